import { boomClearanceCheck, clearanceCheck, padSubject, powerLineCheck, type PreparedLift, type SlewSnapshot } from '@/lib/lift';

/**
 * What is over the plan's limits at the one slew on screen, by name: the live readout turns red on any of
 * it, inside or outside the planned swing. Each test is the results' own (lib/lift/checks.ts) applied at
 * this slew: tipping against the plan's percent, ground pressure against the allowable, clearances and
 * power-line distances.
 */
export interface OverAtSlew {
  tipping: boolean;
  /** Names of pads whose ground pressure is over the allowable. */
  pads: string[];
  /** Names of parts and obstacles the load or boom comes closer to than the clearance limit. */
  clearances: string[];
  /** Names of power lines closer than their required distance (or with no distance set). */
  powerLines: string[];
}

export function overAtSlew(p: PreparedLift, snap: SlewSnapshot): OverAtSlew {
  const { limits, soil } = p.input;
  const climit = limits.clearance ?? 0.3;
  const unique = (names: string[]) => names.filter((n, i) => names.indexOf(n) === i);
  return {
    tipping: snap.governing === null || snap.governing.percentOfTipping > (limits.percentOfTipping ?? 85),
    pads: snap.reactions.filter((r) => r.inContact && r.groundPressure > soil.allowable).map((r) => padSubject(p, r.support).names[0]),
    clearances: unique([
      ...snap.clearances.filter((c) => clearanceCheck(c, climit).status === 'beyond').map((c) => c.name),
      ...snap.boomClearances.filter((c) => boomClearanceCheck(c, climit).status === 'beyond').map((c) => c.name),
    ]),
    powerLines: snap.powerLines.filter((l) => powerLineCheck(l).status === 'beyond').map((l) => l.name),
  };
}

/** "ground under the left front pad, clearance to the shed": what is over, in words; empty when nothing is. */
export function overWords(o: OverAtSlew): string[] {
  return [
    ...o.pads.map((n) => `ground under the ${n} pad`),
    ...o.clearances.map((n) => `clearance to ${n}`),
    ...o.powerLines.map((n) => `distance to the power line ${n}`),
  ];
}
