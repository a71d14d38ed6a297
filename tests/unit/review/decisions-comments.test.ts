import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
vi.mock('@/lib/auth/current-user', () => import('@/tests/setup/auth-mock'));
import { simpleParser } from 'mailparser';
import * as decision from '@/app/api/scenes/[id]/decision/route';
import * as comments from '@/app/api/scenes/[id]/comments/route';
import * as comment from '@/app/api/scenes/[id]/comments/[commentId]/route';
import * as notifications from '@/app/api/notifications/route';
import * as read from '@/app/api/notifications/read/route';
import { getDb } from '@/db';
import { REVIEW_TITLES } from '@/db/seed/demo-review-scenes';
import { deliverDueMail } from '@/lib/server/mail/outbox-worker';
import { startFakeSmtp } from '@/lib/server/mail/fake-smtp';
import nodemailer from 'nodemailer';
import { signInAs } from '@/tests/setup/auth-mock';
import { demoUser, freshSeededDb } from '@/tests/setup/db';
import { sceneIdByTitle } from '@/tests/setup/fixtures';
import { call } from '@/tests/setup/call';

/** Approval rules on the seeded plans, comments with pins and threads, notifications, and the outbox. */
let beyond: number;
let awaiting: number;
const rev = async (id: number) => (await getDb().selectFrom('scenes').select('revision').where('id', '=', id).executeTakeFirstOrThrow()).revision;
const post = (handler: typeof decision.POST, id: number, body?: unknown) => call({ handler, method: 'POST', id: String(id), body });
const patch = (sceneId: number, commentId: number, body: unknown) =>
  comment.PATCH(new Request('http://arcline.test/x', { method: 'PATCH', headers: { 'content-type': 'application/json' }, body: JSON.stringify(body) }), { params: Promise.resolve({ id: String(sceneId), commentId: String(commentId) }) });
let smtp: Awaited<ReturnType<typeof startFakeSmtp>>;

beforeAll(async () => {
  await freshSeededDb();
  beyond = await sceneIdByTitle(REVIEW_TITLES.beyond);
  awaiting = await sceneIdByTitle(REVIEW_TITLES.awaiting);
  smtp = await startFakeSmtp();
});
afterAll(() => smtp.close());

describe('approval rules', () => {
  it('refuses approval beyond a hard limit with 422 naming each check; returning it works', async () => {
    signInAs(await demoUser('supervisor@harrow.example'));
    const revision = await rev(beyond);
    const res = await post(decision.POST, beyond, { decision: 'approve', revision, reason: 'I accept it' });
    expect(res.status).toBe(422);
    const checks = res.json.checks as { id: string; kind: string; value: number | null; limit: number | null; message: string }[];
    expect(checks.map((c) => c.id).sort()).toEqual(['bearing:RR', 'bearing:RR:upper-weight', 'load-chart']);
    const rr = checks.find((c) => c.id === 'bearing:RR')!;
    // Sandy gravel, IBC Table 1806.2 presumptive 3,000 psf = 143.6 kPa (the scene's allowable).
    expect(rr.limit).toBeCloseTo(143.6, 0);
    expect(rr.value!).toBeGreaterThan(rr.limit!);
    expect(res.json.error).toMatch(/bearing:RR/);
    expect((await getDb().selectFrom('scenes').select('status').where('id', '=', beyond).executeTakeFirstOrThrow()).status).toBe('submitted');
  });

  it('needs a written reason beyond the plan’s own stricter limits, and keeps it', async () => {
    // Tighten the pending submission's figures as a stricter plan limit would: 20 % of tipping.
    const sub = await getDb().selectFrom('scene_submissions').select(['id', 'figures']).where('scene_id', '=', awaiting).where('state', '=', 'pending').executeTakeFirstOrThrow();
    const figures = { ...(sub.figures as Record<string, unknown>), beyondPlan: ['stability'] };
    await getDb().updateTable('scene_submissions').set({ figures: JSON.stringify(figures) }).where('id', '=', sub.id).execute();
    signInAs(await demoUser('supervisor@harrow.example'));
    const revision = await rev(awaiting);
    const bare = await post(decision.POST, awaiting, { decision: 'approve', revision });
    expect(bare.status).toBe(422);
    expect(bare.json.issues?.[0].path).toBe('reason');
    expect((bare.json.checks as { id: string; message: string }[]).map((c) => c.id)).toEqual(['stability']);
    expect((bare.json.checks as { message: string }[])[0].message).toMatch(/%/);
    const ok = await post(decision.POST, awaiting, { decision: 'approve', revision, reason: 'Spotter on the scale house side; the yard is closed.', conditions: 'Spotter at the pin.' });
    expect(ok.status, ok.text).toBe(200);
    const decided = await getDb().selectFrom('scene_submissions').select(['state', 'reason', 'conditions']).where('id', '=', sub.id).executeTakeFirstOrThrow();
    expect(decided).toEqual({ state: 'approved', reason: 'Spotter on the scale house side; the yard is closed.', conditions: 'Spotter at the pin.' });
  });
});

describe('comments', () => {
  it('pins to a point or an object, threads replies, and refuses a pin outside the extent or an unknown object', async () => {
    const op2 = await demoUser('operator2@harrow.example');
    signInAs(await demoUser('supervisor@harrow.example'));
    const body = '<script>alert(1)</script> Mats & "cribbing" under RR';
    const pin = await post(comments.POST, beyond, { body, anchor: { x: 2, y: -3 } });
    expect(pin.status, pin.text).toBe(201);
    expect(pin.json.body).toBe(body);
    expect(pin.json.anchor).toEqual({ x: 2, y: -3 });
    const onTruck = await post(comments.POST, beyond, { body: 'Boom length?', anchor: { objectId: 'truck' } });
    expect(onTruck.json.anchor).toEqual({ objectId: 'truck' });
    expect((await post(comments.POST, beyond, { body: 'far', anchor: { x: 5000, y: 0 } })).status).toBe(422);
    const unknown = await post(comments.POST, beyond, { body: 'which?', anchor: { objectId: 'no-such-thing' } });
    expect(unknown.status).toBe(422);
    expect(unknown.json.issues?.[0].path).toBe('anchor.objectId');
    expect((await post(comments.POST, beyond, { body: 'x'.repeat(4001) })).status).toBe(400);
    expect((await post(comments.POST, beyond, { body: '   ' })).status).toBe(400);
    signInAs(op2);
    const reply = await post(comments.POST, beyond, { body: 'Adding two mats.', parentId: pin.json.id });
    expect(reply.status).toBe(201);
    expect((await post(comments.POST, beyond, { body: 'nested', parentId: reply.json.id })).status).toBe(422);
    const resolved = await patch(beyond, pin.json.id as number, { resolved: true });
    expect(resolved.status).toBe(200);
    expect((await resolved.json()).resolved).toBe(true);
    const list = await call({ handler: comments.GET, method: 'GET', id: String(beyond) });
    const threads = list.json.items as { id: number; resolved: boolean; replies: { body: string }[] }[];
    expect(threads.map((t) => [t.resolved, t.replies.map((r) => r.body)])).toEqual([[true, ['Adding two mats.']], [false, []]]);
    expect((await patch(beyond, pin.json.id as number, { resolved: false })).status).toBe(200);
    signInAs(await demoUser('trainer@harrow.example'));
    expect((await post(comments.POST, beyond, { body: 'trainer note' })).status).toBe(403);
    signInAs(await demoUser('operator@cobalt.example'));
    expect((await call({ handler: comments.GET, method: 'GET', id: String(beyond) })).status).toBe(404);
    expect((await patch(beyond, pin.json.id as number, { resolved: true })).status).toBe(404);
  });

  it('notifies the other side in the app; the unread count falls when read; nobody else’s ids are marked', async () => {
    const op2 = await demoUser('operator2@harrow.example');
    signInAs(op2);
    const before = await call({ handler: notifications.GET, method: 'GET' });
    const items = before.json.items as { id: number; kind: string; read: boolean }[];
    expect(items.filter((n) => n.kind === 'comment').length).toBe(2);
    const unread = before.json.unread as number;
    expect(unread).toBeGreaterThanOrEqual(3);
    const supNote = await getDb().selectFrom('notifications').select('id').where('user_id', '=', (await demoUser('supervisor@harrow.example')).id).executeTakeFirstOrThrow();
    const marked = await post(read.POST, 0, { ids: [items[0].id, supNote.id] });
    expect(marked.json).toEqual({ marked: 1, unread: unread - 1 });
  });

  it('the worker sends queued mail after commit to the right people, escaped, with a link and the caution; failures retry with backoff', async () => {
    const transport = nodemailer.createTransport(smtp.url, { secure: false, ignoreTLS: true });
    const out = await deliverDueMail(getDb(), transport);
    expect(out.failed).toBe(0);
    expect(out.sent).toBeGreaterThanOrEqual(4);
    const parsed = await Promise.all(smtp.messages.map((m) => simpleParser(m.raw)));
    const toOp2 = parsed.filter((p) => p.text?.includes('<script>alert(1)</script>'));
    expect(toOp2.length).toBe(1);
    expect(smtp.messages[parsed.indexOf(toOp2[0])].to).toEqual(['operator2@harrow.example']);
    expect(toOp2[0].html).toContain('&lt;script&gt;alert(1)&lt;/script&gt; Mats &amp; &quot;cribbing&quot;');
    expect(toOp2[0].html).not.toContain('<script>');
    expect(toOp2[0].text).toContain(`/scenes/${beyond}`);
    expect(toOp2[0].text).toContain('A qualified operator decides');
    const rows = await getDb().selectFrom('mail_outbox').select(['state', 'attempts']).execute();
    expect(rows.every((r) => r.state === 'sent' && r.attempts === 1)).toBe(true);
    // A mail server that refuses: the message stays pending with the error and a later attempt.
    signInAs(await demoUser('supervisor@harrow.example'));
    await post(comments.POST, beyond, { body: 'One more thing.' });
    const now = new Date();
    const failing = { sendMail: async () => { throw new Error('421 try later'); } } as unknown as typeof transport;
    expect(await deliverDueMail(getDb(), failing, now)).toEqual({ sent: 0, failed: 1 });
    const row = await getDb().selectFrom('mail_outbox').selectAll().where('state', '=', 'pending').executeTakeFirstOrThrow();
    expect([row.attempts, row.last_error, row.next_attempt_at]).toEqual([1, '421 try later', new Date(now.getTime() + 30_000).toISOString()]);
    expect(await deliverDueMail(getDb(), transport, now)).toEqual({ sent: 0, failed: 0 });
    expect(await deliverDueMail(getDb(), transport, new Date(now.getTime() + 31_000))).toEqual({ sent: 1, failed: 0 });
  });
});
