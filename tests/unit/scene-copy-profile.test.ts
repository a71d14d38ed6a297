import { describe, expect, it, vi } from 'vitest';
import { createAutosaver } from '@/canvas/persistence/autosave';
import { memoryDraftStore } from '@/canvas/persistence/draft-store';
import { createScene, truckProfileIdOf } from '@/canvas/persistence/scene-api';
import type { DocumentSource, NetworkSignal } from '@/canvas/persistence/types';

type Doc = { version: 2; objects: { id: string; kind: string; profileId?: number; profileVersion?: number }[] };

const WITH_TRUCK: Doc = { version: 2, objects: [{ id: 'lane', kind: 'obstacle' }, { id: 'truck', kind: 'truck', profileId: 12, profileVersion: 2 }] };
const NO_TRUCK: Doc = { version: 2, objects: [{ id: 'coil', kind: 'load' }] };

/** A fake POST /api/scenes with the server's profile rule: only profiles in `known` are accepted. */
function fakeServer(known: number[]) {
  const posts: { title?: string; document?: unknown; equipmentProfileId?: number }[] = [];
  const fetch = vi.fn(async (url: string, init?: RequestInit) => {
    const body = JSON.parse(String(init!.body));
    posts.push(body);
    if (body.equipmentProfileId !== undefined && !known.includes(body.equipmentProfileId)) {
      return Response.json({ error: 'equipmentProfileId: no such truck profile in your organisation', issues: [{ path: 'equipmentProfileId', message: 'Unknown profile' }] }, { status: 400 });
    }
    return Response.json({ id: 41, title: body.title, revision: 1, updatedAt: '2026-12-02T03:00:00.000Z', document: body.document, equipmentProfileId: body.equipmentProfileId ?? null }, { status: 201 });
  });
  return { fetch, posts };
}

function source(doc: Doc): DocumentSource<Doc> {
  return { getDocument: () => doc, subscribe: () => () => {}, replaceDocument: () => {} };
}
const online: NetworkSignal = { isOnline: () => true, subscribe: () => () => {} };

describe('truckProfileIdOf', () => {
  it('reads the truck object’s profile id, and null without a usable one', () => {
    expect(truckProfileIdOf(WITH_TRUCK)).toBe(12);
    expect(truckProfileIdOf(NO_TRUCK)).toBeNull();
    expect(truckProfileIdOf({ objects: [{ kind: 'truck', profileId: '12' }] })).toBeNull();
    expect(truckProfileIdOf({ objects: [{ kind: 'truck', profileId: 1.5 }] })).toBeNull();
    expect(truckProfileIdOf(null)).toBeNull();
  });
});

describe('"Keep mine as a copy"', () => {
  it('creates the copy with the truck’s profile, like the original', async () => {
    const server = fakeServer([12]);
    const saver = createAutosaver({ sceneId: 5, title: 'Coil transfer', server: { revision: 3 }, source: source(WITH_TRUCK), drafts: memoryDraftStore(), network: online, fetch: server.fetch });
    expect(await saver.keepMineAsCopy()).toEqual({ id: 41 });
    expect(server.posts).toEqual([{ title: 'Coil transfer (my copy)', document: WITH_TRUCK, equipmentProfileId: 12 }]);
  });

  it('a sketch without a truck sends no profile', async () => {
    const server = fakeServer([12]);
    const saver = createAutosaver({ sceneId: 5, title: 'Coil transfer', server: { revision: 3 }, source: source(NO_TRUCK), drafts: memoryDraftStore(), network: online, fetch: server.fetch });
    await saver.keepMineAsCopy();
    expect(server.posts).toEqual([{ title: 'Coil transfer (my copy)', document: NO_TRUCK }]);
  });

  it('when the server refuses the profile (retired since, or not this organisation’s), the copy is still made, without it', async () => {
    const server = fakeServer([]);
    const saver = createAutosaver({ sceneId: 5, title: 'Coil transfer', server: { revision: 3 }, source: source(WITH_TRUCK), drafts: memoryDraftStore(), network: online, fetch: server.fetch });
    expect(await saver.keepMineAsCopy()).toEqual({ id: 41 });
    expect(server.posts.map((p) => p.equipmentProfileId)).toEqual([12, undefined]);
    expect(server.posts[1].document).toEqual(WITH_TRUCK);
  });
});

describe('importing a scene file', () => {
  it('creates the scene with the truck’s profile', async () => {
    const server = fakeServer([12]);
    const scene = await createScene(server.fetch, 'Imported coil transfer', WITH_TRUCK);
    expect(scene.id).toBe(41);
    expect(server.posts).toEqual([{ title: 'Imported coil transfer', document: WITH_TRUCK, equipmentProfileId: 12 }]);
  });

  it('other refusals are not retried', async () => {
    const fetch = vi.fn(async () => Response.json({ error: 'title: Title is required', issues: [{ path: 'title', message: 'Required' }] }, { status: 400 }));
    await expect(createScene(fetch, '', WITH_TRUCK)).rejects.toThrow('title: Title is required');
    expect(fetch).toHaveBeenCalledTimes(1);
  });
});
