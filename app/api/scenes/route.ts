import { getDb } from '@/db';
import { createScene, listScenes } from '@/db/repositories/scenes';
import { findEquipmentProfile } from '@/db/repositories/equipment';
import { route } from '@/lib/api/route';
import { HttpError } from '@/lib/api/errors';
import { createSceneSchema, listScenesQuery } from '@/lib/validations/scenes';
import { emptySceneDocument } from '@/lib/scene-document';

export const runtime = 'nodejs';

export const GET = route({ query: listScenesQuery }, async ({ user, query }) => {
  return listScenes(getDb(), user, query);
});

export const POST = route({ roles: ['operator'], body: createSceneSchema }, async ({ user, body }) => {
  const db = getDb();
  let version: number | null = null;
  if (body.equipmentProfileId) {
    const profile = await findEquipmentProfile(db, user.organisationId, body.equipmentProfileId);
    if (!profile) throw new HttpError(400, 'equipmentProfileId: no such truck profile in your organisation', [{ path: 'equipmentProfileId', message: 'Unknown profile' }]);
    version = profile.version;
  }
  const scene = await createScene(db, user, {
    title: body.title,
    document: body.document ?? emptySceneDocument(),
    equipmentProfileId: body.equipmentProfileId ?? null,
    equipmentProfileVersion: version,
  });
  return Response.json(scene, { status: 201 });
});
