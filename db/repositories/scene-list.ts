import { sql, type Expression, type Kysely, type SqlBool } from 'kysely';
import type { Database } from '../schema';
import { isPostgres, NEVER } from '../dialect';
import type { CurrentUser, SceneStatus } from '@/lib/domain';
import { mayReadAllScenes } from '@/lib/auth/permissions';

type Db = Kysely<Database>;

export interface SceneSummary {
  id: number;
  title: string;
  status: SceneStatus;
  revision: number;
  ownerId: number;
  ownerName: string;
  updatedAt: string;
  inTrainingSet: boolean;
  location: string | null;
}

export const SCENE_LIST_SORTS = ['updatedAt', 'title', 'status', 'ownerName', 'revision'] as const;
export type SceneListSort = (typeof SCENE_LIST_SORTS)[number];

export interface ListScenesOptions {
  pageSize: number;
  /** Free-text search over title, location and notes (FTS5, prefix per word, accents folded). */
  q?: string;
  status?: SceneStatus;
  inTrainingSet?: boolean;
  sort?: SceneListSort;
  dir?: 'asc' | 'desc';
  /** Keyset cursors from a previous page: rows after `after`, or the page before `before`. */
  after?: string;
  before?: string;
}

export interface ScenePage {
  items: SceneSummary[];
  /** Matching scenes, counted up to COUNT_CAP; `totalCapped` says there are more. */
  total: number;
  totalCapped: boolean;
  pageSize: number;
  nextCursor: string | null;
  prevCursor: string | null;
}

/** Counting stops here: past it the list says "10,000+" rather than scan an organisation's whole history. */
export const COUNT_CAP = 10_000;

const SORT_COLUMNS = {
  updatedAt: 'scenes.updated_at',
  title: 'scenes.title',
  status: 'scenes.status',
  ownerName: 'users.name',
  revision: 'scenes.revision',
} as const;

interface Cursor {
  v: string | number;
  id: number;
}

export class BadCursorError extends Error {}

export function encodeCursor(c: Cursor): string {
  return Buffer.from(JSON.stringify([c.v, c.id])).toString('base64url');
}

export function decodeCursor(s: string): Cursor {
  try {
    const parsed: unknown = JSON.parse(Buffer.from(s, 'base64url').toString('utf8'));
    if (Array.isArray(parsed) && parsed.length === 2 && (typeof parsed[0] === 'string' || typeof parsed[0] === 'number') && Number.isSafeInteger(parsed[1]) && parsed[1] > 0) {
      return { v: parsed[0], id: parsed[1] };
    }
  } catch {
    // fall through
  }
  throw new BadCursorError('not a cursor this list gave out');
}

/**
 * An FTS5 query from what a person typed: each word becomes a quoted prefix term, all required.
 * Quoting keeps FTS syntax (AND, NEAR, *, ") from being interpreted; null when nothing searchable is left.
 */
export function ftsQuery(text: string): string | null {
  const words = text.normalize('NFKC').match(/[\p{L}\p{N}]+/gu);
  if (!words) return null;
  return words.slice(0, 12).map((w) => `"${w}"*`).join(' ');
}

/**
 * The same search for PostgreSQL's to_tsquery: each word a prefix term ("word:*"), all required (&). The
 * words hold only letters and digits, so no tsquery syntax gets through; accents are folded by the database
 * (arcline_search_query, migrations/2026-12-02T14-00_scene-list.ts). Null when nothing searchable is left.
 */
export function tsQuery(text: string): string | null {
  const words = text.normalize('NFKC').match(/[\p{L}\p{N}]+/gu);
  if (!words) return null;
  return words.slice(0, 12).map((w) => `${w}:*`).join(' & ');
}

/** Scene ids matching the search, on either database: FTS5 on SQLite, the tsvector GIN index on PostgreSQL. */
function searchCondition(db: Db, text: string): Expression<SqlBool> | null {
  if (isPostgres(db)) {
    const q = tsQuery(text);
    return q === null ? null : sql<SqlBool>`arcline_scene_search(scenes.title, scenes.location, scenes.notes) @@ arcline_search_query(${q})`;
  }
  const match = ftsQuery(text);
  return match === null ? null : sql<SqlBool>`scenes.id in (select rowid from scenes_fts where scenes_fts match ${match})`;
}

/**
 * The ids of the scenes a search's words match (in any organisation), when there are at most
 * SEARCH_DRIVES_AT_MOST of them, read from the search index once (about 1 ms at the cap); null when there
 * are more, on PostgreSQL (whose planner weighs this itself from its statistics), or with no search.
 */
export async function narrowSearchIds(db: Db, text: string | undefined): Promise<number[] | null> {
  if (text === undefined || isPostgres(db)) return null;
  const match = ftsQuery(text);
  if (match === null) return null;
  const { rows } = await sql<{ id: number }>`select rowid as id from scenes_fts where scenes_fts match ${match} limit ${SEARCH_DRIVES_AT_MOST + 1}`.execute(db);
  return rows.length <= SEARCH_DRIVES_AT_MOST ? rows.map((r) => r.id) : null;
}

/**
 * A search whose words match at most this many scenes (in any organisation) is read from its matches outward:
 * their ids, read from the search index once, looked up one by one and sorted. A broader search walks the list
 * index instead, checking each row against the matches. On 100,000 scenes, a search matching 835 of them took
 * 10.9 ms walking the list (8 ms of it counting) and 3 ms this way; one matching a single scene 6 ms against
 * 0.1 ms; but one matching every scene would take 360 ms this way against 13 ms walking.
 */
export const SEARCH_DRIVES_AT_MOST = 1000;

/**
 * The scenes a user may read: their organisation's, not deleted; operators see their own plus approved ones.
 * `fromSearch` writes the organisation test so that SQLite cannot read it from an index (`+column`): the plan
 * then starts from the search's matches (see SEARCH_DRIVES_AT_MOST).
 */
export function visibleScenes(db: Db, user: CurrentUser, fromSearch = false) {
  let q = db
    .selectFrom('scenes')
    .innerJoin('users', 'users.id', 'scenes.owner_id')
    .where(fromSearch ? sql<number>`+scenes.organisation_id` : sql.ref<number>('scenes.organisation_id'), '=', user.organisationId)
    .where('scenes.deleted_at', 'is', null);
  if (!mayReadAllScenes(user)) {
    q = q.where((eb) => eb.or([eb('scenes.owner_id', '=', user.id), eb('scenes.status', '=', 'approved')]));
  }
  return q;
}

/** `matchIds`: a narrow search's matches (narrowSearchIds); the plan then starts from them. */
function filtered(db: Db, user: CurrentUser, opts: ListScenesOptions, matchIds: number[] | null = null) {
  let q = visibleScenes(db, user, matchIds !== null);
  // Archived scenes leave the everyday list; asking for status=archived shows them.
  q = opts.status ? q.where('scenes.status', '=', opts.status) : q.where('scenes.status', '!=', 'archived');
  if (opts.inTrainingSet !== undefined) q = q.where('scenes.in_training_set', '=', opts.inTrainingSet ? 1 : 0);
  if (opts.q !== undefined) {
    // A search with no letters or digits in it matches nothing, rather than everything.
    q = q.where(matchIds !== null ? sql<SqlBool>`scenes.id in (select value from json_each(${JSON.stringify(matchIds)}))` : (searchCondition(db, opts.q) ?? NEVER));
  }
  return q;
}

/**
 * A search's matching scenes counted up to COUNT_CAP + 1. Every column its filters read is in
 * `scenes_count_idx`, so the count reads that index and the search's matches, never the scenes' rows.
 * (Without a search the list's total comes from keptCountQuery.)
 */
export function countQuery(db: Db, user: CurrentUser, opts: Pick<ListScenesOptions, 'status' | 'inTrainingSet' | 'q'>, matchIds: number[] | null = null) {
  return db.selectFrom(filtered(db, user, opts as ListScenesOptions, matchIds).select('scenes.id').limit(COUNT_CAP + 1).as('matching')).select((eb) => eb.fn.countAll<number>().as('n'));
}

/**
 * The total of a list without a search, from the counts the triggers keep (migrations/2026-12-03T14-30):
 * a sum over a few rows per owner, whatever the organisation's history. The same filters as the list:
 * the organisation, live scenes, the status (archived only when asked for), the training set, and for an
 * operator their own scenes plus approved ones.
 */
export function keptCountQuery(db: Db, user: CurrentUser, opts: Pick<ListScenesOptions, 'status' | 'inTrainingSet'>) {
  let q = db.selectFrom('scene_counts').where('organisation_id', '=', user.organisationId);
  q = opts.status ? q.where('status', '=', opts.status) : q.where('status', '!=', 'archived');
  if (opts.inTrainingSet !== undefined) q = q.where('in_training_set', '=', opts.inTrainingSet ? 1 : 0);
  if (!mayReadAllScenes(user)) q = q.where((eb) => eb.or([eb('owner_id', '=', user.id), eb('status', '=', 'approved')]));
  return q.select((eb) => eb.fn.coalesce(eb.fn.sum<number>('n'), eb.lit(0)).as('n'));
}

/**
 * One page of the scenes a user may read, by keyset: the page after (or before) a cursor, never OFFSET,
 * so a deep page costs what page 1 costs and rows saved between pages are neither repeated nor skipped.
 */
export async function listScenes(db: Db, user: CurrentUser, opts: ListScenesOptions): Promise<ScenePage> {
  const sort = opts.sort ?? 'updatedAt';
  const dir = opts.dir ?? 'desc';
  const col = SORT_COLUMNS[sort];
  const backward = opts.before !== undefined;
  const cursor = opts.before !== undefined ? decodeCursor(opts.before) : opts.after !== undefined ? decodeCursor(opts.after) : null;
  // Reading backward walks the order in reverse from the cursor, then turns the page round.
  const walk = backward ? (dir === 'desc' ? 'asc' : 'desc') : dir;
  const cmp = walk === 'desc' ? '<' : '>';

  const matchIds = await narrowSearchIds(db, opts.q);
  let q = filtered(db, user, opts, matchIds);
  if (cursor) {
    // A row-value comparison, (col, id) < (v, id): both databases read it as one range of the list index. The
    // equivalent `col < v or (col = v and id < id)` made SQLite walk the index from the top when the values
    // are bound parameters (13 ms for a page at 90 % of 100,000 scenes, against 2 ms for page 1).
    q = q.where((eb) => eb(eb.refTuple(col, 'scenes.id'), cmp, eb.tuple(cursor.v as never, cursor.id as never)) as Expression<SqlBool>);
  }
  const rows = await q
    .select(['scenes.id', 'scenes.title', 'scenes.status', 'scenes.revision', 'scenes.owner_id', 'scenes.updated_at', 'scenes.in_training_set', 'scenes.location', 'users.name as owner_name'])
    .orderBy(col, walk)
    .orderBy('scenes.id', walk)
    .limit(opts.pageSize + 1)
    .execute();
  const more = rows.length > opts.pageSize;
  const page = rows.slice(0, opts.pageSize);
  if (backward) page.reverse();
  const items: SceneSummary[] = page.map((r) => ({
    id: r.id,
    title: r.title,
    status: r.status,
    revision: r.revision,
    ownerId: r.owner_id,
    ownerName: r.owner_name,
    updatedAt: r.updated_at,
    inTrainingSet: r.in_training_set === 1,
    location: r.location,
  }));
  const keyOf = (s: SceneSummary): Cursor => ({ v: (sort === 'updatedAt' ? s.updatedAt : sort === 'ownerName' ? s.ownerName : s[sort]) as string | number, id: s.id });
  const first = items[0];
  const last = items[items.length - 1];
  const hasNext = backward ? cursor !== null : more;
  const hasPrev = backward ? more : cursor !== null;

  const counted = Number((await (opts.q === undefined ? keptCountQuery(db, user, opts) : countQuery(db, user, opts, matchIds)).executeTakeFirstOrThrow()).n);
  return {
    items,
    total: Math.min(counted, COUNT_CAP),
    totalCapped: counted > COUNT_CAP,
    pageSize: opts.pageSize,
    nextCursor: hasNext && last ? encodeCursor(keyOf(last)) : null,
    prevCursor: hasPrev && first ? encodeCursor(keyOf(first)) : null,
  };
}
