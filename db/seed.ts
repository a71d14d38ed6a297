import { databaseFile, openDatabase } from './index';
import { migrateToLatest } from './migrator';
import { seedDemo } from './seed/run-seed';

const db = openDatabase();
await migrateToLatest(db);
const seeded = await seedDemo(db);
console.log(seeded ? `Seeded the demo scenario into ${databaseFile()}` : `${databaseFile()} already has data; seed skipped`);
await db.destroy();
