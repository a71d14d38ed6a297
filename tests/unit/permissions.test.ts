import { describe, expect, it } from 'vitest';
import { ROLES, type Role, type SceneStatus } from '@/lib/domain';
import { ROLES_FOR, may, mayDeleteScene, mayEditScene, mayReadAllScenes, mayReadScene, rolesFor } from '@/lib/auth/permissions';

/** The rules as README's roles table states them (common practice for this product, no published source). */
const user = (role: Role, id = 1) => ({ id, role });
const scene = (ownerId: number, status: SceneStatus = 'draft') => ({ ownerId, status });
const allowed = (test: (r: Role) => boolean) => ROLES.filter(test);

describe('permissions', () => {
  it('names, for each action, exactly the roles that may start it', () => {
    expect(allowed((r) => may(user(r), 'createScene'))).toEqual(['operator']);
    expect(allowed((r) => may(user(r), 'editScene'))).toEqual(['operator']);
    expect(allowed((r) => may(user(r), 'deleteScene'))).toEqual(['operator', 'admin']);
    expect(allowed((r) => may(user(r), 'markTraining'))).toEqual(['trainer']);
    expect(allowed((r) => may(user(r), 'manageEquipment'))).toEqual(['admin']);
    expect(allowed((r) => may(user(r), 'manageRigging'))).toEqual(['operator', 'admin']);
    expect(allowed((r) => may(user(r), 'writeLessons'))).toEqual(['trainer', 'admin']);
    expect(allowed((r) => may(user(r), 'manageUsers'))).toEqual(['admin']);
    // The route wrapper gets the same lists.
    for (const action of Object.keys(ROLES_FOR) as (keyof typeof ROLES_FOR)[]) expect(rolesFor(action)).toEqual(allowed((r) => may(user(r), action)));
  });

  it('an operator reads their own scenes and approved ones; every other role reads the whole organisation', () => {
    expect(allowed((r) => mayReadAllScenes(user(r)))).toEqual(['supervisor', 'trainer', 'admin']);
    expect(mayReadScene(user('operator', 1), scene(1))).toBe(true);
    expect(mayReadScene(user('operator', 1), scene(2))).toBe(false);
    expect(mayReadScene(user('operator', 1), scene(2, 'approved'))).toBe(true);
    expect(mayReadScene(user('operator', 1), scene(2, 'submitted'))).toBe(false);
    for (const r of ['supervisor', 'trainer', 'admin'] as const) expect(mayReadScene(user(r, 1), scene(2, 'draft'))).toBe(true);
  });

  it('only the owning operator edits a scene; the owner or an admin deletes it', () => {
    expect(mayEditScene(user('operator', 1), scene(1))).toBe(true);
    expect(mayEditScene(user('operator', 1), scene(2))).toBe(false);
    // Owning is not enough without the operator role (an admin's own scene stays read-only).
    for (const r of ['supervisor', 'trainer', 'admin'] as const) expect(mayEditScene(user(r, 1), scene(1))).toBe(false);
    expect(mayDeleteScene(user('operator', 1), scene(1))).toBe(true);
    expect(mayDeleteScene(user('operator', 1), scene(2))).toBe(false);
    expect(mayDeleteScene(user('admin', 9), scene(2))).toBe(true);
    expect(mayDeleteScene(user('supervisor', 1), scene(1))).toBe(false);
    expect(mayDeleteScene(user('trainer', 1), scene(1))).toBe(false);
  });
});
