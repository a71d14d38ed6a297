import { beforeAll, describe, expect, it, vi } from 'vitest';
vi.mock('@/lib/auth/current-user', () => import('@/tests/setup/auth-mock'));
import { spawn, type ChildProcess } from 'node:child_process';
import * as me from '@/app/api/me/route';
import * as scenes from '@/app/api/scenes/route';
import { signInAs } from '@/tests/setup/auth-mock';
import { demoUser, freshSeededDb } from '@/tests/setup/db';
import { call } from '@/tests/setup/call';
import { databaseFile } from '@/db';
import { WRITE_LOCK_WAIT_MS } from '@/db/immediate-dialect';

/**
 * Another process (a second server, a migration) takes the write lock on the same database file and
 * holds it for `holdMs`. Resolves once it holds the lock; the child exits after releasing it.
 */
async function holdWriteLock(holdMs: number): Promise<{ child: ChildProcess; released: Promise<void> }> {
  const script = `
    const Database = require('better-sqlite3');
    const db = new Database(process.argv[1]);
    db.pragma('busy_timeout = 10000');
    db.exec('BEGIN IMMEDIATE');
    db.prepare("insert into audit_log (organisation_id, user_id, action, detail) select organisation_id, id, 'contention.test', '{}' from users limit 1").run();
    process.stdout.write('locked\\n');
    setTimeout(() => { db.exec('COMMIT'); db.close(); process.stdout.write('released\\n'); }, Number(process.argv[2]));
  `;
  const child = spawn(process.execPath, ['-e', script, databaseFile(), String(holdMs)], { cwd: process.cwd(), stdio: ['ignore', 'pipe', 'inherit'] });
  let out = '';
  let onRelease: () => void = () => undefined;
  const released = new Promise<void>((r) => (onRelease = r));
  await new Promise<void>((resolve, reject) => {
    child.once('error', reject);
    child.once('exit', (code) => (code === 0 ? onRelease() : reject(new Error(`lock holder exited ${code}`))));
    child.stdout!.on('data', (d) => {
      out += String(d);
      if (out.includes('locked')) resolve();
      if (out.includes('released')) onRelease();
    });
  });
  return { child, released };
}

beforeAll(async () => {
  await freshSeededDb();
});

const writes = (n: number, tag: string) =>
  Array.from({ length: n }, (_, i) =>
    i % 2 === 0
      ? call({ handler: scenes.POST, method: 'POST', body: { title: `Contention ${tag} ${i}` } })
      : call({ handler: me.PATCH, method: 'PATCH', body: { units: i % 4 === 1 ? 'metric' : 'imperial' } }),
  );

describe('a second process on the same database file', () => {
  it(`holding the write lock for less than the busy timeout (${WRITE_LOCK_WAIT_MS} ms): every write waits and succeeds`, async () => {
    signInAs(await demoUser('operator@harrow.example'));
    const lock = await holdWriteLock(1500);
    const started = performance.now();
    const results = await Promise.all(writes(6, 'short'));
    const waited = performance.now() - started;
    await lock.released;
    expect(results.map((r) => r.status)).toEqual([201, 200, 201, 200, 201, 200]);
    console.log(`[figure] lock held 1.5 s by another process: 6 writes all succeeded after ${(waited / 1000).toFixed(2)} s`);
  }, 60_000);

  it('holding it for longer than the busy timeout: writes get 503 with Retry-After, never 500, and reads still answer', async () => {
    signInAs(await demoUser('operator@harrow.example'));
    // This process has one connection, so two waiting writes queue: the second gives up one timeout later.
    const lock = await holdWriteLock(2 * WRITE_LOCK_WAIT_MS + 3000);
    const read = await call({ handler: scenes.GET, method: 'GET' });
    expect(read.status).toBe(200);
    const post = (title: string) =>
      scenes.POST(new Request('http://arcline.test/api/scenes', { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ title }) }));
    const refused = await Promise.all([post('Contention long 1'), post('Contention long 2')]);
    expect(refused.map((r) => r.status)).toEqual([503, 503]);
    for (const r of refused) {
      expect(Number(r.headers.get('retry-after'))).toBeGreaterThan(0);
      expect((await r.json()).error).toMatch(/busy/);
    }
    await lock.released;
    // Once released, the same write goes through.
    expect((await call({ handler: scenes.POST, method: 'POST', body: { title: 'Contention after release' } })).status).toBe(201);
  }, 60_000);
});
