import type { Kysely } from 'kysely';
import type { Database, EquipmentProfileRow, EquipmentProfileVersionRow } from '../schema';

type Db = Kysely<Database>;

export interface EquipmentProfile {
  id: number;
  kind: string;
  name: string;
  unitNumber: string | null;
  inService: boolean;
  spec: Record<string, unknown>;
  version: number;
  retiredAt: string | null;
  updatedAt: string;
}

export interface EquipmentProfileVersion {
  profileId: number;
  version: number;
  name: string;
  unitNumber: string | null;
  inService: boolean;
  spec: Record<string, unknown>;
  authorName: string | null;
  createdAt: string;
}

export function toProfile(r: EquipmentProfileRow): EquipmentProfile {
  return {
    id: r.id,
    kind: r.kind,
    name: r.name,
    unitNumber: r.unit_number,
    inService: r.in_service === 1,
    spec: r.spec,
    version: r.version,
    retiredAt: r.retired_at,
    updatedAt: r.updated_at,
  };
}

function toVersion(r: EquipmentProfileVersionRow & { author_name: string | null }): EquipmentProfileVersion {
  return {
    profileId: r.profile_id,
    version: r.version,
    name: r.name,
    unitNumber: r.unit_number,
    inService: r.in_service === 1,
    spec: r.spec,
    authorName: r.author_name,
    createdAt: r.created_at,
  };
}

export async function listEquipmentProfiles(db: Db, organisationId: number, opts: { includeRetired?: boolean } = {}) {
  let q = db.selectFrom('equipment_profiles').selectAll().where('organisation_id', '=', organisationId);
  if (!opts.includeRetired) q = q.where('retired_at', 'is', null);
  return (await q.orderBy('unit_number').orderBy('name').execute()).map(toProfile);
}

export async function findEquipmentProfile(db: Db, organisationId: number, id: number) {
  const row = await db
    .selectFrom('equipment_profiles')
    .selectAll()
    .where('organisation_id', '=', organisationId)
    .where('id', '=', id)
    .executeTakeFirst();
  return row ? toProfile(row) : undefined;
}

export interface ProfileInput {
  kind: string;
  name: string;
  unitNumber?: string | null;
  inService?: boolean;
  spec: Record<string, unknown>;
}

/** Copies a profile's current state into its version history. Every write to a profile calls this. */
async function keepVersion(db: Db, p: EquipmentProfileRow, authorId: number | null) {
  await db
    .insertInto('equipment_profile_versions')
    .values({
      profile_id: p.id,
      organisation_id: p.organisation_id,
      version: p.version,
      name: p.name,
      unit_number: p.unit_number,
      in_service: p.in_service,
      spec: JSON.stringify(p.spec),
      author_id: authorId,
      created_at: p.updated_at,
    })
    .execute();
}

/** Creates a profile at version 1 and keeps that version. Run inside a transaction. */
export async function createEquipmentProfile(db: Db, organisationId: number, input: ProfileInput, authorId: number | null = null) {
  const now = new Date().toISOString();
  const row = await db
    .insertInto('equipment_profiles')
    .values({
      organisation_id: organisationId,
      kind: input.kind,
      name: input.name,
      unit_number: input.unitNumber ?? null,
      in_service: input.inService === false ? 0 : 1,
      spec: JSON.stringify(input.spec),
      version: 1,
      created_at: now,
      updated_at: now,
    })
    .returningAll()
    .executeTakeFirstOrThrow();
  await keepVersion(db, row, authorId);
  return toProfile(row);
}

export type ProfileUpdateOutcome = { kind: 'ok'; profile: EquipmentProfile } | { kind: 'missing' } | { kind: 'stale'; current: number } | { kind: 'retired' };

/**
 * Saves a new version if `baseVersion` is still the current one (checked in the same statement, so two
 * admins cannot both win), and keeps it in the history. Run inside a transaction.
 */
export async function updateEquipmentProfile(
  db: Db,
  organisationId: number,
  id: number,
  input: ProfileInput & { baseVersion?: number },
  authorId: number | null = null,
): Promise<ProfileUpdateOutcome> {
  let q = db
    .updateTable('equipment_profiles')
    .set((eb) => ({
      kind: input.kind,
      name: input.name,
      unit_number: input.unitNumber ?? null,
      in_service: input.inService === false ? 0 : 1,
      spec: JSON.stringify(input.spec),
      version: eb('version', '+', 1),
      updated_at: new Date().toISOString(),
    }))
    .where('organisation_id', '=', organisationId)
    .where('id', '=', id)
    .where('retired_at', 'is', null);
  if (input.baseVersion !== undefined) q = q.where('version', '=', input.baseVersion);
  const row = await q.returningAll().executeTakeFirst();
  if (!row) {
    const cur = await findEquipmentProfile(db, organisationId, id);
    if (!cur) return { kind: 'missing' };
    if (cur.retiredAt) return { kind: 'retired' };
    return { kind: 'stale', current: cur.version };
  }
  await keepVersion(db, row, authorId);
  return { kind: 'ok', profile: toProfile(row) };
}

/** Profiles are retired, never deleted: approved scenes still point at them. */
export async function retireEquipmentProfile(db: Db, organisationId: number, id: number) {
  const res = await db
    .updateTable('equipment_profiles')
    .set({ retired_at: new Date().toISOString(), in_service: 0 })
    .where('organisation_id', '=', organisationId)
    .where('id', '=', id)
    .where('retired_at', 'is', null)
    .executeTakeFirst();
  return Number(res.numUpdatedRows) > 0;
}

/** A new profile (version 1) with the same spec; run inside a transaction. */
export async function duplicateEquipmentProfile(db: Db, organisationId: number, id: number, opts: { name?: string; unitNumber?: string | null }, authorId: number | null) {
  const src = await findEquipmentProfile(db, organisationId, id);
  if (!src) return undefined;
  return createEquipmentProfile(
    db,
    organisationId,
    { kind: src.kind, name: opts.name ?? `${src.name} (copy)`.slice(0, 80), unitNumber: opts.unitNumber ?? null, inService: true, spec: src.spec },
    authorId,
  );
}

function versionQuery(db: Db, organisationId: number, profileId: number) {
  return db
    .selectFrom('equipment_profile_versions as v')
    .leftJoin('users', 'users.id', 'v.author_id')
    .selectAll('v')
    .select('users.name as author_name')
    .where('v.organisation_id', '=', organisationId)
    .where('v.profile_id', '=', profileId);
}

/** The history list, newest first: every version without its spec (one version's spec: findProfileVersion). */
export async function listProfileVersions(db: Db, organisationId: number, profileId: number): Promise<Omit<EquipmentProfileVersion, 'spec'>[]> {
  const rows = await db
    .selectFrom('equipment_profile_versions as v')
    .leftJoin('users', 'users.id', 'v.author_id')
    .select(['v.profile_id', 'v.version', 'v.name', 'v.unit_number', 'v.in_service', 'v.created_at', 'users.name as author_name'])
    .where('v.organisation_id', '=', organisationId)
    .where('v.profile_id', '=', profileId)
    .orderBy('v.version', 'desc')
    .execute();
  return rows.map((r) => ({ profileId: r.profile_id, version: r.version, name: r.name, unitNumber: r.unit_number, inService: r.in_service === 1, authorName: r.author_name, createdAt: r.created_at }));
}

/**
 * Whether this organisation's profile has that stored version, and whether the profile is retired; reads
 * no spec (for pinning a scene to the version its sketch names).
 */
export async function profileVersionStatus(db: Db, organisationId: number, profileId: number, version: number): Promise<{ retired: boolean } | undefined> {
  const row = await db
    .selectFrom('equipment_profile_versions as v')
    .innerJoin('equipment_profiles as p', 'p.id', 'v.profile_id')
    .select('p.retired_at')
    .where('v.organisation_id', '=', organisationId)
    .where('p.organisation_id', '=', organisationId)
    .where('v.profile_id', '=', profileId)
    .where('v.version', '=', version)
    .executeTakeFirst();
  return row ? { retired: row.retired_at !== null } : undefined;
}

export async function findProfileVersion(db: Db, organisationId: number, profileId: number, version: number) {
  const row = await versionQuery(db, organisationId, profileId).where('v.version', '=', version).executeTakeFirst();
  return row ? toVersion(row) : undefined;
}
