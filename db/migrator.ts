import { Migrator, type Kysely, type MigrationProvider } from 'kysely';
import { migrations } from '@/migrations';

const provider: MigrationProvider = { getMigrations: async () => migrations };

/** Runs every pending migration. Safe to call repeatedly: Kysely records what has run. */
export async function migrateToLatest(db: Kysely<any>): Promise<string[]> {
  const { error, results } = await new Migrator({ db, provider }).migrateToLatest();
  if (error) throw error instanceof Error ? error : new Error(String(error));
  return (results ?? []).filter((r) => r.status === 'Success').map((r) => r.migrationName);
}
