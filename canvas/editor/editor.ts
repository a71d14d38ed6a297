import type { EditorStore } from '../store/editor-store';
import type { EditorState } from '../store/types';
import type { PlaceKind } from '@/lib/scene/factories';
import type { Command } from '../commands/command';
import type { SceneObject } from '@/lib/scene/objects';
import { objectAt, type GeometryContext } from '@/lib/scene/geometry/footprints';
import { MIN_DRAWN_PX, handleAt, handlesFor, type Handle } from './handles';
import { screenToWorld } from './camera';
import type { Pt } from '@/lib/scene/geometry/vec';

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

/** Keyboard shortcuts the states left unused; true when one ran. */
export type ShortcutRunner = (ed: Editor, e: KeyInfo) => boolean;

/**
 * The editor's event hub: it routes pointer and key events to the current tool state and offers the
 * states what they share (hit-testing, snapping, running commands). The store holds the state path.
 */
export class Editor {
  private states: Map<string, ToolState>;
  private current: ToolState;
  /** Set by states that track a press (pointing, dragging...). */
  memo: Record<string, unknown> = {};
  spaceHeld = false;

  /** The states and shortcuts come in from create-editor.ts, so neither has to import this class's module back. */
  constructor(
    readonly store: EditorStore,
    states: readonly ToolState[],
    private readonly runShortcut: ShortcutRunner,
  ) {
    this.states = new Map(states.map((s) => [s.id, s]));
    this.current = this.states.get(store.getState().toolPath) ?? this.states.get('select.idle')!;
  }

  get state(): EditorState {
    return this.store.getState();
  }

  get path(): string {
    return this.current.id;
  }

  run(command: Command) {
    this.state.run(command);
  }

  set(patch: Parameters<EditorState['set']>[0]) {
    this.state.set(patch);
  }

  transition(id: string, info?: unknown) {
    const next = this.states.get(id);
    if (!next) throw new Error(`Unknown tool state ${id}`);
    this.current.exit?.(this);
    this.current = next;
    this.state.set({ toolPath: id });
    next.enter?.(this, info);
  }

  geometry(): GeometryContext {
    return { truck: this.state.truck, pxPerM: this.state.camera.pxPerM };
  }

  objectAt(p: Pt): SceneObject | null {
    const objects = this.state.document.objects;
    const hit = objectAt(objects, p, this.geometry(), 4 / this.state.camera.pxPerM);
    if (hit) return hit;
    // A small obstacle is drawn at a minimum size (obstacle-shape.tsx) and is pressed where it is drawn.
    const r = MIN_DRAWN_PX / 2 / this.state.camera.pxPerM;
    return [...objects].reverse().find((o) => o.kind === 'obstacle' && o.shape.kind !== 'line' && Math.hypot(o.x - p.x, o.y - p.y) <= r) ?? null;
  }

  handles(): Handle[] {
    const s = this.state;
    return handlesFor(s.document.objects, s.selection, this.geometry(), s.readOnly);
  }

  handleAt(p: Pt): Handle | null {
    return handleAt(this.handles(), p, this.state.camera.pxPerM);
  }

  selected(): SceneObject[] {
    const ids = new Set(this.state.selection);
    return this.state.document.objects.filter((o) => ids.has(o.id));
  }

  snapPoint(p: Pt): Pt {
    const s = this.state;
    if (!s.snapToGrid) return p;
    const g = s.document.grid;
    return { x: Math.round(p.x / g) * g, y: Math.round(p.y / g) * g };
  }

  snapAngle(deg: number, free = false): number {
    const step = this.state.angleStep;
    return free || step <= 0 ? deg : Math.round(deg / step) * step;
  }

  /** Chooses a tool: "select", "hand", "tape" or a place kind. */
  setTool(tool: 'select' | 'hand' | 'tape' | PlaceKind) {
    this.cancel();
    if (tool === 'select') return this.transition('select.idle');
    if (tool === 'hand') return this.transition('hand.idle');
    if (tool === 'tape') return this.transition('tape.idle');
    if (this.state.readOnly) return;
    this.set({ placeKind: tool, draft: [] });
    this.transition(tool === 'obstacle-polygon' ? 'place.polygon' : 'place.idle');
  }

  pointerInfo(screen: Pt, e: Partial<Omit<PointerInfo, 'world' | 'screen'>> = {}): PointerInfo {
    const s = this.state;
    return {
      world: screenToWorld(s.camera, s.viewport, screen),
      screen,
      shift: e.shift ?? false,
      alt: e.alt ?? false,
      mod: e.mod ?? false,
      button: e.button ?? 0,
      pointerType: e.pointerType ?? 'mouse',
    };
  }

  pointerDown(e: PointerInfo) {
    if (this.spaceHeld || e.button === 1) return this.transition('hand.panning', { from: e, back: this.path });
    this.current.pointerDown?.(this, e);
  }
  pointerMove(e: PointerInfo) {
    this.current.pointerMove?.(this, e);
  }
  pointerUp(e: PointerInfo) {
    this.current.pointerUp?.(this, e);
  }
  doubleClick(e: PointerInfo) {
    this.current.doubleClick?.(this, e);
  }
  keyDown(e: KeyInfo) {
    if (e.key === ' ') {
      this.spaceHeld = true;
      return true;
    }
    if (this.current.keyDown?.(this, e)) return true;
    return this.runShortcut(this, e);
  }
  keyUp(e: KeyInfo) {
    if (e.key === ' ') this.spaceHeld = false;
    this.current.keyUp?.(this, e);
  }
  /** Abandons whatever the current state was doing (Escape, a second finger). */
  cancel() {
    this.current.cancel?.(this);
  }
}
