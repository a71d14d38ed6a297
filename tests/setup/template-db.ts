import fs from 'node:fs';
import path from 'node:path';
import { getDb, openDatabase, type DB } from '@/db';
import { migrateToLatest } from '@/db/migrator';
import { seedDemo } from '@/db/seed/run-seed';
import { backfillSceneFigures } from '@/lib/server/scene-figures';

/**
 * A migrated, seeded database file built once per test file, copied afresh whenever a test needs a clean
 * slate. Copying a closed SQLite file takes a millisecond; re-seeding would hash the demo password again.
 */
export async function buildTemplate(prepare?: (db: DB) => Promise<void>): Promise<string> {
  const dir = path.dirname(process.env.DATABASE_FILE!);
  const file = path.join(dir, 'template.db');
  const db = openDatabase(file);
  await migrateToLatest(db);
  await seedDemo(db);
  if (prepare) await prepare(db);
  // The list stores each scene's figures on first read; computing them now keeps a listing a pure read in tests.
  await backfillSceneFigures(db);
  await db.destroy(); // closing checkpoints the WAL, so the one file holds everything
  return file;
}

let copies = 0;

/** Points getDb() at a fresh copy of the template, closing the previous copy. */
export async function resetToTemplate(template: string): Promise<DB> {
  const previous = process.env.DATABASE_FILE!;
  await getDb().destroy();
  const file = path.join(path.dirname(template), `copy-${++copies}.db`);
  fs.copyFileSync(template, file);
  process.env.DATABASE_FILE = file;
  if (path.basename(previous).startsWith('copy-')) {
    for (const f of [previous, `${previous}-wal`, `${previous}-shm`]) fs.rmSync(f, { force: true });
  }
  return getDb();
}
