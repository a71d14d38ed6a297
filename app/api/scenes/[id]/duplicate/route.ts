import { z } from 'zod';
import { getDb } from '@/db';
import { inTransaction } from '@/db/transaction';
import { getScene } from '@/db/repositories/scenes';
import { duplicateScene } from '@/db/repositories/scene-actions';
import { idParams, route } from '@/lib/api/route';
import { HttpError } from '@/lib/api/errors';
import { rolesFor } from '@/lib/auth/permissions';
import { copyTitle } from '@/lib/scene/retention';
import { sceneTitle } from '@/lib/validations/scenes';

export const runtime = 'nodejs';

/** `{}` names the copy "Copy of …". */
const body = z.object({ title: sceneTitle.optional() }).strict();

/** An operator copies a scene they may read into a new draft of their own (revision 1). */
export const POST = route({ roles: rolesFor('createScene'), params: idParams, body }, async ({ user, params, body }) => {
  const copy = await inTransaction(getDb(), async (trx) => {
    const source = await getScene(trx, user, params.id);
    if (!source) throw new HttpError(404, 'Scene not found');
    return duplicateScene(trx, user, source, body.title ?? copyTitle(source.title));
  });
  return Response.json(copy, { status: 201 });
});
