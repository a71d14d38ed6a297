/**
 * What the saving code needs from the editor's store. The editor's zustand store is adapted to this in
 * one place (store-adapter.ts), so autosave, drafts and conflicts can be tested without React or Konva.
 */
export interface DocumentSource<Doc = unknown> {
  /** The current document. A new object after every edit (the store is immutable), so identity means "unchanged". */
  getDocument(): Doc;
  /** Called after any store change; the saver compares documents itself. Returns an unsubscribe. */
  subscribe(listener: () => void): () => void;
  /** Swaps in a whole document (a restored draft, or the other person's version) at a server revision. */
  replaceDocument(doc: Doc, opts: { revision: number }): void;
}

/** Whether the browser thinks it is online, and news when that changes. */
export interface NetworkSignal {
  isOnline(): boolean;
  subscribe(onChange: (online: boolean) => void): () => void;
}

export type SaveStatus =
  /** Everything is on the server. */
  | 'saved'
  /** Edited; a save is about to go. */
  | 'pending'
  | 'saving'
  /** No connection: the change is kept on this device and sent when the connection returns. */
  | 'offline'
  /** Someone else saved first; the user must choose. */
  | 'conflict'
  /** The server refused the save for another reason. */
  | 'error';

export interface SaveState {
  status: SaveStatus;
  /** The server revision the local document is based on. */
  revision: number;
  /** Unsaved local changes exist (kept in the draft store). */
  dirty: boolean;
  lastSavedAt: number | null;
  /** For 'error': the server's message; for 'conflict': the revision the server is at. */
  message?: string;
  serverRevision?: number;
}

export function networkFromBrowser(): NetworkSignal {
  return {
    isOnline: () => (typeof navigator === 'undefined' ? true : navigator.onLine),
    subscribe(onChange) {
      const on = () => onChange(true);
      const off = () => onChange(false);
      window.addEventListener('online', on);
      window.addEventListener('offline', off);
      return () => {
        window.removeEventListener('online', on);
        window.removeEventListener('offline', off);
      };
    },
  };
}
