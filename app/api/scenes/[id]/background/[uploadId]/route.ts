import { getDb } from '@/db';
import { getScene } from '@/db/repositories/scenes';
import { findSceneUpload } from '@/db/repositories/scene-uploads';
import { route } from '@/lib/api/route';
import { HttpError } from '@/lib/api/errors';
import { openObjectStream } from '@/lib/storage';
import { uploadParams } from '@/lib/validations/uploads';

export const runtime = 'nodejs';

/**
 * Streams a scene's background image to users who can read the scene. Anyone else, including every
 * other organisation, gets the same 404 as for an id that does not exist.
 */
export const GET = route({ params: uploadParams }, async ({ user, params }) => {
  const db = getDb();
  const notFound = new HttpError(404, 'Image not found');
  const scene = await getScene(db, user, params.id);
  if (!scene) throw notFound;
  const upload = await findSceneUpload(db, user.organisationId, scene.id, params.uploadId);
  if (!upload) throw notFound;
  const opened = await openObjectStream(upload.storageKey);
  if (!opened) throw notFound;
  return new Response(opened.stream, {
    headers: {
      'Content-Type': upload.mime,
      'Content-Length': String(opened.bytes),
      // Private: the image is organisation data. Immutable: an upload id never names different bytes.
      'Cache-Control': 'private, max-age=31536000, immutable',
      'X-Content-Type-Options': 'nosniff',
    },
  });
});
