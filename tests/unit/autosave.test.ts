import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { createAutosaver, RETRY_FIRST_MS, SAVE_DEBOUNCE_MS } from '@/canvas/persistence/autosave';
import { memoryDraftStore } from '@/canvas/persistence/draft-store';
import type { DocumentSource, NetworkSignal } from '@/canvas/persistence/types';

type Doc = { version: 1; notes: string[] };

/** A stand-in for the editor store: immutable documents, change listeners. */
function fakeSource(initial: Doc) {
  let doc = initial;
  const listeners = new Set<() => void>();
  const source: DocumentSource<Doc> & { edit(note: string): void; replaced: number[] } = {
    replaced: [],
    getDocument: () => doc,
    subscribe(l) {
      listeners.add(l);
      return () => listeners.delete(l);
    },
    replaceDocument(d, { revision }) {
      doc = d;
      source.replaced.push(revision);
      listeners.forEach((l) => l());
    },
    edit(note) {
      doc = { ...doc, notes: [...doc.notes, note] };
      listeners.forEach((l) => l());
    },
  };
  return source;
}

function fakeNetwork(online = true) {
  let isOn = online;
  const listeners = new Set<(o: boolean) => void>();
  const net: NetworkSignal & { go(o: boolean): void } = {
    isOnline: () => isOn,
    subscribe(l) {
      listeners.add(l);
      return () => listeners.delete(l);
    },
    go(o) {
      isOn = o;
      listeners.forEach((l) => l(o));
    },
  };
  return net;
}

/** A fake scenes API holding one scene, with the real revision rule: a PUT must carry the current revision. */
/** What the editor sends in a save or a copy (GETs send nothing). */
type SentBody = { revision?: number; title?: string; document?: unknown; equipmentProfileId?: number };

function fakeServer(net: { isOnline(): boolean }) {
  const scene = { id: 5, title: 'Coil transfer', revision: 3, updatedAt: '2026-12-01T20:00:00.000Z', document: { version: 1, notes: [] } as Doc };
  const calls: { method: string; url: string; body: SentBody }[] = [];
  let nextId = 40;
  const fetch = vi.fn(async (url: string, init?: RequestInit) => {
    const method = init?.method ?? 'GET';
    const body = init?.body ? JSON.parse(String(init.body)) : undefined;
    calls.push({ method, url, body: body ?? {} });
    if (!net.isOnline()) throw new TypeError('Failed to fetch');
    if (method === 'PUT') {
      if (body.revision !== scene.revision) return Response.json({ error: 'revision: stale', currentRevision: scene.revision }, { status: 409 });
      scene.revision += 1;
      scene.document = body.document;
      return Response.json(scene);
    }
    if (method === 'POST') return Response.json({ ...scene, id: nextId++, title: body.title, revision: 1, document: body.document }, { status: 201 });
    return Response.json(scene);
  });
  return { scene, calls, fetch, puts: () => calls.filter((c) => c.method === 'PUT') };
}

function setup(opts: { online?: boolean } = {}) {
  const net = fakeNetwork(opts.online ?? true);
  const server = fakeServer(net);
  const source = fakeSource({ version: 1, notes: [] });
  const drafts = memoryDraftStore();
  const saver = createAutosaver({ sceneId: 5, title: 'Coil transfer', server: { revision: 3, updatedAt: server.scene.updatedAt }, source, drafts, network: net, fetch: server.fetch });
  return { net, server, source, drafts, saver };
}

beforeEach(() => {
  vi.useFakeTimers();
  vi.setSystemTime(new Date('2026-12-01T21:00:00.000Z'));
});
afterEach(() => vi.useRealTimers());

describe('autosave', () => {
  it('coalesces a burst of edits into one PUT carrying the base revision', async () => {
    const { server, source, saver } = setup();
    await saver.start();
    source.edit('a');
    await vi.advanceTimersByTimeAsync(300);
    source.edit('b');
    await vi.advanceTimersByTimeAsync(300);
    source.edit('c');
    expect(saver.getState().status).toBe('pending');
    await vi.advanceTimersByTimeAsync(SAVE_DEBOUNCE_MS - 1);
    expect(server.puts()).toHaveLength(0);
    await vi.advanceTimersByTimeAsync(1);
    expect(server.puts()).toHaveLength(1);
    expect(server.puts()[0].body).toEqual({ revision: 3, document: { version: 1, notes: ['a', 'b', 'c'] } });
    expect(saver.getState()).toMatchObject({ status: 'saved', revision: 4, dirty: false });
  });

  it('sends the next save on the revision the last one returned', async () => {
    const { server, source, saver } = setup();
    await saver.start();
    source.edit('a');
    await vi.advanceTimersByTimeAsync(SAVE_DEBOUNCE_MS);
    source.edit('b');
    await vi.advanceTimersByTimeAsync(SAVE_DEBOUNCE_MS);
    expect(server.puts().map((p) => p.body.revision)).toEqual([3, 4]);
    expect(server.scene.revision).toBe(5);
  });

  it('goes to conflict on a 409, stops saving, and keeps the draft', async () => {
    const { server, source, saver, drafts } = setup();
    await saver.start();
    server.scene.revision = 9; // someone else saved in between
    source.edit('mine');
    await vi.advanceTimersByTimeAsync(SAVE_DEBOUNCE_MS);
    expect(saver.getState()).toMatchObject({ status: 'conflict', serverRevision: 9 });
    source.edit('more');
    await vi.advanceTimersByTimeAsync(SAVE_DEBOUNCE_MS * 3);
    expect(server.puts()).toHaveLength(1);
    await saver.idle();
    expect((await drafts.latest(5))?.document).toEqual({ version: 1, notes: ['mine', 'more'] });
  });

  it('a 409 where the server already holds exactly this document is no conflict: it takes the server revision', async () => {
    const { server, source, saver, drafts } = setup();
    await saver.start();
    // The previous page's closing save landed after this page read revision 3, with the same edit.
    server.scene.revision = 4;
    server.scene.document = { notes: ['mine'], version: 1 } as Doc; // other key order, same value
    source.edit('mine');
    await vi.advanceTimersByTimeAsync(SAVE_DEBOUNCE_MS);
    expect(saver.getState()).toMatchObject({ status: 'saved', revision: 4, dirty: false });
    expect(server.puts()).toHaveLength(1);
    await saver.idle();
    expect(await drafts.latest(5)).toBeUndefined();
    // The next edit is sent on revision 4 and saves.
    source.edit('next');
    await vi.advanceTimersByTimeAsync(SAVE_DEBOUNCE_MS);
    expect(server.puts()[1].body.revision).toBe(4);
    expect(saver.getState()).toMatchObject({ status: 'saved', revision: 5 });
  });

  it('a 409 with a different server document is a conflict', async () => {
    const { server, source, saver } = setup();
    await saver.start();
    server.scene.revision = 4;
    server.scene.document = { version: 1, notes: ['theirs'] };
    source.edit('mine');
    await vi.advanceTimersByTimeAsync(SAVE_DEBOUNCE_MS);
    expect(saver.getState()).toMatchObject({ status: 'conflict', serverRevision: 4 });
  });

  it('"reload theirs" replaces the document with the server copy and clears the draft', async () => {
    const { server, source, saver, drafts } = setup();
    await saver.start();
    server.scene.revision = 9;
    server.scene.document = { version: 1, notes: ['theirs'] };
    source.edit('mine');
    await vi.advanceTimersByTimeAsync(SAVE_DEBOUNCE_MS);
    await saver.reloadTheirs();
    expect(source.getDocument()).toEqual({ version: 1, notes: ['theirs'] });
    expect(source.replaced).toEqual([9]);
    expect(saver.getState()).toMatchObject({ status: 'saved', revision: 9, dirty: false });
    expect(drafts.size()).toBe(0);
  });

  it('"keep mine as a copy" posts the local document under "(my copy)" and returns the new id', async () => {
    const { server, source, saver, drafts } = setup();
    await saver.start();
    server.scene.revision = 9;
    source.edit('mine');
    await vi.advanceTimersByTimeAsync(SAVE_DEBOUNCE_MS);
    const { id } = await saver.keepMineAsCopy();
    expect(id).toBe(40);
    const post = server.calls.find((c) => c.method === 'POST')!;
    expect(post.url).toBe('/api/scenes');
    expect(post.body).toEqual({ title: 'Coil transfer (my copy)', document: { version: 1, notes: ['mine'] } });
    expect(drafts.size()).toBe(0);
  });

  it('offline: keeps the draft without sending, then flushes when "online" fires', async () => {
    const { net, server, source, saver, drafts } = setup();
    await saver.start();
    net.go(false);
    expect(saver.getState().status).toBe('offline');
    source.edit('roadside');
    await vi.advanceTimersByTimeAsync(SAVE_DEBOUNCE_MS * 2);
    expect(server.puts()).toHaveLength(0);
    await saver.idle();
    expect(await drafts.latest(5)).toMatchObject({ sceneId: 5, baseRevision: 3, document: { version: 1, notes: ['roadside'] } });
    net.go(true);
    await vi.advanceTimersByTimeAsync(0);
    expect(server.puts()).toHaveLength(1);
    expect(server.scene.document).toEqual({ version: 1, notes: ['roadside'] });
    expect(saver.getState()).toMatchObject({ status: 'saved', dirty: false, revision: 4 });
    await saver.idle();
    expect(drafts.size()).toBe(0);
  });

  it('a dropped connection mid-save (fetch throws) shows offline and keeps the draft for later', async () => {
    const { server, source, saver, drafts } = setup();
    await saver.start();
    server.fetch.mockRejectedValueOnce(new TypeError('Failed to fetch'));
    source.edit('x');
    await vi.advanceTimersByTimeAsync(SAVE_DEBOUNCE_MS + 200);
    expect(saver.getState()).toMatchObject({ status: 'offline', dirty: true });
    await saver.idle();
    expect((await drafts.latest(5))?.document).toEqual({ version: 1, notes: ['x'] });
    // The browser still says online, so no 'online' event will come: it retries by itself.
    expect(server.fetch).toHaveBeenCalledTimes(1);
    await vi.advanceTimersByTimeAsync(RETRY_FIRST_MS);
    expect(server.fetch).toHaveBeenCalledTimes(2);
    expect(server.puts()).toHaveLength(1); // the failed attempt never reached the fake server
    expect(saver.getState()).toMatchObject({ status: 'saved', dirty: false, revision: 4 });
  });

  it('on load, restores a draft on the current revision and sends it', async () => {
    const net = fakeNetwork();
    const server = fakeServer(net);
    const drafts = memoryDraftStore();
    await drafts.put({ sceneId: 5, baseRevision: 3, document: { version: 1, notes: ['before reload'] }, savedAt: Date.now() - 5000 });
    const source = fakeSource({ version: 1, notes: [] });
    const saver = createAutosaver({ sceneId: 5, title: 'Coil transfer', server: { revision: 3, updatedAt: server.scene.updatedAt }, source, drafts, network: net, fetch: server.fetch });
    expect(await saver.start()).toEqual({ restoredDraft: true });
    expect(source.getDocument()).toEqual({ version: 1, notes: ['before reload'] });
    expect(server.puts()[0].body).toEqual({ revision: 3, document: { version: 1, notes: ['before reload'] } });
    expect(saver.getState().status).toBe('saved');
  });

  it('on load, drops a draft older than the server copy', async () => {
    const net = fakeNetwork();
    const server = fakeServer(net);
    const drafts = memoryDraftStore();
    await drafts.put({ sceneId: 5, baseRevision: 2, document: { version: 1, notes: ['stale'] }, savedAt: Date.parse('2026-12-01T19:00:00.000Z') });
    const source = fakeSource({ version: 1, notes: [] });
    const saver = createAutosaver({ sceneId: 5, title: 'Coil transfer', server: { revision: 3, updatedAt: server.scene.updatedAt }, source, drafts, network: net, fetch: server.fetch });
    expect(await saver.start()).toEqual({ restoredDraft: false });
    expect(source.getDocument()).toEqual({ version: 1, notes: [] });
    expect(drafts.size()).toBe(0);
    expect(server.puts()).toHaveLength(0);
  });

  it('shows the server message when a save is refused for another reason', async () => {
    const { server, source, saver } = setup();
    await saver.start();
    server.fetch.mockResolvedValueOnce(Response.json({ error: 'document.truck.x: Expected number' }, { status: 400 }));
    source.edit('bad');
    await vi.advanceTimersByTimeAsync(SAVE_DEBOUNCE_MS);
    expect(saver.getState()).toMatchObject({ status: 'error', message: 'document.truck.x: Expected number' });
  });
});
