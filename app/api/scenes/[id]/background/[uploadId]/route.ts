import { getDb } from '@/db';
import { getScene } from '@/db/repositories/scenes';
import { findSceneUpload } from '@/db/repositories/scene-uploads';
import { route } from '@/lib/api/route';
import { HttpError } from '@/lib/api/errors';
import { openObjectStream } from '@/lib/storage';
import { uploadParams } from '@/lib/validations/uploads';
import { UPLOAD_CSP } from '@/lib/security/content-security-policy';

export const runtime = 'nodejs';

const EXTENSION: Record<string, string> = { 'image/png': 'png', 'image/jpeg': 'jpg', 'image/webp': 'webp' };

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
      // Organisation data: never kept by shared or browser caches, like every API answer.
      'Cache-Control': 'no-store',
      'X-Content-Type-Options': 'nosniff',
      // Shown inline as an image; opened on its own it runs nothing and can load nothing (sandbox).
      'Content-Disposition': `inline; filename="scene-${scene.id}-background-${upload.id}.${EXTENSION[upload.mime] ?? 'bin'}"`,
      'Content-Security-Policy': UPLOAD_CSP,
    },
  });
});
