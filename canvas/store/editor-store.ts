import { createStore, type StoreApi } from 'zustand/vanilla';
import type { SceneDocument } from '@/lib/scene/schema';
import { emptySceneDocument } from '@/lib/scene/empty';
import { truckModelFromProfile, type TruckProfileInput } from '@/lib/scene/truck/from-spec';
import type { TruckModel } from '@/lib/scene/truck/truck-model';
import type { UnitSystem } from '@/lib/units';
import type { EditorState } from './types';

export type EditorStore = StoreApi<EditorState>;

/** Undo keeps this many steps; older ones drop off. */
const HISTORY_LIMIT = 200;
export const BASE_PX_PER_M = 20;
export const MIN_ZOOM = 0.05;
export const MAX_ZOOM = 20;

export interface EditorStoreOptions {
  sceneId?: number | null;
  document?: SceneDocument;
  revision?: number;
  readOnly?: boolean;
  units?: UnitSystem;
  profiles?: TruckProfileInput[];
}

/** The truck model for the document's truck, reusing the previous one when the profile is unchanged. */
export function resolveTruck(doc: SceneDocument, profiles: TruckProfileInput[], prev: TruckModel | null): TruckModel | null {
  const t = doc.objects.find((o) => o.kind === 'truck');
  if (!t || t.kind !== 'truck') return null;
  if (prev && prev.profileId === t.profileId && prev.profileVersion === t.profileVersion) return prev;
  // Exactly the version the plan was made with: another version's figures would silently change the plan.
  const p = profiles.find((q) => q.id === t.profileId && q.version === t.profileVersion);
  return p ? truckModelFromProfile(p) : null;
}

export function createEditorStore(opts: EditorStoreOptions = {}): EditorStore {
  const document = opts.document ?? emptySceneDocument();
  const profiles = opts.profiles ?? [];
  return createStore<EditorState>()((set, get) => {
    /** Applies a new document and keeps the truck model in step. */
    const withDoc = (doc: SceneDocument) => ({ document: doc, truck: resolveTruck(doc, get().profiles, get().truck) });
    return {
      sceneId: opts.sceneId ?? null,
      document,
      revision: opts.revision ?? 0,
      readOnly: opts.readOnly ?? false,
      units: opts.units ?? 'imperial',
      profiles,
      truck: resolveTruck(document, profiles, null),
      selection: [],
      toolPath: 'select.idle',
      placeKind: null,
      draft: [],
      marquee: null,
      camera: { x: 0, y: 0, pxPerM: BASE_PX_PER_M },
      viewport: { width: 1000, height: 700 },
      snapToGrid: true,
      angleStep: 15,
      clipboard: [],
      undoStack: [],
      redoStack: [],
      gestureBase: null,
      helpOpen: false,
      scrubSlew: null,
      analysis: null,

      run(command) {
        const s = get();
        if (s.readOnly) return;
        const { document: next, capture } = command(s.document);
        if (next === s.document && capture !== 'commit') return;
        if (capture === 'none') return set(withDoc(next));
        if (capture === 'gesture') return set({ ...withDoc(next), gestureBase: s.gestureBase ?? s.document });
        const base = s.gestureBase ?? s.document;
        if (next === base) return set({ ...withDoc(next), gestureBase: null });
        set({ ...withDoc(next), gestureBase: null, undoStack: [...s.undoStack, base].slice(-HISTORY_LIMIT), redoStack: [] });
      },
      cancelGesture() {
        const s = get();
        if (s.gestureBase) set({ ...withDoc(s.gestureBase), gestureBase: null });
      },
      undo() {
        const s = get();
        if (s.readOnly || s.undoStack.length === 0) return;
        const prev = s.undoStack[s.undoStack.length - 1];
        const ids = new Set(prev.objects.map((o) => o.id));
        set({ ...withDoc(prev), undoStack: s.undoStack.slice(0, -1), redoStack: [...s.redoStack, s.document], gestureBase: null, selection: s.selection.filter((id) => ids.has(id)) });
      },
      redo() {
        const s = get();
        if (s.readOnly || s.redoStack.length === 0) return;
        const next = s.redoStack[s.redoStack.length - 1];
        const ids = new Set(next.objects.map((o) => o.id));
        set({ ...withDoc(next), redoStack: s.redoStack.slice(0, -1), undoStack: [...s.undoStack, s.document], gestureBase: null, selection: s.selection.filter((id) => ids.has(id)) });
      },
      replaceDocument(doc, { revision, keepHistory }) {
        const ids = new Set(doc.objects.map((o) => o.id));
        set({
          ...withDoc(doc),
          revision,
          gestureBase: null,
          selection: get().selection.filter((id) => ids.has(id)),
          ...(keepHistory ? {} : { undoStack: [], redoStack: [] }),
        });
      },
      setRevision(revision) {
        set({ revision });
      },
      set(patch) {
        set(patch);
      },
    };
  });
}
