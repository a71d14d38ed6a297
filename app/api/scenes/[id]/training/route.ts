import { z } from 'zod';
import { getDb } from '@/db';
import { inTransaction } from '@/db/transaction';
import { getScene, setTrainingSet } from '@/db/repositories/scenes';
import { idParams, route } from '@/lib/api/route';
import { HttpError } from '@/lib/api/errors';
import { rolesFor } from '@/lib/auth/permissions';

export const runtime = 'nodejs';

const body = z.object({ inTrainingSet: z.boolean({ error: 'inTrainingSet must be true or false' }) }).strict();

/** A trainer adds a scene to, or takes it out of, the organisation's training set. */
export const PUT = route({ roles: rolesFor('markTraining'), params: idParams, body }, async ({ user, params, body }) => {
  return inTransaction(getDb(), async (trx) => {
    if (!(await setTrainingSet(trx, user, params.id, body.inTrainingSet))) throw new HttpError(404, 'Scene not found');
    return (await getScene(trx, user, params.id))!;
  });
});
