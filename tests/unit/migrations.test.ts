import { describe, expect, it } from 'vitest';
import { sql } from 'kysely';
import { getDb } from '@/db';
import { isPostgres } from '@/db/dialect';
import { migrateToLatest } from '@/db/migrator';
import { migrations } from '@/migrations';
import { seedDemo } from '@/db/seed/run-seed';
import { snapshotDb } from '@/tests/setup/snapshot';

/** Every table, index, trigger and function with its definition, from the database's own catalogue. */
const schemaOf = async () =>
  isPostgres(getDb())
    ? (
        await sql<{ type: string; name: string; sql: string | null }>`
          select 'table' as type, table_name as name, null as sql from information_schema.tables where table_schema = current_schema()
          union all select 'index', indexname, indexdef from pg_indexes where schemaname = current_schema()
          union all select 'column', table_name || '.' || column_name, data_type from information_schema.columns where table_schema = current_schema()
          union all select 'function', p.proname, pg_get_functiondef(p.oid) from pg_proc p where p.pronamespace = current_schema()::regnamespace
          order by 1, 2`.execute(getDb())
      ).rows
    : (await sql<{ type: string; name: string; sql: string | null }>`select type, name, sql from sqlite_master order by type, name`.execute(getDb())).rows;

describe('migrations', () => {
  it('run every registered migration on a fresh file, then nothing on the second run', async () => {
    const db = getDb();
    expect(await migrateToLatest(db)).toEqual(Object.keys(migrations));
    const schema = await schemaOf();
    expect(schema.map((r) => r.name)).toEqual(expect.arrayContaining(['organisations', 'users', 'equipment_profiles', 'scenes', 'scene_revisions', 'audit_log']));
    expect(await migrateToLatest(db)).toEqual([]);
    expect(await schemaOf()).toEqual(schema);
  });

  it('re-running on a seeded database keeps the data, and seeding twice adds nothing', async () => {
    const db = getDb();
    await migrateToLatest(db);
    expect(await seedDemo(db)).toBe(true);
    const before = await snapshotDb(db);
    expect(await migrateToLatest(db)).toEqual([]);
    expect(await seedDemo(db)).toBe(false);
    expect(await snapshotDb(db)).toEqual(before);
  });

  it('turns on foreign keys (and, on SQLite, WAL) for the connection', async () => {
    const db = getDb();
    if (isPostgres(db)) {
      await migrateToLatest(db);
      await expect(sql`insert into scenes (organisation_id, owner_id, title, document) values (987654, 987654, 'orphan', '{}')`.execute(db)).rejects.toThrow(/violates foreign key constraint/);
      return;
    }
    expect((await sql<{ foreign_keys: number }>`pragma foreign_keys`.execute(db)).rows[0].foreign_keys).toBe(1);
    expect((await sql<{ journal_mode: string }>`pragma journal_mode`.execute(db)).rows[0].journal_mode).toBe('wal');
    await expect(sql`insert into scenes (organisation_id, owner_id, title, document) values (987654, 987654, 'orphan', '{}')`.execute(db)).rejects.toThrow(/FOREIGN KEY/);
  });
});
