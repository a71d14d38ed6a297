import type { DocumentSource } from './types';

/** The part of the editor's zustand store (canvas/store) that saving uses. */
export interface EditorStoreLike<Doc> {
  getState(): {
    document: Doc;
    replaceDocument(doc: Doc, opts: { revision: number }): void;
    setRevision(revision: number): void;
  };
  subscribe(listener: () => void): () => void;
}

export function documentSourceFromStore<Doc>(store: EditorStoreLike<Doc>): DocumentSource<Doc> {
  return {
    getDocument: () => store.getState().document,
    subscribe: (listener) => store.subscribe(() => listener()),
    replaceDocument: (doc, opts) => store.getState().replaceDocument(doc, opts),
  };
}
