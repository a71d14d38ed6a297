import type { Capture } from '../../commands/command';
import { setSlew } from '../../commands/truck';
import { slewToward } from '../../commands/aim';
import type { TruckObject } from '@/lib/scene/objects';
import type { Editor } from '../../editor/editor';
import type { PointerInfo, ToolState } from '../tool-state';
import { gestureHandlers } from './gesture';

/** Whole degrees while dragging (Shift: tenths), so the readouts settle on round angles. */
function apply(ed: Editor, e: PointerInfo, capture: Capture) {
  const truck = ed.state.document.objects.find((o): o is TruckObject => o.kind === 'truck');
  if (!truck) return;
  const raw = slewToward(truck, e.world);
  const slew = e.shift ? Math.round(raw * 10) / 10 : Math.round(raw) % 360;
  if (ed.state.readOnly) return ed.set({ scrubSlew: slew });
  ed.run(setSlew(slew, capture));
}

/** Dragging the boom tip round: the load turns with it and every readout follows. */
export const selectSlewing: ToolState = {
  id: 'select.slewing',
  ...gestureHandlers(apply),
};
