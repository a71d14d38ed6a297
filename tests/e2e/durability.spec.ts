import { expect, request as playwrightRequest, test, type APIRequestContext } from '@playwright/test';
import { execFileSync, spawn, type ChildProcess } from 'node:child_process';
import path from 'node:path';
import Database from 'better-sqlite3';
import { PASSWORD } from './helpers';

/**
 * Issue 11 item 5: two server processes on one database file, and a crash. A second `next start` is
 * served from the same build against the e2e server's own database file (the settings mirror
 * playwright.config.ts). Writers save through both processes at once; then the second process is killed
 * with SIGKILL in the middle of saves and started again. Nothing may answer 500, and every save a client
 * was told succeeded must be in the database afterwards, which must pass `PRAGMA integrity_check`.
 */
const dataDir = path.join(process.cwd(), 'data', 'e2e');
const databaseFile = path.join(dataDir, 'e2e.db');
// playwright.config.ts picks the e2e server's port once and every worker inherits it.
const baseA = `http://127.0.0.1:${process.env.E2E_PORT}`;

function startServer(port: string): ChildProcess {
  return spawn('npx', ['next', 'start', '-H', '127.0.0.1', '-p', port], {
    env: {
      ...process.env,
      DATABASE_FILE: databaseFile,
      UPLOAD_DIR: path.join(dataDir, 'uploads'),
      NEXTAUTH_URL: baseA,
      NEXTAUTH_SECRET: 'e2e-secret-not-for-production',
    },
    stdio: 'ignore',
    // Its own process group, so SIGKILL reaches npx and the server it started.
    detached: true,
  });
}

async function waitUp(base: string) {
  const until = Date.now() + 120_000;
  for (;;) {
    try {
      if ((await fetch(`${base}/sign-in`)).ok) return;
    } catch {
      // not listening yet
    }
    if (Date.now() > until) throw new Error(`${base} did not start`);
    await new Promise((r) => setTimeout(r, 250));
  }
}

async function signedIn(base: string, email: string): Promise<APIRequestContext> {
  const ctx = await playwrightRequest.newContext({ baseURL: base });
  const { csrfToken } = await (await ctx.get('/api/auth/csrf')).json();
  const res = await ctx.post('/api/auth/callback/credentials', { form: { csrfToken, email, password: PASSWORD, json: 'true' } });
  expect(res.status()).toBeLessThan(400);
  return ctx;
}

interface Ack {
  id: number;
  revision: number;
  title: string;
}

/**
 * One writer: owns a scene and saves a new title to it again and again, alternating between the servers
 * it is given, until `stop`. Records each acknowledged save and every status.
 */
async function writer(n: number, servers: APIRequestContext[], stop: () => boolean, statuses: Map<number | string, number>, acks: Map<number, Ack>) {
  const created = await servers[0]!.post('/api/scenes', { data: { title: `Two-process writer ${n}` } });
  expect(created.status()).toBe(201);
  const scene = (await created.json()) as { id: number; revision: number };
  let revision = scene.revision;
  acks.set(scene.id, { id: scene.id, revision, title: `Two-process writer ${n}` });
  for (let i = 0; !stop(); i++) {
    const title = `Writer ${n} save ${i}`;
    let status: number | string;
    try {
      const res = await servers[i % servers.length]!.put(`/api/scenes/${scene.id}`, { data: { revision, title }, timeout: 15_000 });
      status = res.status();
      if (status === 200) {
        revision = ((await res.json()) as { revision: number }).revision;
        acks.set(scene.id, { id: scene.id, revision, title });
      }
    } catch {
      // The process went away under the request: not acknowledged, so nothing is owed.
      status = 'no answer';
    }
    statuses.set(status, (statuses.get(status) ?? 0) + 1);
  }
}

/**
 * Every acknowledged save is in the database. After a crash, one more save per writer may have been
 * committed whose answer never arrived (`inFlight`): then the scene is one revision further on.
 */
async function expectAllPresent(ctx: APIRequestContext, acks: Map<number, Ack>, inFlight = false) {
  for (const a of acks.values()) {
    const res = await ctx.get(`/api/scenes/${a.id}`);
    expect(res.status()).toBe(200);
    const body = (await res.json()) as { revision: number; title: string };
    if (inFlight && body.revision === a.revision + 1) continue;
    expect({ id: a.id, revision: body.revision, title: body.title }).toEqual(a);
  }
}

test('two server processes on one database file: 20 writers for 20 s, no 500, no acknowledged save lost; then kill -9 mid-save', async () => {
  test.setTimeout(300_000);
  const portB = execFileSync('node', ['scripts/free-port.mjs']).toString().trim();
  const baseB = `http://127.0.0.1:${portB}`;
  let b = startServer(portB);
  try {
    await waitUp(baseB);
    const a = await signedIn(baseA, 'operator@harrow.example');
    const bCtx = await signedIn(baseB, 'operator@harrow.example');

    const statuses = new Map<number | string, number>();
    const acks = new Map<number, Ack>();
    const end = Date.now() + 20_000;
    await Promise.all(Array.from({ length: 20 }, (_, n) => writer(n, [a, bCtx], () => Date.now() > end, statuses, acks)));
    console.log(`[figure] two processes, 20 writers, 20 s: ${JSON.stringify(Object.fromEntries(statuses))}`);
    expect(statuses.get(500) ?? 0).toBe(0);
    expect(statuses.get('no answer') ?? 0).toBe(0);
    expect(statuses.get(200) ?? 0).toBeGreaterThan(100);
    await expectAllPresent(a, acks);

    // The crash: writers on the second process only; it is killed with SIGKILL while they save.
    const crashStatuses = new Map<number | string, number>();
    const crashAcks = new Map<number, Ack>();
    let stopped = false;
    const writers = Promise.all(Array.from({ length: 10 }, (_, n) => writer(100 + n, [bCtx], () => stopped, crashStatuses, crashAcks)));
    await new Promise((r) => setTimeout(r, 4_000));
    process.kill(-b.pid!, 'SIGKILL');
    await new Promise((r) => setTimeout(r, 1_000));
    stopped = true;
    await writers;
    console.log(`[figure] kill -9 during saves: ${JSON.stringify(Object.fromEntries(crashStatuses))}`);
    expect(crashStatuses.get(200) ?? 0).toBeGreaterThan(0);
    expect(crashStatuses.get('no answer') ?? 0).toBeGreaterThan(0);

    b = startServer(portB);
    await waitUp(baseB);
    const db = new Database(databaseFile, { readonly: true });
    try {
      expect(db.pragma('integrity_check', { simple: true })).toBe('ok');
    } finally {
      db.close();
    }
    // Every acknowledged save is there, read through the restarted process and the one that stayed up.
    await expectAllPresent(await signedIn(baseB, 'operator@harrow.example'), crashAcks, true);
    await expectAllPresent(a, crashAcks, true);
  } finally {
    try {
      process.kill(-b.pid!, 'SIGKILL');
    } catch {
      // already gone
    }
  }
});
