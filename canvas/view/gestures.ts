import type { Editor } from '../editor/editor';
import { clampScale, screenToWorld } from '../editor/camera';

interface Touch {
  x: number;
  y: number;
}

/**
 * Two fingers pan and pinch-zoom the view. Whatever one finger had started is cancelled when the second
 * lands, so a pinch never drags an object.
 */
export class PinchTracker {
  private pointers = new Map<number, Touch>();
  private start: { dist: number; mid: Touch; camera: { x: number; y: number; pxPerM: number }; world: Touch } | null = null;

  /** True from the second finger landing until the last one lifts. */
  blocked = false;

  get active() {
    return this.start !== null;
  }
  get count() {
    return this.pointers.size;
  }

  down(ed: Editor, id: number, p: Touch): boolean {
    this.pointers.set(id, p);
    if (this.pointers.size === 2) {
      ed.cancel();
      this.blocked = true;
      this.begin(ed);
      return true;
    }
    return this.blocked;
  }

  private begin(ed: Editor) {
    const [a, b] = [...this.pointers.values()];
    const mid = { x: (a.x + b.x) / 2, y: (a.y + b.y) / 2 };
    const s = ed.state;
    this.start = { dist: Math.max(1, Math.hypot(a.x - b.x, a.y - b.y)), mid, camera: s.camera, world: screenToWorld(s.camera, s.viewport, mid) };
  }

  move(ed: Editor, id: number, p: Touch): boolean {
    if (!this.pointers.has(id)) return false;
    this.pointers.set(id, p);
    if (!this.start || this.pointers.size < 2) return this.blocked;
    const [a, b] = [...this.pointers.values()];
    const mid = { x: (a.x + b.x) / 2, y: (a.y + b.y) / 2 };
    const pxPerM = clampScale(this.start.camera.pxPerM * (Math.hypot(a.x - b.x, a.y - b.y) / this.start.dist));
    const vp = ed.state.viewport;
    // Keep the world point that was under the fingers' midpoint under it now.
    const x = this.start.world.x - (mid.x - vp.width / 2) / pxPerM;
    const y = this.start.world.y + (mid.y - vp.height / 2) / pxPerM;
    ed.set({ camera: { x, y, pxPerM } });
    return true;
  }

  /** True when the event belonged to a pinch (the editor should not see it). */
  up(id: number): boolean {
    const was = this.blocked;
    this.pointers.delete(id);
    if (this.pointers.size < 2) this.start = null;
    if (this.pointers.size === 0) this.blocked = false;
    return was;
  }

  reset() {
    this.pointers.clear();
    this.start = null;
  }
}
