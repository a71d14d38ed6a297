import { z } from 'zod';
import { getDb } from '@/db';
import { inTransaction } from '@/db/transaction';
import { createScene, getScene, setTrainingSet } from '@/db/repositories/scenes';
import { idParams, route } from '@/lib/api/route';
import { HttpError } from '@/lib/api/errors';
import { scenePin } from '@/lib/server/truck-pin';
import { rolesFor } from '@/lib/auth/permissions';
import { sceneDocument, sceneTitle } from '@/lib/validations/scenes';

export const runtime = 'nodejs';

const body = z.object({ title: sceneTitle, document: sceneDocument }).strict();

/**
 * The replay's "Save as a training scene": a what-if variant of a scene the user may read becomes a new
 * draft scene in the training set, owned by the trainer. The source scene and its revisions are untouched.
 */
export const POST = route({ roles: rolesFor('writeLessons'), params: idParams, body }, async ({ user, params, body }) => {
  const scene = await inTransaction(getDb(), async (trx) => {
    if (!(await getScene(trx, user, params.id))) throw new HttpError(404, 'Scene not found');
    const pin = await scenePin(trx, user.organisationId, { document: body.document });
    const created = await createScene(trx, user, {
      title: body.title,
      document: body.document,
      equipmentProfileId: pin?.equipmentProfileId ?? null,
      equipmentProfileVersion: pin?.equipmentProfileVersion ?? null,
    });
    await setTrainingSet(trx, user, created.id, true);
    return (await getScene(trx, user, created.id))!;
  });
  return Response.json(scene, { status: 201 });
});
