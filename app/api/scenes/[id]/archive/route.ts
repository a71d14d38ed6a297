import { z } from 'zod';
import { getDb } from '@/db';
import { inTransaction } from '@/db/transaction';
import { getScene } from '@/db/repositories/scenes';
import { setArchived } from '@/db/repositories/scene-actions';
import { idParams, route } from '@/lib/api/route';
import { HttpError } from '@/lib/api/errors';
import { mayArchiveScene, rolesFor } from '@/lib/auth/permissions';

export const runtime = 'nodejs';

const body = z.object({ archived: z.boolean({ error: 'archived must be true or false' }) }).strict();

/**
 * Archive a scene (it leaves the default list; `status=archived` finds it) or bring it back to the status
 * it had. A plan awaiting review is not archived: withdraw it first, so no supervisor reviews a shelved plan.
 */
export const PUT = route({ roles: rolesFor('archiveScene'), params: idParams, body }, async ({ user, params, body }) => {
  return inTransaction(getDb(), async (trx) => {
    const scene = await getScene(trx, user, params.id);
    if (!scene) throw new HttpError(404, 'Scene not found');
    if (!mayArchiveScene(user, scene)) throw new HttpError(403, 'Only the scene owner or an admin can archive it');
    const isArchived = scene.status === 'archived';
    if (body.archived === isArchived) {
      throw new HttpError(409, `archived: the scene is ${isArchived ? 'already archived' : 'not archived'}`, [{ path: 'archived', message: isArchived ? 'Already archived' : 'Not archived' }]);
    }
    if (scene.status === 'submitted') {
      throw new HttpError(409, 'archived: this plan is awaiting review; withdraw it before archiving', [{ path: 'archived', message: 'Awaiting review' }]);
    }
    await setArchived(trx, user, scene, body.archived);
    return (await getScene(trx, user, params.id))!;
  });
});
