import { G } from '@/lib/units';
import { boomGapAt, boomMeets } from './boom-clearance';
import { gapAt } from './clearance';
import { pointSegmentDist2 } from './geometry';
import { lipschitzLowerBound, reactionSlopes, ROUNDING, tippingOnArc } from './coarse-bounds';
import { percentOfRated } from './load-chart';
import { upperWeight } from './load-weight';
import { powerLineDistanceAt, requiredClearance } from './power-lines';
import { slewAt, withLoadMass, type PreparedLift, type Target } from './prepare';
import { createReactionState, reactionsAt } from './reactions';
import { assertStandsUnloaded } from './tipping';
import { atLeast, atMost, CLEARANCE_MARGIN_CAP, clearanceScale, type Margin } from './margins';

/**
 * The coarse mode: the same limits as analyzeLift, each as a bound that is never on the favourable side
 * of the exact figure, at a small fraction of the cost (for searches that try thousands of placements).
 * - Percent of tipping: the exact maximum over the arc in closed form (coarse-bounds.ts), not a sweep.
 * - Load chart: the same lookup (it does not depend on the slew).
 * - Pad pressures: reactions sampled every `step`°, with the Lipschitz bound of the reaction between samples.
 * - Clearances and power lines: a closed-form lower bound first; only where it could decide the least
 *   margin, samples every `step`° with the Lipschitz bound of the gap between them.
 * Figures are bounds: higher for at-most limits, lower for at-least limits. tests/lift/coarse.test.ts
 * checks this against analyzeLift over random scenes.
 */
export interface CoarseOptions {
  /** Sampling step of the reaction and clearance bounds, degrees. */
  step?: number;
}

export interface CoarseFigures {
  /** Upper bound of the worst percent of tipping over the arc; at the upper weight when one is given. */
  percentOfTipping: number;
  upperPercentOfTipping: number | null;
  loadChartPercent: number | null;
  upperLoadChartPercent: number | null;
  /** Upper bounds of each pad's largest ground pressure, kPa (nominal, and at the upper weight). */
  pads: { support: string; pressure: number; upperPressure: number | null }[];
  /** Lower bounds of each part's or obstacle's smallest plan gap to the load, m, and the vertical gap. */
  clearances: { target: string; horizontal: number; vertical: number }[];
  /** Lower bounds of the boom's smallest gap to each part or obstacle, m. */
  boomClearances: { target: string; distance: number }[];
  /** Lower bounds of the smallest distance to each power line, m, and its required clearance. */
  powerLines: { id: string; distance: number; required: number | null }[];
}

export const COARSE_STEP = 3;

const DEG = Math.PI / 180;

/**
 * Upper bound of each support's largest reaction (kg) over the arc: samples every `step`°, then each
 * interval whose Lipschitz bound rises more than REFINE above the best sample is halved (up to DEPTH
 * times), so the bound is tight where the reaction peaks and the search pays for few extra solves.
 */
const REFINE = 0.01;
const DEPTH = 5;

/**
 * What upperReaction works on (module state rather than a closure per support: this runs per placement).
 * The halvings of sample interval k are the nodes of a binary tree (root 1, children 2j and 2j + 1), the
 * same slews for every support, so each midpoint is solved once and its reactions kept for the others.
 */
const NODES = 2 ** DEPTH;
const refine = {
  p: null as unknown as PreparedLift, state: createReactionState(0), i: 0, n: 0, K: 0, best: -Infinity,
  memo: new Float64Array(0), stamp: new Int32Array(0), generation: 0,
};

/** Upper bound of support refine.i's reaction between two samples, halving where it could exceed the best. */
function upperReaction(t0: number, m0: number, t1: number, m1: number, depth: number, node: number): number {
  const bound = (m0 + m1 + refine.K * (t1 - t0)) / 2;
  if (depth === 0 || bound <= refine.best + REFINE * Math.abs(refine.best)) return Math.max(bound, m0, m1);
  const tm = (t0 + t1) / 2;
  if (refine.stamp[node] !== refine.generation) {
    copyInto(refine.memo, reactionsAt(refine.p, slewAt(refine.p, tm), refine.state).mass, node * refine.n);
    refine.stamp[node] = refine.generation;
  }
  const mm = refine.memo[node * refine.n + refine.i];
  refine.best = Math.max(refine.best, mm);
  const child = node - (node % NODES) + 2 * (node % NODES);
  return Math.max(upperReaction(t0, m0, tm, mm, depth - 1, child), upperReaction(tm, mm, t1, m1, depth - 1, child + 1));
}

/** reactionBounds' sample buffers, kept between analyses (every entry it reads is written first). */
let sampleT = new Float64Array(0);
let sampleM = new Float64Array(0);

/** dst.set(src, at) for the few supports of a truck, without the call into the runtime. */
function copyInto(dst: Float64Array, src: Float64Array, at: number): void {
  for (let i = 0; i < src.length; i++) dst[at + i] = src[i];
}

function reactionBounds(p: PreparedLift, step: number): Float64Array {
  const n = p.supportX.length;
  const W = p.fixedMass + p.rotMass + p.hookLoad;
  const rx = p.rotMx0 + p.hookLoad * p.hookX0, ry = p.rotMy0 + p.hookLoad * p.hookY0;
  // The CG turns on a circle of this radius about its fixed part, m per radian of slew.
  const rho = Math.hypot(rx, ry) / W;
  // Keyed by the supports list, so a search that moves one truck around computes it once per leg set.
  const slope = reactionSlopes(p.supportX, p.supportY, p.input.supports);
  const state = createReactionState(n);
  const samples = p.span > 0 ? Math.ceil(p.span / step - 1e-9) : 0;
  if (sampleT.length < samples + 1) sampleT = new Float64Array(samples + 1);
  if (sampleM.length < (samples + 1) * n) sampleM = new Float64Array((samples + 1) * n);
  const ts = sampleT;
  // Reactions at the samples, flat: ms[k·n + i] is support i at sample k.
  const ms = sampleM;
  for (let k = 0; k <= samples; k++) {
    ts[k] = Math.min(k * step, p.span);
    copyInto(ms, reactionsAt(p, slewAt(p, ts[k]), state).mass, k * n);
  }
  const out = new Float64Array(n);
  refine.p = p;
  refine.state = state;
  refine.n = n;
  if (refine.stamp.length < samples * NODES) refine.stamp = new Int32Array(samples * NODES);
  if (refine.memo.length < samples * NODES * n) refine.memo = new Float64Array(samples * NODES * n);
  refine.generation++;
  for (let i = 0; i < n; i++) {
    // Reaction change per degree of slew at most.
    const K = W * slope[i] * rho * DEG;
    let best = -Infinity;
    for (let k = 0; k <= samples; k++) best = Math.max(best, ms[k * n + i]);
    refine.i = i;
    refine.K = K;
    refine.best = best;
    let b = best;
    for (let k = 1; k <= samples; k++) b = Math.max(b, upperReaction(ts[k - 1], ms[(k - 1) * n + i], ts[k], ms[k * n + i], DEPTH, (k - 1) * NODES + 1));
    out[i] = Math.max(0, b) * (1 + ROUNDING) + ROUNDING * W;
  }
  return out;
}

function pressureOf(p: PreparedLift, i: number, m: number): number {
  const sup = p.input.supports[i];
  return sup.cribbingArea ? ((m + (sup.cribbingMass ?? 0)) * G) / 1000 / sup.cribbingArea : (m * G) / 1000 / sup.area;
}

/**
 * What the clearance bounds of every part and obstacle share, worked out once per prepared lift (the same
 * expressions each bound used to work out for itself): the hook's angle at slew 0 (degrees), the pivot's
 * distance from the slew axis and the boom's run in plan, m.
 */
const shape = { p: null as PreparedLift | null, hookAngle: 0, pivotR: 0, run: 0 };
function shapeOf(p: PreparedLift): typeof shape {
  if (shape.p !== p) {
    shape.p = p;
    shape.hookAngle = Math.atan2(p.hookY0, p.hookX0) / DEG;
    shape.pivotR = Math.hypot(p.pivotX0, p.pivotY0);
    shape.run = Math.hypot(p.hookX0 - p.pivotX0, p.hookY0 - p.pivotY0);
  }
  return shape;
}

/** Smallest distance from the hook's arc to a point, m (closed form). */
function hookArcDistance(p: PreparedLift, x: number, y: number): number {
  const d = Math.hypot(x, y);
  const hookAngle = shapeOf(p).hookAngle;
  const slew = Math.atan2(y, x) / DEG - hookAngle;
  const rel = (((p.sign * (slew - p.from)) % 360) + 360) % 360;
  if (rel <= p.span) return Math.abs(p.radius - d);
  // The nearer end of the arc (no array of the two: this runs per part and obstacle of every placement).
  const a0 = (slewAt(p, 0) + hookAngle) * DEG, a1 = (slewAt(p, p.span) + hookAngle) * DEG;
  const best = Math.min(Infinity, Math.hypot(p.radius * Math.cos(a0) - x, p.radius * Math.sin(a0) - y));
  return Math.min(best, Math.hypot(p.radius * Math.cos(a1) - x, p.radius * Math.sin(a1) - y));
}

/** Below this a bound is refined by sampling; at or above it the margin is capped anyway (margins.ts). */
const decisive = (limit: number) => limit + CLEARANCE_MARGIN_CAP * clearanceScale(limit);

/**
 * The sample grid of the clearance bounds, shared by every part and obstacle: arc parameters, slews, the
 * hook's centre and the boom's ends at each sample (worked out once per analysis, not once per target).
 */
interface Samples {
  count: number;
  t: Float64Array;
  deg: Float64Array;
  hx: Float64Array;
  hy: Float64Array;
  px: Float64Array;
  py: Float64Array;
  qx: Float64Array;
  qy: Float64Array;
}

/** The grid's arrays, kept from one analysis to the next (a search analyses thousands of placements). */
const grid: Samples = { count: 0, t: new Float64Array(0), deg: new Float64Array(0), hx: new Float64Array(0), hy: new Float64Array(0), px: new Float64Array(0), py: new Float64Array(0), qx: new Float64Array(0), qy: new Float64Array(0) };

/** Fills the shared grid (every entry up to count is written afresh). */
function samplesOf(p: PreparedLift, step: number): Samples {
  const n = p.span > 0 ? Math.ceil(p.span / step - 1e-9) : 0;
  const out = grid;
  if (out.t.length < n + 1) {
    const f = () => new Float64Array(n + 1);
    Object.assign(out, { t: f(), deg: f(), hx: f(), hy: f(), px: f(), py: f(), qx: f(), qy: f() });
  }
  out.count = n + 1;
  const hookAngle = Math.atan2(p.hookY0, p.hookX0);
  for (let k = 0; k <= n; k++) {
    const t = Math.min(k * step, p.span);
    const deg = slewAt(p, t);
    out.t[k] = t;
    out.deg[k] = deg;
    const a = deg * DEG + hookAngle;
    out.hx[k] = p.radius * Math.cos(a);
    out.hy[k] = p.radius * Math.sin(a);
    const c = Math.cos(deg * DEG), s = Math.sin(deg * DEG);
    out.px[k] = c * p.pivotX0 - s * p.pivotY0;
    out.py[k] = s * p.pivotX0 + c * p.pivotY0;
    out.qx[k] = c * p.hookX0 - s * p.hookY0;
    out.qy[k] = s * p.hookX0 + c * p.hookY0;
  }
  return out;
}

/**
 * lipschitzLowerBound (coarse-bounds.ts) over the shared samples, with the value at sample k given in
 * `v` (the same arithmetic, so the same bound).
 */
function lowerBoundOf(v: Float64Array, s: Samples, lipschitz: number): number {
  let lb = v[0];
  for (let k = 1; k < s.count; k++) lb = Math.min(lb, v[k], (v[k - 1] + v[k] - lipschitz * (s.t[k] - s.t[k - 1])) / 2);
  return lb;
}

let values = new Float64Array(128);

function loadGapBound(p: PreparedLift, t: Target, samples: () => Samples, step: number, limit: number): number {
  const rough = Math.max(0, hookArcDistance(p, t.cx, t.cy) - t.r - p.footprint.reach);
  if (rough >= decisive(limit) || p.loadBottom - t.top >= decisive(limit)) return rough;
  const lipschitz = (p.radius + p.footprint.reach) * DEG;
  // Any lower bound of the gap at a sample keeps the interval bound valid: the bounding circles where
  // they are far enough apart, the outlines where they come near.
  const far = decisive(limit) + lipschitz * step;
  const s = samples();
  if (values.length < s.count) {
    values = new Float64Array(s.count);
    big = new Uint8Array(s.count);
  }
  // Samples whose bounding circles lie farther apart than `floor` get `floor` (a lower bound of their
  // value, with a margin for rounding) instead of a square root each; see boundWithFloors.
  const floor = Math.max(far, rough + 2 * lipschitz * step + 0.5);
  const cut = floor + t.r + p.footprint.reach;
  const cut2 = cut * cut * (1 + 1e-9);
  let floors = 0;
  for (let k = 0; k < s.count; k++) {
    const dx = s.hx[k] - t.cx, dy = s.hy[k] - t.cy;
    if (dx * dx + dy * dy > cut2) {
      values[k] = floor;
      big[k] = 1;
      floors++;
      continue;
    }
    big[k] = 0;
    const circles = Math.hypot(dx, dy) - t.r - p.footprint.reach;
    values[k] = circles >= far ? circles : gapAt(p, t, s.deg[k]);
  }
  const lb = floors > 0 ? boundWithFloors(s, lipschitz) : lowerBoundOf(values, s, lipschitz);
  if (!Number.isNaN(lb)) return Math.max(0, lb);
  // A floored sample could decide the bound: work out every value.
  for (let k = 0; k < s.count; k++) {
    if (!big[k]) continue;
    const circles = Math.hypot(s.hx[k] - t.cx, s.hy[k] - t.cy) - t.r - p.footprint.reach;
    values[k] = circles >= far ? circles : gapAt(p, t, s.deg[k]);
  }
  return Math.max(0, lowerBoundOf(values, s, lipschitz));
}

let big = new Uint8Array(128);

/**
 * lowerBoundOf when some values are floors (big[k]): the true values are at least the floors and each term
 * of the bound grows with its values, so when every term that uses a floor is above the least term that
 * uses none, the bound is that least term, the same number as with every value worked out. NaN otherwise.
 */
function boundWithFloors(s: Samples, lipschitz: number): number {
  let exact = big[0] ? Infinity : values[0];
  let floored = big[0] ? values[0] : Infinity;
  for (let k = 1; k < s.count; k++) {
    const pair = (values[k - 1] + values[k] - lipschitz * (s.t[k] - s.t[k - 1])) / 2;
    if (big[k]) floored = Math.min(floored, values[k]);
    else exact = Math.min(exact, values[k]);
    if (big[k] || big[k - 1]) floored = Math.min(floored, pair);
    else exact = Math.min(exact, pair);
  }
  return floored > exact ? exact : NaN;
}

function boomGapBound(p: PreparedLift, t: Target, samples: () => Samples, step: number, limit: number): number {
  const reach = Math.max(p.radius, shapeOf(p).pivotR);
  const plan = Math.hypot(t.cx, t.cy) - t.r - reach;
  const above = Math.min(p.pivotZ, p.tipZ) - t.top;
  const rough = Math.max(0, Math.max(plan, above, risingBoomGap(p, t)) - p.boomRadius);
  if (rough >= decisive(limit)) return rough;
  const lipschitz = reach * DEG;
  const far = decisive(limit) + lipschitz * step;
  const s = samples();
  if (values.length < s.count) values = new Float64Array(s.count);
  for (let k = 0; k < s.count; k++) {
    const circle = Math.max(Math.sqrt(pointSegmentDist2(t.cx, t.cy, s.px[k], s.py[k], s.qx[k], s.qy[k])) - t.r, above) - p.boomRadius;
    values[k] = circle >= far ? circle : boomGapAt(p, t, s.deg[k]);
  }
  return Math.max(0, lowerBoundOf(values, s, lipschitz));
}

/**
 * A raised boom climbs as it runs out: a boom point s metres out (in plan) from the pivot stands at least
 * pivotZ + s·tan(elevation) high and at most |pivot| + s from the axis, while the part lies at least
 * dmin = |centre| − r from the axis. Its gap is at least the larger of the plan and the height shortfall,
 * and the smallest of that over s is where the two meet (or at an end).
 */
function risingBoomGap(p: PreparedLift, t: Target): number {
  const { run, pivotR } = shapeOf(p);
  if (!(p.tipZ > p.pivotZ) || !(run > 0)) return -Infinity;
  const slope = (p.tipZ - p.pivotZ) / run;
  const start = Math.max(0, Math.hypot(t.cx, t.cy) - t.r) - pivotR;
  const meet = Math.min(run, Math.max(0, (start - p.pivotZ + t.top) / (1 + slope)));
  const lb0 = Math.max(start - 0, p.pivotZ + 0 * slope - t.top);
  const lbRun = Math.max(start - run, p.pivotZ + run * slope - t.top);
  const lbMeet = Math.max(start - meet, p.pivotZ + meet * slope - t.top);
  return Math.min(lb0, lbRun, lbMeet);
}

/** Closed-form lower bound on the distance to a wire: every part swung lies within `reach` of the axis in plan. */
function wireRough(p: PreparedLift, l: PreparedLift['powerLines'][number], reach: number): number {
  return Math.max(0, Math.sqrt(pointSegmentDist2(0, 0, l.a.x, l.a.y, l.b.x, l.b.y)) - reach);
}

export function analyzeCoarse(p: PreparedLift, options: CoarseOptions = {}): CoarseFigures {
  const step = options.step ?? COARSE_STEP;
  assertStandsUnloaded(p);
  const { input } = p;
  const limit = input.limits.clearance;
  const up = input.weightUncertainty ? withLoadMass(p, upperWeight(input.load.mass, input.weightUncertainty)) : null;
  const chart = (q: PreparedLift) => (input.loadChart ? percentOfRated(input.loadChart, q.radius, input.boom.length, q.hookLoad).percent : null);
  const nominal = reactionBounds(p, step);
  const upper = up ? reactionBounds(up, step) : null;
  const reach = Math.max(p.radius, Math.hypot(p.pivotX0, p.pivotY0)) + p.footprint.reach;
  // The shared sample grid, filled when the first part or obstacle needs sampling.
  let filled: Samples | null = null;
  const samples = () => (filled ??= samplesOf(p, step));
  return {
    percentOfTipping: tippingOnArc(p, p.hookLoad).percent,
    upperPercentOfTipping: up ? tippingOnArc(up, up.hookLoad).percent : null,
    loadChartPercent: chart(p),
    upperLoadChartPercent: up ? chart(up) : null,
    pads: input.supports.map((s, i) => ({
      support: s.id,
      pressure: pressureOf(p, i, nominal[i]),
      upperPressure: upper ? pressureOf(p, i, upper[i]) : null,
    })),
    clearances: p.targets.map((t) => ({ target: t.id, horizontal: loadGapBound(p, t, samples, step, limit), vertical: p.loadBottom - t.top })),
    boomClearances: p.targets.filter(boomMeets).map((t) => ({ target: t.id, distance: boomGapBound(p, t, samples, step, limit) })),
    powerLines: p.powerLines.map((l) => {
      const required = requiredClearance(l).required;
      const rough = wireRough(p, l, reach);
      if (required !== null && rough >= decisive(required)) return { id: l.id, distance: rough, required };
      const d = lipschitzLowerBound((u) => powerLineDistanceAt(p, l, slewAt(p, u)), p.span, step, reach * DEG);
      return { id: l.id, distance: Math.max(0, d), required };
    }),
  };
}

/** The plan's limits the coarse figures are compared with. */
export interface MarginLimits {
  percentOfTipping: number;
  percentOfRated: number;
  clearance: number;
  allowable: number;
  hasChart: boolean;
}

/** Margins of a coarse analysis, with the same ids as resultMargins; each is at most the exact one. */
export function coarseMargins(f: CoarseFigures, limits: MarginLimits): Margin[] {
  const out: Margin[] = [{ id: 'stability', margin: atMost(f.percentOfTipping, limits.percentOfTipping) }];
  if (f.upperPercentOfTipping !== null) out.push({ id: 'stability:upper-weight', margin: atMost(f.upperPercentOfTipping, limits.percentOfTipping) });
  for (const pad of f.pads) {
    out.push({ id: `bearing:${pad.support}`, margin: atMost(pad.pressure, limits.allowable) });
    if (pad.upperPressure !== null) out.push({ id: `bearing:${pad.support}:upper-weight`, margin: atMost(pad.upperPressure, limits.allowable) });
  }
  if (limits.hasChart) {
    out.push({ id: 'load-chart', margin: atMost(f.loadChartPercent, limits.percentOfRated) });
    if (f.upperPercentOfTipping !== null) out.push({ id: 'load-chart:upper-weight', margin: atMost(f.upperLoadChartPercent, limits.percentOfRated) });
  }
  for (const c of f.clearances) out.push({ id: `clearance:${c.target}`, margin: atLeast(Math.max(c.horizontal, c.vertical), limits.clearance) });
  for (const c of f.boomClearances) out.push({ id: `clearance:${c.target}:boom`, margin: atLeast(c.distance, limits.clearance) });
  for (const l of f.powerLines) out.push({ id: `power-line:${l.id}`, margin: atLeast(l.distance, l.required) });
  return out;
}


/** The limits of a prepared lift, as coarseMargins wants them. */
export function limitsOf(p: PreparedLift): MarginLimits {
  const { limits, soil, loadChart } = p.input;
  return { percentOfTipping: limits.percentOfTipping, percentOfRated: limits.percentOfRated, clearance: limits.clearance, allowable: soil.allowable, hasChart: !!loadChart };
}

/**
 * A ceiling on the coarse least margin from its cheap terms alone: the tipping and load-chart margins,
 * the same figures analyzeCoarse gives them (closed form, no sampling), and the power lines' distance at a
 * few of the samples analyzeCoarse takes every `step`° (its default, as analyzeCoarse's). The least margin is the smallest
 * of all its terms, so it is never above this. A search can leave out the full coarse analysis of a
 * placement whose ceiling is no better than what it already has. Throws as analyzeCoarse does.
 */
export function coarseCeiling(p: PreparedLift, step = COARSE_STEP): number {
  assertStandsUnloaded(p);
  const { input } = p;
  const limits = limitsOf(p);
  const up = input.weightUncertainty ? withLoadMass(p, upperWeight(input.load.mass, input.weightUncertainty)) : null;
  const terms = [atMost(tippingOnArc(p, p.hookLoad).percent, limits.percentOfTipping)];
  if (up) terms.push(atMost(tippingOnArc(up, up.hookLoad).percent, limits.percentOfTipping));
  if (input.loadChart) {
    terms.push(atMost(percentOfRated(input.loadChart, p.radius, input.boom.length, p.hookLoad).percent, limits.percentOfRated));
    if (up) terms.push(atMost(percentOfRated(input.loadChart, up.radius, input.boom.length, up.hookLoad).percent, limits.percentOfRated));
  }
  // Power lines: the coarse distance is max(0, lb), where lb is at most the distance at every sample of
  // lipschitzLowerBound; so the distance at a few of those same samples (the ends, and the one nearest the
  // line's closest approach to the slew axis) is a ceiling for it.
  const reach = Math.max(p.radius, Math.hypot(p.pivotX0, p.pivotY0)) + p.footprint.reach;
  const last = p.span > 0 ? Math.ceil(p.span / step - 1e-9) : 0;
  for (const l of p.powerLines) {
    const required = requiredClearance(l).required;
    const rough = wireRough(p, l, reach);
    if (required !== null && rough >= decisive(required)) {
      terms.push(atLeast(rough, required));
      continue;
    }
    let d = Infinity;
    for (const k of [0, last, nearestSample(p, l, step, last)]) d = Math.min(d, powerLineDistanceAt(p, l, slewAt(p, Math.min(k * step, p.span))));
    terms.push(atLeast(Math.max(0, d), required));
  }
  // As leastMargin: a term that is not a number is passed over.
  let least = Infinity;
  for (const m of terms) if (m < least) least = m;
  return least;
}

/** The sample (index, `step` apart along the arc) where the hook points nearest the wire's closest point to the axis. */
function nearestSample(p: PreparedLift, l: PreparedLift['powerLines'][number], step: number, last: number): number {
  const dx = l.b.x - l.a.x, dy = l.b.y - l.a.y, len2 = dx * dx + dy * dy;
  const u = len2 > 0 ? Math.min(1, Math.max(0, -(l.a.x * dx + l.a.y * dy) / len2)) : 0;
  const x = l.a.x + u * dx, y = l.a.y + u * dy;
  const slew = Math.atan2(y, x) / DEG - Math.atan2(p.hookY0, p.hookX0) / DEG;
  const rel = (((p.sign * (slew - p.from)) % 360) + 360) % 360;
  return rel <= p.span ? Math.min(last, Math.max(0, Math.round(rel / step))) : 0;
}
