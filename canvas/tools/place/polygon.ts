import { addObjects } from '../../commands/objects';
import type { Editor } from '../../editor/editor';
import { newId } from '@/lib/scene/ids';
import type { ToolState } from '../tool-state';

/** Press near the first corner (this many px) to close the outline. */
const CLOSE_PX = 14;

function finish(ed: Editor) {
  const pts = ed.state.draft;
  ed.set({ draft: [], placeKind: null });
  if (pts.length < 3) return ed.transition('select.idle');
  const cx = pts.reduce((a, p) => a + p.x, 0) / pts.length;
  const cy = pts.reduce((a, p) => a + p.y, 0) / pts.length;
  const id = newId('obstacle');
  ed.run(
    addObjects([
      { id, kind: 'obstacle', obstacleKind: 'structure', x: cx, y: cy, rotation: 0, locked: false, label: '', height: 3, voltageKV: null, shape: { kind: 'polygon', points: pts.map((p) => ({ x: p.x - cx, y: p.y - cy })) } },
    ]),
  );
  ed.set({ selection: [id] });
  ed.transition('select.idle');
}

/** Drawing an obstacle outline corner by corner; Enter, a double press or the first corner closes it. */
export const placePolygon: ToolState = {
  id: 'place.polygon',
  pointerDown(ed, e) {
    const at = e.alt ? e.world : ed.snapPoint(e.world);
    const pts = ed.state.draft;
    const first = pts[0];
    if (first && pts.length >= 3 && Math.hypot(first.x - e.world.x, first.y - e.world.y) * ed.state.camera.pxPerM < CLOSE_PX) return finish(ed);
    ed.set({ draft: [...pts, at] });
  },
  doubleClick(ed) {
    finish(ed);
  },
  keyDown(ed, e) {
    if (e.key === 'Enter') {
      finish(ed);
      return true;
    }
    if (e.key === 'Escape') {
      placePolygon.cancel!(ed);
      return true;
    }
  },
  cancel(ed) {
    ed.set({ draft: [], placeKind: null });
    ed.transition('select.idle');
  },
};
