import { assertStandsUnloaded, percentOfRated, sweepTipping, type PreparedLift } from '@/lib/lift';
import { atReach, envelopeLift, reachFor } from './at-radius';
import type { EnvelopeGrid } from './grid';

/**
 * Whether the load can be held at one point (truck frame), and why not. The grid decides where the four
 * nodes round the point agree: along each direction the running maximum only grows away from the pick,
 * and at one slew the percent of tipping only grows with the radius (a longer lever, the boom's CG further
 * out), so four nodes inside (or outside) the limit hold the whole cell inside (or outside) it. Where
 * they disagree the point lies in the boundary band, and the engine's own sweep decides it there. Load
 * chart use is looked up at the point's own radius.
 */
export type Governs = 'tipping' | 'chart' | 'reach';

export interface Hold {
  inside: boolean;
  /** False when the boom cannot put the hook there at its planned length. */
  reachable: boolean;
  /** Which way from the pick keeps it within the limits (ccw preferred), or null. */
  direction: 'ccw' | 'cw' | null;
  /** Worst percent of tipping on the better way there. */
  tipping: number;
  /** Percent of the load chart's rating at that radius; null without a chart. */
  chart: number | null;
  /** Largest share of a limit used (≤ 1 inside): tipping ÷ its limit or chart use ÷ its limit. */
  share: number;
  governs: Governs;
  /** True when the engine's sweep decided the point (boundary band); false when the grid did. */
  exact: boolean;
  /** The boom's slew and reach that put the hook there (NaN when unreachable). */
  slew: number;
  reach: number;
}

const UNREACHABLE: Hold = { inside: false, reachable: false, direction: null, tipping: NaN, chart: null, share: Infinity, governs: 'reach', exact: true, slew: NaN, reach: NaN };
const wrap = (d: number) => ((d % 360) + 360) % 360;

/** Worst percent of tipping slewing from the pick to `slew` at this reach, as analyzeLift computes it. */
export function tippingOnTheWay(p: PreparedLift, reach: number, slew: number, sign: 1 | -1): number {
  const pr = atReach(envelopeLift(p), reach);
  const arc = { ...pr, span: wrap(sign * (slew - pr.from)), sign };
  try {
    assertStandsUnloaded(arc);
  } catch {
    return Infinity;
  }
  return sweepTipping(arc, 1).worst.percentOfTipping;
}

export function holdAt(g: EnvelopeGrid, prepared: PreparedLift, x: number, y: number): Hold {
  const r = Math.hypot(x, y);
  const reach = reachFor(prepared, r);
  if (reach === null || r < g.radii[0] || r > g.radii[g.nR - 1]) return UNREACHABLE;
  const p = envelopeLift(prepared);
  const hookX = p.pivotX0 + reach;
  const slew = wrap(((Math.atan2(y, x) - Math.atan2(p.pivotY0, hookX)) * 180) / Math.PI);
  const dr = (g.radii[g.nR - 1] - g.radii[0]) / (g.nR - 1);
  const j = Math.min(g.nR - 2, Math.max(0, Math.floor((r - g.radii[0]) / dr)));
  const k = Math.floor(slew / g.step) % g.nS;
  const k1 = (k + 1) % g.nS;
  const nodes = [j * g.nS + k, j * g.nS + k1, (j + 1) * g.nS + k, (j + 1) * g.nS + k1];
  let exact = false;
  const way = (vals: Float64Array, sign: 1 | -1) => {
    const lo = Math.min(...nodes.map((n) => vals[n]));
    const hi = Math.max(...nodes.map((n) => vals[n]));
    if (hi <= g.limits.tipping || lo > g.limits.tipping) return vals[nodes[0]] + (r - g.radii[j]) / dr * (vals[nodes[2]] - vals[nodes[0]]);
    exact = true;
    return tippingOnTheWay(prepared, reach, slew, sign);
  };
  const ccw = way(g.ccw, 1);
  const cw = way(g.cw, -1);
  const tipping = Math.min(ccw, cw);
  const chart = p.input.loadChart ? (percentOfRated(p.input.loadChart, Math.hypot(hookX, p.pivotY0), p.input.boom.length, p.hookLoad).percent ?? Infinity) : null;
  const tShare = tipping / g.limits.tipping;
  const cShare = chart === null ? 0 : chart / g.limits.chart;
  const inside = tipping <= g.limits.tipping && (chart === null || chart <= g.limits.chart);
  return {
    inside, reachable: true,
    direction: ccw <= g.limits.tipping ? 'ccw' : cw <= g.limits.tipping ? 'cw' : null,
    tipping, chart, share: Math.max(tShare, cShare), governs: cShare > tShare ? 'chart' : 'tipping', exact, slew, reach,
  };
}
