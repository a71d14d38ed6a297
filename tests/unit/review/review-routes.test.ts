import { beforeAll, describe, expect, it, vi } from 'vitest';
vi.mock('@/lib/auth/current-user', () => import('@/tests/setup/auth-mock'));
import * as scene from '@/app/api/scenes/[id]/route';
import * as submit from '@/app/api/scenes/[id]/submit/route';
import * as withdraw from '@/app/api/scenes/[id]/withdraw/route';
import * as decision from '@/app/api/scenes/[id]/decision/route';
import * as newRevision from '@/app/api/scenes/[id]/new-revision/route';
import { getDb } from '@/db';
import { ENGINE_VERSION } from '@/lib/lift/version';
import { signInAs } from '@/tests/setup/auth-mock';
import { demoUser, freshSeededDb } from '@/tests/setup/db';
import { TITLES, sceneIdByTitle } from '@/tests/setup/fixtures';
import { call } from '@/tests/setup/call';
import type { CurrentUser } from '@/lib/auth/current-user';

/** Submit, withdraw, decide, start a new revision, and the frozen PUT (issue 13's API section). */
let coil: number;
let operator: CurrentUser;
let supervisor: CurrentUser;
let admin: CurrentUser;

const rev = async (id: number) => (await getDb().selectFrom('scenes').select(['revision', 'status', 'document']).where('id', '=', id).executeTakeFirstOrThrow());
const post = (handler: typeof submit.POST, id: number, body?: unknown) => call({ handler, method: 'POST', id: String(id), body });
const audit = async (id: number) => (await getDb().selectFrom('audit_log').select('action').where('scene_id', '=', id).orderBy('id').execute()).map((r) => r.action);

beforeAll(async () => {
  await freshSeededDb();
  coil = await sceneIdByTitle(TITLES.ownDraft);
  operator = await demoUser('operator@harrow.example');
  supervisor = await demoUser('supervisor@harrow.example');
  admin = await demoUser('admin@harrow.example');
});

describe('the review lifecycle over the API', () => {
  it('submit: stale revision → 409; then 200 with the figures the server computed stored with the submission', async () => {
    signInAs(operator);
    const { revision } = await rev(coil);
    const stale = await post(submit.POST, coil, { revision: revision + 5 });
    expect(stale.status).toBe(409);
    expect(stale.json.currentRevision).toBe(revision);
    expect((await post(submit.POST, coil, {})).status).toBe(400);
    const ok = await post(submit.POST, coil, { revision });
    expect(ok.status, ok.text).toBe(200);
    expect(ok.json).toEqual({ status: 'submitted', revision });
    const sub = await getDb().selectFrom('scene_submissions').selectAll().where('scene_id', '=', coil).executeTakeFirstOrThrow();
    expect(sub.engine_version).toBe(ENGINE_VERSION);
    expect(sub.state).toBe('pending');
    const f = sub.figures as { percentOfTipping: number; hardLimits: unknown[]; ground: { percent: number } };
    expect(f.percentOfTipping).toBeGreaterThan(5);
    expect(f.percentOfTipping).toBeLessThan(100);
    expect(f.hardLimits).toEqual([]);
    expect(f.ground.percent).toBeGreaterThan(0);
    expect((sub.checks as unknown[]).length).toBeGreaterThan(3);
    // Supervisors are told in the app and by e-mail, in the same transaction.
    const notes = await getDb().selectFrom('notifications').select(['user_id', 'kind', 'link']).where('scene_id', '=', coil).execute();
    expect(notes).toEqual([{ user_id: supervisor.id, kind: 'submitted', link: `/scenes/${coil}/review` }]);
    const mail = await getDb().selectFrom('mail_outbox').select(['to_address', 'subject', 'text_body', 'html_body']).execute();
    expect(mail.map((m) => m.to_address)).toEqual(['supervisor@harrow.example']);
    expect(mail[0].text_body).toContain(`/scenes/${coil}/review`);
    expect(mail[0].text_body).toContain("manufacturer's load chart");
    expect(mail[0].html_body).toContain('<a href=');
  });

  it('a submitted plan is frozen: PUT → 409 saying to withdraw; submitting again → 409', async () => {
    signInAs(operator);
    const { revision } = await rev(coil);
    const put = await call({ handler: scene.PUT, method: 'PUT', id: String(coil), body: { revision, title: 'Changed while submitted' } });
    expect(put.status).toBe(409);
    expect(put.json.error).toMatch(/Withdraw it to edit it/);
    expect((await post(submit.POST, coil, { revision })).status).toBe(409);
  });

  it('decision: wrong role → 403, stale revision → 409, return without a note or open comment → 422, with a note → returned', async () => {
    const { revision } = await rev(coil);
    signInAs(operator);
    expect((await post(decision.POST, coil, { decision: 'approve', revision })).status).toBe(403);
    signInAs(await demoUser('trainer@harrow.example'));
    expect((await post(decision.POST, coil, { decision: 'approve', revision })).status).toBe(403);
    signInAs(supervisor);
    expect((await post(decision.POST, coil, { decision: 'approve', revision: revision + 1 })).status).toBe(409);
    expect((await post(decision.POST, coil, { decision: 'maybe', revision })).status).toBe(400);
    const bare = await post(decision.POST, coil, { decision: 'return', revision });
    expect(bare.status).toBe(422);
    expect(bare.json.issues?.[0].path).toBe('note');
    const back = await post(decision.POST, coil, { decision: 'return', revision, note: 'Two more mats under the rear pads, please.' });
    expect(back.status, back.text).toBe(200);
    expect(back.json.status).toBe('returned');
    expect((await rev(coil)).status).toBe('returned');
    // Deciding again on a plan that is no longer submitted.
    expect((await post(decision.POST, coil, { decision: 'approve', revision })).status).toBe(409);
  });

  it('editing a returned plan takes it back to draft; resubmit; withdraw → draft; resubmit and approve with conditions', async () => {
    signInAs(operator);
    let { revision } = await rev(coil);
    const put = await call({ handler: scene.PUT, method: 'PUT', id: String(coil), body: { revision, title: 'Coil transfer, Route 9 weigh station (mats added)' } });
    expect(put.status, put.text).toBe(200);
    expect((await rev(coil)).status).toBe('draft');
    revision += 1;
    expect((await post(submit.POST, coil, { revision })).status).toBe(200);
    const w = await post(withdraw.POST, coil);
    expect(w.status).toBe(200);
    expect(w.json).toEqual({ status: 'draft' });
    expect((await post(withdraw.POST, coil)).status).toBe(409);
    expect((await post(submit.POST, coil, { revision })).status).toBe(200);
    signInAs(admin);
    const ok = await post(decision.POST, coil, { decision: 'approve', revision, conditions: 'Two more mats under the right rear pad.' });
    expect(ok.status, ok.text).toBe(200);
    expect(ok.json.status).toBe('approved');
    const sub = await getDb().selectFrom('scene_submissions').selectAll().where('scene_id', '=', coil).orderBy('id', 'desc').executeTakeFirstOrThrow();
    expect([sub.state, sub.decided_by, sub.conditions, sub.revision]).toEqual(['approved', admin.id, 'Two more mats under the right rear pad.', revision]);
    expect(await audit(coil)).toEqual(['scene.submit', 'scene.return', 'scene.update', 'scene.submit', 'scene.withdraw', 'scene.submit', 'scene.approve']);
  });

  it('an approved plan: PUT → 409 naming "Start a new revision"; a new revision is a draft one higher, the approval stays', async () => {
    signInAs(operator);
    const { revision, document } = await rev(coil);
    const put = await call({ handler: scene.PUT, method: 'PUT', id: String(coil), body: { revision, title: 'x y z' } });
    expect(put.status).toBe(409);
    expect(put.json.error).toMatch(/Start a new revision/);
    signInAs(supervisor);
    expect((await post(newRevision.POST, coil)).status).toBe(403);
    signInAs(operator);
    const nr = await post(newRevision.POST, coil);
    expect(nr.status, nr.text).toBe(200);
    expect(nr.json).toEqual({ status: 'draft', revision: revision + 1, approvedRevision: revision });
    const now = await rev(coil);
    expect(now.document).toEqual(document);
    expect((await post(newRevision.POST, coil)).status).toBe(409);
    const approved = await getDb().selectFrom('scene_submissions').select(['state', 'revision']).where('scene_id', '=', coil).where('state', '=', 'approved').execute();
    expect(approved).toEqual([{ state: 'approved', revision }]);
  });

  it('nobody decides on a plan they wrote; another organisation gets 404', async () => {
    signInAs(await demoUser('operator@cobalt.example'));
    expect((await post(submit.POST, coil, { revision: 1 })).status).toBe(404);
    expect((await post(withdraw.POST, coil)).status).toBe(404);
    signInAs(operator);
    expect((await post(decision.POST, coil, { decision: 'approve', revision: 1 })).status).toBe(403);
  });
});
