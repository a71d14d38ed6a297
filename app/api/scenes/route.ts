import { getDb } from '@/db';
import { inTransaction } from '@/db/transaction';
import { createScene, listScenes } from '@/db/repositories/scenes';
import { route } from '@/lib/api/route';
import { scenePin } from '@/lib/server/truck-pin';
import { createSceneSchema, listScenesQuery } from '@/lib/validations/scenes';
import { emptySceneDocument } from '@/lib/scene';

export const runtime = 'nodejs';

export const GET = route({ query: listScenesQuery }, async ({ user, query }) => {
  return listScenes(getDb(), user, query);
});

export const POST = route({ roles: ['operator'], body: createSceneSchema }, async ({ user, body }) => {
  // The profile check and the insert share a transaction, so the pinned version is the one that was checked.
  const scene = await inTransaction(getDb(), async (trx) => {
    const pin = await scenePin(trx, user.organisationId, body);
    return createScene(trx, user, {
      title: body.title,
      document: body.document ?? emptySceneDocument(),
      equipmentProfileId: pin?.equipmentProfileId ?? null,
      equipmentProfileVersion: pin?.equipmentProfileVersion ?? null,
    });
  });
  return Response.json(scene, { status: 201 });
});
