import { beforeAll, beforeEach, describe, expect, it, vi } from 'vitest';
import bcrypt from 'bcryptjs';
vi.mock('@/lib/auth/current-user', async (orig) => {
  // Route calls sign in through the mock; getCurrentUser itself stays real for the session-version checks.
  const mock = await import('@/tests/setup/auth-mock');
  return { ...(await orig<typeof import('@/lib/auth/current-user')>()), getCurrentUserReal: (await orig<typeof import('@/lib/auth/current-user')>()).getCurrentUser, getCurrentUser: mock.getCurrentUser };
});
const claims = vi.hoisted(() => ({ value: null as { userId: number; sessionVersion: number } | null }));
vi.mock('@/lib/auth/session-claims', () => ({ getSessionClaims: async () => claims.value }));

import * as auth from '@/app/api/auth/[...nextauth]/route';
import * as users from '@/app/api/users/route';
import * as mePassword from '@/app/api/me/password/route';
import * as currentUser from '@/lib/auth/current-user';
import { authOptions, checkCredentials } from '@/lib/auth/options';
import { ACCOUNT_FAILURES_PER_MINUTE, ADDRESS_FAILURES_PER_15_MIN, forgetInstanceCounts, recordSignInFailure, resetSignInThrottle, signInWaitSeconds } from '@/lib/server/sign-in-throttle';
import { isPostgres } from '@/db/dialect';
import { isCommonPassword, passwordSchema } from '@/lib/auth/password-policy';
import { DEMO_PASSWORD } from '@/db/seed/demo-users';
import { signInAs } from '@/tests/setup/auth-mock';
import { demoUser, freshSeededDb } from '@/tests/setup/db';
import { call } from '@/tests/setup/call';
import type { DB } from '@/db';

const realGetCurrentUser = (currentUser as unknown as { getCurrentUserReal: typeof currentUser.getCurrentUser }).getCurrentUserReal;
let db: DB;
const idOf = async (email: string) => (await db.selectFrom('users').select(['id', 'session_version']).where('email', '=', email).executeTakeFirstOrThrow());

beforeAll(async () => {
  db = await freshSeededDb();
});
beforeEach(() => resetSignInThrottle());

function credentialsPost(email: string, password: string, address = '203.0.113.7') {
  const body = new URLSearchParams({ email, password, csrfToken: 'x', json: 'true' }).toString();
  return auth.POST(
    new Request('http://arcline.test/api/auth/callback/credentials', { method: 'POST', headers: { 'content-type': 'application/x-www-form-urlencoded', 'x-forwarded-for': address }, body }),
    { params: Promise.resolve({ nextauth: ['callback', 'credentials'] }) },
  );
}

describe('sign-in throttling', () => {
  it(`the ${ACCOUNT_FAILURES_PER_MINUTE + 1}th wrong password within a minute gets 429 with Retry-After`, async () => {
    expect(ACCOUNT_FAILURES_PER_MINUTE).toBe(10);
    for (let i = 0; i < ACCOUNT_FAILURES_PER_MINUTE; i++) {
      expect(await checkCredentials({ email: 'supervisor@harrow.example', password: `wrong guess ${i}` }, '203.0.113.7')).toBeNull();
    }
    const res = await credentialsPost('Supervisor@Harrow.example ', 'wrong guess 11');
    expect(res.status).toBe(429);
    const retry = Number(res.headers.get('retry-after'));
    expect(retry).toBeGreaterThanOrEqual(1);
    expect(retry).toBeLessThanOrEqual(60);
    const body = await res.json();
    expect(new URL(body.url).searchParams.get('error')).toBe('TooManyAttempts');
  }, 120_000);

  it('on PostgreSQL every instance sees the same counts; on SQLite each process counts its own', async () => {
    for (let i = 0; i < ACCOUNT_FAILURES_PER_MINUTE; i++) await recordSignInFailure('admin@harrow.example', '198.51.100.4');
    expect(await signInWaitSeconds('admin@harrow.example', '198.51.100.99')).toBeGreaterThan(0);
    // Another instance: nothing in its memory.
    forgetInstanceCounts();
    const elsewhere = await signInWaitSeconds('Admin@Harrow.example', '198.51.100.99');
    if (isPostgres(db)) {
      expect(elsewhere).toBeGreaterThan(0);
      expect(elsewhere).toBeLessThanOrEqual(60);
      const rows = await db.selectFrom('sign_in_throttle').select(['key', 'points']).orderBy('key').execute();
      expect(rows).toEqual([
        { key: 'signin-account:admin@harrow.example', points: ACCOUNT_FAILURES_PER_MINUTE },
        { key: 'signin-address:198.51.100.4', points: ACCOUNT_FAILURES_PER_MINUTE },
      ]);
    } else {
      expect(elsewhere).toBe(0);
    }
    await resetSignInThrottle();
    expect(await signInWaitSeconds('admin@harrow.example', '198.51.100.4')).toBe(0);
  });

  it('counts per account: another account from the same address is not held up by ten failures', async () => {
    for (let i = 0; i < ACCOUNT_FAILURES_PER_MINUTE; i++) await recordSignInFailure('trainer@harrow.example', '203.0.113.8');
    expect(await signInWaitSeconds('trainer@harrow.example', '203.0.113.99')).toBeGreaterThan(0);
    expect(await signInWaitSeconds('operator@harrow.example', '203.0.113.8')).toBe(0);
  });

  it('counts per address too: 100 failures across many accounts from one address lock that address out', async () => {
    for (let i = 0; i < ADDRESS_FAILURES_PER_15_MIN; i++) await recordSignInFailure(`walker${i}@harrow.example`, '198.51.100.9');
    expect((await credentialsPost('operator@harrow.example', 'anything', '198.51.100.9')).status).toBe(429);
    expect(await signInWaitSeconds('operator@harrow.example', '198.51.100.10')).toBe(0);
  });
});

describe('no account enumeration', () => {
  it('a known account with a wrong password and an unknown address do the same work: one bcrypt comparison at the same cost', async () => {
    // Timing is what leaks an account; the work behind it is what can be tested without a clock. Each path
    // must run exactly one bcrypt comparison against a hash of the same cost factor (the "$2b$10$" prefix).
    const compare = vi.spyOn(bcrypt, 'compare');
    const work = async (email: string) => {
      compare.mockClear();
      expect(await checkCredentials({ email, password: 'not the right password' }, '192.0.2.1')).toBeNull();
      return compare.mock.calls.map(([, hash]) => String(hash).slice(0, 7));
    };
    const known = await work('operator@harrow.example');
    const unknown = await work('nobody@harrow.example');
    const malformed = await work('not an address');
    expect(known).toHaveLength(1);
    expect(unknown).toEqual(known);
    expect(malformed).toEqual(known);
    expect(known[0]).toMatch(/^\$2[aby]\$\d\d\$$/);
    compare.mockRestore();
  });

  it('creating a user with an address used in another organisation answers exactly as for a new address', async () => {
    signInAs(await demoUser('admin@harrow.example'));
    const fresh = await call({ handler: users.POST, method: 'POST', body: { name: 'Avery Fresh', email: 'avery.fresh@harrow.example', role: 'operator', password: 'a long enough passphrase' } });
    const elsewhere = await call({ handler: users.POST, method: 'POST', body: { name: 'Jules Too', email: 'operator@cobalt.example', role: 'operator', password: 'a long enough passphrase' } });
    expect(fresh.status).toBe(201);
    expect(elsewhere.status).toBe(201);
    expect(Object.keys(elsewhere.json).sort()).toEqual(Object.keys(fresh.json).sort());
    // Within one's own organisation a repeat is still refused, naming the field.
    const again = await call({ handler: users.POST, method: 'POST', body: { name: 'Avery Again', email: 'Avery.Fresh@harrow.example', role: 'operator', password: 'a long enough passphrase' } });
    expect(again.status).toBe(409);
    expect(again.json.issues?.[0].path).toBe('email');
    // Both Jules accounts sign in, each with its own password.
    expect((await checkCredentials({ email: 'operator@cobalt.example', password: DEMO_PASSWORD }, '192.0.2.2'))?.name).toBe('Jules Amari');
    expect((await checkCredentials({ email: 'operator@cobalt.example', password: 'a long enough passphrase' }, '192.0.2.2'))?.name).toBe('Jules Too');
  }, 120_000);
});

describe('password policy', () => {
  it('takes the demo password and a long passphrase; refuses short, long, over-72-byte and common ones', () => {
    expect(passwordSchema.safeParse(DEMO_PASSWORD).success).toBe(true);
    expect(isCommonPassword(DEMO_PASSWORD)).toBe(false);
    expect(passwordSchema.safeParse('cribbing under the left pad').success).toBe(true);
    expect(passwordSchema.safeParse('eleven char').success).toBe(false);
    expect(passwordSchema.safeParse('x'.repeat(129)).success).toBe(false);
    // 30 two-byte letters and 12 one-byte ones are 72 bytes, the most bcrypt reads; one more byte is refused.
    expect(passwordSchema.safeParse(`${'é'.repeat(30)}outrigger pa`).success).toBe(true);
    expect(passwordSchema.safeParse(`${'é'.repeat(30)}outrigger pad`).success).toBe(false);
    for (const common of ['password1234', 'Password1234!', 'qwerty123456', '123456789012', 'iloveyou2026!!', 'PasswordPassword', 'aaaaaaaaaaaa']) {
      expect(passwordSchema.safeParse(common).success, common).toBe(false);
    }
  });
});

describe('sessions end', () => {
  it('a signed-out token is refused', async () => {
    const u = await idOf('supervisor@harrow.example');
    claims.value = { userId: u.id, sessionVersion: u.session_version };
    expect((await realGetCurrentUser())?.email).toBe('supervisor@harrow.example');
    await authOptions.events!.signOut!({ token: { userId: u.id, sessionVersion: u.session_version } } as never);
    expect(await realGetCurrentUser()).toBeNull();
    claims.value = null;
  });

  it('changing the password ends every session of the user, and the old password stops working', async () => {
    const u = await idOf('trainer@harrow.example');
    claims.value = { userId: u.id, sessionVersion: u.session_version };
    expect((await realGetCurrentUser())?.email).toBe('trainer@harrow.example');
    signInAs(await demoUser('trainer@harrow.example'));
    const wrong = await call({ handler: mePassword.POST, method: 'POST', body: { currentPassword: 'not it at all', newPassword: 'slew ring grease schedule' } });
    expect(wrong.status).toBe(400);
    expect(wrong.json.issues?.[0].path).toBe('currentPassword');
    const weak = await call({ handler: mePassword.POST, method: 'POST', body: { currentPassword: DEMO_PASSWORD, newPassword: 'password1234' } });
    expect(weak.status).toBe(400);
    expect(weak.json.issues?.[0].path).toBe('newPassword');
    const ok = await call({ handler: mePassword.POST, method: 'POST', body: { currentPassword: DEMO_PASSWORD, newPassword: 'slew ring grease schedule' } });
    expect(ok.status).toBe(200);
    expect(await realGetCurrentUser()).toBeNull();
    expect(await checkCredentials({ email: 'trainer@harrow.example', password: DEMO_PASSWORD }, '192.0.2.3')).toBeNull();
    expect((await checkCredentials({ email: 'trainer@harrow.example', password: 'slew ring grease schedule' }, '192.0.2.3'))?.sessionVersion).toBe(u.session_version + 1);
    claims.value = null;
  }, 120_000);

  it('deactivation (PATCH /api/users/{id} active:false, through updateUser) ends the sessions', async () => {
    const { updateUser } = await import('@/db/repositories/users');
    const u = await idOf('operator@harrow.example');
    const harrow = (await demoUser('operator@harrow.example')).organisationId;
    claims.value = { userId: u.id, sessionVersion: u.session_version };
    expect((await realGetCurrentUser())?.email).toBe('operator@harrow.example');
    await updateUser(db, harrow, u.id, { active: false });
    await updateUser(db, harrow, u.id, { active: true });
    // Reactivated, but the old session stays ended.
    expect(await realGetCurrentUser()).toBeNull();
    claims.value = null;
  });
});
