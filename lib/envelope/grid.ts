import { gapAt, goldenMax, percentOfRated, tippingAtCS, type PreparedLift } from '@/lib/lift';
import { atReach, envelopeLift, radiusRange, reachFor } from './at-radius';

/**
 * The reach envelope on a polar grid, truck frame: rows of hook radius (the boom luffed at its planned
 * length, at-radius.ts), columns of slew. At each node, the worst percent of tipping met while slewing
 * there from the pick, counter-clockwise and clockwise: the running maximum of the engine's own per-slew
 * figure (tipping.ts), with every local peak refined by golden-section search as the engine's sweep
 * does (sweep.ts), so a node reads what analyzeLift reports for that swing. Load chart use depends on
 * the radius only. Drawn for the upper weight when the plan states an uncertainty.
 */
export interface EnvelopeGrid {
  nR: number;
  nS: number;
  /** Hook radius of each row, m, ascending. */
  radii: Float64Array;
  /** Boom reach of each row (see reachFor), m. */
  reach: Float64Array;
  /** Angle of the hook from the boom's direction in each row (a pivot off the centre line), radians. */
  offset: Float64Array;
  /** Degrees between columns; column k is at slew k·step. */
  step: number;
  /** Pick slew, degrees. */
  pick: number;
  /** Per node (row·nS + column): worst percent of tipping slewing there from the pick, ccw and cw (Infinity: tips unloaded). */
  ccw: Float64Array;
  cw: Float64Array;
  /** Per row: percent of the load chart's rating at that radius (NaN without a chart, Infinity with no rating there). */
  chart: Float64Array;
  /** Per node: index of a truck part or obstacle the load would meet there (in plan, within the clearance limit, not above it), or −1. */
  cut: Int16Array;
  limits: { tipping: number; chart: number; clearance: number };
  targets: { id: string; name: string; kind: 'body' | 'obstacle' }[];
  /** Load mass the envelope is drawn for, kg. */
  loadMass: number;
}

export interface GridOptions {
  radii?: number;
  slews?: number;
}

/** Percent of tipping at one slew, Infinity when the truck would tip with nothing on the hook. */
function pctAt(p: PreparedLift, c: number, s: number): number {
  const hit = tippingAtCS(p, c, s);
  return hit.unloaded >= 0 ? Infinity : hit.percent;
}

const REFINE = 0.005;

/** Running maxima of the row's figure from the pick, both ways, into ccw/cw at offset `o`. */
function rowMaxima(p: PreparedLift, nS: number, step: number, pick: number, cos: Float64Array, sin: Float64Array, ccw: Float64Array, cw: Float64Array, o: number): void {
  const v = new Float64Array(nS);
  for (let k = 0; k < nS; k++) v[k] = pctAt(p, cos[k], sin[k]);
  const at = (deg: number) => pctAt(p, Math.cos((deg * Math.PI) / 180), Math.sin((deg * Math.PI) / 180));
  // Local peaks between samples, refined as the engine's sweep refines them.
  const peaks: { deg: number; v: number }[] = [];
  for (let k = 0; k < nS; k++) {
    const a = v[(k + nS - 1) % nS], b = v[k], c = v[(k + 1) % nS];
    if (!(b > 0) || !Number.isFinite(b) || b < a || b < c || (b === a && b === c)) continue;
    const r = goldenMax(at, (k - 1) * step, (k + 1) * step, REFINE);
    if (r.v > b) peaks.push({ deg: r.t, v: r.v });
  }
  const vPick = at(pick);
  for (const dir of [1, -1] as const) {
    const out = dir === 1 ? ccw : cw;
    // Walk the nodes in order of their distance along the arc from the pick, taking in the refined peaks
    // passed on the way (few: sorted once per direction).
    const along = (deg: number) => (((dir * (deg - pick)) % 360) + 360) % 360;
    const ps = peaks.map((q) => ({ t: along(q.deg), v: q.v })).sort((a, b) => a.t - b.t);
    const first = dir === 1 ? Math.ceil(pick / step - 1e-12) : Math.floor(pick / step + 1e-12);
    let m = vPick;
    let q = 0;
    for (let i = 0; i < nS; i++) {
      const k = (((first + dir * i) % nS) + nS) % nS;
      const t0 = along(k * step);
      // A node a hair behind the pick (rounding) is the pick's own node, not the far end of the turn.
      const t = t0 > 360 - 1e-9 ? 0 : t0;
      while (q < ps.length && ps[q].t <= t) m = Math.max(m, ps[q++].v);
      if (v[k] > m) m = v[k];
      out[o + k] = m;
    }
  }
}

/** Whether the load at this slew meets target i (in plan, within the clearance limit, not above it). */
function meets(p: PreparedLift, i: number, deg: number, clearance: number): boolean {
  const t = p.targets[i];
  if (p.loadBottom - t.top >= clearance) return false;
  const a = (deg * Math.PI) / 180;
  const hx = Math.cos(a) * p.hookX0 - Math.sin(a) * p.hookY0;
  const hy = Math.sin(a) * p.hookX0 + Math.cos(a) * p.hookY0;
  if (Math.hypot(hx - t.cx, hy - t.cy) - t.r - p.footprint.reach >= clearance) return false;
  return gapAt(p, t, deg) < clearance;
}

/**
 * One row's cut-outs into `cut` at offset `o`: per node, the lowest index of a part or obstacle the load
 * meets there, or −1. Each target is tried only at the columns where its bounding circle can come within
 * the clearance of the load's (law of cosines on the hook's circle, widened by a column), not at all 240:
 * with hundreds of obstacles the grid was mostly these rejections. Same answer as trying every node.
 */
function rowCuts(p: PreparedLift, nS: number, step: number, clearance: number, cut: Int16Array, o: number): void {
  cut.fill(-1, o, o + nS);
  const R = Math.hypot(p.hookX0, p.hookY0);
  const off = (Math.atan2(p.hookY0, p.hookX0) * 180) / Math.PI;
  for (let i = 0; i < p.targets.length; i++) {
    const t = p.targets[i];
    if (p.loadBottom - t.top >= clearance) continue;
    const lim = t.r + p.footprint.reach + clearance;
    const d = Math.hypot(t.cx, t.cy);
    if (Math.abs(R - d) >= lim + 1e-9) continue;
    let first = 0, last = nS - 1;
    if (R > 1e-9 && d > 1e-9) {
      const q = (R * R + d * d - lim * lim) / (2 * R * d);
      if (q > -1) {
        const w = (Math.acos(Math.min(1, q)) * 180) / Math.PI;
        const centre = (Math.atan2(t.cy, t.cx) * 180) / Math.PI - off;
        first = Math.floor((centre - w) / step) - 1;
        last = Math.ceil((centre + w) / step) + 1;
        if (last - first >= nS) {
          first = 0;
          last = nS - 1;
        }
      }
    }
    for (let m = first; m <= last; m++) {
      const k = ((m % nS) + nS) % nS;
      if (cut[o + k] < 0 && meets(p, i, k * step, clearance)) cut[o + k] = i;
    }
  }
}

export function envelopeGrid(prepared: PreparedLift, opts: GridOptions = {}): EnvelopeGrid | null {
  const p = envelopeLift(prepared);
  const nR = opts.radii ?? 36;
  const nS = opts.slews ?? 240;
  const range = radiusRange(p);
  if (!(range.max > range.min)) return null;
  const step = 360 / nS;
  const cos = new Float64Array(nS), sin = new Float64Array(nS);
  for (let k = 0; k < nS; k++) {
    cos[k] = Math.cos((k * step * Math.PI) / 180);
    sin[k] = Math.sin((k * step * Math.PI) / 180);
  }
  const chart = p.input.loadChart;
  const radii = new Float64Array(nR), reach = new Float64Array(nR), offset = new Float64Array(nR), chartPct = new Float64Array(nR);
  const ccw = new Float64Array(nR * nS), cw = new Float64Array(nR * nS);
  const cut = new Int16Array(nR * nS);
  const clearance = p.input.limits.clearance;
  for (let j = 0; j < nR; j++) {
    const r = range.min + ((range.max - range.min) * j) / (nR - 1);
    const rc = reachFor(p, r) ?? p.input.boom.length;
    const pr = atReach(p, rc);
    radii[j] = r;
    reach[j] = rc;
    offset[j] = Math.atan2(pr.hookY0, pr.hookX0);
    chartPct[j] = chart ? (percentOfRated(chart, pr.radius, p.input.boom.length, pr.hookLoad).percent ?? Infinity) : NaN;
    rowMaxima(pr, nS, step, p.from, cos, sin, ccw, cw, j * nS);
    rowCuts(pr, nS, step, clearance, cut, j * nS);
  }
  return {
    nR, nS, radii, reach, offset, step, pick: p.from, ccw, cw, chart: chartPct, cut,
    limits: { tipping: p.input.limits.percentOfTipping, chart: p.input.limits.percentOfRated, clearance },
    targets: p.targets.map((t) => ({ id: t.id, name: t.name, kind: t.kind })),
    loadMass: p.input.load.mass,
  };
}
