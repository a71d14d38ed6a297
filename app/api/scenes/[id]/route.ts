import { getDb } from '@/db';
import { inTransaction } from '@/db/transaction';
import { getScene, getSceneAsJson, sceneForSave, softDeleteScene, updateScene } from '@/db/repositories/scenes';
import { scheduleThinning } from '@/db/repositories/revision-storage';
import { idParams, route } from '@/lib/api/route';
import { HttpError, staleRevisionBody, statusAfterEdit } from '@/lib/api/errors';
import { scenePin } from '@/lib/server/truck-pin';
import { updateSceneSchema } from '@/lib/validations/scenes';
import { mayDeleteScene, mayEditScene, mayReadScene, rolesFor } from '@/lib/auth/permissions';

export const runtime = 'nodejs';

const notFound = () => new HttpError(404, 'Scene not found');

export const GET = route({ params: idParams }, async ({ user, params }) => {
  const json = await getSceneAsJson(getDb(), user, params.id);
  if (json === undefined) throw notFound();
  return new Response(json, { headers: { 'content-type': 'application/json' } });
});

export const PUT = route({ roles: rolesFor('editScene'), params: idParams, body: updateSceneSchema }, async ({ user, params, body }) => {
  // Read, ownership check and write in one transaction: nothing can change the scene in between.
  const outcome = await inTransaction(getDb(), async (trx) => {
    // The few columns the checks need; the stored document is never read on a save.
    const scene = await sceneForSave(trx, user, params.id);
    // A scene this user may not even read is not found, as on GET.
    if (!scene || !mayReadScene(user, scene)) throw notFound();
    if (!mayEditScene(user, scene)) throw new HttpError(403, 'Only the scene owner can edit it');
    // A submitted or approved plan is frozen; the message says what to do instead (withdraw, new revision).
    // Editing a returned plan takes it back to draft.
    const to = statusAfterEdit(scene.status);
    const status = to !== scene.status ? { status: to } : {};
    // The record names the profile version the saved sketch's truck is drawn from (lib/api/truck-pin).
    const pin = await scenePin(trx, user.organisationId, body, { keepProfileId: scene.equipmentProfileId });
    return updateScene(trx, user, params.id, { ...body, ...pin, ...status });
  });
  if (outcome.kind === 'missing') throw notFound();
  if (outcome.kind === 'stale') {
    return Response.json(staleRevisionBody('this save', body.revision, outcome.current), { status: 409 });
  }
  scheduleThinning(getDb(), params.id);
  return { revision: outcome.revision, savedAt: outcome.savedAt };
});

export const DELETE = route({ roles: rolesFor('deleteScene'), params: idParams }, async ({ user, params }) => {
  await inTransaction(getDb(), async (trx) => {
    const scene = await getScene(trx, user, params.id);
    if (!scene) throw notFound();
    if (!mayDeleteScene(user, scene)) throw new HttpError(403, 'Only the scene owner can delete it');
    if (!(await softDeleteScene(trx, user, params.id))) throw notFound();
  });
  return { ok: true };
});
