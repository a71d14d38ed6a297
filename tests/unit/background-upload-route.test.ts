import fs from 'node:fs';
import path from 'node:path';
import { beforeAll, describe, expect, it, vi } from 'vitest';
vi.mock('@/lib/auth/current-user', () => import('@/tests/setup/auth-mock'));
import { signInAs } from '@/tests/setup/auth-mock';
import { demoUser, freshSeededDb } from '@/tests/setup/db';
import { POST } from '@/app/api/scenes/[id]/background/route';
import { GET } from '@/app/api/scenes/[id]/background/[uploadId]/route';
import { storageRoot } from '@/lib/storage';
import { storeSceneUpload } from '@/lib/server/store-scene-upload';
import { sniffImage } from '@/lib/image-sniff';
import { getDb } from '@/db';
import { makeGifHeader, makePng } from '@/tests/fixtures/images';

let sceneId: number;
let cobaltSceneId: number;

const ctx = (params: Record<string, string>) => ({ params: Promise.resolve(params) });

function upload(id: number, file: Blob | null, name = 'site.png') {
  const form = new FormData();
  if (file !== null) form.set('file', file, name);
  return POST(new Request(`http://t/api/scenes/${id}/background`, { method: 'POST', body: form }), ctx({ id: String(id) }));
}

function download(id: number, uploadId: number) {
  return GET(new Request(`http://t/api/scenes/${id}/background/${uploadId}`), ctx({ id: String(id), uploadId: String(uploadId) }));
}

/** Rows in scene_uploads and files under the storage root: what a refused upload must leave untouched. */
async function footprint() {
  const rows = await getDb().selectFrom('scene_uploads').select((eb) => eb.fn.countAll<number>().as('n')).executeTakeFirstOrThrow();
  const root = storageRoot();
  const files = fs.existsSync(root) ? fs.readdirSync(root, { recursive: true }).filter((f) => fs.statSync(path.join(root, String(f))).isFile()).length : 0;
  return { rows: Number(rows.n), files };
}

const png = makePng(40, 30, (x, y) => [x * 6, y * 8, 120]);

beforeAll(async () => {
  const db = await freshSeededDb();
  sceneId = (await db.selectFrom('scenes').select('id').where('title', '=', 'Coil transfer, Route 9 weigh station').executeTakeFirstOrThrow()).id;
  cobaltSceneId = (await db.selectFrom('scenes').select('id').where('title', '=', 'Box truck up the embankment, Quarry Road').executeTakeFirstOrThrow()).id;
});

describe('POST /api/scenes/[id]/background', () => {
  it('stores a PNG for the owning operator (201) and records its size', async () => {
    signInAs(await demoUser('operator@harrow.example'));
    const before = await footprint();
    const res = await upload(sceneId, new Blob([png]));
    expect(res.status).toBe(201);
    const body = await res.json();
    expect(body).toMatchObject({ sceneId, mime: 'image/png', bytes: png.length, width: 40, height: 30 });
    expect(body.url).toBe(`/api/scenes/${sceneId}/background/${body.id}`);
    expect(await footprint()).toEqual({ rows: before.rows + 1, files: before.files + 1 });
  });

  it('refuses a supervisor with 403 and changes nothing', async () => {
    signInAs(await demoUser('supervisor@harrow.example'));
    const before = await footprint();
    const res = await upload(sceneId, new Blob([png]));
    expect(res.status).toBe(403);
    expect(await footprint()).toEqual(before);
  });

  it('refuses a plan that is submitted or approved with 409 naming status, and stores nothing', async () => {
    // The demo's frozen plans, each uploaded to by its own owner (who may edit it in every other respect).
    const frozen = await getDb()
      .selectFrom('scenes')
      .innerJoin('users', 'users.id', 'scenes.owner_id')
      .select(['scenes.id', 'scenes.status', 'users.email'])
      .where('scenes.status', 'in', ['submitted', 'approved'])
      .where('scenes.deleted_at', 'is', null)
      .execute();
    expect(new Set(frozen.map((f) => f.status))).toEqual(new Set(['submitted', 'approved']));
    for (const f of frozen) {
      signInAs(await demoUser(f.email as never));
      const before = await footprint();
      const res = await upload(f.id, new Blob([png]));
      expect(res.status, f.status).toBe(409);
      expect((await res.json()).issues).toEqual([{ path: 'status', message: `The plan is ${f.status}` }]);
      expect(await footprint()).toEqual(before);
    }
  });

  it('answers 404 to an operator of another organisation', async () => {
    signInAs(await demoUser('operator@cobalt.example'));
    const before = await footprint();
    expect((await upload(sceneId, new Blob([png]))).status).toBe(404);
    expect(await footprint()).toEqual(before);
  });

  it('answers 413 naming the file field for 11 MB, and stores nothing', async () => {
    signInAs(await demoUser('operator@harrow.example'));
    const before = await footprint();
    const big = new Uint8Array(11 * 1024 * 1024);
    big.set(png.subarray(0, 33)); // a real PNG start, so only the size is wrong
    const res = await upload(sceneId, new Blob([big]));
    expect(res.status).toBe(413);
    const body = await res.json();
    expect(body.error).toContain('file');
    expect(body.issues[0].path).toBe('file');
    expect(await footprint()).toEqual(before);
  });

  it('refuses a text file named .png and a GIF by content (415), and a missing field (400)', async () => {
    signInAs(await demoUser('operator@harrow.example'));
    const before = await footprint();
    const text = await upload(sceneId, new Blob(['just some words'], { type: 'image/png' }), 'photo.png');
    expect(text.status).toBe(415);
    expect((await text.json()).issues[0].path).toBe('file');
    expect((await upload(sceneId, new Blob([makeGifHeader(8, 8)]), 'site.gif')).status).toBe(415);
    const missing = await upload(sceneId, null);
    expect(missing.status).toBe(400);
    expect((await missing.json()).issues[0].path).toBe('file');
    expect(await footprint()).toEqual(before);
  });

  it('removes the written file when the row cannot be inserted', async () => {
    const before = await footprint();
    const owner = await demoUser('operator@harrow.example');
    // Scene 999999 does not exist, so the foreign key refuses the row after the file was written.
    await expect(
      storeSceneUpload(getDb(), { organisationId: owner.organisationId, sceneId: 999999, uploaderId: owner.id, bytes: png, image: sniffImage(png)! }),
    ).rejects.toThrow();
    expect(await footprint()).toEqual(before);
  });
});

describe('GET /api/scenes/[id]/background/[uploadId]', () => {
  let uploadId: number;
  beforeAll(async () => {
    signInAs(await demoUser('operator@harrow.example'));
    uploadId = (await (await upload(sceneId, new Blob([png]))).json()).id;
  });

  it('streams the exact bytes to the owner and to readers in the organisation', async () => {
    for (const email of ['operator@harrow.example', 'supervisor@harrow.example', 'trainer@harrow.example'] as const) {
      signInAs(await demoUser(email));
      const res = await download(sceneId, uploadId);
      expect(res.status).toBe(200);
      expect(res.headers.get('content-type')).toBe('image/png');
      expect(Buffer.from(await res.arrayBuffer()).equals(png)).toBe(true);
    }
  });

  it('answers 404 to another organisation, to a wrong scene id and when signed out 401', async () => {
    signInAs(await demoUser('operator@cobalt.example'));
    expect((await download(sceneId, uploadId)).status).toBe(404);
    expect((await download(cobaltSceneId, uploadId)).status).toBe(404);
    signInAs(await demoUser('operator@harrow.example'));
    expect((await download(sceneId, uploadId + 1000)).status).toBe(404);
    signInAs(null);
    expect((await download(sceneId, uploadId)).status).toBe(401);
  });
});
