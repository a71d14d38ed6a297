import { databaseLabel, openConfigured } from './index';
import { migrateToLatest } from './migrator';
import { seedDemo } from './seed/run-seed';

const db = openConfigured();
await migrateToLatest(db);
const seeded = await seedDemo(db);
console.log(seeded ? `Seeded the demo scenario into ${databaseLabel()}` : `${databaseLabel()} already has data; seed skipped`);
await db.destroy();
