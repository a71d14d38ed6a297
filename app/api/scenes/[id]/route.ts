import { getDb } from '@/db';
import { inTransaction } from '@/db/transaction';
import { getScene, softDeleteScene, updateScene } from '@/db/repositories/scenes';
import { idParams, route } from '@/lib/api/route';
import { HttpError } from '@/lib/api/errors';
import { documentTruckPin, pinFromDocument, pinnedProfileVersion } from '@/lib/api/truck-pin';
import { updateSceneSchema } from '@/lib/validations/scenes';

export const runtime = 'nodejs';

const notFound = () => new HttpError(404, 'Scene not found');

export const GET = route({ params: idParams }, async ({ user, params }) => {
  const scene = await getScene(getDb(), user, params.id);
  if (!scene) throw notFound();
  return scene;
});

export const PUT = route({ roles: ['operator'], params: idParams, body: updateSceneSchema }, async ({ user, params, body }) => {
  // Read, ownership check and write in one transaction: nothing can change the scene in between.
  const outcome = await inTransaction(getDb(), async (trx) => {
    const scene = await getScene(trx, user, params.id);
    if (!scene) throw notFound();
    if (scene.ownerId !== user.id) throw new HttpError(403, 'Only the scene owner can edit it');
    let equipmentProfileVersion: number | null | undefined;
    if (body.equipmentProfileId) {
      equipmentProfileVersion = await pinnedProfileVersion(trx, user.organisationId, body.equipmentProfileId, {
        allowRetired: body.equipmentProfileId === scene.equipmentProfileId,
      });
    } else if (body.equipmentProfileId === null) equipmentProfileVersion = null;
    // A saved sketch carries its truck's profile and version; the record follows it, so the plan's pinned
    // version is the one its truck is drawn from (for example after moving the plan to a newer version).
    const follow = body.equipmentProfileId === undefined && body.document !== undefined ? await pinFromDocument(trx, user.organisationId, body.document) : null;
    if (follow) return updateScene(trx, user, params.id, { ...body, ...follow });
    if (body.equipmentProfileId && body.equipmentProfileId === documentTruckPin(body.document)?.profileId) {
      const exact = await pinFromDocument(trx, user.organisationId, body.document);
      if (exact) equipmentProfileVersion = exact.equipmentProfileVersion;
    }
    return updateScene(trx, user, params.id, { ...body, equipmentProfileVersion });
  });
  if (outcome.kind === 'missing') throw notFound();
  if (outcome.kind === 'stale') {
    return Response.json(
      {
        error: `revision: this save was based on revision ${body.revision}, but the scene is now at revision ${outcome.current}`,
        issues: [{ path: 'revision', message: 'Stale revision' }],
        currentRevision: outcome.current,
      },
      { status: 409 },
    );
  }
  return outcome.scene;
});

export const DELETE = route({ roles: ['operator', 'admin'], params: idParams }, async ({ user, params }) => {
  await inTransaction(getDb(), async (trx) => {
    const scene = await getScene(trx, user, params.id);
    if (!scene) throw notFound();
    if (user.role === 'operator' && scene.ownerId !== user.id) throw new HttpError(403, 'Only the scene owner can delete it');
    if (!(await softDeleteScene(trx, user, params.id))) throw notFound();
  });
  return { ok: true };
});
