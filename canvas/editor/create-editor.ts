import type { EditorStore } from '../store/editor-store';
import { TOOL_STATES } from '../tools/registry';
import { Editor } from './editor';
import { runShortcut } from './shortcuts';

/** The editor with every tool state and shortcut wired in: the one place that knows all three. */
export function createEditor(store: EditorStore): Editor {
  return new Editor(store, TOOL_STATES, runShortcut);
}
