import { objectBounds } from '@/lib/scene/geometry/footprints';
import type { PointerInfo, ToolState } from '../tool-state';

/** Shift-drag on empty ground draws a box; objects wholly inside it join the selection. */
export const selectBrushing: ToolState = {
  id: 'select.brushing',
  enter(ed, info) {
    const { from } = info as { from: PointerInfo };
    ed.memo = { from, before: ed.state.selection };
    ed.set({ marquee: { x0: from.world.x, y0: from.world.y, x1: from.world.x, y1: from.world.y } });
  },
  pointerMove(ed, e) {
    const m = ed.state.marquee!;
    const box = { minX: Math.min(m.x0, e.world.x), maxX: Math.max(m.x0, e.world.x), minY: Math.min(m.y0, e.world.y), maxY: Math.max(m.y0, e.world.y) };
    const ctx = ed.geometry();
    const inside = ed.state.document.objects
      .filter((o) => {
        const b = objectBounds(o, ctx);
        return b && b.minX >= box.minX && b.maxX <= box.maxX && b.minY >= box.minY && b.maxY <= box.maxY;
      })
      .map((o) => o.id);
    const before = ed.memo.before as string[];
    ed.set({ marquee: { ...m, x1: e.world.x, y1: e.world.y }, selection: [...new Set([...before, ...inside])] });
  },
  pointerUp(ed) {
    ed.set({ marquee: null });
    ed.transition('select.idle');
  },
  cancel(ed) {
    ed.set({ marquee: null, selection: ed.memo.before as string[] });
    ed.transition('select.idle');
  },
};
