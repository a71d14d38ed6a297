import type { EditorStore } from '../store/editor-store';
import type { EditorState, PlaceKind } from '../store/types';
import type { Command } from '../commands/command';
import type { SceneObject } from '../document/objects';
import type { KeyInfo, PointerInfo, ToolState } from '../tools/tool-state';
import { TOOL_STATES } from '../tools/registry';
import { objectAt, type GeometryContext } from '../shapes/geometry';
import { handleAt, handlesFor, type Handle } from './handles';
import { runShortcut } from './shortcuts';
import { screenToWorld } from './camera';
import type { Pt } from '../geometry/vec';

let idCounter = 0;
/** Short unique ids: a time-based prefix keeps pasted copies from colliding across sessions. */
export function newId(kind: string): string {
  idCounter += 1;
  return `${kind}-${Date.now().toString(36).slice(-5)}${idCounter.toString(36)}`;
}

/**
 * The editor's event hub: it routes pointer and key events to the current tool state and offers the
 * states what they share (hit-testing, snapping, running commands). The store holds the state path.
 */
export class Editor {
  private states = new Map<string, ToolState>(TOOL_STATES.map((s) => [s.id, s]));
  private current: ToolState;
  /** Set by states that track a press (pointing, dragging...). */
  memo: Record<string, unknown> = {};
  spaceHeld = false;

  constructor(readonly store: EditorStore) {
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
    return objectAt(this.state.document.objects, p, this.geometry(), 4 / this.state.camera.pxPerM);
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
    return runShortcut(this, e);
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
