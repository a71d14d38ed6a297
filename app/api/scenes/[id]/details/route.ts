import { getDb } from '@/db';
import { inTransaction } from '@/db/transaction';
import { getScene } from '@/db/repositories/scenes';
import { planDetailsAt, savePlanDetails } from '@/db/repositories/plan-details';
import { idParams, route } from '@/lib/api/route';
import { HttpError, staleRevisionBody, statusAfterEdit } from '@/lib/api/errors';
import { planRevisionQuery, savePlanDetailsSchema } from '@/lib/validations/plan';
import { planRevision } from '../plan-revision';
import { mayEditScene, rolesFor } from '@/lib/auth/permissions';

export const runtime = 'nodejs';

/** The plan details that go with a revision (default: the approved revision, else the latest). */
export const GET = route({ params: idParams, query: planRevisionQuery }, async ({ user, params, query }) => {
  const db = getDb();
  const { scene, revision } = await planRevision(db, user, params.id, query.revision);
  const stored = await planDetailsAt(db, scene.id, revision);
  return { id: scene.id, revision, savedAt: stored.savedAt, savedBy: stored.savedBy, details: stored.details };
});

/** Saves the details as a new revision of the scene (the sketch is carried over unchanged); a frozen plan is 409. */
export const PUT = route({ roles: rolesFor('editScene'), params: idParams, body: savePlanDetailsSchema }, async ({ user, params, body }) => {
  const outcome = await inTransaction(getDb(), async (trx) => {
    const scene = await getScene(trx, user, params.id);
    if (!scene) throw new HttpError(404, 'Scene not found');
    if (!mayEditScene(user, scene)) throw new HttpError(403, 'Only the scene owner can edit its plan details');
    // A new revision of the details is an edit of the plan: a submitted, approved or archived plan is frozen
    // (as for PUT /api/scenes/{id}), and saving a returned plan's details takes it back to draft.
    const status = statusAfterEdit(scene.status);
    return savePlanDetails(trx, user, params.id, body.revision, body.details, status !== scene.status ? status : undefined);
  });
  if (outcome.kind === 'missing') throw new HttpError(404, 'Scene not found');
  if (outcome.kind === 'stale') {
    return Response.json(staleRevisionBody('these details', body.revision, outcome.current), { status: 409 });
  }
  return { id: params.id, revision: outcome.revision, savedAt: outcome.savedAt, savedBy: user.name, details: body.details };
});
