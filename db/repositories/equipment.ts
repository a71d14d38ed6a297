import type { Kysely } from 'kysely';
import type { Database, EquipmentProfileRow } from '../schema';

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

export async function listEquipmentProfiles(db: Db, organisationId: number, opts: { includeRetired?: boolean } = {}) {
  let q = db.selectFrom('equipment_profiles').selectAll().where('organisation_id', '=', organisationId);
  if (!opts.includeRetired) q = q.where('retired_at', 'is', null);
  return (await q.orderBy('name').execute()).map(toProfile);
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

export async function createEquipmentProfile(db: Db, organisationId: number, input: ProfileInput) {
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
      created_at: now,
      updated_at: now,
    })
    .returningAll()
    .executeTakeFirstOrThrow();
  return toProfile(row);
}

export async function updateEquipmentProfile(db: Db, organisationId: number, id: number, input: ProfileInput) {
  const row = await db
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
    .returningAll()
    .executeTakeFirst();
  return row ? toProfile(row) : undefined;
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
