import { databaseFile, openDatabase } from './index';
import { migrateToLatest } from './migrator';

const db = openDatabase();
const ran = await migrateToLatest(db);
console.log(ran.length ? `Migrated ${databaseFile()}: ${ran.join(', ')}` : `${databaseFile()} is up to date`);
await db.destroy();
