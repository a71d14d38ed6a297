import { beforeAll, describe, expect, it, vi } from 'vitest';

// getCurrentUser is tested for real here; only the next-auth session lookup is replaced.
const session = vi.hoisted(() => ({ userId: null as number | null, version: 0 }));
vi.mock('@/lib/auth/session-claims', () => ({
  getSessionClaims: async () => (session.userId === null ? null : { userId: session.userId, sessionVersion: session.version }),
}));

import { getDb } from '@/db';
import { ROLES, type Role } from '@/lib/domain';
import { DEMO_PASSWORD } from '@/db/seed/demo-users';
import { AccessError, assertRole } from '@/lib/auth/roles';
import { getCurrentUser, type CurrentUser } from '@/lib/auth/current-user';
import { authOptions } from '@/lib/auth/options';
import { freshSeededDb } from '@/tests/setup/db';
import { endUserSessions } from '@/db/repositories/users';

type Authorize = (credentials: Record<string, unknown> | undefined, req: unknown) => Promise<unknown>;
const authorize = (authOptions.providers[0] as unknown as { options: { authorize: Authorize } }).options.authorize;
const userWith = (role: Role): CurrentUser => ({ id: 1, organisationId: 1, organisationName: 'Harrow Ridge Recovery', role, name: 'T', email: 't@harrow.example', units: 'imperial' });
const idOf = async (email: string) => (await getDb().selectFrom('users').select('id').where('email', '=', email).executeTakeFirstOrThrow()).id;

beforeAll(async () => {
  await freshSeededDb();
});

describe('assertRole', () => {
  it('answers 401 with no user, whatever roles are asked for', () => {
    for (const roles of [undefined, ['admin'] as const]) {
      const err = (() => {
        try {
          assertRole(null, roles);
        } catch (e) {
          return e;
        }
      })();
      expect(err).toBeInstanceOf(AccessError);
      expect((err as AccessError).status).toBe(401);
    }
  });

  it('lets every role through when no roles are listed, and only the listed ones otherwise', () => {
    for (const role of ROLES) {
      expect(assertRole(userWith(role)).role).toBe(role);
      if (role === 'admin') expect(assertRole(userWith(role), ['admin']).role).toBe('admin');
      else expect(() => assertRole(userWith(role), ['admin'])).toThrow(expect.objectContaining({ status: 403, message: expect.stringContaining(role) }));
    }
    expect(() => assertRole(userWith('trainer'), [])).toThrow(expect.objectContaining({ status: 403 }));
  });
});

describe('getCurrentUser', () => {
  it('is null when signed out or when the session names no such user', async () => {
    session.userId = null;
    expect(await getCurrentUser()).toBeNull();
    session.userId = 987654;
    expect(await getCurrentUser()).toBeNull();
  });

  it('reads the role and organisation from the database, so a change applies at once', async () => {
    const id = await idOf('supervisor@harrow.example');
    session.userId = id;
    expect(await getCurrentUser()).toEqual({ id, organisationId: expect.any(Number), organisationName: 'Harrow Ridge Recovery', role: 'supervisor', name: 'Mitch Varga', email: 'supervisor@harrow.example', units: 'imperial' });
    await getDb().updateTable('users').set({ role: 'trainer' }).where('id', '=', id).execute();
    expect((await getCurrentUser())?.role).toBe('trainer');
    await getDb().updateTable('users').set({ role: 'supervisor' }).where('id', '=', id).execute();
  });

  it('is null for a deactivated user', async () => {
    const id = await idOf('trainer@harrow.example');
    session.userId = id;
    expect((await getCurrentUser())?.email).toBe('trainer@harrow.example');
    await getDb().updateTable('users').set({ active: 0 }).where('id', '=', id).execute();
    expect(await getCurrentUser()).toBeNull();
    await getDb().updateTable('users').set({ active: 1 }).where('id', '=', id).execute();
  });

  it('is null once the user\'s session version has moved on (signed out, password changed)', async () => {
    const id = await idOf('supervisor@harrow.example');
    session.userId = id;
    session.version = 0;
    expect((await getCurrentUser())?.id).toBe(id);
    await endUserSessions(getDb(), id);
    expect(await getCurrentUser()).toBeNull();
    session.version = 1;
    expect((await getCurrentUser())?.id).toBe(id);
    // A sign-out carrying an already-ended version leaves the newer session alone.
    await endUserSessions(getDb(), id, 0);
    expect((await getCurrentUser())?.id).toBe(id);
    session.version = 0;
  });
});

describe('credentials authorize', () => {
  it('signs in with the right password, carrying role and organisation; e-mail case and spaces do not matter', async () => {
    const org = await getDb().selectFrom('organisations').select('id').where('slug', '=', 'cobalt-flats').executeTakeFirstOrThrow();
    const user = await authorize({ email: '  Operator@Cobalt.example ', password: DEMO_PASSWORD }, {});
    expect(user).toEqual({ id: String(await idOf('operator@cobalt.example')), name: 'Jules Amari', email: 'operator@cobalt.example', role: 'operator', organisationId: org.id, sessionVersion: 0 });
  });

  it('refuses a wrong password, an unknown e-mail, malformed credentials and a deactivated user', async () => {
    expect(await authorize({ email: 'admin@harrow.example', password: `${DEMO_PASSWORD}x` }, {})).toBeNull();
    expect(await authorize({ email: 'nobody@harrow.example', password: DEMO_PASSWORD }, {})).toBeNull();
    expect(await authorize({ email: 'not-an-email', password: DEMO_PASSWORD }, {})).toBeNull();
    expect(await authorize({ email: 'admin@harrow.example', password: '' }, {})).toBeNull();
    expect(await authorize(undefined, {})).toBeNull();
    await getDb().updateTable('users').set({ active: 0 }).where('email', '=', 'admin@harrow.example').execute();
    expect(await authorize({ email: 'admin@harrow.example', password: DEMO_PASSWORD }, {})).toBeNull();
  });

  it('puts the user id, role and organisation into the token and the session', async () => {
    const jwt = authOptions.callbacks!.jwt!;
    const token = await jwt({ token: {}, user: { id: '7', role: 'trainer', organisationId: 3, sessionVersion: 4 } } as never);
    expect(token).toMatchObject({ userId: 7, role: 'trainer', organisationId: 3, sessionVersion: 4 });
    const s = await authOptions.callbacks!.session!({ session: { user: {}, expires: '' }, token } as never);
    expect((s as { user: unknown }).user).toMatchObject({ id: 7, role: 'trainer', organisationId: 3, sessionVersion: 4 });
  });
});
