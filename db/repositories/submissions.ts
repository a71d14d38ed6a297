import type { Kysely } from 'kysely';
import type { SceneStatus } from '@/lib/domain';
import type { Database, SceneSubmissionRow, SubmissionState } from '../schema';

type Db = Kysely<Database>;

export interface Submission {
  id: number;
  sceneId: number;
  revision: number;
  submittedBy: number;
  submittedByName: string;
  submittedAt: string;
  engineVersion: string;
  figures: Record<string, unknown>;
  checks: unknown[];
  state: SubmissionState;
  decidedBy: number | null;
  decidedByName: string | null;
  decidedByRole: string | null;
  decidedAt: string | null;
  note: string | null;
  conditions: string | null;
  reason: string | null;
}

type Row = SceneSubmissionRow & { submitted_by_name: string; decided_by_name: string | null; decided_by_role: string | null };

function toSubmission(r: Row): Submission {
  return {
    id: r.id,
    sceneId: r.scene_id,
    revision: r.revision,
    submittedBy: r.submitted_by,
    submittedByName: r.submitted_by_name,
    submittedAt: r.submitted_at,
    engineVersion: r.engine_version,
    figures: r.figures,
    checks: r.checks,
    state: r.state,
    decidedBy: r.decided_by,
    decidedByName: r.decided_by_name,
    decidedByRole: r.decided_by_role,
    decidedAt: r.decided_at,
    note: r.note,
    conditions: r.conditions,
    reason: r.reason,
  };
}

function submissions(db: Db, organisationId: number) {
  return db
    .selectFrom('scene_submissions as s')
    .innerJoin('users as sb', 'sb.id', 's.submitted_by')
    .leftJoin('users as db', 'db.id', 's.decided_by')
    .selectAll('s')
    .select(['sb.name as submitted_by_name', 'db.name as decided_by_name', 'db.role as decided_by_role'])
    .where('s.organisation_id', '=', organisationId);
}

/** A scene's submissions, newest first. */
export async function listSubmissions(db: Db, organisationId: number, sceneId: number): Promise<Submission[]> {
  const rows = await submissions(db, organisationId).where('s.scene_id', '=', sceneId).orderBy('s.id', 'desc').execute();
  return rows.map((r) => toSubmission(r as Row));
}

/** The scene's approved revision: the newest approved submission's (undefined when none was approved). */
export async function approvedRevision(db: Db, organisationId: number, sceneId: number): Promise<number | undefined> {
  const r = await db
    .selectFrom('scene_submissions')
    .select('revision')
    .where('organisation_id', '=', organisationId)
    .where('scene_id', '=', sceneId)
    .where('state', '=', 'approved')
    .orderBy('revision', 'desc')
    .limit(1)
    .executeTakeFirst();
  return r?.revision;
}

export async function pendingSubmission(db: Db, organisationId: number, sceneId: number): Promise<Submission | undefined> {
  const r = await submissions(db, organisationId).where('s.scene_id', '=', sceneId).where('s.state', '=', 'pending').orderBy('s.id', 'desc').executeTakeFirst();
  return r ? toSubmission(r as Row) : undefined;
}

export interface NewSubmission {
  organisationId: number;
  sceneId: number;
  revision: number;
  submittedBy: number;
  engineVersion: string;
  figures: Record<string, unknown>;
  checks: unknown[];
}

export async function insertSubmission(db: Db, s: NewSubmission): Promise<number> {
  const row = await db
    .insertInto('scene_submissions')
    .values({
      organisation_id: s.organisationId,
      scene_id: s.sceneId,
      revision: s.revision,
      submitted_by: s.submittedBy,
      submitted_at: new Date().toISOString(),
      engine_version: s.engineVersion,
      figures: JSON.stringify(s.figures),
      checks: JSON.stringify(s.checks),
    })
    .returning('id')
    .executeTakeFirstOrThrow();
  return row.id;
}

export async function closeSubmission(
  db: Db,
  id: number,
  state: Exclude<SubmissionState, 'pending'>,
  decision: { decidedBy?: number; note?: string | null; conditions?: string | null; reason?: string | null } = {},
) {
  await db
    .updateTable('scene_submissions')
    .set({
      state,
      decided_by: decision.decidedBy ?? null,
      decided_at: new Date().toISOString(),
      note: decision.note ?? null,
      conditions: decision.conditions ?? null,
      reason: decision.reason ?? null,
    })
    .where('id', '=', id)
    .where('state', '=', 'pending')
    .execute();
}

/**
 * Moves a scene between lifecycle statuses only if it is still at `revision` and in one of `from`: the
 * check and the write are one statement, so two racing decisions cannot both win.
 */
export async function moveSceneStatus(db: Db, organisationId: number, sceneId: number, opts: { from: readonly SceneStatus[]; to: SceneStatus; revision: number }): Promise<boolean> {
  const res = await db
    .updateTable('scenes')
    .set({ status: opts.to, updated_at: new Date().toISOString() })
    .where('id', '=', sceneId)
    .where('organisation_id', '=', organisationId)
    .where('deleted_at', 'is', null)
    .where('revision', '=', opts.revision)
    .where('status', 'in', [...opts.from])
    .executeTakeFirst();
  return Number(res.numUpdatedRows) === 1;
}

export interface QueueRow {
  sceneId: number;
  title: string;
  revision: number;
  ownerId: number;
  ownerName: string;
  submittedAt: string;
  document: Record<string, unknown>;
  figures: Record<string, unknown>;
  submissionId: number;
}

/** Submissions awaiting a decision whose scene is still submitted: the review queue. */
function awaitingReview(db: Db, organisationId: number) {
  return db
    .selectFrom('scene_submissions as s')
    .innerJoin('scenes', 'scenes.id', 's.scene_id')
    .where('s.organisation_id', '=', organisationId)
    .where('scenes.organisation_id', '=', organisationId)
    .where('s.state', '=', 'pending')
    .where('scenes.status', '=', 'submitted')
    .where('scenes.deleted_at', 'is', null);
}

export async function countReviewQueue(db: Db, organisationId: number): Promise<number> {
  const r = await awaitingReview(db, organisationId).select((eb) => eb.fn.countAll<number>().as('n')).executeTakeFirstOrThrow();
  return Number(r.n);
}

/** The organisation's plans awaiting review, oldest submission first. */
export async function listReviewQueue(db: Db, organisationId: number): Promise<QueueRow[]> {
  const rows = await awaitingReview(db, organisationId)
    .innerJoin('users', 'users.id', 'scenes.owner_id')
    .select(['scenes.id', 'scenes.title', 's.revision', 'scenes.owner_id', 'users.name as owner_name', 's.submitted_at', 'scenes.document', 's.figures', 's.id as submission_id'])
    .orderBy('s.submitted_at', 'asc')
    .orderBy('s.id', 'asc')
    .execute();
  return rows.map((r) => ({
    sceneId: r.id,
    title: r.title,
    revision: r.revision,
    ownerId: r.owner_id,
    ownerName: r.owner_name,
    submittedAt: r.submitted_at,
    document: r.document,
    figures: r.figures,
    submissionId: r.submission_id,
  }));
}
