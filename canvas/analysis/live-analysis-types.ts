import type { LiftResult, PreparedLift, SlewSnapshot } from '@/lib/lift';
import type { SceneLift } from '@/lib/scene/to-lift-input';

/** The engine's view of the scene: prepared once per edit, a snapshot per slew, the full result when idle. */
export interface LiveAnalysis {
  lift: SceneLift;
  prepared: PreparedLift | null;
  /** analyzeLift over the planned swing; null while a drag is in progress or on an engine error. */
  result: LiftResult | null;
  /** The engine's typed error, in its words. */
  error: { code: string; message: string } | null;
  /** At the slew the view shows. */
  snapshot: SlewSnapshot | null;
  slew: number | null;
}
