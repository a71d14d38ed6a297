import type { Capture } from '../../commands/command';
import type { Editor } from '../../editor/editor';
import type { PointerInfo, ToolState } from '../tool-state';

/**
 * The shared end of a one-drag gesture: each move applies as part of the gesture, the release commits it
 * (one undo step) and returns to select.idle, and a cancel puts the document back as it was.
 */
export function gestureHandlers(apply: (ed: Editor, e: PointerInfo, capture: Capture) => void): Pick<ToolState, 'pointerMove' | 'pointerUp' | 'cancel'> {
  return {
    pointerMove(ed, e) {
      apply(ed, e, 'gesture');
    },
    pointerUp(ed, e) {
      apply(ed, e, 'commit');
      ed.transition('select.idle');
    },
    cancel(ed) {
      ed.state.cancelGesture();
      ed.transition('select.idle');
    },
  };
}
