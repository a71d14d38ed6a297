import { beforeAll, describe, expect, it, vi } from 'vitest';

// The routes run for real; only the next-auth session lookup is replaced, so getCurrentUser reads the database.
const session = vi.hoisted(() => ({ userId: null as number | null, version: 0 }));
vi.mock('@/lib/auth/session-claims', () => ({
  getSessionClaims: async () => (session.userId === null ? null : { userId: session.userId, sessionVersion: session.version }),
}));

import { getDb } from '@/db';
import { DEMO_PASSWORD } from '@/db/seed/demo-users';
import { POST as sendRoute } from '@/app/api/users/[id]/password-reset/route';
import { POST as completeRoute } from '@/app/api/password-reset/route';
import { PATCH as patchUser } from '@/app/api/users/[id]/route';
import { getCurrentUser } from '@/lib/auth/current-user';
import { authorize, idOf } from '@/tests/setup/credentials';
import { hashResetToken } from '@/lib/auth/reset-token';
import { sendPasswordReset } from '@/lib/server/password-reset';
import { freshSeededDb, demoUser } from '@/tests/setup/db';
import { snapshotDb } from '@/tests/setup/snapshot';

async function signInAs(email: string | null) {
  if (email === null) {
    session.userId = null;
    return;
  }
  const row = await getDb().selectFrom('users').select(['id', 'session_version']).where('email', '=', email).executeTakeFirstOrThrow();
  session.userId = row.id;
  session.version = row.session_version;
}
const json = { 'content-type': 'application/json' };

async function send(asEmail: string, userId: number) {
  await signInAs(asEmail);
  const res = await sendRoute(new Request('http://arcline.test/api/users/x/password-reset', { method: 'POST' }), { params: Promise.resolve({ id: String(userId) }) });
  return { status: res.status, json: await res.json() };
}
async function complete(body: unknown) {
  await signInAs(null);
  const res = await completeRoute(new Request('http://arcline.test/api/password-reset', { method: 'POST', body: JSON.stringify(body), headers: json }));
  return { status: res.status, json: await res.json() };
}
/** The newest e-mail queued for this address, and the token in its link. */
async function lastResetMail(to: string) {
  const m = await getDb().selectFrom('mail_outbox').selectAll().where('to_address', '=', to).orderBy('id', 'desc').executeTakeFirstOrThrow();
  const token = /\/reset-password\?token=([A-Za-z0-9_-]{43})/.exec(m.text_body)?.[1];
  return { mail: m, token: token! };
}
const NEW_PASSWORD = 'lowboy winch cable 2026';

beforeAll(async () => {
  await freshSeededDb();
});

describe('password reset by an e-mailed one-time link', () => {
  it('an admin sends the link: the answer and the database hold no token, the e-mail does', async () => {
    const trainer = await idOf('trainer@harrow.example');
    const res = await send('admin@harrow.example', trainer);
    expect(res.status).toBe(202);
    expect(res.json.sentTo).toBe('trainer@harrow.example');
    expect(Object.keys(res.json).sort()).toEqual(['expiresAt', 'ok', 'sentTo']);
    // 24 hours from now, within the few seconds this test takes.
    expect(Math.abs(Date.parse(res.json.expiresAt) - Date.now() - 24 * 3600_000)).toBeLessThan(60_000);

    const { mail, token } = await lastResetMail('trainer@harrow.example');
    expect(token).toHaveLength(43);
    expect(mail.subject).toBe('Set a new Arcline password');
    expect(mail.html_body).toContain(`/reset-password?token=${token}`);
    expect(mail.text_body).toContain('Harrow');
    expect(mail.state).toBe('pending');
    const row = await getDb().selectFrom('password_resets').selectAll().where('user_id', '=', trainer).executeTakeFirstOrThrow();
    expect(row.token_hash).toBe(hashResetToken(token));
    // Outside the queued e-mail, no table holds the token.
    const tables = await snapshotDb(getDb());
    expect(JSON.stringify({ ...tables, mail_outbox: [] })).not.toContain(token);
    expect(JSON.stringify(tables)).toContain(token);
    const audit = await getDb().selectFrom('audit_log').select(['action', 'detail']).orderBy('id', 'desc').executeTakeFirstOrThrow();
    expect(audit).toEqual({ action: 'user.password.reset-sent', detail: { id: trainer } });
  });

  it('the link sets the new password once: old password and old sessions end, a second use is refused', async () => {
    const email = 'trainer@harrow.example';
    await signInAs(email);
    const oldSession = { ...session };
    expect((await getCurrentUser())?.email).toBe(email);
    const { token } = await lastResetMail(email);

    const done = await complete({ token, newPassword: NEW_PASSWORD });
    expect(done).toEqual({ status: 200, json: { ok: true } });
    expect(await authorize({ email, password: DEMO_PASSWORD }, {})).toBeNull();
    expect(await authorize({ email, password: NEW_PASSWORD }, {})).toMatchObject({ email });
    session.userId = oldSession.userId;
    session.version = oldSession.version;
    expect(await getCurrentUser()).toBeNull();

    const again = await complete({ token, newPassword: 'another long passphrase 7' });
    expect(again.status).toBe(400);
    expect(again.json.issues[0].path).toBe('token');
    expect(again.json.error).toMatch(/expired or has already been used/);
    expect(await authorize({ email, password: NEW_PASSWORD }, {})).toMatchObject({ email });
  });

  it('two submissions of one link at once: exactly one sets the password', async () => {
    const email = 'supervisor@harrow.example';
    await send('admin@harrow.example', await idOf(email));
    const { token } = await lastResetMail(email);
    const results = await Promise.all([complete({ token, newPassword: 'first boom angle 2026' }), complete({ token, newPassword: 'second boom angle 2026' })]);
    expect(results.map((r) => r.status).sort()).toEqual([200, 400]);
    const winner = results.findIndex((r) => r.status === 200) === 0 ? 'first boom angle 2026' : 'second boom angle 2026';
    expect(await authorize({ email, password: winner }, {})).toMatchObject({ email });
  });

  it('an expired link, and a link replaced by a newer one, are refused; a policy-breaking password leaves the link usable', async () => {
    const email = 'operator@harrow.example';
    const opId = await idOf(email);
    const admin = await demoUser('admin@harrow.example');
    await sendPasswordReset(getDb(), admin, opId, new Date(Date.now() - 25 * 3600_000));
    const expired = (await lastResetMail(email)).token;
    expect((await complete({ token: expired, newPassword: NEW_PASSWORD })).json.issues[0].path).toBe('token');

    await send('admin@harrow.example', opId);
    const older = (await lastResetMail(email)).token;
    await send('admin@harrow.example', opId);
    const newer = (await lastResetMail(email)).token;
    expect(older).not.toBe(newer);
    expect((await complete({ token: older, newPassword: NEW_PASSWORD })).status).toBe(400);

    const weak = await complete({ token: newer, newPassword: 'password1234' });
    expect(weak.status).toBe(400);
    expect(weak.json.issues[0].path).toBe('newPassword');
    expect(await authorize({ email, password: DEMO_PASSWORD }, {})).toMatchObject({ email });
    expect((await complete({ token: newer, newPassword: NEW_PASSWORD })).status).toBe(200);
  });

  it('a deactivated account gets no link, and a link sent before deactivation stops working', async () => {
    const who = { id: await idOf('operator2@harrow.example'), email: 'operator2@harrow.example' };
    await send('admin@harrow.example', who.id);
    const { token } = await lastResetMail(who.email);
    await signInAs('admin@harrow.example');
    const off = await patchUser(new Request('http://arcline.test/api/users/x', { method: 'PATCH', body: JSON.stringify({ active: false }), headers: json }), { params: Promise.resolve({ id: String(who.id) }) });
    expect(off.status).toBe(200);
    expect((await complete({ token, newPassword: NEW_PASSWORD })).status).toBe(400);
    const refused = await send('admin@harrow.example', who.id);
    expect(refused.status).toBe(409);
    expect(refused.json.issues[0].path).toBe('id');
  });

  it('only an admin of the same organisation may send one; bad tokens are refused naming the field', async () => {
    const trainer = await idOf('trainer@harrow.example');
    expect((await send('supervisor@harrow.example', trainer)).status).toBe(403);
    expect((await send('admin@harrow.example', await idOf('operator@cobalt.example'))).status).toBe(404);
    await signInAs(null);
    const signedOut = await sendRoute(new Request('http://arcline.test/api/users/x/password-reset', { method: 'POST' }), { params: Promise.resolve({ id: String(trainer) }) });
    expect(signedOut.status).toBe(401);
    for (const body of [{ newPassword: NEW_PASSWORD }, { token: 'short', newPassword: NEW_PASSWORD }, { token: 'A'.repeat(43), newPassword: NEW_PASSWORD, extra: 1 }]) {
      const res = await complete(body);
      expect(res.status).toBe(400);
      expect(res.json.issues.length).toBeGreaterThan(0);
    }
    const unknown = await complete({ token: 'A'.repeat(43), newPassword: NEW_PASSWORD });
    expect(unknown.status).toBe(400);
    expect(unknown.json.issues[0].path).toBe('token');
  });
});
