'use client';
import { createContext, useContext } from 'react';
import { useStore } from 'zustand';
import type { EditorStore } from './store/editor-store';
import type { EditorState } from './store/types';
import type { Editor } from './editor/editor';

export const EditorContext = createContext<{ store: EditorStore; editor: Editor } | null>(null);

export function useEditorContext() {
  const c = useContext(EditorContext);
  if (!c) throw new Error('Editor components need <EditorContext.Provider>');
  return c;
}

/** Subscribes a component to one slice of the editor state. */
export function useEditorState<T>(selector: (s: EditorState) => T): T {
  return useStore(useEditorContext().store, selector);
}
