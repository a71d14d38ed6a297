import type { Capture } from '../../commands/command';
import { setLegExtension } from '../../commands/truck';
import type { TruckObject } from '@/lib/scene/objects';
import type { Editor } from '../../editor/editor';
import { DEG, rotate } from '@/lib/scene/geometry/vec';
import { maxExtension } from '@/lib/scene/truck/truck-model';
import type { PointerInfo, ToolState } from '../tool-state';
import { gestureHandlers } from './gesture';

/** Within this many metres of a stage mark, the pad settles on the stage. */
const STAGE_SNAP_M = 0.15;

function apply(ed: Editor, e: PointerInfo, capture: Capture) {
  const legId = ed.memo.legId as string;
  const model = ed.state.truck;
  const truck = ed.state.document.objects.find((o): o is TruckObject => o.kind === 'truck');
  const leg = model?.legs.find((l) => l.id === legId);
  if (!truck || !leg) return;
  const local = rotate({ x: e.world.x - truck.x, y: e.world.y - truck.y }, -truck.rotation);
  const along = (local.x - leg.mount.x) * Math.cos(leg.direction * DEG) + (local.y - leg.mount.y) * Math.sin(leg.direction * DEG);
  let ext = Math.max(0, Math.min(maxExtension(leg), along - leg.retracted));
  const stages = [0, maxExtension(leg), ...(leg.intermediate !== null ? [leg.intermediate - leg.retracted] : [])];
  for (const s of stages) if (!e.alt && Math.abs(ext - s) < STAGE_SNAP_M) ext = s;
  ed.run(setLegExtension(legId, Math.round(ext * 1000) / 1000, capture));
}

/** Dragging a pad along its leg to set the extension (a leg may be partly out). */
export const selectExtending: ToolState = {
  id: 'select.extending',
  enter(ed, info) {
    ed.memo = info as Record<string, unknown>;
  },
  ...gestureHandlers(apply),
};
