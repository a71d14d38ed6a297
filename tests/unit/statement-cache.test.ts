import { describe, expect, it } from 'vitest';
import SQLite from 'better-sqlite3';
import { Kysely, sql } from 'kysely';
import { ImmediateSqliteDialect, withStatementCache } from '@/db/immediate-dialect';

describe('prepared statements kept by SQL text', () => {
  it('reuses a statement for the same SQL and keeps at most `size`, dropping the least recently used', () => {
    const raw = new SQLite(':memory:');
    const db = withStatementCache(raw, 2);
    const a = db.prepare('select 1 as x');
    expect(db.prepare('select 1 as x')).toBe(a);
    const b = db.prepare('select 2 as x');
    expect(db.cached).toBe(2);
    db.prepare('select 1 as x'); // a is now the most recently used
    db.prepare('select 3 as x'); // drops b
    expect(db.cached).toBe(2);
    expect(db.prepare('select 1 as x')).toBe(a);
    expect(db.prepare('select 2 as x')).not.toBe(b);
    raw.close();
  });

  it('never hands out a statement that is still being iterated', () => {
    const raw = new SQLite(':memory:');
    const db = withStatementCache(raw);
    const text = 'select value from json_each(?)';
    const first = db.prepare(text);
    const it1 = first.iterate(['[1,2,3]']);
    expect(it1.next().value).toEqual({ value: 1 });
    const second = db.prepare(text);
    expect(second).not.toBe(first);
    expect(second.all(['[7]'])).toEqual([{ value: 7 }]);
    expect([...it1].map((r) => (r as { value: number }).value)).toEqual([2, 3]);
    expect(db.prepare(text)).toBe(first);
    raw.close();
  });

  it('gives Kysely the same answers through kept statements, streamed or not, across a schema change', async () => {
    const raw = new SQLite(':memory:');
    const db = new Kysely<{ t: { id: number; v: string } }>({ dialect: new ImmediateSqliteDialect({ database: raw }) });
    await sql`create table t (id integer primary key, v text)`.execute(db);
    await db.insertInto('t').values([{ id: 1, v: 'a' }, { id: 2, v: 'b' }]).execute();
    const read = () => db.selectFrom('t').selectAll().orderBy('id').execute();
    expect(await read()).toEqual([{ id: 1, v: 'a' }, { id: 2, v: 'b' }]);
    await db.updateTable('t').set({ v: 'c' }).where('id', '=', 2).execute();
    expect(await read()).toEqual([{ id: 1, v: 'a' }, { id: 2, v: 'c' }]);
    // A column added after the statement was kept: SQLite re-prepares it, and selectAll's "*" sees the column.
    await sql`alter table t add column w text default 'x'`.execute(db);
    expect(await read()).toEqual([{ id: 1, v: 'a', w: 'x' }, { id: 2, v: 'c', w: 'x' }]);
    const streamed: number[] = [];
    // Kysely holds its one SQLite connection for a stream's length, so the same SQL runs after it, on the
    // statement the stream used.
    for await (const row of db.selectFrom('t').select('id').orderBy('id').stream()) streamed.push(row.id);
    expect(streamed).toEqual([1, 2]);
    expect(await db.selectFrom('t').select('id').orderBy('id').execute()).toEqual([{ id: 1 }, { id: 2 }]);
    await db.destroy();
  });
});
