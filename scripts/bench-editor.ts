/**
 * Editor frame-time bench (not a test): serves the built app on a free port against a fresh demo
 * database, opens a scene with 300 obstacles in Chromium, scrubs the slew through 360° one degree per
 * frame and measures frame intervals with requestAnimationFrame in the page. Prints the median and the
 * 95th percentile, and the compressed JS bytes the editor page loads. Needs `next build` first.
 */
import { spawn, execFileSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { chromium } from 'playwright-core';
import { DEMO_SCENES } from '@/db/seed/demo-scenes';

const root = process.cwd();
if (!fs.existsSync(path.join(root, '.next', 'BUILD_ID'))) {
  console.error('No build found: run `npx next build` first.');
  process.exit(1);
}
const port = execFileSync('node', ['scripts/free-port.mjs']).toString().trim();
const dir = path.join(root, 'data', 'bench');
fs.rmSync(dir, { recursive: true, force: true });
fs.mkdirSync(dir, { recursive: true });
const env = { ...process.env, DATABASE_FILE: path.join(dir, 'bench.db'), UPLOAD_DIR: path.join(dir, 'uploads'), NEXTAUTH_URL: `http://127.0.0.1:${port}`, NEXTAUTH_SECRET: 'bench-secret-not-for-production' };
execFileSync('npx', ['tsx', 'db/seed.ts'], { env, stdio: 'ignore' });
const server = spawn('npx', ['next', 'start', '-H', '127.0.0.1', '-p', port], { env, stdio: 'ignore', detached: true });
const base = `http://127.0.0.1:${port}`;

async function waitForServer() {
  for (let i = 0; i < 120; i++) {
    try {
      if ((await fetch(`${base}/sign-in`)).ok) return;
    } catch {
      /* not up yet */
    }
    await new Promise((r) => setTimeout(r, 500));
  }
  throw new Error('server did not start');
}

/** 300 obstacles of mixed kinds scattered round the scene, outside the truck's own footprint. */
function benchDocument(profileId: number, version: number) {
  const doc = structuredClone(DEMO_SCENES[0].document) as { objects: Record<string, unknown>[] };
  doc.objects = doc.objects.map((o) => (o.kind === 'truck' ? { ...o, profileId, profileVersion: version } : o));
  let seed = 7;
  const rand = () => ((seed = (seed * 16807) % 2147483647) / 2147483647);
  for (let i = 0; i < 300; i++) {
    const a = rand() * 2 * Math.PI;
    const r = 14 + rand() * 60;
    const round = i % 3 === 0;
    doc.objects.push({
      id: `bench-${i}`,
      kind: 'obstacle',
      obstacleKind: round ? 'tree' : 'structure',
      x: r * Math.cos(a),
      y: r * Math.sin(a),
      rotation: rand() * 90,
      locked: false,
      label: '',
      shape: round ? { kind: 'circle', diameter: 1 + rand() * 4 } : { kind: 'rect', length: 1 + rand() * 6, width: 1 + rand() * 4 },
      height: 2 + rand() * 8,
      voltageKV: null,
    });
  }
  return doc;
}

const pct = (xs: number[], p: number) => [...xs].sort((a, b) => a - b)[Math.min(xs.length - 1, Math.floor((p / 100) * xs.length))];

try {
  await waitForServer();
  const browser = await chromium.launch({ executablePath: '/usr/bin/chromium', args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'] });
  const page = await browser.newPage({ viewport: { width: 1366, height: 900 } });
  await page.goto(`${base}/sign-in`);
  await page.getByLabel('E-mail').fill('operator@harrow.example');
  await page.getByLabel('Password').fill('arcline-demo-2026');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL(/\/scenes$/);
  const trucks = (await (await page.request.get(`${base}/api/equipment`)).json()) as { items?: { id: number; unitNumber: string; version: number }[] } | { id: number; unitNumber: string; version: number }[];
  const list = Array.isArray(trucks) ? trucks : (trucks.items ?? []);
  const hr7 = list.find((t) => t.unitNumber === 'HR-7')!;
  const created = await page.request.post(`${base}/api/scenes`, { data: { title: 'Bench: 300 obstacles', document: benchDocument(hr7.id, hr7.version), equipmentProfileId: hr7.id } });
  if (created.status() !== 201) throw new Error(`create failed: ${created.status()} ${await created.text()}`);
  const id = (await created.json()).id as number;

  let jsBytes = 0;
  page.on('requestfinished', async (req) => {
    if (req.resourceType() !== 'script') return;
    const sizes = await req.sizes();
    jsBytes += sizes.responseBodySize + sizes.responseHeadersSize;
  });
  await page.goto(`${base}/scenes/${id}`, { waitUntil: 'networkidle' });
  await page.waitForFunction('!!window.__arclineEditor?.store.getState().analysis?.result', null, { timeout: 60_000 });

  // Baseline: the same page with nothing changing, so the machine's own frame pacing is visible.
  const idle = (await page.evaluate(`new Promise((resolve) => {
    const t = []; let last = performance.now(); let n = 0;
    const f = (now) => { t.push(now - last); last = now; if (n++ >= 120) return resolve(t.slice(1)); requestAnimationFrame(f); };
    requestAnimationFrame(f);
  })`)) as number[];
  // A string, not a function: tsx would wrap a function with helpers that do not exist in the page.
  const frames = (await page.evaluate(`new Promise((resolve) => {
    const store = window.__arclineEditor.store;
    const truck = store.getState().document.objects.find((o) => o.kind === 'truck');
    const start = truck.boom.slew;
    const times = [];
    const work = [];
    let i = 0;
    let last = performance.now();
    const frame = (now) => {
      times.push(now - last);
      last = now;
      if (i++ >= 360) return resolve({ frames: times.slice(1), work });
      const slew = (start + i) % 360;
      const t0 = performance.now();
      store.getState().run((doc) => ({ document: { ...doc, objects: doc.objects.map((o) => (o.kind === 'truck' ? { ...o, boom: { ...o.boom, slew } } : o)) }, capture: 'gesture' }));
      work.push(performance.now() - t0);
      requestAnimationFrame(frame);
    };
    requestAnimationFrame(frame);
  })`)) as { frames: number[]; work: number[] };
  const median = pct(frames.frames, 50);
  const p95 = pct(frames.frames, 95);
  console.log(`Editor slew scrub, 300 obstacles, ${frames.frames.length} frames (1° per frame through 360°):`);
  console.log(`  frame time median ${median.toFixed(2)} ms, p95 ${p95.toFixed(2)} ms (target p95 < 16.7 ms) ${p95 < 16.7 ? 'within target' : 'OVER target'}`);
  console.log(`  idle page (nothing changing), same machine: median ${pct(idle, 50).toFixed(2)} ms, p95 ${pct(idle, 95).toFixed(2)} ms`);
  console.log(`  script work per frame (store update + React render, synchronous): median ${pct(frames.work, 50).toFixed(2)} ms, p95 ${pct(frames.work, 95).toFixed(2)} ms`);
  console.log(`  JS loaded by the editor page, compressed on the wire: ${(jsBytes / 1024).toFixed(1)} KiB (${jsBytes} bytes)`);
  await browser.close();
} finally {
  if (server.pid) process.kill(-server.pid, 'SIGTERM');
}
