import path from 'node:path';
import { promises as fs } from 'node:fs';
import { FileMigrationProvider, Migrator, type Kysely } from 'kysely';

export const MIGRATIONS_DIR = path.join(process.cwd(), 'migrations');

/** Runs every pending migration. Safe to call repeatedly: Kysely records what has run. */
export async function migrateToLatest(db: Kysely<any>): Promise<string[]> {
  const migrator = new Migrator({
    db,
    provider: new FileMigrationProvider({ fs, path, migrationFolder: MIGRATIONS_DIR }),
  });
  const { error, results } = await migrator.migrateToLatest();
  if (error) throw error instanceof Error ? error : new Error(String(error));
  return (results ?? []).filter((r) => r.status === 'Success').map((r) => r.migrationName);
}
