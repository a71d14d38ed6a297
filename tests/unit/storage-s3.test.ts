import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
// s3rver is a local S3 fake: the SDK speaks the real protocol to it over loopback.
import S3rver from 's3rver';
vi.mock('@/lib/auth/current-user', () => import('@/tests/setup/auth-mock'));
import { signInAs } from '@/tests/setup/auth-mock';
import { demoUser, freshSeededDb } from '@/tests/setup/db';
import { POST } from '@/app/api/scenes/[id]/background/route';
import { GET } from '@/app/api/scenes/[id]/background/[uploadId]/route';
import { deleteObject, getObject, openObjectStream, putObject, storageRoot } from '@/lib/storage';
import { makePng } from '@/tests/fixtures/images';

let server: S3rver;
let dir: string;

beforeAll(async () => {
  dir = fs.mkdtempSync(path.join(os.tmpdir(), 'arcline-s3-'));
  server = new S3rver({ address: '127.0.0.1', port: 0, silent: true, directory: dir, configureBuckets: [{ name: 'arcline-test', configs: [] }] });
  const { port } = await server.run();
  Object.assign(process.env, {
    S3_BUCKET: 'arcline-test',
    S3_ENDPOINT: `http://127.0.0.1:${port}`,
    S3_ACCESS_KEY_ID: 'S3RVER',
    S3_SECRET_ACCESS_KEY: 'S3RVER',
    S3_PREFIX: 'uploads/',
  });
});

afterAll(async () => {
  for (const k of ['S3_BUCKET', 'S3_ENDPOINT', 'S3_ACCESS_KEY_ID', 'S3_SECRET_ACCESS_KEY', 'S3_PREFIX']) delete process.env[k];
  await server.close();
  fs.rmSync(dir, { recursive: true, force: true });
});

/** Every file under a folder, recursively. */
const filesUnder = (root: string) => (fs.existsSync(root) ? fs.readdirSync(root, { recursive: true }).filter((f) => fs.statSync(path.join(root, String(f))).isFile()) : []);

describe('S3 storage driver (against s3rver)', () => {
  it('round-trips bytes, streams them, and deletes, writing nothing to local disk', async () => {
    // 200,000 bytes: large enough that a checksum or chunking mistake would show as a changed length.
    const bytes = new Uint8Array(200_000).map((_, i) => (i * 31) % 251);
    const localBefore = filesUnder(storageRoot()).length;
    const key = await putObject(bytes);
    expect(Buffer.from((await getObject(key))!).equals(Buffer.from(bytes))).toBe(true);
    const opened = (await openObjectStream(key))!;
    expect(opened.bytes).toBe(200_000);
    expect(Buffer.from(await new Response(opened.stream).arrayBuffer()).equals(Buffer.from(bytes))).toBe(true);
    // The fake keeps the object under the configured prefix.
    expect(filesUnder(dir).some((f) => String(f).includes(`uploads/${key}`))).toBe(true);
    expect(filesUnder(storageRoot()).length).toBe(localBefore);
    expect(await deleteObject(key)).toBe(true);
    expect(await getObject(key)).toBeNull();
    expect(await openObjectStream(key)).toBeNull();
    expect(await deleteObject(key)).toBe(false);
  });

  it('serves a site image uploaded through the route from the bucket', async () => {
    const db = await freshSeededDb();
    const sceneId = (await db.selectFrom('scenes').select('id').where('title', '=', 'Coil transfer, Route 9 weigh station').executeTakeFirstOrThrow()).id;
    signInAs(await demoUser('operator@harrow.example'));
    const png = makePng(32, 24, (x, y) => [x * 7, y * 9, 60]);
    const form = new FormData();
    form.set('file', new Blob([png]), 'site.png');
    const ctx = (params: Record<string, string>) => ({ params: Promise.resolve(params) });
    const res = await POST(new Request(`http://t/api/scenes/${sceneId}/background`, { method: 'POST', body: form }), ctx({ id: String(sceneId) }));
    expect(res.status).toBe(201);
    const { id } = await res.json();
    const got = await GET(new Request(`http://t/api/scenes/${sceneId}/background/${id}`), ctx({ id: String(sceneId), uploadId: String(id) }));
    expect(got.status).toBe(200);
    expect(Buffer.from(await got.arrayBuffer()).equals(png)).toBe(true);
  });
});
