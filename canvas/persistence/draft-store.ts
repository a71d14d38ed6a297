import { createStore, del, get, keys, set, type UseStore } from 'idb-keyval';

/** An unsaved local copy of a scene document, based on a server revision. */
export interface Draft<Doc = unknown> {
  sceneId: number;
  baseRevision: number;
  document: Doc;
  /** Epoch ms when written (this device's clock). */
  savedAt: number;
}

export interface DraftStore {
  /** Replaces every draft of this scene with this one. */
  put(draft: Draft): Promise<void>;
  /** The newest draft of the scene, if any. */
  latest(sceneId: number): Promise<Draft | undefined>;
  clear(sceneId: number): Promise<void>;
}

/** Drafts are keyed by scene id and base revision: "scene:12:rev:7". */
export const draftKey = (sceneId: number, baseRevision: number) => `scene:${sceneId}:rev:${baseRevision}`;
const prefix = (sceneId: number) => `scene:${sceneId}:rev:`;

interface KeyValue {
  get(key: string): Promise<Draft | undefined>;
  set(key: string, value: Draft): Promise<void>;
  del(key: string): Promise<void>;
  keys(): Promise<string[]>;
}

function draftStoreOver(kv: KeyValue): DraftStore {
  const keysOf = async (sceneId: number) => (await kv.keys()).filter((k) => k.startsWith(prefix(sceneId)));
  return {
    async put(draft) {
      const key = draftKey(draft.sceneId, draft.baseRevision);
      await kv.set(key, draft);
      for (const k of await keysOf(draft.sceneId)) if (k !== key) await kv.del(k);
    },
    async latest(sceneId) {
      let best: Draft | undefined;
      for (const k of await keysOf(sceneId)) {
        const d = await kv.get(k);
        if (d && (!best || d.savedAt > best.savedAt)) best = d;
      }
      return best;
    },
    async clear(sceneId) {
      for (const k of await keysOf(sceneId)) await kv.del(k);
    },
  };
}

let idbStore: UseStore | undefined;

/** Drafts in IndexedDB (database "arcline-drafts"), which survive a reload and a closed tab. */
export function indexedDbDraftStore(): DraftStore {
  idbStore ??= createStore('arcline-drafts', 'drafts');
  const s = idbStore;
  return draftStoreOver({
    get: (k) => get<Draft>(k, s),
    set: (k, v) => set(k, v, s),
    del: (k) => del(k, s),
    keys: async () => (await keys(s)).map(String),
  });
}

/** The same behaviour in memory, for tests and for browsers without IndexedDB. */
export function memoryDraftStore(): DraftStore & { size(): number } {
  const m = new Map<string, Draft>();
  const store = draftStoreOver({
    get: async (k) => structuredClone(m.get(k)),
    set: async (k, v) => void m.set(k, structuredClone(v)),
    del: async (k) => void m.delete(k),
    keys: async () => [...m.keys()],
  });
  return Object.assign(store, { size: () => m.size });
}
