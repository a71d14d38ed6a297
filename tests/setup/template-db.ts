import fs from 'node:fs';
import path from 'node:path';
import { databaseUrl, getDb, openDatabase, openPostgres, type DB } from '@/db';
import { migrateToLatest } from '@/db/migrator';
import { seedDemo } from '@/db/seed/run-seed';
import { backfillSceneFigures } from '@/lib/server/scene-figures';
import { createDatabase, onCluster, urlFor } from './pg';

/**
 * A migrated, seeded database built once per test file, copied afresh whenever a test needs a clean slate.
 * Copying a closed SQLite file takes a millisecond; on PostgreSQL a copy is CREATE DATABASE ... TEMPLATE
 * (tens of milliseconds). Re-seeding would hash the demo password again.
 * Returns the template: a file path (SQLite) or a database name (PostgreSQL).
 */
export async function buildTemplate(prepare?: (db: DB) => Promise<void>): Promise<string> {
  const pg = databaseUrl() !== null;
  const template = pg ? await createDatabase('template') : path.join(path.dirname(process.env.DATABASE_FILE!), 'template.db');
  const db = pg ? openPostgres(urlFor(template)) : openDatabase(template);
  await migrateToLatest(db);
  await seedDemo(db);
  if (prepare) await prepare(db);
  // The list stores each scene's figures on first read; computing them now keeps a listing a pure read in tests.
  await backfillSceneFigures(db);
  await db.destroy(); // closing checkpoints the WAL, so the one file holds everything (and frees the template database)
  return template;
}

let copies = 0;

/** Points getDb() at a fresh copy of the template, closing the previous copy. */
export async function resetToTemplate(template: string): Promise<DB> {
  await getDb().destroy();
  if (databaseUrl() !== null) {
    // Its pool is closed, so the previous copy can go at once (hundreds of copies would fill the disk).
    const previous = new URL(process.env.DATABASE_URL!).pathname.slice(1);
    if (previous.includes('_copy_')) await onCluster(`drop database if exists ${previous} with (force)`);
    process.env.DATABASE_URL = urlFor(await createDatabase(`copy_${++copies}`, template));
    return getDb();
  }
  const previous = process.env.DATABASE_FILE!;
  const file = path.join(path.dirname(template), `copy-${++copies}.db`);
  fs.copyFileSync(template, file);
  process.env.DATABASE_FILE = file;
  if (path.basename(previous).startsWith('copy-')) {
    for (const f of [previous, `${previous}-wal`, `${previous}-shm`]) fs.rmSync(f, { force: true });
  }
  return getDb();
}
