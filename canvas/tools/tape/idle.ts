import { newId } from '@/lib/scene/ids';
import type { ToolState } from '../tool-state';

/** The measuring tape: press at one end, drag to the other. */
export const tapeIdle: ToolState = {
  id: 'tape.idle',
  pointerDown(ed, e) {
    if (ed.state.readOnly) return;
    const at = e.alt ? e.world : ed.snapPoint(e.world);
    const id = newId('tape');
    ed.run((doc) => ({
      document: { ...doc, objects: [...doc.objects, { id, kind: 'tape', x: at.x, y: at.y, x2: at.x, y2: at.y, rotation: 0, locked: false, label: '' }] },
      capture: 'gesture',
    }));
    ed.transition('tape.stretching', { objectId: id, end: 'b', back: 'tape.idle', creating: true });
  },
  keyDown(ed, e) {
    if (e.key !== 'Escape') return;
    ed.transition('select.idle');
    return true;
  },
};
