import { reactionMaxima, type ReactionMaximum } from './bearing';
import { percentOfRated } from './load-chart';
import { withLoadMass, type PreparedLift } from './prepare';
import { riggingVerdicts } from './rigging';
import { RANGE } from './schema';
import { sweepTipping } from './sweep';
import { weightBandOf, type WeightBand } from './weight-band';
import { bracketedRoot } from './root';

/**
 * Weight sensitivity: for each of the plan's limits, the load mass at which it is reached over the whole
 * swing, and curves of the figures over the load's weight band.
 *
 * - Tipping: at every slew the percent of tipping is hook load × lever ÷ stabilising moment (tipping.ts),
 *   and neither lever nor moment depends on the hook load. So the worst percent over the swing is exactly
 *   proportional to the hook load, at the same slew and line: the hook load at a limit L is H·L ÷ worst %.
 * - Load chart: percent = hook load ÷ rating, the rating fixed by radius and boom: exact as well.
 * - Rigging: each demand is affine in the load mass (slings, shackles, hooks on the load; blocks and winch
 *   on the hook load; a given line pull is constant): solved from two evaluations.
 * - Pad pressure: at one slew a reaction is continuous and piecewise affine in the load mass (the contact
 *   set changes where a pad releases), and its maximum over the swing is the engine's own sampled and
 *   refined maximum. It is scanned on a grid of load masses up to the mass that tips the truck, and the
 *   first crossing is closed in on the engine's own figure by bracketedRoot to within BEARING_TOL kg.
 *   A crossing and uncrossing both inside one grid cell would be missed; the pressures seen are monotone
 *   over the band in every scene tried (tests/lift/sensitivity.test.ts checks the bracket both ways).
 */
export type WeightLimitKind = 'tipping-limit' | 'tipping' | 'load-chart' | 'bearing' | 'rigging';

export interface WeightLimit {
  kind: WeightLimitKind;
  /** Id of the check it belongs to: "stability", "load-chart", "bearing:FL", "rigging:sling:S1". */
  check: string;
  /** What reaches it: the tipping line's code, the pad's or the rigging item's id, "load-chart". */
  subject: string;
  /** Its name for people ("left rear", a rigging tag); a tipping line's code; "load chart". */
  name: string;
  quantity: 'percent' | 'pressure' | 'mass';
  /** The limit in SI: percent, kPa, kg. */
  limit: number;
  /**
   * Load mass (without block and rigging), kg, at which the figure reaches the limit: for a figure within it at
   * the planned weight, the first such mass above it; for one already over, the mass below it where it was
   * reached (0 when over with nothing on the hook). Null when no load mass reaches it (`never` says why).
   */
  loadMass: number | null;
  /** loadMass as a change from the plan's load mass, percent (+18 = 18 % heavier); null without a loadMass or for a plan load under 1 g. */
  change: number | null;
  /** Slew where it is reached, degrees; null where the figure does not turn with the slew. */
  slew: number | null;
  /** 'proportional' or 'affine': solved exactly; 'bracketed': a root of the engine's own figure, within `tolerance` kg. */
  method: 'proportional' | 'affine' | 'bracketed';
  tolerance: number;
  never: 'no-lever' | 'no-rating' | 'refused' | 'constant' | 'tips-first' | 'beyond-search' | null;
  /**
   * Pads only: a figure within its limit at the planned weight that a lighter load would take over it (a pad
   * on the far side carries more when less hangs on the hook): the load mass below which that happens.
   */
  lighter?: { loadMass: number; change: number | null };
}

export interface WeightCurvePoint {
  /** Percent change from the plan's load mass. */
  change: number;
  loadMass: number;
  percentOfTipping: number;
  loadChartPercent: number | null;
  /** Highest ground pressure of any pad over the swing, kPa, and that pad's id. */
  padPressure: number;
  pad: string;
}

export interface WeightSensitivity {
  /** The plan's load mass, kg. */
  loadMass: number;
  band: WeightBand;
  limits: WeightLimit[];
  /** The plan's limit reached first as the load gets heavier (tipping at the plan's limit, chart, pads, rigging; not tipping at 100 %). */
  first: WeightLimit | null;
  curve: WeightCurvePoint[];
}

/** Bearing crossings are closed in to 10 g: far inside any weight a crew can know. */
export const BEARING_TOL = 0.01;
/** Grid of the bearing scan and points of the curve. */
const SCAN_POINTS = 16;
const CURVE_POINTS = 15;

/** Under a gram of load there is no band and no percent change to speak of (and a ratio could overflow). */
const MIN_LOAD = 1e-3;
const changeOf = (m: number | null, m0: number) => (m === null || !(m0 >= MIN_LOAD) ? null : (100 * (m - m0)) / m0);

/** `sweep` is the analysis's own tipping sweep of `p`, reused when the hook carries something. */
export function weightSensitivity(p: PreparedLift, step: number, sweep?: ReturnType<typeof sweepTipping>): WeightSensitivity {
  const m0 = p.input.load.mass;
  const extra = p.hookLoad - m0;
  const toLoad = (hook: number) => Math.max(0, hook - extra);
  const limits: WeightLimit[] = [];
  const base = (kind: WeightLimitKind, check: string, subject: string, name: string, quantity: WeightLimit['quantity'], limit: number) =>
    ({ kind, check, subject, name, quantity, limit, slew: null, method: 'proportional' as const, tolerance: 0, never: null });

  // Tipping: percent per kg of hook load, from the engine's own sweep (a probe load when the hook is empty).
  const probe = p.hookLoad > 0 ? p : withLoadMass(p, 1000);
  const worst = (sweep && probe === p ? sweep : sweepTipping(probe, step)).worst;
  const perKg = worst.percentOfTipping / probe.hookLoad;
  const line = p.lines[worst.line].id;
  for (const [kind, limit] of [['tipping-limit', p.input.limits.percentOfTipping], ['tipping', 100]] as const) {
    const m = perKg > 0 ? toLoad(limit / perKg) : null;
    limits.push({ ...base(kind, 'stability', line, line, 'percent', limit), loadMass: m, change: changeOf(m, m0), slew: worst.slew, never: m === null ? 'no-lever' : null });
  }
  const tipMass = perKg > 0 ? toLoad(100 / perKg) : null;

  const chart = p.input.loadChart;
  const rated = chart ? percentOfRated(chart, p.radius, p.input.boom.length, 1).rated : null;
  if (chart) {
    const m = rated === null ? null : toLoad((rated * p.input.limits.percentOfRated) / 100);
    limits.push({ ...base('load-chart', 'load-chart', 'load-chart', 'load chart', 'percent', p.input.limits.percentOfRated), loadMass: m, change: changeOf(m, m0), never: rated === null ? 'no-rating' : null });
  }

  const dm = Math.max(1000, m0);
  const hookAt = (m: number) => m + extra;
  const r0 = riggingVerdicts(p.input.rigging, m0, hookAt(m0));
  const r1 = riggingVerdicts(p.input.rigging, m0 + dm, hookAt(m0 + dm));
  r0.forEach((r, i) => {
    const slope = (r1[i].demand - r.demand) / dm;
    const never = r.facts.refused ? 'refused' : slope > 1e-12 ? null : 'constant';
    const m = never ? null : Math.max(0, m0 + (r.capacity - r.demand) / slope);
    limits.push({ ...base('rigging', `rigging:${r.element}:${r.id}`, r.id, r.name, 'mass', r.capacity), method: 'affine', loadMass: m, change: changeOf(m, m0), never });
  });

  // Pad pressures: the engine's maxima over the swing, cached per load mass.
  const cache = new Map<number, ReactionMaximum[]>();
  const maximaAt = (m: number) => {
    let hit = cache.get(m);
    if (!hit) cache.set(m, (hit = reactionMaxima(withLoadMass(p, m), step)));
    return hit;
  };
  const band = weightBandOf(p.input);
  const curveMasses = m0 >= MIN_LOAD ? Array.from({ length: CURVE_POINTS }, (_, k) => m0 * (1 + (-band.below + ((band.below + band.above) * k) / (CURVE_POINTS - 1)) / 100)) : [0];
  if (m0 >= MIN_LOAD && !curveMasses.includes(m0)) curveMasses.push(m0);
  curveMasses.sort((a, b) => a - b);

  const top = Math.min(RANGE.mass, tipMass ?? Math.max(20 * m0, 100_000));
  const scan = [...new Set([...Array.from({ length: SCAN_POINTS + 1 }, (_, k) => (top * k) / SCAN_POINTS), ...curveMasses.filter((m) => m < top)])].sort((a, b) => a - b);
  const allowable = p.input.soil.allowable;
  // The planned mass is on the scan; a crossing is looked for from it: heavier when the pad is within the
  // limit at the plan (and lighter too, as a pad on the far side carries more under a lighter load), lighter
  // when it is already over (the mass where it was reached).
  if (!scan.includes(m0)) scan.push(m0);
  scan.sort((a, b) => a - b);
  const i0 = scan.indexOf(m0);
  p.input.supports.forEach((s, i) => {
    const f = (m: number) => maximaAt(m)[i].pressure - allowable;
    const up = (from: number): { m: number; tol: number } | null => {
      for (let k = from + 1; k < scan.length; k++) {
        if (f(scan[k]) < 0) continue;
        const r = bracketedRoot(f, scan[k - 1], scan[k], f(scan[k - 1]), f(scan[k]), BEARING_TOL);
        return { m: r.x, tol: (r.hi - r.lo) / 2 };
      }
      return null;
    };
    const down = (from: number): { m: number; tol: number } | null => {
      for (let k = from - 1; k >= 0; k--) {
        if (f(scan[k]) < 0) continue;
        // Mirrored so that the bracket runs from below the limit to on or over it.
        const g = (x: number) => f(-x);
        const r = bracketedRoot(g, -scan[k + 1], -scan[k], g(-scan[k + 1]), g(-scan[k]), BEARING_TOL);
        return { m: -r.x, tol: (r.hi - r.lo) / 2 };
      }
      return null;
    };
    /** Over at the plan: the mass below it where the figure came up to the limit (0 when over all the way down). */
    const reachedBelow = (): { m: number; tol: number } => {
      for (let k = i0 - 1; k >= 0; k--) {
        if (f(scan[k]) >= 0) continue;
        const r = bracketedRoot(f, scan[k], scan[k + 1], f(scan[k]), f(scan[k + 1]), BEARING_TOL);
        return { m: r.x, tol: (r.hi - r.lo) / 2 };
      }
      return { m: 0, tol: 0 };
    };
    const within = f(m0) < 0;
    const found = within ? up(i0) : reachedBelow();
    const lighter = within ? down(i0) : null;
    const m = found ? Math.max(0, found.m) : null;
    const name = maximaAt(m0)[i].name;
    limits.push({
      ...base('bearing', `bearing:${s.id}`, s.id, name, 'pressure', allowable), method: 'bracketed', tolerance: found?.tol ?? 0,
      loadMass: m, change: changeOf(m, m0), slew: m === null ? null : maximaAt(m)[i].slew,
      never: m === null ? (tipMass !== null ? 'tips-first' : 'beyond-search') : null,
      ...(lighter ? { lighter: { loadMass: Math.max(0, lighter.m), change: changeOf(Math.max(0, lighter.m), m0) } } : {}),
    });
  });

  const curve = curveMasses.map((m) => {
    const hook = hookAt(m);
    const pads = maximaAt(m);
    let best = 0;
    pads.forEach((x, i) => { if (x.pressure > pads[best].pressure) best = i; });
    return {
      change: changeOf(m, m0) ?? 0, loadMass: m, percentOfTipping: perKg * hook,
      loadChartPercent: rated === null ? null : (100 * hook) / rated,
      padPressure: pads[best]?.pressure ?? 0, pad: pads[best]?.support ?? '',
    };
  });

  let first: WeightLimit | null = null;
  for (const l of limits) if (l.kind !== 'tipping' && l.loadMass !== null && (!first || l.loadMass < (first.loadMass as number))) first = l;
  return { loadMass: m0, band, limits, first, curve };
}
