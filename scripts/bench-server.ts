/**
 * Server bench (not a test): builds a database of 100 and of 100,000 scenes (a realistic mix of sizes), serves
 * the production build on each, and drives it with autocannon (10 connections unless BENCH_CONNECTIONS is set):
 * a trivial route (the framework's own ceiling on this server), /api/me, the scene list's page 1, a deep page, a
 * search, one scene's GET, a save of a 200 kB scene and /api/analyze. Prints req/s and p95 for each, the
 * 100,000 : 100 ratios for the list and search, each authenticated read against the trivial route, and the
 * database growth per 1,000 autosaves of a 200 kB scene. Needs `next build` first.
 */
import { spawn, execFileSync, type ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import autocannon from 'autocannon';
import SQLite from 'better-sqlite3';
import { DEMO_PASSWORD } from '@/db/seed/demo-users';
import { DEMO_SCENES } from '@/db/seed/demo-scenes';
import { encodeCursor } from '@/db/repositories/scene-list';

const root = process.cwd();
if (!fs.existsSync(path.join(root, '.next', 'BUILD_ID'))) {
  console.error('No build found: run `npx next build` first.');
  process.exit(1);
}
const SECONDS = Number(process.env.BENCH_SECONDS ?? 6);
const CONNECTIONS = Number(process.env.BENCH_CONNECTIONS ?? 10);
const dir = path.join(root, 'data', 'bench-server');
fs.mkdirSync(dir, { recursive: true });

const WORDS = ['coil', 'reefer', 'tanker', 'flatbed', 'box truck', 'embankment', 'ditch', 'ramp', 'bridge', 'culvert', 'median', 'quarry', 'overpass', 'weigh station', 'switchback'];
const PLACES = ['Route 9', 'Mill Creek', 'Harlan Pass', 'Quarry Road', 'Dell Road', 'Mile 114', 'Orchard Lane', 'Kestrel Gap'];

/** A document of about `kb` kilobytes: the demo coil transfer plus obstacles. */
function documentOf(kb: number, seed: number) {
  const doc = structuredClone(DEMO_SCENES[0].document) as { objects: Record<string, unknown>[] };
  const base = JSON.stringify(doc).length;
  const per = 190; // bytes of one obstacle below, as JSON
  const n = Math.max(0, Math.round((kb * 1024 - base) / per));
  for (let i = 0; i < n; i++) {
    const a = ((i * 137.5 + seed) % 360) * (Math.PI / 180);
    doc.objects.push({ id: `o-${seed}-${i}`, kind: 'obstacle', obstacleKind: 'structure', x: 20 * Math.cos(a), y: 20 * Math.sin(a), rotation: 0, locked: false, label: '', shape: { kind: 'rect', length: 2, width: 1 }, height: 3, voltageKV: null });
  }
  return doc;
}

/** Migrates and seeds a fresh file, then adds scenes up to `count` for the demo operator: 90 % small, 9 % medium, 1 % 200 kB. */
function buildDatabase(count: number): string {
  const file = path.join(dir, `scenes-${count}.db`);
  for (const f of [file, `${file}-wal`, `${file}-shm`]) fs.rmSync(f, { force: true });
  execFileSync('npx', ['tsx', 'db/seed.ts'], { env: { ...process.env, DATABASE_FILE: file }, stdio: 'ignore' });
  const db = new SQLite(file);
  // The demo operator's organisation, whatever its slug: the scenes go where the signed-in bench users look.
  const { id: ownerId, organisation_id: orgId } = db.prepare(`select id, organisation_id from users where email = 'operator@harrow.example'`).get() as { id: number; organisation_id: number };
  const { n: have } = db.prepare('select count(*) as n from scenes where organisation_id = ?').get(orgId) as { n: number };
  const sizes = { small: JSON.stringify(documentOf(4, 1)), medium: JSON.stringify(documentOf(30, 2)), large: JSON.stringify(documentOf(200, 3)) };
  const insert = db.prepare(`insert into scenes (organisation_id, owner_id, title, location, notes, status, document, revision, created_at, updated_at) values (?, ?, ?, ?, ?, ?, ?, 1, ?, ?)`);
  const t0 = Date.parse('2022-01-01T00:00:00Z');
  db.transaction(() => {
    for (let i = have; i < count; i++) {
      const doc = i % 100 === 0 ? sizes.large : i % 10 === 0 ? sizes.medium : sizes.small;
      const when = new Date(t0 + i * 900_000).toISOString();
      const status = i % 7 === 0 ? 'approved' : 'draft';
      insert.run(orgId, ownerId, `${WORDS[i % WORDS.length]} recovery ${i}`, `${PLACES[i % PLACES.length]}, mile ${i % 300}`, i % 5 === 0 ? 'Soft shoulder; bring mats' : null, status, doc, when, when);
    }
  })();
  db.close();
  return file;
}

interface Figure {
  name: string;
  rps: number;
  p95: number;
  non2xx: number;
}

async function cannon(name: string, opts: autocannon.Options): Promise<Figure> {
  const latencies: number[] = [];
  const instance = autocannon({ connections: CONNECTIONS, duration: SECONDS, ...opts });
  instance.on('response', (_client: unknown, _status: number, _bytes: number, ms: number) => latencies.push(ms));
  const res = await instance;
  latencies.sort((a, b) => a - b);
  const p95 = latencies.length ? latencies[Math.min(latencies.length - 1, Math.floor(0.95 * latencies.length))] : NaN;
  return { name, rps: res.requests.average, p95, non2xx: res.non2xx };
}

async function startServer(file: string, port: string): Promise<ChildProcess> {
  const env = { ...process.env, DATABASE_FILE: file, UPLOAD_DIR: path.join(dir, 'uploads'), NEXTAUTH_URL: `http://127.0.0.1:${port}`, NEXTAUTH_SECRET: 'bench-secret-not-for-production' };
  const child = spawn('npx', ['next', 'start', '-H', '127.0.0.1', '-p', port], { env, stdio: 'ignore', detached: true });
  for (let i = 0; i < 240; i++) {
    try {
      if ((await fetch(`http://127.0.0.1:${port}/sign-in`)).ok) return child;
    } catch {
      /* not up yet */
    }
    await new Promise((r) => setTimeout(r, 500));
  }
  throw new Error('server did not start');
}

/** Signs in through next-auth's credentials flow and returns the Cookie header of the session. */
async function signIn(base: string, email: string): Promise<string> {
  const csrfRes = await fetch(`${base}/api/auth/csrf`);
  const jar = new Map<string, string>();
  const keep = (res: Response) => res.headers.getSetCookie().forEach((c) => jar.set(c.split('=')[0], c.split(';')[0]));
  keep(csrfRes);
  const { csrfToken } = (await csrfRes.json()) as { csrfToken: string };
  const res = await fetch(`${base}/api/auth/callback/credentials`, {
    method: 'POST',
    redirect: 'manual',
    headers: { 'content-type': 'application/x-www-form-urlencoded', cookie: [...jar.values()].join('; '), origin: base },
    body: new URLSearchParams({ csrfToken, email, password: DEMO_PASSWORD, json: 'true' }),
  });
  keep(res);
  const cookie = [...jar.values()].join('; ');
  if (!cookie.includes('session-token')) throw new Error(`sign-in failed (${res.status})`);
  return cookie;
}

async function benchOne(count: number) {
  const file = buildDatabase(count);
  const port = execFileSync('node', ['scripts/free-port.mjs']).toString().trim();
  const base = `http://127.0.0.1:${port}`;
  const server = await startServer(file, port);
  try {
    const sup = await signIn(base, 'supervisor@harrow.example');
    const op = await signIn(base, 'operator@harrow.example');
    const db = new SQLite(file, { readonly: true });
    const deep = db.prepare(`select id, updated_at from scenes where organisation_id = (select organisation_id from users where email = 'operator@harrow.example') and deleted_at is null order by updated_at desc, id desc limit 1 offset ?`).get(Math.floor(count * 0.9)) as { id: number; updated_at: string };
    db.close();
    const deepCursor = encodeCursor({ v: deep.updated_at, id: deep.id });
    const example = fs.readFileSync(path.join(root, 'examples', 'lift', 'coil-transfer.json'), 'utf8');
    const big = documentOf(200, 9);

    const auth = (cookie: string) => ({ cookie, origin: base });
    const figures: Figure[] = [];
    figures.push(await cannon('trivial route (/api/health)', { url: `${base}/api/health` }));
    figures.push(await cannon('GET /api/me', { url: `${base}/api/me`, headers: auth(sup) }));
    figures.push(await cannon('list, page 1', { url: `${base}/api/scenes?pageSize=20`, headers: auth(sup) }));
    figures.push(await cannon('list, deep page (90 %)', { url: `${base}/api/scenes?pageSize=20&after=${deepCursor}`, headers: auth(sup) }));
    figures.push(await cannon('search "embankment quarry"', { url: `${base}/api/scenes?pageSize=20&q=embankment%20quarry`, headers: auth(sup) }));
    // The same 200 kB scene on both databases (the small one has no scene that large of its own).
    const created = await fetch(`${base}/api/scenes`, { method: 'POST', headers: { ...auth(op), 'content-type': 'application/json' }, body: JSON.stringify({ title: 'Bench save target', document: big }) });
    const target = (await created.json()) as { id: number; revision: number };
    figures.push(await cannon('GET one scene (200 kB)', { url: `${base}/api/scenes/${target.id}`, headers: auth(sup) }));
    figures.push(await cannon('POST /api/analyze', { url: `${base}/api/analyze`, method: 'POST', headers: { ...auth(sup), 'content-type': 'application/json' }, body: example }));

    // Saves: one connection, each PUT based on the revision the last one answered, so none is stale.
    let revision = target.revision;
    const sizeBefore = fs.statSync(file).size + (fs.existsSync(`${file}-wal`) ? fs.statSync(`${file}-wal`).size : 0);
    const savesBefore = revision;
    figures.push(
      await cannon('save a 200 kB scene (PUT)', {
        url: `${base}/api/scenes/${target.id}`,
        connections: 1,
        headers: { ...auth(op), 'content-type': 'application/json' },
        requests: [
          {
            method: 'PUT',
            setupRequest: (req: Record<string, unknown>) => ({ ...req, body: JSON.stringify({ revision, document: { ...big, grid: 3 + (revision % 7) } }) }),
            onResponse: (status: number, body: string) => {
              if (status === 200) revision = (JSON.parse(body) as { revision: number }).revision;
            },
          },
        ],
      }),
    );
    const saves = revision - savesBefore;
    const check = new SQLite(file);
    check.pragma('wal_checkpoint(TRUNCATE)');
    check.close();
    const sizeAfter = fs.statSync(file).size;
    return { count, figures, growthPer1000: saves > 0 ? ((sizeAfter - sizeBefore) / saves) * 1000 : NaN, saves };
  } finally {
    if (server.pid) process.kill(-server.pid, 'SIGTERM');
  }
}

const small = await benchOne(100);
const large = await benchOne(100_000);
const fmt = (n: number, d = 1) => (Number.isFinite(n) ? n.toFixed(d) : '–');
console.log(`\nServer bench: ${CONNECTIONS} connections, ${SECONDS} s a route, this machine (${(await import('node:os')).cpus().length} cores)\n`);
console.log('route'.padEnd(32), '100 scenes: req/s  p95 ms'.padEnd(28), '100,000 scenes: req/s  p95 ms'.padEnd(32), 'ratio p95');
for (let i = 0; i < small.figures.length; i++) {
  const a = small.figures[i];
  const b = large.figures[i];
  console.log(a.name.padEnd(32), `${fmt(a.rps).padStart(17)} ${fmt(a.p95).padStart(7)}`.padEnd(28), `${fmt(b.rps).padStart(21)} ${fmt(b.p95).padStart(7)}`.padEnd(32), fmt(b.p95 / a.p95, 2), a.non2xx + b.non2xx ? `(${a.non2xx + b.non2xx} non-2xx)` : '');
}
const ceiling = large.figures[0].rps;
console.log(`\nAuthenticated reads against the trivial route (100,000 scenes): ${large.figures.slice(1, 6).map((f) => `${f.name} ${fmt(f.rps / ceiling, 2)}×`).join('; ')}`);
console.log(`Database growth per 1,000 autosaves of a 200 kB scene: ${fmt(large.growthPer1000 / 1e6, 1)} MB (${large.saves} saves measured)`);
process.exit(0);
