import { z } from 'zod';
import { pathId } from './path-id';

/** Largest background image accepted: 10 MB (binary megabytes, as file browsers show sizes). */
export const MAX_BACKGROUND_BYTES = 10 * 1024 * 1024;
/** Room for the multipart boundary and headers around the file. */
export const MULTIPART_OVERHEAD_BYTES = 64 * 1024;

/** The multipart form of POST /api/scenes/[id]/background: one `file` field. */
export const backgroundUploadForm = z.object({
  file: z.custom<Blob>((v) => typeof Blob !== 'undefined' && v instanceof Blob, { error: 'Attach the image as a file in the "file" field' }),
});

export const uploadParams = z.object({ id: pathId('id'), uploadId: pathId('uploadId') });
