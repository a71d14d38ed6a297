import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import type { DB } from '@/db';
import { createOrganisation, findOrganisation } from '@/db/repositories/organisations';
import { createUser, findUserByEmail, findUserById, listUsers, setUserRole, setUserUnits } from '@/db/repositories/users';
import { createEquipmentProfile, findEquipmentProfile, listEquipmentProfiles, retireEquipmentProfile, updateEquipmentProfile } from '@/db/repositories/equipment';
import { HR4_SPEC } from '@/db/seed/demo-trucks';
import { buildTemplate, resetToTemplate } from '@/tests/setup/template-db';
import { snapshotDb } from '@/tests/setup/snapshot';

// The database's own refusal, as SQLite words it ("UNIQUE constraint failed") or PostgreSQL does.
const UNIQUE = /UNIQUE constraint failed|violates unique constraint/;
const CHECK = /CHECK constraint failed|violates check constraint/;

let template: string;
let db: DB;
let harrow: number, cobalt: number;

beforeAll(async () => {
  template = await buildTemplate();
});
beforeEach(async () => {
  db = await resetToTemplate(template);
  const orgs = await db.selectFrom('organisations').select(['id', 'slug']).execute();
  harrow = orgs.find((o) => o.slug === 'harrow-ridge')!.id;
  cobalt = orgs.find((o) => o.slug === 'cobalt-flats')!.id;
});

describe('organisations', () => {
  it('creates and finds an organisation; slugs are unique', async () => {
    const o = await createOrganisation(db, 'Tillbrook Heavy Recovery', 'tillbrook');
    expect(await findOrganisation(db, o.id)).toMatchObject({ name: 'Tillbrook Heavy Recovery', slug: 'tillbrook' });
    await expect(createOrganisation(db, 'Another Tillbrook', 'tillbrook')).rejects.toThrow(UNIQUE);
    expect(await findOrganisation(db, 987654)).toBeUndefined();
  });
});

describe('users', () => {
  it('stores e-mail trimmed and lower-case and finds it however it is typed', async () => {
    const u = await createUser(db, { organisation_id: harrow, email: '  Casey.Ng@Harrow.Example ', name: 'Casey Ng', role: 'trainer', password_hash: 'h' });
    expect(u.email).toBe('casey.ng@harrow.example');
    expect(u).not.toHaveProperty('password_hash');
    expect((await findUserByEmail(db, 'CASEY.NG@harrow.example'))?.id).toBe(u.id);
    await expect(createUser(db, { organisation_id: harrow, email: 'casey.ng@HARROW.example', name: 'Dup', role: 'operator', password_hash: 'h' })).rejects.toThrow(UNIQUE);
    // Another organisation may use the same address: e-mail is unique within an organisation only.
    const other = await createUser(db, { organisation_id: cobalt, email: 'casey.ng@HARROW.example', name: 'Casey Ng (Cobalt)', role: 'operator', password_hash: 'h' });
    expect(other.organisation_id).toBe(cobalt);
  });

  it('lists only the organisation’s users, without password hashes', async () => {
    const list = await listUsers(db, cobalt);
    expect(list.map((u) => u.email)).toEqual(['operator@cobalt.example']);
    expect(Object.keys(list[0])).not.toContain('password_hash');
    expect((await listUsers(db, harrow)).map((u) => u.role).sort()).toEqual(['admin', 'operator', 'operator', 'supervisor', 'trainer']);
  });

  it('finds a user by id with the organisation name, defaults to imperial and active', async () => {
    const row = (await findUserByEmail(db, 'trainer@harrow.example'))!;
    expect(await findUserById(db, row.id)).toMatchObject({ name: 'Priya Lindqvist', role: 'trainer', units: 'imperial', active: 1, organisation_name: 'Harrow Ridge Recovery' });
  });

  it('changes a role only within the organisation, and units for the user', async () => {
    const row = (await findUserByEmail(db, 'trainer@harrow.example'))!;
    expect(Number((await setUserRole(db, cobalt, row.id, 'admin')).numUpdatedRows)).toBe(0);
    expect((await findUserById(db, row.id))!.role).toBe('trainer');
    expect(Number((await setUserRole(db, harrow, row.id, 'supervisor')).numUpdatedRows)).toBe(1);
    expect((await findUserById(db, row.id))!.role).toBe('supervisor');
    await setUserUnits(db, row.id, 'metric');
    expect((await findUserById(db, row.id))!.units).toBe('metric');
  });

  it('the database refuses a role or units outside the lists', async () => {
    const before = await snapshotDb(db);
    await expect(createUser(db, { organisation_id: harrow, email: 'x@harrow.example', name: 'X', role: 'owner' as never, password_hash: 'h' })).rejects.toThrow(CHECK);
    const row = (await findUserByEmail(db, 'admin@harrow.example'))!;
    await expect(setUserUnits(db, row.id, 'furlongs' as never)).rejects.toThrow(CHECK);
    expect(await snapshotDb(db)).toEqual(before);
  });
});

describe('equipment profiles', () => {
  const input = { kind: 'truck', name: '30-ton rotator (example values)', unitNumber: 'HR-9', spec: HR4_SPEC };

  it('creates at version 1 in service, and lists within the organisation only', async () => {
    const p = await createEquipmentProfile(db, harrow, input);
    expect(p).toMatchObject({ name: input.name, unitNumber: 'HR-9', inService: true, version: 1, retiredAt: null });
    expect(p.spec).toEqual(HR4_SPEC);
    const names = (await listEquipmentProfiles(db, harrow)).map((x) => x.name);
    expect([...names].sort()).toEqual(['30-ton rotator (example values)', '35-ton rotator (example values)', '50-ton rotator (example values)']);
    expect((await listEquipmentProfiles(db, cobalt)).map((x) => x.unitNumber)).toEqual(['CF-2']);
    expect(await findEquipmentProfile(db, cobalt, p.id)).toBeUndefined();
  });

  it('bumps the version on every update, and not across organisations or from a stale base', async () => {
    const p = await createEquipmentProfile(db, harrow, input);
    const u1 = await updateEquipmentProfile(db, harrow, p.id, { ...input, name: 'Renamed once', baseVersion: 1 });
    const u2 = await updateEquipmentProfile(db, harrow, p.id, { ...input, name: 'Renamed twice', inService: false, baseVersion: 2 });
    expect(u1.kind === 'ok' && u1.profile.version).toBe(2);
    expect(u2.kind === 'ok' && [u2.profile.version, u2.profile.inService]).toEqual([3, false]);
    expect(await updateEquipmentProfile(db, harrow, p.id, { ...input, name: 'Stale edit', baseVersion: 2 })).toEqual({ kind: 'stale', current: 3 });
    expect(await updateEquipmentProfile(db, cobalt, p.id, { ...input, name: 'Cross-org' })).toEqual({ kind: 'missing' });
    expect((await findEquipmentProfile(db, harrow, p.id))!.name).toBe('Renamed twice');
  });

  it('retires once: hidden from the default list, still readable, second retire is false', async () => {
    const p = await createEquipmentProfile(db, harrow, input);
    expect(await retireEquipmentProfile(db, cobalt, p.id)).toBe(false);
    expect(await retireEquipmentProfile(db, harrow, p.id)).toBe(true);
    expect(await retireEquipmentProfile(db, harrow, p.id)).toBe(false);
    expect((await listEquipmentProfiles(db, harrow)).map((x) => x.id)).not.toContain(p.id);
    expect((await listEquipmentProfiles(db, harrow, { includeRetired: true })).map((x) => x.id)).toContain(p.id);
    expect(await findEquipmentProfile(db, harrow, p.id)).toMatchObject({ inService: false, retiredAt: expect.stringMatching(/^\d{4}-/) });
  });
});
