import { beforeAll, describe, expect, it, vi } from 'vitest';
vi.mock('@/lib/auth/current-user', () => import('@/tests/setup/auth-mock'));
import * as users from '@/app/api/users/route';
import * as scene from '@/app/api/scenes/[id]/route';
import { signInAs } from '@/tests/setup/auth-mock';
import { demoUser, freshSeededDb } from '@/tests/setup/db';
import { sceneIdByTitle, addAccessFixtures, TITLES } from '@/tests/setup/fixtures';
import { MAX_JSON_BODY } from '@/lib/api/route';
import type { DB } from '@/db';

let db: DB;
let draft: string;
const newAdmin = { name: 'Mallory Outsider', email: 'mallory@elsewhere.example', role: 'admin', password: 'a long enough passphrase 42' };
const userCount = async () => Number((await db.selectFrom('users').select((e) => e.fn.countAll().as('n')).executeTakeFirstOrThrow()).n);

beforeAll(async () => {
  db = await freshSeededDb();
  await addAccessFixtures(db);
  draft = String(await sceneIdByTitle(TITLES.ownDraft, db));
});

function post(headers: Record<string, string>, body: string = JSON.stringify(newAdmin)) {
  return users.POST(new Request('http://arcline.test/api/users', { method: 'POST', headers, body }), { params: Promise.resolve({}) });
}

describe('cross-site requests', () => {
  it("a cross-origin text/plain POST with an admin's session is refused (403) and creates nobody", async () => {
    signInAs(await demoUser('admin@harrow.example'));
    const before = await userCount();
    const res = await post({ origin: 'https://evil.example', 'content-type': 'text/plain' });
    expect(res.status).toBe(403);
    expect((await res.json()).error).toMatch(/Cross-site request refused/);
    expect(await userCount()).toBe(before);
  });

  it('a cross-site request without Origin is judged by Sec-Fetch-Site', async () => {
    signInAs(await demoUser('admin@harrow.example'));
    const before = await userCount();
    for (const site of ['cross-site', 'same-site']) {
      expect((await post({ 'sec-fetch-site': site, 'content-type': 'application/json' })).status).toBe(403);
    }
    expect(await userCount()).toBe(before);
  });

  it('Origin "null" (a sandboxed frame, a data: URL) is not this site', async () => {
    signInAs(await demoUser('admin@harrow.example'));
    expect((await post({ origin: 'null', 'content-type': 'application/json' })).status).toBe(403);
  });

  it('a same-origin JSON body must say application/json: text/plain is 415 and creates nobody', async () => {
    signInAs(await demoUser('admin@harrow.example'));
    const before = await userCount();
    const res = await post({ origin: 'http://arcline.test', 'sec-fetch-site': 'same-origin', 'content-type': 'text/plain' });
    expect(res.status).toBe(415);
    expect((await res.json()).issues[0].path).toBe('body');
    expect(await userCount()).toBe(before);
  });

  it('the same request from our own origin as JSON goes through (201)', async () => {
    signInAs(await demoUser('admin@harrow.example'));
    const res = await post({ origin: 'http://arcline.test', 'sec-fetch-site': 'same-origin', 'content-type': 'application/json; charset=utf-8' });
    expect(res.status).toBe(201);
    expect((await res.json()).email).toBe(newAdmin.email);
  });

  it('reads are not refused for a cross-site Sec-Fetch-Site (a GET changes nothing)', async () => {
    signInAs(await demoUser('admin@harrow.example'));
    const res = await users.GET(new Request('http://arcline.test/api/users', { headers: { 'sec-fetch-site': 'cross-site' } }), { params: Promise.resolve({}) });
    expect(res.status).toBe(200);
  });
});

/** A chunked body (no Content-Length) of `total` bytes, made lazily so only what is read is ever built. */
function endlessBody(total: number): { stream: ReadableStream<Uint8Array>; produced: () => number } {
  const chunk = new Uint8Array(64 * 1024).fill(0x20);
  let produced = 0;
  const stream = new ReadableStream<Uint8Array>({
    pull(ctrl) {
      if (produced >= total) return ctrl.close();
      produced += chunk.byteLength;
      ctrl.enqueue(chunk.slice());
    },
  });
  return { stream, produced: () => produced };
}

describe('body limits while streaming', () => {
  it('a 256 MB chunked body is refused with 413 after about 2 MB are read, and memory grows < 50 MB', async () => {
    signInAs(await demoUser('operator@harrow.example'));
    global.gc?.();
    const before = process.memoryUsage().rss;
    const body = endlessBody(256 * 1024 * 1024);
    const req = new Request(`http://arcline.test/api/scenes/${draft}`, { method: 'PUT', headers: { 'content-type': 'application/json' }, body: body.stream, duplex: 'half' } as RequestInit);
    expect(req.headers.get('content-length')).toBeNull();
    const res = await scene.PUT(req, { params: Promise.resolve({ id: draft }) });
    const grown = (process.memoryUsage().rss - before) / (1024 * 1024);
    expect(res.status).toBe(413);
    expect((await res.json()).issues[0].path).toBe('body');
    // Read no further than the limit plus one chunk (and whatever the stream queued ahead).
    expect(body.produced()).toBeLessThan(MAX_JSON_BODY + 4 * 64 * 1024);
    expect(grown).toBeLessThan(50);
    console.log(`[figure] 256 MB chunked body: ${(body.produced() / 1024 / 1024).toFixed(2)} MB read before 413; RSS grew ${grown.toFixed(1)} MB`);
  });

  it('a declared Content-Length over the limit is 413 before anything is read', async () => {
    signInAs(await demoUser('operator@harrow.example'));
    const body = endlessBody(256 * 1024 * 1024);
    const req = new Request(`http://arcline.test/api/scenes/${draft}`, {
      method: 'PUT',
      headers: { 'content-type': 'application/json', 'content-length': String(256 * 1024 * 1024) },
      body: body.stream,
      duplex: 'half',
    } as RequestInit);
    const res = await scene.PUT(req, { params: Promise.resolve({ id: draft }) });
    expect(res.status).toBe(413);
    expect(body.produced()).toBeLessThanOrEqual(2 * 64 * 1024);
  });
});
