import fs from 'node:fs';
import fsp from 'node:fs/promises';
import path from 'node:path';
import { beforeAll, describe, expect, it, vi } from 'vitest';
vi.mock('@/lib/auth/current-user', () => import('@/tests/setup/auth-mock'));
import { signInAs } from '@/tests/setup/auth-mock';
import { demoUser, freshSeededDb } from '@/tests/setup/db';
import { sceneIdByTitle, addAccessFixtures, TITLES } from '@/tests/setup/fixtures';
import { POST } from '@/app/api/scenes/[id]/background/route';
import { GET } from '@/app/api/scenes/[id]/background/[uploadId]/route';
import { putObject, storageRoot, sweepStaleTemps, STALE_TEMP_MS } from '@/lib/storage';
import { makePng } from '@/tests/fixtures/images';

let sceneId: number;
const ctx = (params: Record<string, string>) => ({ params: Promise.resolve(params) });

function upload(bytes: Uint8Array) {
  const form = new FormData();
  form.set('file', new Blob([bytes as BlobPart], { type: 'image/png' }), 'site.png');
  return POST(new Request(`http://t/api/scenes/${sceneId}/background`, { method: 'POST', body: form }), ctx({ id: String(sceneId) }));
}

/** Every file under the storage root, temp files included. */
const filesUnderRoot = () => {
  const root = storageRoot();
  return fs.existsSync(root) ? fs.readdirSync(root, { recursive: true }).map(String).filter((f) => fs.statSync(path.join(root, f)).isFile()) : [];
};

/** A PNG signature and an IHDR claiming width × height, with nothing behind it. */
function pngHeaderClaiming(width: number, height: number): Uint8Array {
  const b = Buffer.alloc(33);
  Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]).copy(b);
  b.writeUInt32BE(13, 8);
  b.write('IHDR', 12, 'ascii');
  b.writeUInt32BE(width, 16);
  b.writeUInt32BE(height, 20);
  b[24] = 8;
  b[25] = 2;
  return b;
}

beforeAll(async () => {
  const db = await freshSeededDb();
  await addAccessFixtures(db);
  sceneId = await sceneIdByTitle(TITLES.ownDraft, db);
});

describe('uploaded images', () => {
  it('a PNG header claiming 2^31 pixels is refused (422, naming the file) and leaves no file, temporary or not', async () => {
    signInAs(await demoUser('operator@harrow.example'));
    const before = filesUnderRoot();
    const res = await upload(pngHeaderClaiming(65_536, 32_768));
    expect(res.status).toBe(422);
    const body = await res.json();
    expect(body.issues[0].path).toBe('file');
    expect(body.error).toMatch(/16,384 px/);
    expect(filesUnderRoot()).toEqual(before);
  });

  it('50 megapixels is the most, even with each side within 16,384 px', async () => {
    signInAs(await demoUser('operator@harrow.example'));
    const res = await upload(pngHeaderClaiming(10_000, 5_001));
    expect(res.status).toBe(422);
    expect((await res.json()).error).toMatch(/megapixels/);
  });

  it('a bare PNG signature with nothing behind it is not an image (415)', async () => {
    signInAs(await demoUser('operator@harrow.example'));
    const res = await upload(new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]));
    expect(res.status).toBe(415);
    expect((await res.json()).issues[0].path).toBe('file');
  });

  it('is served with its true type, as an attachment-safe inline file, sandboxed, never cached', async () => {
    signInAs(await demoUser('operator@harrow.example'));
    const created = await upload(makePng(20, 10));
    expect(created.status).toBe(201);
    const { id } = await created.json();
    const res = await GET(new Request(`http://t/api/scenes/${sceneId}/background/${id}`), ctx({ id: String(sceneId), uploadId: String(id) }));
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toBe('image/png');
    expect(res.headers.get('content-disposition')).toBe(`inline; filename="scene-${sceneId}-background-${id}.png"`);
    expect(res.headers.get('content-security-policy')).toMatch(/(^|; )sandbox($|;)/);
    expect(res.headers.get('content-security-policy')).toContain("default-src 'none'");
    expect(res.headers.get('x-content-type-options')).toBe('nosniff');
    expect(res.headers.get('cache-control')).toBe('no-store');
  });
});

describe('temporary files', () => {
  it('a write that fails half-way removes its temp file', async () => {
    const before = filesUnderRoot();
    // A body that throws while being written: the temp file exists by then and must go again.
    const exploding = new Proxy(new Uint8Array(16), {
      get(target, prop, recv) {
        if (prop === 'byteLength' || prop === 'length' || prop === 'buffer') throw new Error('disk went away');
        return Reflect.get(target, prop, recv);
      },
    });
    await expect(putObject(exploding)).rejects.toThrow();
    expect(filesUnderRoot()).toEqual(before);
  });

  it('stale temp files are swept at start; fresh ones (another process mid-write) stay', async () => {
    const folder = path.join(storageRoot(), 'ab');
    await fsp.mkdir(folder, { recursive: true });
    const stale = path.join(folder, 'abcdef01-0000-4000-8000-000000000000.4242.tmp');
    const fresh = path.join(folder, 'abcdef01-0000-4000-8000-000000000001.4243.tmp');
    await fsp.writeFile(stale, 'half a file');
    await fsp.writeFile(fresh, 'being written');
    const old = new Date(Date.now() - STALE_TEMP_MS - 60_000);
    await fsp.utimes(stale, old, old);
    expect(await sweepStaleTemps()).toBe(1);
    expect(fs.existsSync(stale)).toBe(false);
    expect(fs.existsSync(fresh)).toBe(true);
    await fsp.rm(fresh);
  });
});
