import type { Capture } from '../../commands/command';
import { rotateObjects } from '../../commands/objects';
import type { SceneDocument } from '@/lib/scene/schema';
import type { Editor } from '../../editor/editor';
import { wrap180 } from '@/lib/angles';
import { bearing } from '@/lib/scene/geometry/vec';
import type { PointerInfo, ToolState } from '../tool-state';
import { gestureHandlers } from './gesture';

interface Turn {
  base: SceneDocument;
  id: string;
  centre: { x: number; y: number };
  startBearing: number;
  startRotation: number;
}

function apply(ed: Editor, e: PointerInfo, capture: Capture) {
  const t = ed.memo as unknown as Turn;
  const target = ed.snapAngle(t.startRotation + wrap180(bearing(t.centre, e.world) - t.startBearing), e.shift);
  ed.run(rotateObjects(t.base, [t.id], t.centre, target - t.startRotation, capture));
}

/** Turning one object about its reference point with the rotate handle; snaps to the angle step (Shift frees it). */
export const selectRotating: ToolState = {
  id: 'select.rotating',
  enter(ed, info) {
    const { objectId, from } = info as { objectId: string; from: PointerInfo };
    const base = ed.state.document;
    const o = base.objects.find((q) => q.id === objectId)!;
    ed.memo = { base, id: objectId, centre: { x: o.x, y: o.y }, startBearing: bearing(o, from.world), startRotation: o.rotation } satisfies Turn;
  },
  ...gestureHandlers(apply),
};
