import { expect } from 'vitest';
import { createEditorStore, type EditorStoreOptions } from '@/canvas/store/editor-store';
import type { Editor } from '@/canvas/editor/editor';
import { createEditor } from '@/canvas/editor/create-editor';
import { worldToScreen } from '@/canvas/editor/camera';
import type { PointerInfo } from '@/canvas/tools/tool-state';
import type { SceneObject } from '@/lib/scene/objects';
import type { TruckProfileInput } from '@/lib/scene/truck/from-spec';

type Mods = Partial<Pick<PointerInfo, 'shift' | 'alt' | 'mod' | 'pointerType' | 'button'>>;

/** A profile with no geometry, so the editor uses its built-in example outline (invented values). */
export const TEST_PROFILE: TruckProfileInput = { id: 7, version: 3, name: 'Unit 7 (example values)', unitNumber: 'HR-7', spec: {} };

/**
 * Drives the editor the way a person does, through pointer and key events in site metres, with no DOM.
 * Chainable, so tests read like the steps a user takes.
 */
export class TestEditor {
  readonly store;
  readonly editor: Editor;

  constructor(opts: EditorStoreOptions = {}) {
    this.store = createEditorStore({ profiles: [TEST_PROFILE], ...opts });
    this.editor = createEditor(this.store);
    this.store.getState().set({ viewport: { width: 1000, height: 800 }, camera: { x: 0, y: 0, pxPerM: 20 } });
  }

  get state() {
    return this.store.getState();
  }
  get doc() {
    return this.state.document;
  }
  obj(id: string): SceneObject {
    const o = this.doc.objects.find((q) => q.id === id);
    if (!o) throw new Error(`no object ${id}`);
    return o;
  }
  byKind<K extends SceneObject['kind']>(kind: K): Extract<SceneObject, { kind: K }>[] {
    return this.doc.objects.filter((o): o is Extract<SceneObject, { kind: K }> => o.kind === kind);
  }

  private info(x: number, y: number, mods: Mods): PointerInfo {
    const s = this.state;
    return { ...this.editor.pointerInfo(worldToScreen(s.camera, s.viewport, { x, y })), ...mods };
  }
  pointerDown(x: number, y: number, mods: Mods = {}) {
    this.editor.pointerDown(this.info(x, y, mods));
    return this;
  }
  pointerMove(x: number, y: number, mods: Mods = {}) {
    this.editor.pointerMove(this.info(x, y, mods));
    return this;
  }
  pointerUp(x: number, y: number, mods: Mods = {}) {
    this.editor.pointerUp(this.info(x, y, mods));
    return this;
  }
  click(x: number, y: number, mods: Mods = {}) {
    return this.pointerDown(x, y, mods).pointerUp(x, y, mods);
  }
  /** Press, move in `steps` frames, release: the way a hand drags. */
  drag(from: [number, number], to: [number, number], mods: Mods = {}, steps = 10) {
    this.pointerDown(from[0], from[1], mods);
    for (let i = 1; i <= steps; i++) this.pointerMove(from[0] + ((to[0] - from[0]) * i) / steps, from[1] + ((to[1] - from[1]) * i) / steps, mods);
    return this.pointerUp(to[0], to[1], mods);
  }
  /** A drag in screen pixels (for view gestures, where the camera moves under the pointer). */
  dragScreen(from: [number, number], to: [number, number], steps = 10) {
    const at = (i: number) => this.editor.pointerInfo({ x: from[0] + ((to[0] - from[0]) * i) / steps, y: from[1] + ((to[1] - from[1]) * i) / steps });
    this.editor.pointerDown(at(0));
    for (let i = 1; i <= steps; i++) this.editor.pointerMove(at(i));
    this.editor.pointerUp(at(steps));
    return this;
  }
  keyDown(key: string, mods: { shift?: boolean; mod?: boolean; alt?: boolean } = {}) {
    this.editor.keyDown({ key, shift: mods.shift ?? false, mod: mods.mod ?? false, alt: mods.alt ?? false });
    return this;
  }
  tool(t: Parameters<Editor['setTool']>[0]) {
    this.editor.setTool(t);
    return this;
  }
  expectToBeIn(path: string) {
    expect(this.editor.path).toBe(path);
    expect(this.state.toolPath).toBe(path);
    return this;
  }
}
