import type { Kysely } from 'kysely';
import type { Database } from '@/db/schema';
import { inTransaction } from '@/db/transaction';
import { ENGINE_VERSION } from '@/lib/lift/version';
import { planFigures, type ListFigures } from '@/lib/scene/plan-figures';
import { computeDocument } from './scene-analysis';

export type { ListFigures };

interface FigureRow {
  percent_of_tipping: number | null;
  percent_of_bearing: number | null;
  least_clearance: number | null;
  beyond_count: number | null;
  problem: string | null;
}

export const figuresFromRow = (r: FigureRow): ListFigures =>
  r.problem !== null
    ? { percentOfTipping: null, percentOfBearing: null, leastClearance: null, beyond: null, problem: r.problem }
    : { percentOfTipping: r.percent_of_tipping, percentOfBearing: r.percent_of_bearing, leastClearance: r.least_clearance, beyond: r.beyond_count ?? 0, problem: null };

/**
 * The stored figures of these scenes' current revisions, computing (and storing) those missing or from an
 * older engine. Each revision is computed once: a saved revision never changes, and the row names the engine.
 */
export async function figuresFor(db: Kysely<Database>, organisationId: number, scenes: readonly { id: number; revision: number }[]): Promise<Map<number, ListFigures>> {
  const out = new Map<number, ListFigures>();
  if (scenes.length === 0) return out;
  const rows = await db
    .selectFrom('scene_figures')
    .selectAll()
    .where('engine_version', '=', ENGINE_VERSION)
    .where((eb) => eb.or(scenes.map((s) => eb.and([eb('scene_id', '=', s.id), eb('revision', '=', s.revision)]))))
    .execute();
  for (const r of rows) out.set(r.scene_id, figuresFromRow(r));
  for (const s of scenes) if (!out.has(s.id)) out.set(s.id, await computeAndStore(db, organisationId, s));
  return out;
}

async function computeAndStore(db: Kysely<Database>, organisationId: number, s: { id: number; revision: number }): Promise<ListFigures> {
  // The current revision's document is the scene row's own (one read, no revision blob to inflate); an older
  // revision, when the scene has moved on since the list was read, comes from the revision history.
  const current = await db
    .selectFrom('scenes')
    .select('document')
    .where('id', '=', s.id)
    .where('revision', '=', s.revision)
    .where('organisation_id', '=', organisationId)
    .executeTakeFirst();
  const rev =
    current ??
    (await db
      .selectFrom('scene_revisions')
      .innerJoin('scenes', 'scenes.id', 'scene_revisions.scene_id')
      .select('scene_revisions.document')
      .where('scene_revisions.scene_id', '=', s.id)
      .where('scene_revisions.revision', '=', s.revision)
      .where('scenes.organisation_id', '=', organisationId)
      .executeTakeFirst());
  if (!rev) return { percentOfTipping: null, percentOfBearing: null, leastClearance: null, beyond: null, problem: 'No saved revision' };
  const a = await computeDocument(db, organisationId, { sceneId: s.id, revision: s.revision }, rev.document);
  const f = a.ok ? planFigures(a.result) : null;
  const row: FigureRow = {
    percent_of_tipping: f?.percentOfTipping ?? null,
    percent_of_bearing: f?.percentOfBearing ?? null,
    least_clearance: f?.leastClearance ?? null,
    beyond_count: f?.beyond ?? null,
    problem: a.ok ? null : a.message,
  };
  storeLater(db, s, row);
  return figuresFromRow(row);
}

const pending = new Set<Promise<void>>();

/**
 * Stores a computed row after the answer, never inside it: a listing is a read and must answer even while
 * another process holds the write lock (tests/unit/security/contention.test.ts). A store that fails (busy,
 * or a test's database already closed) is dropped; the next read computes the figures again.
 */
function storeLater(db: Kysely<Database>, s: { id: number; revision: number }, row: FigureRow) {
  const write = new Promise<void>((resolve) => setTimeout(resolve, 0))
    .then(() =>
      inTransaction(db, async (trx) => {
        // Older revisions' rows go; this revision's row is written or replaced, so two instances storing the
        // same figures at once both succeed (an upsert on the primary key, on SQLite and PostgreSQL alike).
        await trx.deleteFrom('scene_figures').where('scene_id', '=', s.id).where('revision', '<>', s.revision).execute();
        const values = { engine_version: ENGINE_VERSION, computed_at: new Date().toISOString(), ...row };
        await trx
          .insertInto('scene_figures')
          .values({ scene_id: s.id, revision: s.revision, ...values })
          .onConflict((oc) => oc.columns(['scene_id', 'revision']).doUpdateSet(values))
          .execute();
      }),
    )
    .catch(() => undefined)
    .finally(() => pending.delete(write));
  pending.add(write);
}

/** Resolves when every figure store scheduled so far has finished (tests, the backfill). */
export async function figureWritesSettled(): Promise<void> {
  while (pending.size) await Promise.all([...pending]);
}

/** Fills the figures of every live scene (the seed and the test fixtures call this, so a first list read writes nothing). */
export async function backfillSceneFigures(db: Kysely<Database>): Promise<number> {
  const scenes = await db.selectFrom('scenes').select(['id', 'revision', 'organisation_id']).where('deleted_at', 'is', null).execute();
  const byOrg = new Map<number, { id: number; revision: number }[]>();
  for (const s of scenes) byOrg.set(s.organisation_id, [...(byOrg.get(s.organisation_id) ?? []), s]);
  for (const [org, list] of byOrg) await figuresFor(db, org, list);
  await figureWritesSettled();
  return scenes.length;
}
