import { databaseLabel, openConfigured } from './index';
import { migrateToLatest } from './migrator';

const db = openConfigured();
const ran = await migrateToLatest(db);
console.log(ran.length ? `Migrated ${databaseLabel()}: ${ran.join(', ')}` : `${databaseLabel()} is up to date`);
await db.destroy();
