import path from 'node:path';
import fs from 'node:fs';
import SQLite from 'better-sqlite3';
import pg from 'pg';
import { Kysely, PostgresDialect } from 'kysely';
import type { Database } from './schema';
import { log } from '@/lib/log';
import { JsonColumnsPlugin } from './json-columns';
import { ImmediateSqliteDialect, STATEMENT_BUSY_TIMEOUT_MS, WRITE_LOCK_WAIT_MS } from './immediate-dialect';

export type DB = Kysely<Database>;

export function databaseFile(): string {
  return process.env.DATABASE_FILE ?? path.join(process.cwd(), 'data', 'arcline.db');
}

/**
 * The PostgreSQL connection string when DATABASE_URL asks for PostgreSQL (postgres:// or postgresql://),
 * else null and Arcline uses the SQLite file (DATABASE_FILE). Any other DATABASE_URL is refused rather than
 * silently ignored.
 */
export function databaseUrl(): string | null {
  const url = process.env.DATABASE_URL?.trim();
  if (!url) return null;
  if (!/^postgres(ql)?:\/\//i.test(url)) throw new Error('DATABASE_URL must start with postgres:// or postgresql:// (unset it to use the SQLite file DATABASE_FILE)');
  return url;
}

/** Where the data lives, for log lines: the SQLite file, or the PostgreSQL URL without its password. */
export function databaseLabel(): string {
  const url = databaseUrl();
  if (!url) return databaseFile();
  try {
    const u = new URL(url);
    if (u.password) u.password = '***';
    return u.toString();
  } catch {
    return 'postgres://(unparsable URL)';
  }
}

/**
 * Opens a Kysely instance over one SQLite file. WAL lets readers carry on while one connection writes
 * (several server processes may share the file). synchronous=FULL syncs the WAL at every commit: an
 * answered save or approval then survives a power cut, not only a crashed process (NORMAL would keep
 * the file consistent but could lose the last commits). Saves are human-paced, so the cost is small.
 * Every transaction starts with BEGIN IMMEDIATE (see immediate-dialect.ts).
 */
export function openDatabase(file: string = databaseFile()): DB {
  if (file !== ':memory:') fs.mkdirSync(path.dirname(file), { recursive: true });
  const sqlite = new SQLite(file);
  sqlite.pragma(`busy_timeout = ${STATEMENT_BUSY_TIMEOUT_MS}`);
  sqlite.pragma('journal_mode = WAL');
  sqlite.pragma('synchronous = FULL');
  sqlite.pragma('foreign_keys = ON');
  return new Kysely<Database>({
    dialect: new ImmediateSqliteDialect({ database: sqlite }),
    plugins: [new JsonColumnsPlugin()],
  });
}

// pg's type ids: int8 (count(), sum() of integers) and numeric come back as strings unless parsed.
const INT8 = 20;
const NUMERIC = 1700;
const pgTypes = {
  getTypeParser: ((oid: number, format?: 'text' | 'binary') =>
    oid === INT8 || oid === NUMERIC ? (v: string) => Number(v) : pg.types.getTypeParser(oid, format)) as typeof pg.types.getTypeParser,
};

/**
 * Opens a Kysely instance over a PostgreSQL database through a connection pool (DATABASE_POOL_SIZE,
 * default 10 per process). Counts come back as numbers (see pgTypes); transactions are PostgreSQL's
 * default READ COMMITTED, and writes that must not race check their condition in the UPDATE itself.
 * A statement waits at most WRITE_LOCK_WAIT_MS for a row lock (lock_timeout), then the route wrapper
 * answers 503, as it does for a busy SQLite file.
 */
export function openPostgres(url: string): DB {
  const pool = new pg.Pool({
    connectionString: url,
    max: Number(process.env.DATABASE_POOL_SIZE ?? 10),
    types: pgTypes,
    options: `-c lock_timeout=${WRITE_LOCK_WAIT_MS}`,
  });
  // An idle pooled connection the server closes (a restart, a failover, an administrator) must not take the
  // process down as an unhandled 'error' event; the pool drops it and opens a new one when next needed.
  pool.on('error', (err) => log.warn({ err }, 'PostgreSQL closed an idle pooled connection'));
  const db = new Kysely<Database>({ dialect: new PostgresDialect({ pool }), plugins: [new JsonColumnsPlugin()] });
  pools.set(db, pool);
  return db;
}

const pools = new WeakMap<DB, pg.Pool>();

/**
 * The connection pool under a PostgreSQL Kysely instance opened here, or null (SQLite). For a library that
 * takes a pg pool of its own (the shared sign-in limiter): its queries run on their own pooled connections,
 * never inside a transaction of ours.
 */
export function postgresPoolOf(db: DB): pg.Pool | null {
  return pools.get(db) ?? null;
}

/** Opens the configured database: PostgreSQL when DATABASE_URL says so, else the SQLite file. */
export function openConfigured(): DB {
  const url = databaseUrl();
  return url ? openPostgres(url) : openDatabase(databaseFile());
}

// One instance per process, kept on globalThis so dev hot reload does not open new connections.
const globalForDb = globalThis as unknown as { arclineDb?: { key: string; db: DB } };

export function getDb(): DB {
  const key = databaseUrl() ?? databaseFile();
  if (!globalForDb.arclineDb || globalForDb.arclineDb.key !== key) {
    globalForDb.arclineDb = { key, db: openConfigured() };
  }
  return globalForDb.arclineDb.db;
}
