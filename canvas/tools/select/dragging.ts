import type { Capture } from '../../commands/command';
import { moveObjects } from '../../commands/objects';
import { aimBoom } from '../../commands/aim';
import type { SceneDocument } from '@/lib/scene/schema';
import type { Editor } from '../../editor/editor';
import type { PointerInfo, ToolState } from '../tool-state';
import { gestureHandlers } from './gesture';

interface Drag {
  base: SceneDocument;
  from: PointerInfo;
  ids: string[];
  anchor: { x: number; y: number };
}

function apply(ed: Editor, e: PointerInfo, capture: Capture) {
  const d = ed.memo as unknown as Drag;
  const raw = { x: d.anchor.x + e.world.x - d.from.world.x, y: d.anchor.y + e.world.y - d.from.world.y };
  const at = e.alt ? raw : ed.snapPoint(raw);
  const dx = at.x - d.anchor.x;
  const dy = at.y - d.anchor.y;
  const model = ed.state.truck;
  ed.run((doc) => {
    const moved = moveObjects(d.base, d.ids, dx, dy, capture)(doc);
    // A moved load keeps the hook over it: the boom follows and the pick angle with it.
    const load = moved.document.objects.find((o) => o.kind === 'load' && d.ids.includes(o.id));
    const truckMoved = moved.document.objects.some((o) => o.kind === 'truck' && d.ids.includes(o.id));
    if (load && model && !truckMoved) return { ...moved, document: aimBoom(moved.document, model, load, 'from') };
    return moved;
  });
}

/** Moving the selection; every frame is live, the release makes one undo step. */
export const selectDragging: ToolState = {
  id: 'select.dragging',
  enter(ed, info) {
    const { from, objectId } = info as { from: PointerInfo; objectId: string };
    const base = ed.state.document;
    const ids = ed.state.selection.filter((id) => !base.objects.find((o) => o.id === id)?.locked);
    const primary = base.objects.find((o) => o.id === objectId) ?? base.objects.find((o) => ids.includes(o.id));
    ed.memo = { base, from, ids, anchor: primary ? { x: primary.x, y: primary.y } : from.world } satisfies Drag;
  },
  ...gestureHandlers(apply),
  keyDown(ed, e) {
    if (e.key !== 'Escape') return;
    selectDragging.cancel!(ed);
    return true;
  },
};
