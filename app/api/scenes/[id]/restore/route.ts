import { getDb } from '@/db';
import { inTransaction } from '@/db/transaction';
import { getScene } from '@/db/repositories/scenes';
import { restoreScene } from '@/db/repositories/scene-actions';
import { idParams, route } from '@/lib/api/route';
import { HttpError } from '@/lib/api/errors';
import { rolesFor } from '@/lib/auth/permissions';

export const runtime = 'nodejs';

/**
 * An admin brings back a scene deleted within the restore window. The one read path a deleted scene has:
 * a scene that is not deleted, deleted too long ago, or another organisation's answers 404.
 */
export const POST = route({ roles: rolesFor('restoreScene'), params: idParams }, async ({ user, params }) => {
  return inTransaction(getDb(), async (trx) => {
    if (!(await restoreScene(trx, user, params.id))) throw new HttpError(404, 'No deleted scene with this id can be restored');
    return (await getScene(trx, user, params.id))!;
  });
});
