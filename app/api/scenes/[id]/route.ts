import { getDb } from '@/db';
import { getScene, softDeleteScene, updateScene } from '@/db/repositories/scenes';
import { findEquipmentProfile } from '@/db/repositories/equipment';
import { idParams, route } from '@/lib/api/route';
import { HttpError } from '@/lib/api/errors';
import { updateSceneSchema } from '@/lib/validations/scenes';

export const runtime = 'nodejs';

const notFound = () => new HttpError(404, 'Scene not found');

export const GET = route({ params: idParams }, async ({ user, params }) => {
  const scene = await getScene(getDb(), user, params.id);
  if (!scene) throw notFound();
  return scene;
});

export const PUT = route({ roles: ['operator'], params: idParams, body: updateSceneSchema }, async ({ user, params, body }) => {
  const db = getDb();
  const scene = await getScene(db, user, params.id);
  if (!scene) throw notFound();
  if (scene.ownerId !== user.id) throw new HttpError(403, 'Only the scene owner can edit it');
  let equipmentProfileVersion: number | null | undefined;
  if (body.equipmentProfileId) {
    const profile = await findEquipmentProfile(db, user.organisationId, body.equipmentProfileId);
    if (!profile) throw new HttpError(400, 'equipmentProfileId: no such truck profile in your organisation', [{ path: 'equipmentProfileId', message: 'Unknown profile' }]);
    equipmentProfileVersion = profile.version;
  } else if (body.equipmentProfileId === null) equipmentProfileVersion = null;
  const outcome = await updateScene(db, user, params.id, { ...body, equipmentProfileVersion });
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
  const db = getDb();
  const scene = await getScene(db, user, params.id);
  if (!scene) throw notFound();
  if (user.role === 'operator' && scene.ownerId !== user.id) throw new HttpError(403, 'Only the scene owner can delete it');
  await softDeleteScene(db, user, params.id);
  return { ok: true };
});
