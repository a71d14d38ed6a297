import type { ToolState } from '../tool-state';

/** The hand tool: every drag pans. */
export const handIdle: ToolState = {
  id: 'hand.idle',
  pointerDown(ed, e) {
    ed.transition('hand.panning', { from: e, back: 'hand.idle' });
  },
};
