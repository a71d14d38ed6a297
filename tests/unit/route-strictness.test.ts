import { afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
vi.mock('@/lib/auth/current-user', () => import('@/tests/setup/auth-mock'));
import * as version from '@/app/api/equipment/[id]/versions/[version]/route';
import * as upload from '@/app/api/scenes/[id]/background/[uploadId]/route';
import * as scene from '@/app/api/scenes/[id]/route';
import * as equipmentOne from '@/app/api/equipment/[id]/route';
import { log } from '@/lib/log';
import { signInAs } from '@/tests/setup/auth-mock';
import { demoUser, freshSeededDb } from '@/tests/setup/db';
import { addAccessFixtures, sceneIdByTitle, TITLES, truckIdByUnit } from '@/tests/setup/fixtures';
import { snapshotDb } from '@/tests/setup/snapshot';
import type { Handler } from '@/tests/setup/route-matrix';
import type { DB } from '@/db';

/** Ids that Number() or z.coerce would take but a path must not carry. */
const LOOSE = ['1e0', ' 1', '1 ', '01', '0x1', '1.0', '+1', '-1', '0', '', '1_0', '９'];

let db: DB;
let truck: string;
let draft: string;
let uploadId: string;

beforeAll(async () => {
  db = await freshSeededDb();
  await addAccessFixtures(db);
  truck = String(await truckIdByUnit('HR-7', db));
  draft = String(await sceneIdByTitle(TITLES.ownDraft, db));
  uploadId = String((await db.selectFrom('scene_uploads').select('id').where('scene_id', '=', Number(draft)).executeTakeFirstOrThrow()).id);
});
afterEach(() => vi.restoreAllMocks());

async function get(handler: Handler, params: Record<string, string>) {
  const res = await handler(new Request('http://arcline.test/api/x'), { params: Promise.resolve(params) });
  return { status: res.status, json: (await res.json()) as { error: string; issues?: { path: string }[] } };
}

describe('two-id paths take plain positive whole numbers only', () => {
  it('the plain ids answer', async () => {
    signInAs(await demoUser('operator@harrow.example'));
    expect((await get(version.GET, { id: truck, version: '1' })).status).toBe(200);
    const img = await upload.GET(new Request('http://arcline.test/api/x'), { params: Promise.resolve({ id: draft, uploadId }) });
    expect(img.status).toBe(200);
  });

  for (const bad of LOOSE) {
    it(`GET /api/equipment/[id]/versions/[version]: "${bad}" is a 400 naming the field`, async () => {
      signInAs(await demoUser('operator@harrow.example'));
      for (const [params, field] of [
        [{ id: truck, version: bad }, 'params.version'],
        [{ id: bad, version: '1' }, 'params.id'],
      ] as const) {
        const res = await get(version.GET, params);
        expect(res.status).toBe(400);
        expect(res.json.issues?.map((i) => i.path)).toEqual([field]);
        expect(res.json.error).toContain(field);
      }
    });

    it(`GET /api/scenes/[id]/background/[uploadId]: "${bad}" is a 400 naming the field`, async () => {
      signInAs(await demoUser('operator@harrow.example'));
      for (const [params, field] of [
        [{ id: draft, uploadId: bad }, 'params.uploadId'],
        [{ id: bad, uploadId }, 'params.id'],
      ] as const) {
        const res = await get(upload.GET, params);
        expect(res.status).toBe(400);
        expect(res.json.issues?.map((i) => i.path)).toEqual([field]);
        expect(res.json.error).toContain(field);
      }
    });
  }
});

/** A request whose body stream fails after its first chunk, as when the client disconnects mid-upload. */
function abortedRequest(method: string, firstChunk: string) {
  let sent = false;
  const body = new ReadableStream<Uint8Array>({
    pull(controller) {
      if (!sent) {
        sent = true;
        controller.enqueue(new TextEncoder().encode(firstChunk));
      } else controller.error(Object.assign(new Error('aborted'), { code: 'ECONNRESET' }));
    },
  });
  return new Request('http://arcline.test/api/x', { method, body, headers: { 'content-type': 'application/json' }, duplex: 'half' } as RequestInit);
}

describe('a body that cannot be read', () => {
  it('PUT /api/scenes/[id] cut off mid-body: 400 naming the body, nothing logged, nothing written', async () => {
    signInAs(await demoUser('operator@harrow.example'));
    const logged = vi.spyOn(log, 'error').mockImplementation(() => {});
    const before = await snapshotDb(db);
    const res = await scene.PUT(abortedRequest('PUT', '{"revision": 1, "document": {"version": 2, "obj'), { params: Promise.resolve({ id: draft }) });
    expect(res.status).toBe(400);
    const json = (await res.json()) as { error: string; issues: { path: string; message: string }[] };
    expect(json.error).toMatch(/^body: could not be read/);
    expect(json.issues).toEqual([{ path: 'body', message: 'Could not be read' }]);
    expect(logged).not.toHaveBeenCalled();
    expect(await snapshotDb(db)).toEqual(before);
  });

  it('the same for an admin’s profile update', async () => {
    signInAs(await demoUser('admin@harrow.example'));
    const logged = vi.spyOn(log, 'error').mockImplementation(() => {});
    const res = await equipmentOne.PUT(abortedRequest('PUT', '{"name": "Unit'), { params: Promise.resolve({ id: truck }) });
    expect(res.status).toBe(400);
    expect(((await res.json()) as { issues: { path: string }[] }).issues[0].path).toBe('body');
    expect(logged).not.toHaveBeenCalled();
  });

  it('a handler that really fails is still logged as a 500 (the wrapper did not swallow everything)', async () => {
    signInAs(await demoUser('operator@harrow.example'));
    const logged = vi.spyOn(log, 'error').mockImplementation(() => {});
    const broken = (await import('@/lib/api/route')).route({}, async () => {
      throw new Error('disk on fire');
    });
    const res = await broken(new Request('http://arcline.test/api/x'));
    expect(res.status).toBe(500);
    expect(logged).toHaveBeenCalledTimes(1);
  });
});
