import { expect, request as playwrightRequest, test } from '@playwright/test';
import { execFileSync, spawn, type ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import http from 'node:http';
import path from 'node:path';
import { gunzipSync } from 'node:zlib';
import Database from 'better-sqlite3';
import { PASSWORD } from './helpers';

/**
 * Issue 11 item 5: two server processes on one database file, and a crash.
 *
 * The spec starts two `next start` processes of the same build (A and B) on a database file of its own,
 * freshly seeded, so the crash cannot harm the file the other suites use. 20 writers save through both at
 * once for 20 s: two writers per scene, so saves also collide (409). Then B is killed with SIGKILL while
 * saves run through both, and started again. Every answer must be 200, 409 or 503 with Retry-After (never
 * 500), every acknowledged save must be in the file, and every scene must be whole: its current document
 * is the snapshot of its current revision, revisions 1..current all exist, and each save's audit row is
 * there (the three writes of one transaction). The file is also checked with `PRAGMA integrity_check`.
 *
 * The writers are plain fetch calls (a light client), so the servers are the busy side and B is killed
 * while it holds requests it has not answered. Servers are started with node and next's own bin, not npx,
 * with their output in data/e2e-durability/server-*.log.
 */
const dataDir = path.join(process.cwd(), 'data', 'e2e-durability');
const databaseFile = path.join(dataDir, 'durability.db');
const NEXT_BIN = path.join(process.cwd(), 'node_modules', 'next', 'dist', 'bin', 'next');
const SCENES = 10;
const WRITERS = 20;

const freePort = () => execFileSync(process.execPath, ['scripts/free-port.mjs']).toString().trim();

interface Server {
  name: string;
  base: string;
  port: string;
  log: string;
  child: ChildProcess;
}

/** Every server this spec started: killed after the test even when it fails or times out (they are detached). */
const started: Server[] = [];
test.afterEach(async () => {
  for (const s of started.splice(0)) await kill9(s);
});

function startServer(name: string, port: string): Server {
  const base = `http://127.0.0.1:${port}`;
  const log = path.join(dataDir, `server-${name}.log`);
  const out = fs.openSync(log, 'a');
  // node runs next's own bin, not npx, so the pid is the server's; its own process group, so SIGKILL reaches
  // anything it starts too.
  const child = spawn(process.execPath, [NEXT_BIN, 'start', '-H', '127.0.0.1', '-p', port], {
    env: {
      ...process.env,
      DATABASE_FILE: databaseFile,
      UPLOAD_DIR: path.join(dataDir, 'uploads'),
      NEXTAUTH_URL: base,
      NEXTAUTH_SECRET: 'e2e-secret-not-for-production',
      SMTP_URL: '',
    },
    stdio: ['ignore', out, out],
    detached: true,
  });
  fs.closeSync(out);
  const server = { name, base, port, log, child };
  started.push(server);
  return server;
}

const logTail = (s: Server) => fs.readFileSync(s.log, 'utf8').split('\n').slice(-15).join('\n');

async function waitUp(s: Server) {
  const until = Date.now() + 60_000;
  for (;;) {
    if (s.child.exitCode !== null || s.child.signalCode !== null) throw new Error(`server ${s.name} exited (${s.child.exitCode ?? s.child.signalCode}):\n${logTail(s)}`);
    try {
      if ((await fetch(`${s.base}/sign-in`)).ok) return;
    } catch {
      // not listening yet
    }
    if (Date.now() > until) throw new Error(`server ${s.name} did not answer within 60 s:\n${logTail(s)}`);
    await new Promise((r) => setTimeout(r, 200));
  }
}

async function kill9(s: Server) {
  if (s.child.exitCode !== null || s.child.signalCode !== null) return;
  const gone = new Promise((r) => s.child.once('exit', r));
  process.kill(-s.child.pid!, 'SIGKILL');
  await gone;
}

/** A signed-in client of one server. The writers use plain fetch: a light client, so the servers are the busy side. */
interface Client {
  s: Server;
  cookie: string;
}

/** Signs in through the server's own next-auth routes and keeps the session cookie. */
async function signedIn(s: Server): Promise<Client> {
  const ctx = await playwrightRequest.newContext({ baseURL: s.base });
  try {
    const { csrfToken } = await (await ctx.get('/api/auth/csrf')).json();
    const res = await ctx.post('/api/auth/callback/credentials', { form: { csrfToken, email: 'operator@harrow.example', password: PASSWORD, json: 'true' } });
    expect(res.status()).toBeLessThan(400);
    expect((await ctx.get('/api/me')).status()).toBe(200);
    const cookies = (await ctx.storageState()).cookies;
    return { s, cookie: cookies.map((c) => `${c.name}=${c.value}`).join('; ') };
  } finally {
    await ctx.dispose();
  }
}

function send(c: Client, method: 'GET' | 'POST' | 'PUT', path: string, body?: unknown): Promise<Response> {
  return fetch(`${c.s.base}${path}`, {
    method,
    headers: { cookie: c.cookie, ...(body !== undefined && { 'content-type': 'application/json' }) },
    body: body === undefined ? undefined : JSON.stringify(body),
    signal: AbortSignal.timeout(15_000),
  });
}

/**
 * Sends a PUT whose body is `total` bytes in 64 KB chunks with no Content-Length (chunked), stopping as soon
 * as the answer comes. Resolves with the status and how many bytes were handed to the socket by then.
 */
function chunkedPut(c: Client, path: string, total: number): Promise<{ status: number; sent: number }> {
  return new Promise((resolve, reject) => {
    const req = http.request(new URL(path, c.s.base), { method: 'PUT', headers: { cookie: c.cookie, 'content-type': 'application/json' } });
    const chunk = Buffer.alloc(64 * 1024, 'a');
    let sent = 0;
    let answered = false;
    req.on('response', (res) => {
      answered = true;
      res.resume();
      resolve({ status: res.statusCode ?? 0, sent });
      res.on('end', () => req.destroy());
    });
    // The server closes the connection after its answer; an error before any answer is a failure.
    req.on('error', (err) => setTimeout(() => answered || reject(err), 500));
    const pump = () => {
      while (!answered && sent < total) {
        sent += chunk.length;
        if (!req.write(chunk)) return void req.once('drain', pump);
      }
      if (!answered) req.end();
    };
    pump();
  });
}

const rssKb = (pid: number) => Number(/VmRSS:\s+(\d+)/.exec(fs.readFileSync(`/proc/${pid}/status`, 'utf8'))?.[1]);

/** A save the server answered 200 to: the scene's row for `revision` must hold this grid, forever. */
interface Ack {
  scene: number;
  revision: number;
  grid: number;
  title: string;
  at: number;
  server: string;
}

/** Answers to saves (PUT), overall and per server ("A:200"); reads (GET) are counted apart. */
class Tally {
  statuses = new Map<string, number>();
  reads = new Map<string, number>();
  acks: Ack[] = [];
  /** When each request that got no answer was sent. */
  unansweredSentAt: number[] = [];
  /** Requests sent and not yet answered, per server. */
  pending = new Map<string, number>();
  busyWithoutRetryAfter = 0;
  inFlight(server: string, change: 1 | -1) {
    this.pending.set(server, (this.pending.get(server) ?? 0) + change);
  }
  read(server: string, status: number | 'no answer') {
    this.reads.set(`${server}:${status}`, (this.reads.get(`${server}:${status}`) ?? 0) + 1);
  }
  count(server: string, status: number | 'no answer') {
    const key = `${status}`;
    this.statuses.set(key, (this.statuses.get(key) ?? 0) + 1);
    this.statuses.set(`${server}:${key}`, (this.statuses.get(`${server}:${key}`) ?? 0) + 1);
  }
  /** Every status seen, without the per-server keys. */
  kinds() {
    return [...this.statuses.keys()].filter((k) => !k.includes(':'));
  }
}

/**
 * One writer: saves a new document (a grid spacing of its own) and title to `scene` again and again until
 * `stop`, through the servers in turn. On 409 it reads the current revision and goes on; on 503 it waits
 * as Retry-After says; a server that does not answer (killed) is skipped for a second.
 */
async function writer(
  w: number,
  scene: { id: number; document: Record<string, unknown> },
  servers: Client[],
  stop: () => boolean,
  tally: Tally,
) {
  let revision = 0;
  // A server that did not answer is left alone for a second, so the writer goes on through the other.
  const downUntil = new Map<string, number>();
  let turn = w;
  const next = () => {
    for (let k = 0; k < servers.length; k++) {
      const candidate = servers[turn++ % servers.length]!;
      if ((downUntil.get(candidate.s.name) ?? 0) <= Date.now()) return candidate;
    }
    return servers[turn++ % servers.length]!;
  };
  for (let i = 0; !stop(); i++) {
    const client = next();
    const s = client.s;
    const pause = (ms: number) => new Promise((r) => setTimeout(r, ms));
    const sentAt = performance.now();
    tally.inFlight(s.name, 1);
    try {
      if (revision === 0) {
        const cur = await send(client, 'GET', `/api/scenes/${scene.id}`);
        tally.inFlight(s.name, -1);
        tally.read(s.name, cur.status);
        if (cur.status === 200) revision = ((await cur.json()) as { revision: number }).revision;
        else if (cur.status === 503) await pause(Number(cur.headers.get('retry-after') ?? 1) * 1000);
        continue;
      }
      const grid = w + 1 + (i % 1000) / 1000;
      const title = `Durability writer ${w} save ${i}`;
      const res = await send(client, 'PUT', `/api/scenes/${scene.id}`, { revision, title, document: { ...scene.document, grid } });
      tally.inFlight(s.name, -1);
      tally.count(s.name, res.status);
      if (res.status === 200) {
        revision = ((await res.json()) as { revision: number }).revision;
        const ack = { scene: scene.id, revision, grid, title, at: performance.now(), server: s.name };
        tally.acks.push(ack);
      } else if (res.status === 409) {
        revision = 0;
      } else if (res.status === 503) {
        const after = Number(res.headers.get('retry-after'));
        if (!(after > 0)) tally.busyWithoutRetryAfter++;
        await pause((after > 0 ? after : 1) * 1000);
      }
      if (res.status !== 200) await res.body?.cancel();
    } catch {
      // The server went away under the request: nothing was acknowledged, so nothing is owed.
      tally.inFlight(s.name, -1);
      tally.unansweredSentAt.push(sentAt);
      if (revision === 0) tally.read(s.name, 'no answer');
      else tally.count(s.name, 'no answer');
      revision = 0;
      downUntil.set(s.name, Date.now() + 1_000);
      await pause(50);
    }
  }
}

const snapshot = (stored: unknown): Record<string, unknown> =>
  JSON.parse(Buffer.isBuffer(stored) ? gunzipSync(stored).toString('utf8') : String(stored)) as Record<string, unknown>;

/**
 * Reads the file directly: it passes integrity_check, every acknowledged save is in it, and every scene is
 * whole. Returns how many scenes are one save past their last acknowledged one (committed, answer lost).
 */
function checkFile(sceneIds: number[], acks: Ack[]): { revisions: number; unanswered: number } {
  const db = new Database(databaseFile, { readonly: true });
  try {
    expect(db.pragma('integrity_check', { simple: true })).toBe('ok');
    const revisionRow = db.prepare('select document from scene_revisions where scene_id = ? and revision = ?');
    for (const a of acks) {
      const row = revisionRow.get(a.scene, a.revision) as { document: unknown } | undefined;
      expect(row, `acknowledged save ${a.scene}@${a.revision}`).toBeDefined();
      expect(snapshot(row!.document).grid, `document of ${a.scene}@${a.revision}`).toBe(a.grid);
    }
    let revisions = 0;
    let unanswered = 0;
    for (const id of sceneIds) {
      const scene = db.prepare('select revision, title, document from scenes where id = ?').get(id) as { revision: number; title: string; document: string };
      const rows = db.prepare('select count(*) as n, max(revision) as top from scene_revisions where scene_id = ?').get(id) as { n: number; top: number };
      // Revisions 1..current, none missing and none beyond: no save committed half.
      expect(rows, `revision rows of scene ${id}`).toEqual({ n: scene.revision, top: scene.revision });
      const current = revisionRow.get(id, scene.revision) as { document: unknown };
      expect(snapshot(current.document), `scene ${id}'s document is its revision's`).toEqual(JSON.parse(scene.document));
      const audits = db.prepare("select count(*) as n from audit_log where scene_id = ? and action = 'scene.update'").get(id) as { n: number };
      expect(audits.n, `one audit row per save of scene ${id}`).toBe(scene.revision - 1);
      const last = acks.filter((a) => a.scene === id).sort((x, y) => y.revision - x.revision)[0];
      if (last && last.revision === scene.revision) expect(scene.title).toBe(last.title);
      else if (last) {
        expect(scene.revision, `scene ${id} is at most one unanswered save past its last acknowledged one`).toBe(last.revision + 1);
        unanswered++;
      }
      revisions += scene.revision;
    }
    return { revisions, unanswered };
  } finally {
    db.close();
  }
}

test('two server processes on one database file: 20 writers for 20 s, no 500, no acknowledged save lost; then kill -9 mid-save; then the logs and a 256 MB chunked save', async () => {
  test.setTimeout(240_000);
  fs.rmSync(dataDir, { recursive: true, force: true });
  fs.mkdirSync(dataDir, { recursive: true });
  execFileSync('npx', ['tsx', 'db/seed.ts'], { env: { ...process.env, DATABASE_FILE: databaseFile }, stdio: 'ignore' });

  const a = startServer('A', freePort());
  let b = startServer('B', freePort());
  try {
    await Promise.all([waitUp(a), waitUp(b)]);
    const servers = [await signedIn(a), await signedIn(b)];
    const scenes: { id: number; document: Record<string, unknown> }[] = [];
    for (let n = 0; n < SCENES; n++) {
      const res = await send(servers[n % 2]!, 'POST', '/api/scenes', { title: `Durability scene ${n}` });
      expect(res.status).toBe(201);
      scenes.push((await res.json()) as { id: number; document: Record<string, unknown> });
    }
    const ids = scenes.map((s) => s.id);

    // 1. Both processes, 20 writers, two to a scene, 20 s.
    const load = new Tally();
    const end = Date.now() + 20_000;
    await Promise.all(Array.from({ length: WRITERS }, (_, w) => writer(w, scenes[w % SCENES]!, servers, () => Date.now() > end, load)));
    console.log(`[figure] two processes, ${WRITERS} writers, 20 s: saves ${JSON.stringify(Object.fromEntries(load.statuses))}, reads ${JSON.stringify(Object.fromEntries(load.reads))}`);
    expect(load.kinds().filter((k) => !['200', '409', '503'].includes(k))).toEqual([]);
    expect(load.busyWithoutRetryAfter).toBe(0);
    expect([...load.reads.keys()].filter((k) => !/:(200|503)$/.test(k))).toEqual([]);
    // Both processes acknowledged saves, and every scene moved on.
    expect(load.statuses.get('A:200') ?? 0).toBeGreaterThan(0);
    expect(load.statuses.get('B:200') ?? 0).toBeGreaterThan(0);
    expect(new Set(load.acks.map((x) => x.scene)).size).toBe(SCENES);
    const afterLoad = checkFile(ids, load.acks);
    expect(afterLoad.unanswered).toBe(0);
    console.log(`[figure] after the load: ${load.acks.length} acknowledged saves, all present; ${afterLoad.revisions} revisions in the file`);

    // 2. kill -9 of B while ten writers save through A and B: as soon as B has at least three saves or reads
    // sent to it and not answered. A round whose kill still cut nothing off (B answered them all first) is
    // repeated, up to three.
    const allAcks = [...load.acks];
    let cutOff = 0;
    for (let round = 1; round <= 3 && cutOff === 0; round++) {
      const crash = new Tally();
      let stopped = false;
      const writers = Promise.all(scenes.map((scene, w) => writer(w, scene, servers, () => stopped, crash)));
      await new Promise((r) => setTimeout(r, 1_000));
      await expect.poll(() => crash.pending.get('B') ?? 0, { intervals: [2], timeout: 30_000 }).toBeGreaterThanOrEqual(3);
      const killedAt = performance.now();
      await kill9(b);
      await new Promise((r) => setTimeout(r, 3_000));
      stopped = true;
      await writers;
      allAcks.push(...crash.acks);
      const ackedByAAfterKill = crash.acks.filter((x) => x.server === 'A' && x.at > killedAt).length;
      cutOff = crash.unansweredSentAt.filter((t) => t <= killedAt).length;
      console.log(
        `[figure] kill -9 round ${round}: saves ${JSON.stringify(Object.fromEntries(crash.statuses))}, reads ${JSON.stringify(Object.fromEntries(crash.reads))}; ${cutOff} request(s) in flight at the kill got no answer; A acknowledged ${ackedByAAfterKill} saves after it`,
      );
      expect(crash.kinds().filter((k) => !['200', '409', '503', 'no answer'].includes(k))).toEqual([]);
      expect(crash.busyWithoutRetryAfter).toBe(0);
      expect(crash.statuses.get('A:no answer') ?? 0).toBe(0);
      expect([...crash.reads.keys()].filter((k) => !/^(A:(200|503)|B:(200|503|no answer))$/.test(k))).toEqual([]);
      // The surviving process went on saving.
      expect(ackedByAAfterKill).toBeGreaterThan(0);

      // 3. Restart B on the same file: the file is whole and every acknowledged save is there.
      b = startServer('B', b.port);
      servers[1] = { ...servers[1]!, s: b };
      await waitUp(b);
      const afterCrash = checkFile(ids, allAcks);
      console.log(`[figure] after kill -9 and restart: integrity_check ok, ${allAcks.length} acknowledged saves present, ${afterCrash.unanswered} scene(s) one unanswered save further on`);
    }
    // A kill cut off requests in flight.
    expect(cutOff).toBeGreaterThan(0);

    // B serves again, reads and saves, with the session it had before the crash.
    const current = await send(servers[1]!, 'GET', `/api/scenes/${ids[0]}`);
    expect(current.status).toBe(200);
    const { revision } = (await current.json()) as { revision: number };
    const saved = await send(servers[1]!, 'PUT', `/api/scenes/${ids[0]}`, { revision, title: 'Durability scene 0 after the restart' });
    expect(saved.status).toBe(200);
    expect(((await saved.json()) as { revision: number }).revision).toBe(revision + 1);

    // Issue 11 item 8, from the servers' own output: one JSON line per API call with the request id, user,
    // method, route, status and duration, and neither the password nor the session token anywhere.
    const token = servers[0]!.cookie.match(/next-auth\.session-token=([^;]+)/)?.[1];
    expect(token?.length).toBeGreaterThan(20);
    for (const s of [a, b]) {
      const text = fs.readFileSync(s.log, 'utf8');
      const calls = text
        .split('\n')
        .filter((l) => l.startsWith('{'))
        .map((l) => JSON.parse(l) as Record<string, unknown>)
        .filter((l) => l.msg === 'api');
      expect(calls.length, `API log lines of ${s.name}`).toBeGreaterThan(SCENES);
      const saves = calls.filter((x) => x.method === 'PUT');
      expect(saves.length, `save log lines of ${s.name}`).toBeGreaterThan(0);
      for (const c of saves.slice(0, 50)) {
        expect(c).toMatchObject({ requestId: expect.stringMatching(/^[\w.-]{8,}$/), userId: expect.any(Number), route: expect.stringMatching(/^\/api\/scenes\/\d+$/), status: expect.any(Number), ms: expect.any(Number) });
      }
      expect(text).not.toContain(PASSWORD);
      expect(text).not.toContain(token!);
    }

    // Issue 11 item 6 on a running server: a 256 MB chunked save is refused with 413 once the limit (2 MB) is
    // passed, not after reading it all, and the server's memory barely moves. (Next copies and fully reads
    // the body of any request its proxy runs for; proxy.ts's matcher leaves ordinary API paths out.)
    const pid = a.child.pid!;
    const before = rssKb(pid);
    let peak = before;
    const sampler = setInterval(() => (peak = Math.max(peak, rssKb(pid))), 5);
    const big = await chunkedPut(servers[0]!, `/api/scenes/${ids[1]}`, 256 * 1024 * 1024);
    clearInterval(sampler);
    peak = Math.max(peak, rssKb(pid));
    console.log(`[figure] 256 MB chunked save on a running server: ${big.status} after ${(big.sent / 1024 / 1024).toFixed(1)} MB sent; server RSS ${(before / 1024).toFixed(0)} MB, peak ${(peak / 1024).toFixed(0)} MB`);
    expect(big.status).toBe(413);
    expect(big.sent).toBeLessThan(64 * 1024 * 1024);
    expect(peak - before).toBeLessThan(50 * 1024);
  } finally {
    for (const s of started.splice(0)) await kill9(s);
  }
});
