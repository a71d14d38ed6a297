import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { CompiledQuery, sql } from 'kysely';
import type { DB } from '@/db';
import { isPostgres } from '@/db/dialect';
import { createScene, setTrainingSet, softDeleteScene, updateScene } from '@/db/repositories/scenes';
import { COUNT_CAP, countQuery, decodeCursor, keptCountQuery, ftsQuery, listScenes, narrowSearchIds, SEARCH_DRIVES_AT_MOST, tsQuery, type ListScenesOptions } from '@/db/repositories/scene-list';
import type { CurrentUser } from '@/lib/auth/current-user';
import { demoUser } from '@/tests/setup/db';
import { buildTemplate, resetToTemplate } from '@/tests/setup/template-db';

let template: string;
let db: DB;
let op: CurrentUser, sup: CurrentUser;
const doc = { version: 1, objects: [] };

beforeAll(async () => {
  template = await buildTemplate();
});
beforeEach(async () => {
  db = await resetToTemplate(template);
  [op, sup] = await Promise.all(['operator@harrow.example', 'supervisor@harrow.example'].map((e) => demoUser(e as never)));
});

/** Walks every page forward from page 1, running `between` after each page is read. */
async function walk(user: CurrentUser, opts: Omit<ListScenesOptions, 'after' | 'before'>, between?: (page: number) => Promise<void>) {
  const seen: number[] = [];
  let after: string | undefined;
  for (let page = 1; page < 1000; page++) {
    const res = await listScenes(db, user, { ...opts, after });
    seen.push(...res.items.map((i) => i.id));
    if (between) await between(page);
    if (!res.nextCursor) break;
    after = res.nextCursor;
  }
  return seen;
}

describe('keyset paging', () => {
  it('repeats and skips no row while scenes are created between pages', async () => {
    for (let i = 0; i < 23; i++) await createScene(db, op, { title: `Keyset scene ${i}`, document: doc });
    const before = (await listScenes(db, sup, { pageSize: 100 })).items.map((i) => i.id);
    let made = 0;
    const seen = await walk(sup, { pageSize: 4 }, async () => {
      // A new scene lands at the top (newest), ahead of the cursor: it must not shift later pages.
      await createScene(db, op, { title: `Made while paging ${made++}`, document: doc });
    });
    expect(new Set(seen).size).toBe(seen.length);
    expect(seen).toEqual(before);
  });

  it('walks by title ascending and back again with the before cursor', async () => {
    for (const t of ['Delta lift', 'Alpha lift', 'Charlie lift', 'Bravo lift', 'Echo lift']) await createScene(db, op, { title: t, document: doc });
    const opts = { pageSize: 2, q: 'lift', sort: 'title', dir: 'asc' } as const;
    const p1 = await listScenes(db, op, opts);
    const p2 = await listScenes(db, op, { ...opts, after: p1.nextCursor! });
    const p3 = await listScenes(db, op, { ...opts, after: p2.nextCursor! });
    expect([p1, p2, p3].map((p) => p.items.map((i) => i.title))).toEqual([['Alpha lift', 'Bravo lift'], ['Charlie lift', 'Delta lift'], ['Echo lift']]);
    expect(p1.prevCursor).toBeNull();
    expect(p3.nextCursor).toBeNull();
    const back = await listScenes(db, op, { ...opts, before: p3.prevCursor! });
    expect(back.items.map((i) => i.title)).toEqual(['Charlie lift', 'Delta lift']);
    expect(back.nextCursor).not.toBeNull();
    const first = await listScenes(db, op, { ...opts, before: back.prevCursor! });
    expect(first.items.map((i) => i.title)).toEqual(['Alpha lift', 'Bravo lift']);
    expect(first.prevCursor).toBeNull();
  });

  it('refuses a cursor it did not give out', () => {
    expect(() => decodeCursor('bm90IGEgY3Vyc29y')).toThrow(/cursor/);
    expect(() => decodeCursor(Buffer.from('["x",-1]').toString('base64url'))).toThrow(/cursor/);
  });
});

describe('full-text search (FTS5 on SQLite, tsvector on PostgreSQL)', () => {
  it('folds accents and case, matches word prefixes, and covers location and notes', async () => {
    await createScene(db, op, { title: 'Reefer off the Château Ridge ramp', document: doc });
    await createScene(db, op, { title: 'Coil transfer', location: 'Mile 114, Route 9 northbound', document: doc });
    await createScene(db, op, { title: 'Box truck', notes: 'Embankment is soft after the rain; bring extra mats', document: doc });
    const titles = async (q: string) => (await listScenes(db, op, { pageSize: 50, q })).items.map((i) => i.title).sort();
    expect(await titles('chateau')).toEqual(['Reefer off the Château Ridge ramp']);
    expect(await titles('CHÂT')).toEqual(['Reefer off the Château Ridge ramp']);
    expect(await titles('northb')).toEqual(['Coil transfer']);
    expect(await titles('embank mats')).toEqual(['Box truck']);
    expect(await titles('embank coil')).toEqual([]);
  });

  it('follows renames and never finds a deleted scene', async () => {
    const s = await createScene(db, op, { title: 'Tanker on its side', document: doc });
    await updateScene(db, op, s.id, { revision: 1, title: 'Milk tanker on its side' });
    expect((await listScenes(db, op, { pageSize: 5, q: 'milk' })).items.map((i) => i.id)).toEqual([s.id]);
    await softDeleteScene(db, op, s.id);
    expect((await listScenes(db, op, { pageSize: 5, q: 'milk' })).total).toBe(0);
    await db.deleteFrom('scene_revisions').where('scene_id', '=', s.id).execute();
    await db.deleteFrom('audit_log').where('scene_id', '=', s.id).execute();
    await db.deleteFrom('scenes').where('id', '=', s.id).execute();
    // Nothing of it is left in the search index (on PostgreSQL the index is over the rows themselves).
    const left = isPostgres(db)
      ? await sql<{ n: number }>`select count(*) as n from scenes where arcline_scene_search(title, location, notes) @@ arcline_search_query('milk:*')`.execute(db)
      : await sql<{ n: number }>`select count(*) as n from scenes_fts where scenes_fts match 'milk'`.execute(db);
    expect(left.rows[0].n).toBe(0);
  });

  it('quotes what people type, so FTS syntax in it is searched as words', () => {
    expect(ftsQuery('coil "AND" NEAR(x*')).toBe('"coil"* "AND"* "NEAR"* "x"*');
    expect(ftsQuery('%%')).toBeNull();
    expect(tsQuery('coil & !x | (y:*)')).toBe('coil:* & x:* & y:*');
    expect(tsQuery('%%')).toBeNull();
  });

  it('looks words up in the search index, not by reading every scene', async () => {
    // The list's own search condition, planned by the database (sequential scans priced out on PostgreSQL,
    // whose planner would rightly read a table this small from start to end).
    if (isPostgres(db)) {
      const plan = await db.transaction().execute(async (trx) => {
        await sql`set local enable_seqscan = off`.execute(trx);
        const q = trx.selectFrom('scenes').select('scenes.id').where(sql<boolean>`arcline_scene_search(scenes.title, scenes.location, scenes.notes) @@ arcline_search_query(${'chat:*'})`).compile();
        return (await sql.raw<{ 'QUERY PLAN': string }>(`explain ${q.sql.replace('$1', "'chat:*'")}`).execute(trx)).rows.map((r) => r['QUERY PLAN']).join('\n');
      });
      expect(plan).toContain('scenes_search_idx');
    } else {
      // Without the JSON-columns plugin: EXPLAIN's own "detail" column is plain text.
      const plan = await sql<{ detail: string }>`explain query plan select id from scenes where id in (select rowid from scenes_fts where scenes_fts match ${'"chat"*'})`.execute(db.withoutPlugins());
      expect(plan.rows.map((r) => r.detail).join('\n')).toMatch(/VIRTUAL TABLE INDEX/);
    }
  });

  it('counts a broad search from the covering count index and its matches, never reading the scenes themselves', async () => {
    if (isPostgres(db)) {
      const idx = await sql<{ indexdef: string }>`select indexdef from pg_indexes where indexname = 'scenes_count_idx'`.execute(db);
      expect(idx.rows[0]?.indexdef).toMatch(/\(organisation_id, deleted_at, status, owner_id, in_training_set\)/);
    } else {
      // Every filter the list offers, for an operator (own or approved) and a supervisor (all).
      for (const [user, opts] of [[sup, { q: 'coil' }], [op, { q: 'coil' }], [sup, { status: 'draft' as const, q: 'coil' }], [op, { inTrainingSet: true, q: 'coil' }]] as const) {
        const q = countQuery(db, user, opts).compile();
        // Without the JSON-columns plugin: EXPLAIN's own "detail" column is plain text.
        const plan = await db.withoutPlugins().executeQuery<{ detail: string }>(CompiledQuery.raw(`explain query plan ${q.sql}`, [...q.parameters]));
        const detail = plan.rows.map((r) => r.detail).join('\n');
        expect(detail).toContain('USING COVERING INDEX scenes_count_idx');
      }
    }
    // And the figure it gives is the list's own.
    await createScene(db, op, { title: 'Counted coil draft', document: doc });
    const all = await walk(sup, { pageSize: 50, q: 'coil' });
    expect(all.length).toBeGreaterThan(1);
    expect((await listScenes(db, sup, { pageSize: 1, q: 'coil' })).total).toBe(all.length);
  });

  it('searches with query syntax typed into the box as plain words, on this database', async () => {
    await createScene(db, op, { title: 'Quillwort tanker at the weir', document: doc });
    const titles = async (q: string) => (await listScenes(db, op, { pageSize: 5, q })).items.map((i) => i.title);
    expect(await titles('Quillw" & !(')).toEqual(['Quillwort tanker at the weir']);
    expect(await titles('quillwort:* | weir')).toEqual(['Quillwort tanker at the weir']);
    expect(await titles('quillwort -weir')).toEqual(['Quillwort tanker at the weir']);
    expect(await titles('quillwort NOT weir OR x')).toEqual([]);
  });
});

describe('the total', () => {
  it('is counted up to the cap and then reported as capped', async () => {
    const now = new Date().toISOString();
    const rows = Array.from({ length: COUNT_CAP + 5 }, (_, i) => ({ organisation_id: op.organisationId, owner_id: op.id, title: `Bulk ${i}`, document: '{}', created_at: now, updated_at: now }));
    for (let i = 0; i < rows.length; i += 500) await db.insertInto('scenes').values(rows.slice(i, i + 500) as never).execute();
    const res = await listScenes(db, sup, { pageSize: 10 });
    expect(res).toMatchObject({ total: COUNT_CAP, totalCapped: true });
    expect(res.items).toHaveLength(10);
    const few = await listScenes(db, sup, { pageSize: 10, q: 'Bulk 1234' });
    expect(few).toMatchObject({ total: 1, totalCapped: false });
  });
});

describe('a narrow search starts from its matches, a broad one walks the list', () => {
  it('chooses by the number of matches, and either way gives the pages and total the unsearched list gives', async () => {
    const now = Date.parse('2026-01-01T00:00:00Z');
    // Broad: every bulk scene says "gravel"; narrow: one in 97 also says "culvert". Operator and supervisor
    // scenes both, so visibility still filters the matches.
    const rows = Array.from({ length: SEARCH_DRIVES_AT_MOST + 40 }, (_, i) => ({
      organisation_id: op.organisationId,
      owner_id: i % 3 === 0 ? sup.id : op.id,
      status: i % 5 === 0 ? 'approved' : 'draft',
      title: `Gravel pit ${i}${i % 97 === 0 ? ' culvert' : ''}`,
      document: '{}',
      created_at: new Date(now + i * 60_000).toISOString(),
      updated_at: new Date(now + (i % 50) * 60_000).toISOString(),
    }));
    for (let i = 0; i < rows.length; i += 500) await db.insertInto('scenes').values(rows.slice(i, i + 500) as never).execute();
    if (!isPostgres(db)) {
      const ids = await narrowSearchIds(db, 'culvert');
      expect(ids).toHaveLength(Math.ceil(rows.length / 97));
      expect(await narrowSearchIds(db, 'gravel')).toBeNull();
      // The narrow count reads the matches by id, not the list's index.
      const q = countQuery(db, op, { q: 'culvert' }, ids).compile();
      const plan = await db.withoutPlugins().executeQuery<{ detail: string }>(CompiledQuery.raw(`explain query plan ${q.sql}`, [...q.parameters]));
      const detail = plan.rows.map((r) => r.detail).join('\n');
      expect(detail).toMatch(/SEARCH scenes USING INTEGER PRIMARY KEY/);
      expect(detail).not.toMatch(/scenes_count_idx|scenes_list_idx/);
    }
    // Whichever way it is read, a search gives the unsearched list's rows that match, in its order.
    for (const user of [op, sup]) {
      const all = await listScenes(db, user, { pageSize: 100 });
      const every: { id: number; title: string }[] = [];
      for (let after: string | undefined, p = 0; p < 100; p++) {
        const res = await listScenes(db, user, { pageSize: 100, after });
        every.push(...res.items);
        if (!res.nextCursor) break;
        after = res.nextCursor;
      }
      expect(every.length).toBe(all.total);
      for (const [word, test] of [['culvert', / culvert$/], ['gravel', /^Gravel/]] as const) {
        const expected = every.filter((s) => test.test(s.title)).map((s) => s.id);
        expect(expected.length).toBeGreaterThan(0);
        expect(await walk(user, { pageSize: 7, q: word })).toEqual(expected);
        expect((await listScenes(db, user, { pageSize: 7, q: word })).total).toBe(expected.length);
      }
    }
  });
});

describe('the total kept by triggers', () => {
  it('always equals the scenes the list walks, for every filter and reader, through creates, status changes, deletes and restores', async () => {
    const admin = await demoUser('admin@harrow.example');
    const other = await demoUser('operator@cobalt.example');
    let seed = 7;
    const rand = (n: number) => ((seed = (seed * 1103515245 + 12345) % 2147483648), seed % n);
    const statuses = ['draft', 'submitted', 'approved', 'returned', 'archived'] as const;
    const mine: number[] = [];
    for (let step = 0; step < 60; step++) {
      const owner = [op, sup, other][rand(3)];
      const pick = mine.length ? mine[rand(mine.length)] : null;
      const r = rand(6);
      if (r === 0 || pick === null) mine.push((await createScene(db, owner, { title: `Counted ${step}`, document: doc })).id);
      else if (r === 1) await db.updateTable('scenes').set({ status: statuses[rand(statuses.length)] }).where('id', '=', pick).execute();
      else if (r === 2) await db.updateTable('scenes').set({ deleted_at: rand(2) ? new Date().toISOString() : null }).where('id', '=', pick).execute();
      else if (r === 3) await setTrainingSet(db, sup, pick, rand(2) === 1);
      else if (r === 4) await db.updateTable('scenes').set({ owner_id: [op, sup][rand(2)].id }).where('id', '=', pick).where('organisation_id', '=', op.organisationId).execute();
      else {
        await db.deleteFrom('scene_revisions').where('scene_id', '=', pick).execute();
        await db.deleteFrom('scene_figures').where('scene_id', '=', pick).execute();
        await db.deleteFrom('audit_log').where('scene_id', '=', pick).execute();
        await db.deleteFrom('scenes').where('id', '=', pick).execute();
        mine.splice(mine.indexOf(pick), 1);
      }
      if (step % 12 !== 11) continue;
      for (const user of [op, sup, admin, other]) {
        for (const opts of [{}, { status: 'approved' as const }, { status: 'archived' as const }, { inTrainingSet: true }, { inTrainingSet: false, status: 'draft' as const }]) {
          const walked = await walk(user, { pageSize: 50, ...opts });
          const kept = Number((await keptCountQuery(db, user, opts).executeTakeFirstOrThrow()).n);
          expect(kept, `${user.email} ${JSON.stringify(opts)} at step ${step}`).toBe(walked.length);
          expect((await listScenes(db, user, { pageSize: 5, ...opts })).total).toBe(walked.length);
        }
      }
    }
    // Soft delete through the repository too.
    expect(mine.length).toBeGreaterThan(0);
    const last = mine[0];
    await softDeleteScene(db, (await db.selectFrom('scenes').select('owner_id').where('id', '=', last).executeTakeFirstOrThrow()).owner_id === op.id ? op : sup, last);
    expect(Number((await keptCountQuery(db, sup, {}).executeTakeFirstOrThrow()).n)).toBe((await walk(sup, { pageSize: 50 })).length);
  });
});
