import type { Kysely } from 'kysely';
import type { Database } from '../schema';
import { parseSceneDocument } from '@/lib/scene/parse';
import { sceneToLiftInput } from '@/lib/scene/to-lift-input';
import { truckModelFromProfile } from '@/lib/scene/truck/from-spec';
import { analyzeLift } from '@/lib/lift';
import { ENGINE_VERSION } from '@/lib/lift/version';
import { planFigures } from '@/lib/review/figures';
import { REVIEW_TITLES } from './demo-review-scenes';

/**
 * The review records behind the demo plans: submissions with the figures computed exactly as the server
 * computes them, decisions, a pinned comment with a reply, audit entries and in-app notifications. All
 * invented. No e-mail is queued: the demo should not send mail about events that never happened.
 */
const ago = (minutes: number) => new Date(Date.now() - minutes * 60_000).toISOString();
const APPROVED_TITLE = 'Overturned reefer trailer, Mill Creek on-ramp';

export async function seedDemoReview(trx: Kysely<Database>) {
  const users = new Map((await trx.selectFrom('users').select(['id', 'email']).execute()).map((u) => [u.email, u.id]));
  const supervisor = users.get('supervisor@harrow.example')!;

  async function scene(title: string) {
    const s = await trx.selectFrom('scenes').select(['id', 'organisation_id', 'owner_id', 'document', 'revision']).where('title', '=', title).executeTakeFirstOrThrow();
    const parsed = parseSceneDocument(s.document);
    if (!parsed.ok) throw new Error(`demo scene "${title}" does not parse`);
    const t = parsed.document.objects.find((o) => o.kind === 'truck');
    if (!t || t.kind !== 'truck') throw new Error(`demo scene "${title}" has no truck`);
    const v = await trx.selectFrom('equipment_profile_versions').selectAll().where('profile_id', '=', t.profileId).where('version', '=', t.profileVersion).executeTakeFirstOrThrow();
    const lift = sceneToLiftInput(parsed.document, truckModelFromProfile({ id: v.profile_id, version: v.version, name: v.name, unitNumber: v.unit_number, spec: v.spec }));
    if (!lift.ok) throw new Error(`demo scene "${title}": ${lift.problem.message}`);
    const result = analyzeLift(lift.input);
    return { ...s, figures: planFigures(result, lift.input, lift.names), checks: result.checks };
  }

  async function submit(s: Awaited<ReturnType<typeof scene>>, at: string, decision?: { state: 'approved' | 'returned'; at: string; note?: string; conditions?: string }) {
    const row = await trx
      .insertInto('scene_submissions')
      .values({
        organisation_id: s.organisation_id, scene_id: s.id, revision: s.revision, submitted_by: s.owner_id, submitted_at: at, engine_version: ENGINE_VERSION,
        figures: JSON.stringify(s.figures), checks: JSON.stringify(s.checks),
        ...(decision ? { state: decision.state, decided_by: supervisor, decided_at: decision.at, note: decision.note ?? null, conditions: decision.conditions ?? null } : {}),
      })
      .returning('id')
      .executeTakeFirstOrThrow();
    const audit = (userId: number, action: string, created_at: string, detail: Record<string, unknown>) =>
      trx.insertInto('audit_log').values({ organisation_id: s.organisation_id, user_id: userId, scene_id: s.id, action, detail: JSON.stringify(detail), created_at }).execute();
    await audit(s.owner_id, 'scene.submit', at, { revision: s.revision, submissionId: row.id, engineVersion: ENGINE_VERSION });
    if (decision) await audit(supervisor, decision.state === 'approved' ? 'scene.approve' : 'scene.return', decision.at, { revision: s.revision, submissionId: row.id, note: decision.note ?? null, conditions: decision.conditions ?? null, reason: null });
    const notify = (userId: number, kind: string, message: string, link: string, created_at: string) =>
      trx.insertInto('notifications').values({ organisation_id: s.organisation_id, user_id: userId, scene_id: s.id, kind, message, link, created_at }).execute();
    if (!decision) await notify(supervisor, 'submitted', `A plan was submitted for review (revision ${s.revision})`, `/scenes/${s.id}/review`, at);
    else await notify(s.owner_id, decision.state, `Your plan was ${decision.state === 'approved' ? 'approved' : 'returned with changes requested'} (revision ${s.revision})`, `/scenes/${s.id}`, decision.at);
    return row.id;
  }

  const approved = await scene(APPROVED_TITLE);
  await submit(approved, ago(60 * 50), { state: 'approved', at: ago(60 * 47), conditions: 'Two more mats under the right rear pad. The second truck holds the tail before the pick.' });

  const returned = await scene(REVIEW_TITLES.returned);
  await submit(returned, ago(60 * 26), {
    state: 'returned', at: ago(60 * 24),
    note: 'The right rear pad is close to what the lane shoulder allows. Put it on the paved side or add mats, and show the tail truck on the sketch before resubmitting.',
  });

  const awaiting = await scene(REVIEW_TITLES.awaiting);
  await submit(awaiting, ago(180));
  const scaleHouse = { x: 11, y: -9.5 };
  const c = await trx
    .insertInto('scene_comments')
    .values({ organisation_id: awaiting.organisation_id, scene_id: awaiting.id, author_id: supervisor, parent_id: null, revision: awaiting.revision, body: 'Who spots the load past the scale house roof? Put a spotter here for the swing.', anchor_x: scaleHouse.x, anchor_y: scaleHouse.y, created_at: ago(90) })
    .returning('id')
    .executeTakeFirstOrThrow();
  await trx.insertInto('audit_log').values({ organisation_id: awaiting.organisation_id, user_id: supervisor, scene_id: awaiting.id, action: 'comment.create', detail: JSON.stringify({ commentId: c.id, revision: awaiting.revision, pinned: true }), created_at: ago(90) }).execute();

  const beyond = await scene(REVIEW_TITLES.beyond);
  if (!beyond.figures.hardLimits.length) throw new Error('the demo plan beyond a hard limit is not beyond one');
  await submit(beyond, ago(40));
}
