import path from 'node:path';
import fs from 'node:fs';
import SQLite from 'better-sqlite3';
import { Kysely } from 'kysely';
import type { Database } from './schema';
import { JsonColumnsPlugin } from './json-columns';
import { ImmediateSqliteDialect, STATEMENT_BUSY_TIMEOUT_MS } from './immediate-dialect';

export type DB = Kysely<Database>;

export function databaseFile(): string {
  return process.env.DATABASE_FILE ?? path.join(process.cwd(), 'data', 'arcline.db');
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

// One instance per process, kept on globalThis so dev hot reload does not open new connections.
const globalForDb = globalThis as unknown as { arclineDb?: { file: string; db: DB } };

export function getDb(): DB {
  const file = databaseFile();
  if (!globalForDb.arclineDb || globalForDb.arclineDb.file !== file) {
    globalForDb.arclineDb = { file, db: openDatabase(file) };
  }
  return globalForDb.arclineDb.db;
}
