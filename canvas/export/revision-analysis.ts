import { analyzeAtSlew, isLiftError, prepareLift, type LiftResult } from '@/lib/lift';
import type { SceneDocument } from '@/lib/scene/schema';
import type { LiveAnalysis } from '../analysis/live-analysis-types';
import { sceneToLiftInput } from '@/lib/scene/to-lift-input';
import type { TruckModel } from '@/lib/scene/truck/truck-model';

/**
 * What the plan drawing needs besides the figures: the prepared lift (geometry) and a snapshot at the
 * worst-case slew, so the governing line is marked where it governs. The figures themselves are `result`,
 * computed elsewhere (the server's analysis of the saved revision, or the editor's own live result).
 */
export function drawingAnalysis(doc: SceneDocument, model: TruckModel, result: LiftResult): LiveAnalysis | null {
  const lift = sceneToLiftInput(doc, model);
  if (!lift.ok) return null;
  try {
    const prepared = prepareLift(lift.input);
    const snapshot = analyzeAtSlew(prepared, result.worstCase.slew);
    return { lift, prepared, result, error: null, snapshot, slew: result.worstCase.slew };
  } catch (e) {
    if (isLiftError(e)) return null;
    throw e;
  }
}
