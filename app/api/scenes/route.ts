import { getDb } from '@/db';
import { inTransaction } from '@/db/transaction';
import { createScene, listScenes } from '@/db/repositories/scenes';
import { route } from '@/lib/api/route';
import { documentTruckPin, pinFromDocument, pinnedProfileVersion } from '@/lib/api/truck-pin';
import { createSceneSchema, listScenesQuery } from '@/lib/validations/scenes';
import { emptySceneDocument } from '@/lib/scene-document';

export const runtime = 'nodejs';

export const GET = route({ query: listScenesQuery }, async ({ user, query }) => {
  return listScenes(getDb(), user, query);
});

export const POST = route({ roles: ['operator'], body: createSceneSchema }, async ({ user, body }) => {
  // The profile check and the insert share a transaction, so the pinned version is the one that was checked.
  const scene = await inTransaction(getDb(), async (trx) => {
    // No profile named: the record follows the sketch's truck, when it is one of ours.
    const follow = body.equipmentProfileId === undefined ? await pinFromDocument(trx, user.organisationId, body.document) : null;
    const profileId = follow?.equipmentProfileId ?? body.equipmentProfileId ?? null;
    let version = profileId ? await pinnedProfileVersion(trx, user.organisationId, profileId) : null;
    // A copy of a plan drawn from an older version of the same truck records that version, not the newest.
    if (profileId && documentTruckPin(body.document)?.profileId === profileId) {
      const exact = await pinFromDocument(trx, user.organisationId, body.document);
      if (exact) version = exact.equipmentProfileVersion;
    }
    return createScene(trx, user, {
      title: body.title,
      document: body.document ?? emptySceneDocument(),
      equipmentProfileId: profileId,
      equipmentProfileVersion: version,
    });
  });
  return Response.json(scene, { status: 201 });
});
