import os from 'node:os';
import path from 'node:path';
import fs from 'node:fs';

// Each test file (one fork each) gets its own fresh database: a SQLite file, or, when the suites run
// against PostgreSQL (DATABASE_URL, set by scripts/test-postgres.sh), a database of its own in that cluster.
const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'arcline-test-'));
process.env.DATABASE_FILE = path.join(dir, 'test.db');
process.env.NEXTAUTH_SECRET ??= 'test-secret-not-for-production';
process.env.UPLOAD_DIR ??= path.join(dir, 'uploads');
if (process.env.DATABASE_URL) {
  const { createDatabase, urlFor } = await import('./pg');
  process.env.ARCLINE_TEST_CLUSTER_URL ??= process.env.DATABASE_URL;
  process.env.DATABASE_URL = urlFor(await createDatabase('test'));
}
