import { getDb } from '@/db';
import { getScene } from '@/db/repositories/scenes';
import { idParams, route } from '@/lib/api/route';
import { HttpError, statusAfterEdit, zodIssues, describeIssues } from '@/lib/api/errors';
import { ACCEPTED_IMAGE_TYPES, oversizedImageReason, sniffImage } from '@/lib/image-sniff';
import { readBodyLimited } from '@/lib/api/body';
import { storeSceneUpload } from '@/lib/server/store-scene-upload';
import { MAX_BACKGROUND_BYTES, MULTIPART_OVERHEAD_BYTES, backgroundUploadForm } from '@/lib/validations/uploads';
import { mayEditScene, rolesFor } from '@/lib/auth/permissions';

export const runtime = 'nodejs';

const tooLarge = () =>
  new HttpError(413, 'file: the image is larger than 10 MB', [{ path: 'file', message: `At most ${MAX_BACKGROUND_BYTES} bytes` }]);

/** Uploads a site background image (multipart, field "file") for a scene the signed-in operator owns. */
export const POST = route({ roles: rolesFor('editScene'), params: idParams }, async ({ req, user, params }) => {
  const db = getDb();
  const scene = await getScene(db, user, params.id);
  if (!scene) throw new HttpError(404, 'Scene not found');
  if (!mayEditScene(user, scene)) throw new HttpError(403, 'Only the scene owner can add a background image');
  // A submitted, approved or archived plan is frozen: an image it could never place is refused (409 naming status).
  statusAfterEdit(scene.status);

  // Counted while it streams: a declared length over the limit is refused unread, a chunked one at the limit.
  let raw: Uint8Array;
  try {
    raw = await readBodyLimited(req, MAX_BACKGROUND_BYTES + MULTIPART_OVERHEAD_BYTES, 'file');
  } catch (err) {
    if (err instanceof HttpError && err.status === 413) throw tooLarge();
    throw err;
  }
  let form: FormData;
  try {
    form = await new Response(raw as BodyInit, { headers: { 'content-type': req.headers.get('content-type') ?? '' } }).formData();
  } catch {
    throw new HttpError(400, 'file: send the image as multipart/form-data with a "file" field', [{ path: 'file', message: 'Not a multipart form' }]);
  }
  const parsed = backgroundUploadForm.safeParse({ file: form.get('file') ?? undefined });
  if (!parsed.success) {
    const issues = zodIssues(parsed.error);
    throw new HttpError(400, `Invalid form: ${describeIssues(issues)}`, issues);
  }
  const file = parsed.data.file;
  if (file.size > MAX_BACKGROUND_BYTES) throw tooLarge();
  if (file.size === 0) throw new HttpError(400, 'file: the file is empty', [{ path: 'file', message: 'Empty file' }]);

  const bytes = new Uint8Array(await file.arrayBuffer());
  const image = sniffImage(bytes);
  if (!image) {
    throw new HttpError(415, 'file: only PNG, JPEG or WebP images with a readable header are accepted (checked by decoding the file, not by its name)', [
      { path: 'file', message: `Not one of ${ACCEPTED_IMAGE_TYPES.join(', ')}` },
    ]);
  }
  const oversized = oversizedImageReason(image);
  if (oversized) throw new HttpError(422, `file: ${oversized}`, [{ path: 'file', message: 'Too many pixels' }]);
  const upload = await storeSceneUpload(db, { organisationId: user.organisationId, sceneId: scene.id, uploaderId: user.id, bytes, image });
  return Response.json(
    {
      id: upload.id,
      sceneId: upload.sceneId,
      mime: upload.mime,
      bytes: upload.bytes,
      width: upload.width,
      height: upload.height,
      url: `/api/scenes/${scene.id}/background/${upload.id}`,
      createdAt: upload.createdAt,
    },
    { status: 201 },
  );
});
