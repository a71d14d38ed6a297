import os from 'node:os';
import path from 'node:path';
import fs from 'node:fs';

// Each test file (one fork each) gets its own fresh database file.
const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'arcline-test-'));
process.env.DATABASE_FILE = path.join(dir, 'test.db');
process.env.NEXTAUTH_SECRET ??= 'test-secret-not-for-production';
process.env.UPLOAD_DIR ??= path.join(dir, 'uploads');
