import { getDb } from '@/db';
import { inTransaction } from '@/db/transaction';
import { createScene } from '@/db/repositories/scenes';
import { BadCursorError, listScenes } from '@/db/repositories/scene-list';
import { HttpError } from '@/lib/api/errors';
import { route } from '@/lib/api/route';
import { scenePin } from '@/lib/server/truck-pin';
import { figuresFor } from '@/lib/server/scene-figures';
import { createSceneSchema, listScenesQuery } from '@/lib/validations/scenes';
import { emptySceneDocument } from '@/lib/scene';
import { rolesFor } from '@/lib/auth/permissions';

export const runtime = 'nodejs';

export const GET = route({ query: listScenesQuery }, async ({ user, query }) => {
  const { q, title, training, ...rest } = query;
  try {
    const page = await listScenes(getDb(), user, { ...rest, q: q ?? title, inTrainingSet: training === undefined ? undefined : training === '1' });
    // The server's figures for each scene's current revision, stored per revision on first read.
    const figures = await figuresFor(getDb(), user.organisationId, page.items);
    return { ...page, items: page.items.map((s) => ({ ...s, figures: figures.get(s.id)! })) };
  } catch (e) {
    if (e instanceof BadCursorError) {
      const field = query.before !== undefined ? 'before' : 'after';
      throw new HttpError(400, `query.${field}: ${e.message}`, [{ path: `query.${field}`, message: e.message }]);
    }
    throw e;
  }
});

export const POST = route({ roles: rolesFor('createScene'), body: createSceneSchema }, async ({ user, body }) => {
  // The profile check and the insert share a transaction, so the pinned version is the one that was checked.
  const scene = await inTransaction(getDb(), async (trx) => {
    const pin = await scenePin(trx, user.organisationId, body);
    return createScene(trx, user, {
      title: body.title,
      location: body.location,
      notes: body.notes,
      document: body.document ?? emptySceneDocument(),
      equipmentProfileId: pin?.equipmentProfileId ?? null,
      equipmentProfileVersion: pin?.equipmentProfileVersion ?? null,
    });
  });
  return Response.json(scene, { status: 201 });
});
