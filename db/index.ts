import path from 'node:path';
import fs from 'node:fs';
import SQLite from 'better-sqlite3';
import { Kysely, SqliteDialect } from 'kysely';
import type { Database } from './schema';
import { JsonColumnsPlugin } from './json-columns';

export type DB = Kysely<Database>;

export function databaseFile(): string {
  return process.env.DATABASE_FILE ?? path.join(process.cwd(), 'data', 'arcline.db');
}

/** Opens a Kysely instance over one SQLite file, with WAL and foreign keys on. */
export function openDatabase(file: string = databaseFile()): DB {
  if (file !== ':memory:') fs.mkdirSync(path.dirname(file), { recursive: true });
  const sqlite = new SQLite(file);
  sqlite.pragma('journal_mode = WAL');
  sqlite.pragma('foreign_keys = ON');
  sqlite.pragma('busy_timeout = 5000');
  return new Kysely<Database>({
    dialect: new SqliteDialect({ database: sqlite }),
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
