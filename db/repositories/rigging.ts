import type { Kysely } from 'kysely';
import type { Database, RiggingItemRow } from '../schema';
import type { RiggingKind, RiggingStatus } from '@/lib/domain';
import type { ResolvedRiggingItem } from '@/lib/equipment/rigging-item';
import { addDays, DUE_SOON_DAYS } from '@/lib/dates';
import { notForLifting } from '@/lib/equipment/rigging-ratings';

type Db = Kysely<Database>;

export interface RiggingItem {
  id: number;
  tag: string;
  kind: RiggingKind;
  size: string;
  length: number | null;
  ratings: { vertical: number | null; choker: number | null; basket: number | null };
  ratingSource: string;
  /** Why the item cannot be used as lifting rigging (a recovery strap, grade 70 chain, a tie-down rating), or null. */
  notForLifting: string | null;
  status: RiggingStatus;
  lastInspection: string | null;
  nextInspectionDue: string | null;
  notes: string;
  updatedAt: string;
}

export function toRiggingItem(r: RiggingItemRow): RiggingItem {
  return {
    id: r.id,
    tag: r.tag,
    kind: r.kind,
    size: r.size,
    length: r.length,
    ratings: { vertical: r.rating_vertical, choker: r.rating_choker, basket: r.rating_basket },
    ratingSource: r.rating_source,
    notForLifting: notForLifting(r.kind, r.size, r.rating_source)?.reason ?? null,
    status: r.status,
    lastInspection: r.last_inspection,
    nextInspectionDue: r.next_inspection_due,
    notes: r.notes,
    updatedAt: r.updated_at,
  };
}

export type DueFilter = 'overdue' | 'due-30' | 'ok' | 'none';


export interface RiggingFilters {
  kind?: RiggingKind;
  status?: RiggingStatus;
  due?: DueFilter;
  /** YYYY-MM-DD; the due filter is measured from here. */
  today: string;
}

export async function listRiggingItems(db: Db, organisationId: number, f: RiggingFilters) {
  let q = db.selectFrom('rigging_items').selectAll().where('organisation_id', '=', organisationId);
  if (f.kind) q = q.where('kind', '=', f.kind);
  if (f.status) q = q.where('status', '=', f.status);
  if (f.due === 'overdue') q = q.where('next_inspection_due', '<', f.today);
  if (f.due === 'due-30') q = q.where('next_inspection_due', '>=', f.today).where('next_inspection_due', '<=', addDays(f.today, DUE_SOON_DAYS));
  if (f.due === 'ok') q = q.where('next_inspection_due', '>', addDays(f.today, DUE_SOON_DAYS));
  if (f.due === 'none') q = q.where('next_inspection_due', 'is', null);
  return (await q.orderBy('kind').orderBy('tag').execute()).map(toRiggingItem);
}

export async function findRiggingItem(db: Db, organisationId: number, id: number) {
  const row = await db.selectFrom('rigging_items').selectAll().where('organisation_id', '=', organisationId).where('id', '=', id).executeTakeFirst();
  return row ? toRiggingItem(row) : undefined;
}

export async function findRiggingTags(db: Db, organisationId: number, tags: string[]) {
  if (tags.length === 0) return new Set<string>();
  const rows = await db.selectFrom('rigging_items').select('tag').where('organisation_id', '=', organisationId).where('tag', 'in', tags).execute();
  return new Set(rows.map((r) => r.tag));
}

function columns(item: ResolvedRiggingItem) {
  return {
    tag: item.tag,
    kind: item.kind,
    size: item.size,
    length: item.length,
    rating_vertical: item.ratings.vertical,
    rating_choker: item.ratings.choker,
    rating_basket: item.ratings.basket,
    rating_source: item.ratingSource,
    status: item.status,
    last_inspection: item.lastInspection,
    next_inspection_due: item.nextInspectionDue,
    notes: item.notes,
  };
}

export async function createRiggingItem(db: Db, organisationId: number, item: ResolvedRiggingItem) {
  const now = new Date().toISOString();
  const row = await db
    .insertInto('rigging_items')
    .values({ organisation_id: organisationId, ...columns(item), created_at: now, updated_at: now })
    .returningAll()
    .executeTakeFirstOrThrow();
  return toRiggingItem(row);
}

export async function updateRiggingItem(db: Db, organisationId: number, id: number, item: ResolvedRiggingItem) {
  const row = await db
    .updateTable('rigging_items')
    .set({ ...columns(item), updated_at: new Date().toISOString() })
    .where('organisation_id', '=', organisationId)
    .where('id', '=', id)
    .returningAll()
    .executeTakeFirst();
  return row ? toRiggingItem(row) : undefined;
}

export interface InspectionInput {
  inspectedOn: string;
  result: 'pass' | 'fail';
  nextDue: string | null;
  notes: string;
}

/** Records an inspection and moves the item's dates on; a failed inspection tags the item out. Run in a transaction. */
export async function recordInspection(db: Db, organisationId: number, itemId: number, inspectorId: number, input: InspectionInput) {
  const now = new Date().toISOString();
  const row = await db
    .insertInto('rigging_inspections')
    .values({ item_id: itemId, organisation_id: organisationId, inspected_on: input.inspectedOn, inspector_id: inspectorId, result: input.result, notes: input.notes, next_due: input.nextDue, created_at: now })
    .returning('id')
    .executeTakeFirstOrThrow();
  await db
    .updateTable('rigging_items')
    .set({
      last_inspection: input.inspectedOn,
      next_inspection_due: input.nextDue,
      updated_at: now,
      ...(input.result === 'fail' && { status: 'tagged_out' as const }),
    })
    .where('organisation_id', '=', organisationId)
    .where('id', '=', itemId)
    .execute();
  return row.id;
}

export function listInspections(db: Db, organisationId: number, itemId: number) {
  return db
    .selectFrom('rigging_inspections as i')
    .innerJoin('users', 'users.id', 'i.inspector_id')
    .select(['i.id', 'i.inspected_on as inspectedOn', 'i.result', 'i.notes', 'i.next_due as nextDue', 'users.name as inspectorName'])
    .where('i.organisation_id', '=', organisationId)
    .where('i.item_id', '=', itemId)
    .orderBy('i.inspected_on', 'desc')
    .orderBy('i.id', 'desc')
    .execute();
}
