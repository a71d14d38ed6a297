import type { Kysely } from 'kysely';
import type { Database } from '../schema';
import type { CurrentUser, SceneStatus } from '@/lib/domain';
import { emptyPlanDetails, planDetailsSchema, type PlanDetails } from '@/lib/plan-details/schema';
import { updateScene, type UpdateOutcome } from './scenes';
import { inTransaction } from '../transaction';

type Db = Kysely<Database>;

export interface StoredPlanDetails {
  details: PlanDetails;
  /** The revision the details were last saved with (null: never filled in; the empty details apply). */
  savedAt: number | null;
  savedBy: string | null;
}

/**
 * The plan details that go with revision `revision` of a scene: the newest row saved at or before it. The
 * caller has already checked the scene is visible to the user. Rows that no longer validate (an older
 * shape) read as empty details rather than failing the document.
 */
export async function planDetailsAt(db: Db, sceneId: number, revision: number): Promise<StoredPlanDetails> {
  const row = await db
    .selectFrom('scene_plan_details')
    .innerJoin('users', 'users.id', 'scene_plan_details.author_id')
    .select(['scene_plan_details.details', 'scene_plan_details.revision', 'users.name'])
    .where('scene_plan_details.scene_id', '=', sceneId)
    .where('scene_plan_details.revision', '<=', revision)
    .orderBy('scene_plan_details.revision', 'desc')
    .limit(1)
    .executeTakeFirst();
  if (!row) return { details: emptyPlanDetails(), savedAt: null, savedBy: null };
  const parsed = planDetailsSchema.safeParse(row.details);
  return { details: parsed.success ? parsed.data : emptyPlanDetails(), savedAt: row.revision, savedBy: row.name };
}

/** True when the scene has a saved revision numbered `revision`. */
export async function revisionExists(db: Db, sceneId: number, revision: number): Promise<boolean> {
  const row = await db.selectFrom('scene_revisions').select('id').where('scene_id', '=', sceneId).where('revision', '=', revision).executeTakeFirst();
  return row !== undefined;
}

/**
 * Saves plan details as a new revision of the scene (the document is carried over unchanged), so a
 * revision's PDF always shows the details that were current when it was saved. Stale base revision → 'stale'.
 * `status`: the scene's new status, when the save changes it (a returned plan goes back to draft).
 */
export async function savePlanDetails(db: Db, user: CurrentUser, sceneId: number, baseRevision: number, details: PlanDetails, status?: SceneStatus): Promise<UpdateOutcome> {
  return inTransaction(db, async (trx) => {
    // The job's location is also the scene's searchable location (the list's full-text search covers it).
    const location = details.job.location.trim() || undefined;
    const outcome = await updateScene(trx, user, sceneId, { revision: baseRevision, ...(location !== undefined && { location: location.slice(0, 200) }), ...(status !== undefined && { status }) });
    if (outcome.kind !== 'ok') return outcome;
    await trx
      .insertInto('scene_plan_details')
      .values({
        organisation_id: user.organisationId,
        scene_id: sceneId,
        revision: outcome.revision,
        details: JSON.stringify(details),
        author_id: user.id,
        created_at: new Date().toISOString(),
      })
      .execute();
    return outcome;
  });
}
