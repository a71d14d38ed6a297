import type { ToolState } from '../tool-state';

/** Nothing in progress: a press picks a handle, an object, or the empty ground. */
export const selectIdle: ToolState = {
  id: 'select.idle',
  pointerDown(ed, e) {
    const h = ed.handleAt(e.world);
    if (h?.kind === 'boom-tip') return ed.transition('select.slewing', { from: e });
    if (h?.kind === 'pad') return ed.transition('select.extending', { legId: h.legId, from: e });
    if (h?.kind === 'rotate') return ed.transition('select.rotating', { objectId: h.objectId, from: e });
    if (h?.kind === 'tape-end') return ed.transition('tape.stretching', { objectId: h.objectId, end: h.end, back: 'select.idle' });
    const hit = ed.objectAt(e.world);
    if (hit) {
      const sel = ed.state.selection;
      const wasSelected = sel.includes(hit.id);
      if (e.shift) ed.set({ selection: wasSelected ? sel.filter((id) => id !== hit.id) : [...sel, hit.id] });
      else if (!wasSelected) ed.set({ selection: [hit.id] });
      return ed.transition('select.pointing', { from: e, objectId: hit.id, wasSelected });
    }
    if (e.shift) return ed.transition('select.brushing', { from: e });
    ed.set({ selection: [] });
    ed.transition('hand.panning', { from: e, back: 'select.idle' });
  },
  keyDown(ed, e) {
    if (e.key === 'Escape' && ed.state.selection.length) {
      ed.set({ selection: [] });
      return true;
    }
  },
};
