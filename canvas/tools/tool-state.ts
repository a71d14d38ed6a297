import type { Pt } from '../geometry/vec';
import type { Editor } from '../editor/editor';

export interface PointerInfo {
  /** Site frame, m. */
  world: Pt;
  /** Screen pixels inside the canvas. */
  screen: Pt;
  shift: boolean;
  alt: boolean;
  /** Ctrl or Cmd. */
  mod: boolean;
  button: number;
  pointerType: 'mouse' | 'pen' | 'touch';
}

export interface KeyInfo {
  key: string;
  shift: boolean;
  alt: boolean;
  mod: boolean;
}

/**
 * One state of a tool. A tool is a small machine: each state handles the events it cares about and names
 * the next state with editor.transition("tool.state", info).
 */
export interface ToolState {
  id: string;
  enter?(ed: Editor, info?: unknown): void;
  exit?(ed: Editor): void;
  pointerDown?(ed: Editor, e: PointerInfo): void;
  pointerMove?(ed: Editor, e: PointerInfo): void;
  pointerUp?(ed: Editor, e: PointerInfo): void;
  doubleClick?(ed: Editor, e: PointerInfo): void;
  /** Return true when the key was used. */
  keyDown?(ed: Editor, e: KeyInfo): boolean | void;
  keyUp?(ed: Editor, e: KeyInfo): void;
  /** Escape, a second finger landing, or the tool being switched. */
  cancel?(ed: Editor): void;
}

/** Pixels a pointer must travel before a press becomes a drag (finger-friendly). */
export const DRAG_THRESHOLD_PX = 5;
