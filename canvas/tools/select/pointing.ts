import { DRAG_THRESHOLD_PX, type PointerInfo, type ToolState } from '../tool-state';

/** Pressed on an object: it becomes a drag once the pointer travels, or a click when released. */
export const selectPointing: ToolState = {
  id: 'select.pointing',
  enter(ed, info) {
    ed.memo = info as Record<string, unknown>;
  },
  pointerMove(ed, e) {
    const from = ed.memo.from as PointerInfo;
    if (Math.hypot(e.screen.x - from.screen.x, e.screen.y - from.screen.y) < DRAG_THRESHOLD_PX) return;
    if (ed.state.readOnly) return ed.transition('hand.panning', { from, back: 'select.idle' });
    ed.transition('select.dragging', { from, objectId: ed.memo.objectId });
  },
  pointerUp(ed, e) {
    if (ed.memo.wasSelected && !e.shift) ed.set({ selection: [ed.memo.objectId as string] });
    ed.transition('select.idle');
  },
  cancel(ed) {
    ed.transition('select.idle');
  },
};
