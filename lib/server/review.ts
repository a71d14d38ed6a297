import { staleRevisionBody } from '@/lib/api/errors';
import { fullSnapshot, keepRevision } from '@/db/repositories/revision-storage';
import type { Kysely } from 'kysely';
import type { Database } from '@/db/schema';
import { inTransaction } from '@/db/transaction';
import { getScene, type Scene } from '@/db/repositories/scenes';
import { recordAudit } from '@/db/repositories/audit';
import { closeSubmission, insertSubmission, moveSceneStatus, pendingSubmission } from '@/db/repositories/submissions';
import { countOpenComments } from '@/db/repositories/comments';
import { usersWithRole } from '@/db/repositories/notifications';
import { findUserById } from '@/db/repositories/users';
import type { CurrentUser } from '@/lib/domain';
import { transition, type PlanEvent } from '@/lib/review/lifecycle';
import { planFigures, type LimitBreach, type PlanFigures } from '@/lib/review/figures';
import { decisionRefusal, mayManagePlan } from '@/lib/review/permissions';
import { figureLines, formatBreach } from '@/lib/review/format';
import { describeCheck } from '@/lib/format/checks';
import type { Check } from '@/lib/lift';
import { analyseSavedScene } from './scene-analysis';
import { notifyPeople } from './review-notify';
import { kickOutbox } from './mail/outbox-worker';

/** A route's answer: status and JSON body (the review routes answer richer 4xx bodies than { error }). */
export interface Outcome {
  status: number;
  body: Record<string, unknown>;
}
const fail = (status: number, error: string, extra: Record<string, unknown> = {}): Outcome => ({ status, body: { error, ...extra } });
const stale = (sent: number, current: number): Outcome => ({ status: 409, body: staleRevisionBody('this request', sent, current) });

type Db = Kysely<Database>;

async function load(db: Db, user: CurrentUser, id: number, event: PlanEvent, allowed: (s: Scene) => string | null): Promise<Outcome | { scene: Scene }> {
  const scene = await getScene(db, user, id);
  if (!scene) return fail(404, 'Scene not found');
  const refused = allowed(scene);
  if (refused) return fail(403, refused);
  const t = transition(scene.status, event);
  if (!t.ok) return fail(409, t.message, { status: scene.status });
  return { scene };
}
const ownerOnly = (user: CurrentUser) => (s: Scene) => (mayManagePlan(user, s) ? null : 'Only the operator who wrote this plan can do that');

/** Submit a revision: freeze it, compute it on the server and keep the figures with the submission. */
export async function submitPlan(db: Db, user: CurrentUser, id: number, revision: number): Promise<Outcome> {
  const loaded = await load(db, user, id, 'submit', ownerOnly(user));
  if ('status' in loaded) return loaded;
  const { scene } = loaded;
  if (revision !== scene.revision) return stale(revision, scene.revision);
  const found = await analyseSavedScene(db, user, id, revision);
  if (found.kind !== 'done') return fail(404, 'Scene not found');
  const a = found.analysis;
  if (!a.ok) return fail(422, `Nothing to submit yet: ${a.message}`, { code: a.code });
  const figures = planFigures(a.result, a.input, a.names);
  const out = await inTransaction(db, async (trx) => {
    if (!(await moveSceneStatus(trx, user.organisationId, id, { from: ['draft', 'returned'], to: 'submitted', revision }))) return null;
    const submissionId = await insertSubmission(trx, { organisationId: user.organisationId, sceneId: id, revision, submittedBy: user.id, engineVersion: a.meta.engineVersion, figures: figures as unknown as Record<string, unknown>, checks: a.result.checks });
    // A submitted revision is a full snapshot that revision thinning never removes.
    await keepRevision(trx, id, revision);
    await recordAudit(trx, { organisationId: user.organisationId, userId: user.id, sceneId: id, action: 'scene.submit', detail: { revision, submissionId, engineVersion: a.meta.engineVersion } });
    await notifyPeople(trx, {
      organisationId: user.organisationId, sceneId: id, kind: 'submitted', path: `/scenes/${id}/review`,
      message: `${user.name} submitted “${scene.title}” (revision ${revision}) for review`,
      recipients: await usersWithRole(trx, user.organisationId, ['supervisor']),
      mail: { subject: `For review: ${scene.title}`, lead: `${user.name} submitted the lift plan “${scene.title}” (revision ${revision}) for your review.`, figures: figureLines(figures, 'imperial'), linkLabel: 'Open the review page' },
    });
    return submissionId;
  });
  if (out === null) {
    const now = await getScene(db, user, id);
    return now && now.revision !== revision ? stale(revision, now.revision) : fail(409, 'The plan changed status meanwhile; reload it');
  }
  kickOutbox();
  return { status: 200, body: { status: 'submitted', revision } };
}

export async function withdrawPlan(db: Db, user: CurrentUser, id: number): Promise<Outcome> {
  const loaded = await load(db, user, id, 'withdraw', ownerOnly(user));
  if ('status' in loaded) return loaded;
  const { scene } = loaded;
  const ok = await inTransaction(db, async (trx) => {
    if (!(await moveSceneStatus(trx, user.organisationId, id, { from: ['submitted'], to: 'draft', revision: scene.revision }))) return false;
    const pending = await pendingSubmission(trx, user.organisationId, id);
    if (pending) await closeSubmission(trx, pending.id, 'withdrawn');
    await recordAudit(trx, { organisationId: user.organisationId, userId: user.id, sceneId: id, action: 'scene.withdraw', detail: { revision: scene.revision } });
    return true;
  });
  return ok ? { status: 200, body: { status: 'draft' } } : fail(409, 'The plan changed status meanwhile; reload it');
}

export interface DecisionInput {
  decision: 'approve' | 'return';
  revision: number;
  note?: string;
  conditions?: string;
  reason?: string;
}

const breachJson = (b: LimitBreach) => ({ ...b, message: formatBreach(b, 'metric') });

export async function decidePlan(db: Db, user: CurrentUser, id: number, d: DecisionInput): Promise<Outcome> {
  const loaded = await load(db, user, id, d.decision, (s) => decisionRefusal(user, s));
  if ('status' in loaded) return loaded;
  const { scene } = loaded;
  const pending = await pendingSubmission(db, user.organisationId, id);
  if (!pending) return fail(409, 'This plan has no submission awaiting a decision');
  if (d.revision !== pending.revision) return stale(d.revision, pending.revision);
  const figures = pending.figures as unknown as PlanFigures;
  if (d.decision === 'approve') {
    if (figures.hardLimits.length) {
      return fail(422, `Approval refused: ${figures.hardLimits.length === 1 ? 'a figure is' : `${figures.hardLimits.length} figures are`} beyond a hard limit (${figures.hardLimits.map((b) => b.id).join(', ')}). Return the plan with a note instead.`, { checks: figures.hardLimits.map(breachJson) });
    }
    if (figures.beyondPlan.length && !d.reason?.trim()) {
      const beyond = (pending.checks as Check[]).filter((c) => figures.beyondPlan.includes(c.id));
      return fail(422, `reason: the plan is beyond its own limits (${figures.beyondPlan.join(', ')}); approving it needs a written reason`, {
        issues: [{ path: 'reason', message: 'Required when the plan is beyond its own limits' }],
        checks: beyond.map((c) => ({ ...c, message: describeCheck(c, 'metric').sentence })),
      });
    }
  } else if (!d.note?.trim() && (await countOpenComments(db, user.organisationId, id)) === 0) {
    return fail(422, 'note: returning a plan needs a note or an open comment saying what to change', { issues: [{ path: 'note', message: 'Required without an open comment' }] });
  }
  const to = d.decision === 'approve' ? 'approved' : 'returned';
  const ok = await inTransaction(db, async (trx) => {
    if (!(await moveSceneStatus(trx, user.organisationId, id, { from: ['submitted'], to, revision: pending.revision }))) return false;
    const decision = { decidedBy: user.id, note: d.note?.trim() || null, conditions: d.decision === 'approve' ? d.conditions?.trim() || null : null, reason: d.decision === 'approve' ? d.reason?.trim() || null : null };
    await closeSubmission(trx, pending.id, to, decision);
    await recordAudit(trx, { organisationId: user.organisationId, userId: user.id, sceneId: id, action: d.decision === 'approve' ? 'scene.approve' : 'scene.return', detail: { revision: pending.revision, submissionId: pending.id, note: decision.note, conditions: decision.conditions, reason: decision.reason } });
    const owner = (await findUserById(trx, scene.ownerId))!;
    const verb = d.decision === 'approve' ? 'approved' : 'returned with changes requested';
    await notifyPeople(trx, {
      organisationId: user.organisationId, sceneId: id, kind: to, path: `/scenes/${id}`,
      message: `${user.name} ${verb} “${scene.title}” (revision ${pending.revision})`,
      recipients: [{ id: owner.id, email: owner.email }],
      mail: {
        subject: `${d.decision === 'approve' ? 'Approved' : 'Returned'}: ${scene.title}`,
        lead: `${user.name} ${verb} your lift plan “${scene.title}” (revision ${pending.revision}).`,
        quotes: [{ label: 'Note', text: decision.note ?? '' }, { label: 'Conditions', text: decision.conditions ?? '' }, { label: 'Reason for approval beyond the plan’s own limits', text: decision.reason ?? '' }],
        figures: figureLines(figures, 'imperial'),
        linkLabel: 'Open the plan',
      },
    });
    return true;
  });
  if (!ok) return fail(409, 'The plan changed meanwhile; reload it');
  kickOutbox();
  return { status: 200, body: { status: to, revision: pending.revision } };
}

/** A new draft revision of an approved plan: the approval stays with the approved revision. */
export async function startNewRevision(db: Db, user: CurrentUser, id: number): Promise<Outcome> {
  const loaded = await load(db, user, id, 'new-revision', ownerOnly(user));
  if ('status' in loaded) return loaded;
  const { scene } = loaded;
  const next = scene.revision + 1;
  const ok = await inTransaction(db, async (trx) => {
    const now = new Date().toISOString();
    const res = await trx
      .updateTable('scenes')
      .set({ status: 'draft', revision: next, updated_at: now })
      .where('id', '=', id)
      .where('organisation_id', '=', user.organisationId)
      .where('revision', '=', scene.revision)
      .where('status', '=', 'approved')
      .executeTakeFirst();
    if (Number(res.numUpdatedRows) !== 1) return false;
    await trx.insertInto('scene_revisions').values({ scene_id: id, revision: next, document: fullSnapshot(trx, scene.document), author_id: user.id, created_at: now }).execute();
    await recordAudit(trx, { organisationId: user.organisationId, userId: user.id, sceneId: id, action: 'scene.new-revision', detail: { approvedRevision: scene.revision, revision: next } });
    return true;
  });
  return ok ? { status: 200, body: { status: 'draft', revision: next, approvedRevision: scene.revision } } : fail(409, 'The plan changed meanwhile; reload it');
}
