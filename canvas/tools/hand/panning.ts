import { panBy } from '../../editor/camera';
import type { PointerInfo, ToolState } from '../tool-state';

/** Dragging the view (empty ground, the hand tool, space-drag or the middle button); returns to `back`. */
export const handPanning: ToolState = {
  id: 'hand.panning',
  enter(ed, info) {
    const { from, back } = info as { from: PointerInfo; back: string };
    ed.memo = { last: from.screen, back };
  },
  pointerMove(ed, e) {
    const last = ed.memo.last as { x: number; y: number };
    ed.set({ camera: panBy(ed.state.camera, e.screen.x - last.x, e.screen.y - last.y) });
    ed.memo.last = e.screen;
  },
  pointerUp(ed) {
    ed.transition(ed.memo.back as string);
  },
  cancel(ed) {
    ed.transition(ed.memo.back as string);
  },
};
