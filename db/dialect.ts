import { PostgresAdapter, sql, type ColumnDataType, type ColumnDefinitionBuilder, type QueryExecutor, type RawBuilder } from 'kysely';

/**
 * The few places where SQLite and PostgreSQL differ, behind small helpers, so one set of migrations and
 * repositories runs on both (db/index.ts picks the database: DATABASE_URL=postgres://... or the SQLite file).
 *
 * Choices that keep both databases behaving the same:
 * - ids are 32-bit integers (SQLite's rowid alias; an identity column on PostgreSQL), so pg returns numbers;
 * - timestamps are ISO-8601 UTC text (`2026-12-03T08:15:00.123Z`) on both: they sort as text and reach the
 *   app exactly as written, with no time-zone conversion in the driver;
 * - flags stay integers 0/1 (the schema's types say `number`);
 * - JSON columns are `json` on PostgreSQL (validated, kept verbatim with its key order) and text on SQLite;
 * - floating-point columns are `double precision` on PostgreSQL (its `real` is 32-bit, SQLite's is 64-bit).
 */
export type Dialect = 'sqlite' | 'postgres';

/** Any Kysely instance or transaction, whatever its table types. */
export type HasExecutor = { getExecutor(): QueryExecutor };

export function dialectOf(db: HasExecutor): Dialect {
  return db.getExecutor().adapter instanceof PostgresAdapter ? 'postgres' : 'sqlite';
}

export function isPostgres(db: HasExecutor): boolean {
  return dialectOf(db) === 'postgres';
}

/** Column default: the current time as ISO-8601 UTC text with milliseconds, on either database. */
export function nowText(db: HasExecutor): RawBuilder<string> {
  return isPostgres(db)
    ? sql<string>`(to_char(clock_timestamp() at time zone 'UTC', 'YYYY-MM-DD"T"HH24:MI:SS.MS"Z"'))`
    : sql<string>`(strftime('%Y-%m-%dT%H:%M:%fZ', 'now'))`;
}

/** The column modifier of an auto-numbered integer primary key: `.addColumn('id', 'integer', autoId(db))`. */
export function autoId(db: HasExecutor): (c: ColumnDefinitionBuilder) => ColumnDefinitionBuilder {
  return isPostgres(db) ? (c) => c.primaryKey().generatedByDefaultAsIdentity() : (c) => c.primaryKey().autoIncrement();
}

/** A column holding one JSON value (parsed on read by db/json-columns.ts where it arrives as text). */
export function jsonType(db: HasExecutor): ColumnDataType {
  return isPostgres(db) ? 'json' : 'text';
}

/** A 64-bit floating-point column. */
export function doubleType(db: HasExecutor): ColumnDataType {
  return isPostgres(db) ? 'double precision' : 'real';
}

/** A condition that is never true (`where 0` is SQLite-only; PostgreSQL wants a boolean). */
export const NEVER = sql<boolean>`1 = 0`;

/**
 * A UNIQUE (or primary key) violation, on either database; with `table`, only one on that table.
 * SQLite says "UNIQUE constraint failed: table.column"; PostgreSQL gives code 23505 and the table.
 */
export function isUniqueViolation(err: unknown, table?: string): boolean {
  const e = err as { code?: unknown; message?: unknown; table?: unknown } | null;
  if (e?.code === '23505') return table === undefined || e.table === table;
  if (e?.code === 'SQLITE_CONSTRAINT_UNIQUE' || e?.code === 'SQLITE_CONSTRAINT_PRIMARYKEY') return table === undefined || String(e.message).includes(`: ${table}.`);
  return false;
}
