import type { ReactionMaximum } from './bearing';
import type { Check } from './checks';
import type { Clearance } from './clearance';
import type { BoomClearance } from './boom-clearance';
import type { ChartLookup } from './load-chart';
import type { PowerLineClearance } from './power-lines';
import type { SupportReaction } from './reactions';
import type { RiggingVerdict } from './rigging';
import type { TruckSide } from './names';
import type { LineChange, SweepSample } from './sweep';
import type { WeightSensitivity } from './sensitivity';

/** The analysis result. The field names of issue 3's contract are kept; the rest are additions. */
export interface TippingLineResult {
  id: string;
  from: string;
  to: string;
  /** Names of the two pads ("left rear", "right rear") and the side of the truck the line lies on. */
  names: [string, string];
  side: TruckSide;
  /** Perpendicular distance from the slew axis, m (positive: the axis is inside). */
  distanceFromAxis: number;
  /** Perpendicular distance from the combined CG (hook load included) at the worst-case slew, m (positive inside). */
  distanceFromCG: number;
  a: { x: number; y: number };
  b: { x: number; y: number };
}

export interface WorstCase {
  slew: number;
  percentOfTipping: number;
  line: string;
  /** Hook load that would tip the truck about that line at that slew, kg (null when the hook is inside every line). */
  tippingLoad: number | null;
}

export interface UpperWeightResult {
  /** Load mass at the upper end of its uncertainty, kg. */
  loadMass: number;
  hookLoad: number;
  worstCase: WorstCase;
  reactionMaxima: ReactionMaximum[];
}

/** The arc that was analysed, after the swing rule of swing.ts (from and to normalised to [0, 360)). */
export interface AnalysedArc {
  from: number;
  to: number;
  direction: 'ccw' | 'cw';
  /** Degrees swept: 0 for one slew (pick and set the same), 360 for a full turn. */
  span: number;
  fullTurn: boolean;
}

export interface LiftResult {
  arc: AnalysedArc;
  tippingLines: TippingLineResult[];
  worstCase: WorstCase;
  sweep: SweepSample[];
  /** Slews where the governing tipping line changes. */
  lineChanges: LineChange[];
  reactions: { atWorstCase: SupportReaction[]; maxima: ReactionMaximum[]; tipsAtWorstCase: boolean };
  clearances: Clearance[];
  /** The boom (a capsule) against the same parts and obstacles: nearest gap, where on the boom, at which slew. */
  boomClearances: BoomClearance[];
  powerLines: PowerLineClearance[];
  rigging: RiggingVerdict[];
  loadChart: (ChartLookup & { percent: number | null; radius: number; boomLength: number }) | null;
  upperWeight: UpperWeightResult | null;
  /** For each limit, the load mass at which it is reached over the whole swing, and curves over the weight band (sensitivity.ts); null when the caller asked for none. */
  weightSensitivity: WeightSensitivity | null;
  hook: { radius: number; tipHeight: number; loadBottom: number; hookLoad: number };
  checks: Check[];
  /** The standing caution that goes with every result. */
  caution: readonly string[];
}
