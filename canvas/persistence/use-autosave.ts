'use client';

import { useEffect, useMemo, useState, useSyncExternalStore } from 'react';
import { createAutosaver, type Autosaver } from './autosave';
import { indexedDbDraftStore, memoryDraftStore } from './draft-store';
import { documentSourceFromStore, type EditorStoreLike } from './store-adapter';
import { networkFromBrowser, type SaveState } from './types';

export interface UseAutosaveOptions {
  sceneId: number;
  title: string;
  server: { revision: number; updatedAt?: string };
  /** Read-only viewers (supervisor, trainer) never save. */
  enabled: boolean;
}

const idleState = (revision: number): SaveState => ({ status: 'saved', revision, dirty: false, lastSavedAt: null });

/** Starts autosave for the editor store on mount and stops it on unmount. */
export function useAutosave<Doc>(store: EditorStoreLike<Doc>, opts: UseAutosaveOptions): { state: SaveState; saver: Autosaver | null } {
  const [saver, setSaver] = useState<Autosaver | null>(null);
  const { sceneId, title, enabled } = opts;
  const { revision, updatedAt } = opts.server;

  useEffect(() => {
    if (!enabled) return;
    const drafts = typeof indexedDB === 'undefined' ? memoryDraftStore() : indexedDbDraftStore();
    const s = createAutosaver<Doc>({
      sceneId,
      title,
      server: { revision, updatedAt },
      source: documentSourceFromStore(store),
      drafts,
      network: networkFromBrowser(),
      fetch: (input, init) => fetch(input, { credentials: 'same-origin', ...init }),
    });
    // Keep the store's revision in step with what the server has accepted.
    const unsync = s.subscribe((st) => {
      if (store.getState().setRevision && st.revision !== undefined) store.getState().setRevision(st.revision);
    });
    // Leaving the tab: save now rather than after the debounce (the draft is there either way).
    const onHide = () => {
      if (document.visibilityState === 'hidden') void s.flush();
    };
    document.addEventListener('visibilitychange', onHide);
    void s.start();
    // The saver is an outside system this effect creates and disposes of; the page reads it from state.
    // eslint-disable-next-line react-hooks/set-state-in-effect -- publishing the effect's own resource, not syncing props
    setSaver(s);
    return () => {
      document.removeEventListener('visibilitychange', onHide);
      unsync();
      s.stop();
      setSaver(null);
    };
  }, [store, sceneId, title, revision, updatedAt, enabled]);

  const idle = useMemo(() => idleState(revision), [revision]);
  const state = useSyncExternalStore(
    (cb) => (saver ? saver.subscribe(cb) : () => undefined),
    () => (saver ? saver.getState() : idle),
    () => idle,
  );
  return { state, saver };
}
