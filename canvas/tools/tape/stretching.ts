import type { Capture } from '../../commands/command';
import { updateObject } from '../../commands/objects';
import type { Editor } from '../../editor/editor';
import type { PointerInfo, ToolState } from '../tool-state';

interface Stretch {
  objectId: string;
  end: 'a' | 'b';
  back: string;
  creating?: boolean;
}

function apply(ed: Editor, e: PointerInfo, capture: Capture) {
  const m = ed.memo as unknown as Stretch;
  const at = e.alt ? e.world : ed.snapPoint(e.world);
  ed.run(updateObject(m.objectId, m.end === 'a' ? { x: at.x, y: at.y } : ({ x2: at.x, y2: at.y } as never), capture));
}

/** Moving one end of a tape; a new tape shorter than a few pixels is dropped on release. */
export const tapeStretching: ToolState = {
  id: 'tape.stretching',
  enter(ed, info) {
    ed.memo = info as Record<string, unknown>;
  },
  pointerMove(ed, e) {
    apply(ed, e, 'gesture');
  },
  pointerUp(ed, e) {
    const m = ed.memo as unknown as Stretch;
    apply(ed, e, 'gesture');
    const tape = ed.state.document.objects.find((o) => o.id === m.objectId);
    const tiny = tape?.kind === 'tape' && Math.hypot(tape.x2 - tape.x, tape.y2 - tape.y) * ed.state.camera.pxPerM < 4;
    if (m.creating && tiny) ed.state.cancelGesture();
    else {
      ed.run((doc) => ({ document: doc, capture: 'commit' }));
      if (m.creating) ed.set({ selection: [m.objectId] });
    }
    ed.transition(m.back);
  },
  cancel(ed) {
    ed.state.cancelGesture();
    ed.transition((ed.memo as unknown as Stretch).back);
  },
};
