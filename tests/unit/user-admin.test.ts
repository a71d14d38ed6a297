import { beforeAll, describe, expect, it, vi } from 'vitest';

// The route runs for real; only the next-auth session lookup is replaced, so getCurrentUser reads the database.
// A session carries the user's session version from when it began (see signInAt).
const session = vi.hoisted(() => ({ userId: null as number | null, version: 0 }));
vi.mock('@/lib/auth/session-claims', () => ({
  getSessionClaims: async () => (session.userId === null ? null : { userId: session.userId, sessionVersion: session.version }),
}));

import { getDb } from '@/db';
import { DEMO_PASSWORD } from '@/db/seed/demo-users';
import { PATCH } from '@/app/api/users/[id]/route';
import { getCurrentUser } from '@/lib/auth/current-user';
import { authorize, idOf } from '@/tests/setup/credentials';
import { freshSeededDb } from '@/tests/setup/db';

/** A fresh session for this user: the token carries their current session version. */
async function signInAt(id: number) {
  session.userId = id;
  session.version = (await getDb().selectFrom('users').select('session_version').where('id', '=', id).executeTakeFirstOrThrow()).session_version;
}

async function patch(asEmail: string, id: number, body: unknown) {
  await signInAt(await idOf(asEmail));
  const res = await PATCH(new Request('http://arcline.test/api/users/x', { method: 'PATCH', body: JSON.stringify(body), headers: { 'content-type': 'application/json' } }), { params: Promise.resolve({ id: String(id) }) });
  return { status: res.status, json: await res.json() };
}

beforeAll(async () => {
  await freshSeededDb();
});

describe('PATCH /api/users/{id}', () => {
  it('changes a role and records who did it', async () => {
    const trainer = await idOf('trainer@harrow.example');
    const res = await patch('admin@harrow.example', trainer, { role: 'supervisor' });
    expect(res).toMatchObject({ status: 200, json: { id: trainer, role: 'supervisor', active: 1 } });
    const audit = await getDb().selectFrom('audit_log').select(['action', 'detail']).where('action', '=', 'user.update').orderBy('id', 'desc').executeTakeFirstOrThrow();
    expect(audit.detail).toEqual({ id: trainer, role: 'supervisor', from: 'trainer' });
    await patch('admin@harrow.example', trainer, { role: 'trainer' });
  });

  it('deactivation ends the user’s session at once and refuses their sign-in; reactivation restores both', async () => {
    const op = await idOf('operator@harrow.example');
    await signInAt(op);
    const opVersion = session.version;
    expect((await getCurrentUser())?.id).toBe(op);
    expect(await authorize({ email: 'operator@harrow.example', password: DEMO_PASSWORD }, {})).toMatchObject({ email: 'operator@harrow.example' });

    expect((await patch('admin@harrow.example', op, { active: false })).json.active).toBe(0);
    session.userId = op; // the same session token, still presented
    session.version = opVersion;
    expect(await getCurrentUser()).toBeNull();
    expect(await authorize({ email: 'operator@harrow.example', password: DEMO_PASSWORD }, {})).toBeNull();

    expect((await patch('admin@harrow.example', op, { active: true })).json.active).toBe(1);
    expect(await authorize({ email: 'operator@harrow.example', password: DEMO_PASSWORD }, {})).toMatchObject({ email: 'operator@harrow.example' });
  });

  it('will not demote or deactivate the last active admin (409 naming the field), and writes nothing', async () => {
    const admin = await idOf('admin@harrow.example');
    const before = await getDb().selectFrom('users').select(['role', 'active']).where('id', '=', admin).executeTakeFirstOrThrow();
    const demote = await patch('admin@harrow.example', admin, { role: 'operator' });
    expect(demote.status).toBe(409);
    expect(demote.json.issues[0].path).toBe('role');
    const off = await patch('admin@harrow.example', admin, { active: false });
    expect(off.status).toBe(409);
    expect(off.json.issues[0].path).toBe('active');
    expect(await getDb().selectFrom('users').select(['role', 'active']).where('id', '=', admin).executeTakeFirstOrThrow()).toEqual(before);

    // With a second admin, the first may step down.
    const sup = await idOf('supervisor@harrow.example');
    expect((await patch('admin@harrow.example', sup, { role: 'admin' })).status).toBe(200);
    expect((await patch('admin@harrow.example', admin, { role: 'operator' })).status).toBe(200);
    expect((await patch('supervisor@harrow.example', admin, { role: 'admin' })).status).toBe(200);
    expect((await patch('admin@harrow.example', sup, { role: 'supervisor' })).status).toBe(200);
  });

  it('refuses bad bodies naming the field, and another organisation’s user is not found', async () => {
    const trainer = await idOf('trainer@harrow.example');
    for (const [body, field] of [[{ role: 'owner' }, 'role'], [{ active: 'no' }, 'active'], [{}, 'role'], [{ role: 'admin', name: 'x' }, 'name']] as const) {
      const res = await patch('admin@harrow.example', trainer, body);
      expect(res.status).toBe(400);
      expect(res.json.issues.map((i: { path: string }) => i.path)).toContain(field);
    }
    expect((await patch('admin@harrow.example', await idOf('operator@cobalt.example'), { role: 'admin' })).status).toBe(404);
  });
});
