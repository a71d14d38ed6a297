import { LiftError } from './errors';
import { normalizeDegrees } from './types';
import { clearanceAt, type Clearance } from './clearance';
import { boomClearanceAt, boomMeets, type BoomClearance } from './boom-clearance';
import { powerLineAt, type PowerLineClearance } from './power-lines';
import type { PreparedLift } from './prepare';
import { createReactionState, describeReactions, reactionsAt, type SupportReaction } from './reactions';
import { tippingAt } from './tipping';

/**
 * The editor's fast path: everything at one slew angle, from a PreparedLift made once per edit. It is
 * called at 60 frames a second while the user scrubs the slew, so it does no validation or searching.
 */
export interface SlewSnapshot {
  slew: number;
  /** Percent of tipping about each tipping line, in the order of prepared.lines. */
  lines: { id: string; percentOfTipping: number }[];
  /** Governing line and its percent; null when the truck would tip with nothing on the hook. */
  governing: { line: string; percentOfTipping: number } | null;
  /** Id of a line the truck tips about with no load at all, or null. */
  tipsUnloadedAbout: string | null;
  reactions: SupportReaction[];
  /** True when the supports cannot carry the load without one lifting past three (the truck tips). */
  tips: boolean;
  clearances: Clearance[];
  /** The boom against the same parts and obstacles (not the part under the slew axis). */
  boomClearances: BoomClearance[];
  powerLines: PowerLineClearance[];
}

export function analyzeAtSlew(p: PreparedLift, at: number): SlewSnapshot {
  // A NaN slew would make every figure NaN, and every comparison with a limit false: refuse it.
  if (typeof at !== 'number' || !Number.isFinite(at)) {
    throw new LiftError('invalid-input', `The slew must be a finite number of degrees; ${String(at)} is not.`, 'slew');
  }
  const slew = normalizeDegrees(at);
  const perLine = new Float64Array(p.lines.length);
  const hit = tippingAt(p, slew, perLine);
  const state = reactionsAt(p, slew, createReactionState(p.supportX.length));
  const unloaded = hit.unloaded >= 0 ? p.lines[hit.unloaded].id : null;
  return {
    slew,
    lines: p.lines.map((l, i) => ({ id: l.id, percentOfTipping: perLine[i] })),
    governing: unloaded ? null : { line: p.lines[hit.line].id, percentOfTipping: hit.percent },
    tipsUnloadedAbout: unloaded,
    reactions: describeReactions(p, state),
    tips: state.tips,
    clearances: p.targets.map((t) => clearanceAt(p, t, slew)),
    boomClearances: p.targets.filter(boomMeets).map((t) => boomClearanceAt(p, t, slew)),
    powerLines: p.powerLines.map((l) => powerLineAt(p, l, slew)),
  };
}
