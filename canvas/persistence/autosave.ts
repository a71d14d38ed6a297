import type { DraftStore } from './draft-store';
import { copyTitle, createScene, getScene, putSceneDocument, type Fetch } from './scene-api';
import type { DocumentSource, NetworkSignal, SaveState } from './types';

/** Edits closer together than this make one save: long enough to span a drag, short enough to feel immediate. */
export const SAVE_DEBOUNCE_MS = 800;
/** The local draft is written sooner, so a reload straight after an edit still finds it. */
export const DRAFT_DEBOUNCE_MS = 150;
/** After a failed request while the browser still claims to be online, retry after this, doubling up to a minute. */
export const RETRY_FIRST_MS = 5000;
const RETRY_MAX_MS = 60_000;

export interface AutosaveOptions<Doc> {
  sceneId: number;
  title: string;
  /** The server copy the editor opened: its revision and, when known, when it was saved (ISO). */
  server: { revision: number; updatedAt?: string };
  source: DocumentSource<Doc>;
  drafts: DraftStore;
  network: NetworkSignal;
  fetch: Fetch;
  debounceMs?: number;
  draftDebounceMs?: number;
  now?: () => number;
}

export interface Autosaver {
  getState(): SaveState;
  subscribe(listener: (s: SaveState) => void): () => void;
  /** Restores a newer local draft if there is one, then starts watching the document. */
  start(): Promise<{ restoredDraft: boolean }>;
  stop(): void;
  /** Saves now instead of waiting for the debounce. */
  flush(): Promise<void>;
  /** Conflict choice 1: drop local changes and load the version on the server. */
  reloadTheirs(): Promise<void>;
  /** Conflict choice 2: save the local document as a new scene; returns its id for navigation. */
  keepMineAsCopy(): Promise<{ id: number }>;
  /** Test hook: the outstanding draft write, if any. */
  idle(): Promise<void>;
}

export function createAutosaver<Doc>(o: AutosaveOptions<Doc>): Autosaver {
  const debounceMs = o.debounceMs ?? SAVE_DEBOUNCE_MS;
  const draftDebounceMs = o.draftDebounceMs ?? DRAFT_DEBOUNCE_MS;
  const now = o.now ?? Date.now;

  let state: SaveState = { status: o.network.isOnline() ? 'saved' : 'offline', revision: o.server.revision, dirty: false, lastSavedAt: null };
  const listeners = new Set<(s: SaveState) => void>();
  let lastSavedDoc: Doc = o.source.getDocument();
  let lastSeenDoc: Doc = lastSavedDoc;
  let saveTimer: ReturnType<typeof setTimeout> | undefined;
  let draftTimer: ReturnType<typeof setTimeout> | undefined;
  let inFlight: Promise<void> | null = null;
  let again = false;
  let stopped = false;
  let retryMs = RETRY_FIRST_MS;
  const unsubs: (() => void)[] = [];
  // Draft writes and clears run one after another, so a late write can never undo a clear.
  let draftChain: Promise<void> = Promise.resolve();
  const queueDraft = (op: () => Promise<void>) => {
    draftChain = draftChain.then(op).catch(() => undefined);
    return draftChain;
  };

  const set = (patch: Partial<SaveState>) => {
    state = { ...state, ...patch };
    if (patch.status && patch.status !== 'error') delete state.message;
    for (const l of listeners) l(state);
  };

  const writeDraftSoon = () => {
    clearTimeout(draftTimer);
    draftTimer = setTimeout(() => {
      const doc = o.source.getDocument();
      if (doc === lastSavedDoc) return;
      const revision = state.revision;
      void queueDraft(() => o.drafts.put({ sceneId: o.sceneId, baseRevision: revision, document: doc, savedAt: now() }));
    }, draftDebounceMs);
  };

  const scheduleSave = (delay = debounceMs) => {
    clearTimeout(saveTimer);
    saveTimer = setTimeout(() => void runSave(), delay);
  };

  const onStoreChange = () => {
    const doc = o.source.getDocument();
    if (doc === lastSeenDoc) return;
    lastSeenDoc = doc;
    const dirty = doc !== lastSavedDoc;
    if (!dirty) return;
    writeDraftSoon();
    if (state.status === 'conflict') return set({ dirty: true });
    if (!o.network.isOnline()) return set({ dirty: true, status: 'offline' });
    set({ dirty: true, status: state.status === 'saving' ? 'saving' : 'pending' });
    scheduleSave();
  };

  async function saveOnce(): Promise<void> {
    const doc = o.source.getDocument();
    if (doc === lastSavedDoc) return set({ status: 'saved', dirty: false });
    set({ status: 'saving' });
    const outcome = await putSceneDocument(o.fetch, o.sceneId, state.revision, doc);
    if (stopped) return;
    if (outcome.kind === 'network') {
      writeDraftSoon();
      // navigator.onLine can stay true through a dead connection; the 'online' event may never come.
      if (o.network.isOnline()) {
        scheduleSave(retryMs);
        retryMs = Math.min(retryMs * 2, RETRY_MAX_MS);
      }
      return set({ status: 'offline' });
    }
    retryMs = RETRY_FIRST_MS;
    if (outcome.kind === 'conflict') {
      // The server may already hold exactly this document: a save sent as the previous page closed can land
      // after this page read the scene. Then there is nothing to choose between; take its revision.
      const theirs = await getScene(o.fetch, o.sceneId).catch(() => null);
      if (stopped) return;
      if (theirs && sameDocument(theirs.document, doc)) return accepted(doc, theirs.revision);
      return set({ status: 'conflict', serverRevision: theirs?.revision ?? outcome.currentRevision ?? undefined });
    }
    if (outcome.kind === 'refused') return set({ status: 'error', message: outcome.message });
    accepted(doc, outcome.revision);
  }

  /** The server holds `doc` at `revision`: saved, unless the user edited on while it was on its way. */
  function accepted(doc: Doc, revision: number) {
    lastSavedDoc = doc;
    if (o.source.getDocument() === doc) {
      clearTimeout(draftTimer);
      void queueDraft(() => o.drafts.clear(o.sceneId));
      set({ status: 'saved', dirty: false, revision, lastSavedAt: now() });
    } else {
      // Edited while the save was on its way: re-key the draft on the new base and save again.
      set({ revision, lastSavedAt: now(), status: 'pending' });
      writeDraftSoon();
      again = true;
    }
  }

  function runSave(): Promise<void> {
    clearTimeout(saveTimer);
    if (stopped || state.status === 'conflict') return Promise.resolve();
    if (inFlight) {
      again = true;
      return inFlight;
    }
    if (!o.network.isOnline()) {
      set({ status: 'offline' });
      return Promise.resolve();
    }
    inFlight = saveOnce().finally(() => {
      inFlight = null;
      if (again && !stopped && state.status !== 'conflict' && state.status !== 'offline') {
        again = false;
        scheduleSave();
      }
      again = false;
    });
    return inFlight;
  }

  return {
    getState: () => state,
    subscribe(listener) {
      listeners.add(listener);
      return () => listeners.delete(listener);
    },
    async start() {
      let restoredDraft = false;
      const draft = await o.drafts.latest(o.sceneId).catch(() => undefined);
      if (draft) {
        // A draft on the same base revision holds edits the server never got. A draft on an older base is
        // still newer work if it was written after the server copy; sending it then surfaces the conflict.
        // Without the server's time, an older-base draft is sent anyway and the conflict choice decides.
        const serverTime = o.server.updatedAt ? Date.parse(o.server.updatedAt) : -Infinity;
        const newer = draft.baseRevision === o.server.revision || (draft.baseRevision < o.server.revision && draft.savedAt > serverTime);
        if (newer && draft.baseRevision <= o.server.revision) {
          o.source.replaceDocument(draft.document as Doc, { revision: draft.baseRevision });
          lastSeenDoc = o.source.getDocument();
          state = { ...state, revision: draft.baseRevision, dirty: true };
          restoredDraft = true;
        } else {
          await o.drafts.clear(o.sceneId);
        }
      }
      unsubs.push(o.source.subscribe(onStoreChange));
      unsubs.push(
        o.network.subscribe((online) => {
          if (online) {
            if (state.dirty && state.status !== 'conflict') void runSave();
            else if (state.status === 'offline') set({ status: 'saved' });
          } else if (state.status !== 'conflict') set({ status: 'offline' });
        }),
      );
      if (restoredDraft) {
        set({ status: o.network.isOnline() ? 'pending' : 'offline' });
        if (o.network.isOnline()) await runSave();
      }
      return { restoredDraft };
    },
    stop() {
      stopped = true;
      clearTimeout(saveTimer);
      clearTimeout(draftTimer);
      unsubs.splice(0).forEach((u) => u());
    },
    flush: () => runSave(),
    async reloadTheirs() {
      const scene = await getScene(o.fetch, o.sceneId);
      o.source.replaceDocument(scene.document as Doc, { revision: scene.revision });
      lastSavedDoc = lastSeenDoc = o.source.getDocument();
      clearTimeout(draftTimer);
      clearTimeout(saveTimer);
      await queueDraft(() => o.drafts.clear(o.sceneId));
      set({ status: 'saved', dirty: false, revision: scene.revision, serverRevision: undefined, lastSavedAt: now() });
    },
    async keepMineAsCopy() {
      const scene = await createScene(o.fetch, copyTitle(o.title), o.source.getDocument());
      clearTimeout(draftTimer);
      clearTimeout(saveTimer);
      await queueDraft(() => o.drafts.clear(o.sceneId));
      return { id: scene.id };
    },
    idle: () => draftChain,
  };
}

/** Key order aside, the same JSON value: what the server stored and what this page would send. */
export function sameDocument(a: unknown, b: unknown): boolean {
  return stableJson(a) === stableJson(b);
}

function stableJson(v: unknown): string {
  if (Array.isArray(v)) return `[${v.map(stableJson).join(',')}]`;
  if (v && typeof v === 'object') {
    const entries = Object.entries(v as Record<string, unknown>).filter(([, x]) => x !== undefined);
    entries.sort(([x], [y]) => (x < y ? -1 : x > y ? 1 : 0));
    return `{${entries.map(([k, x]) => `${JSON.stringify(k)}:${stableJson(x)}`).join(',')}}`;
  }
  return JSON.stringify(v) ?? 'null';
}
