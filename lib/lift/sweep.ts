import { slewAt, type PreparedLift } from './prepare';
import { goldenMax } from './search';
import { tippingAt, tippingAtCS } from './tipping';

/**
 * Percent of tipping over the planned arc. Samples at `step` (ends included), then refines each local
 * peak by golden-section search in the bracket of its neighbours, to well inside 0.1° and 0.01 %.
 */
export interface SweepSample {
  slew: number;
  percentOfTipping: number;
  line: string;
}

export interface LineChange {
  slew: number;
  from: string;
  to: string;
}

export interface SweepResult {
  /** Parameters t (degrees along the arc from `from`) of the samples. */
  t: Float64Array;
  percent: Float64Array;
  line: Int32Array;
  worst: { t: number; slew: number; percentOfTipping: number; line: number };
  changes: LineChange[];
}

/** Angle tolerance of the refinement, degrees (the contract asks for 0.1°). */
export const REFINE_TOL = 0.005;

const percentAtT = (p: PreparedLift, t: number) => tippingAt(p, slewAt(p, t)).percent;

export function sweepTipping(p: PreparedLift, step = 1): SweepResult {
  const n = p.span > 0 ? Math.ceil(p.span / step - 1e-9) + 1 : 1;
  const t = new Float64Array(n);
  const percent = new Float64Array(n);
  const line = new Int32Array(n);
  // Step cos/sin by a fixed rotation instead of calling trig per sample; re-anchored every 64 samples.
  const d = (p.sign * step * Math.PI) / 180;
  const cd = Math.cos(d);
  const sd = Math.sin(d);
  let c = 1;
  let s = 0;
  for (let k = 0; k < n; k++) {
    t[k] = Math.min(k * step, p.span);
    if (k % 64 === 0 || t[k] !== k * step) {
      const a = (slewAt(p, t[k]) * Math.PI) / 180;
      c = Math.cos(a);
      s = Math.sin(a);
    }
    const hit = tippingAtCS(p, c, s);
    percent[k] = hit.percent;
    line[k] = hit.line;
    const nc = c * cd - s * sd;
    s = s * cd + c * sd;
    c = nc;
  }
  let worstT = t[0];
  let worstV = percent[0];
  for (let k = 0; k < n; k++) {
    const v = percent[k];
    const left = k > 0 ? percent[k - 1] : -Infinity;
    const right = k < n - 1 ? percent[k + 1] : -Infinity;
    if (v > worstV) {
      worstV = v;
      worstT = t[k];
    }
    if (v <= 0 || v < left || v < right || (v === left && v === right)) continue;
    const a = k > 0 ? t[k - 1] : t[k];
    const b = k < n - 1 ? t[k + 1] : t[k];
    if (b - a <= REFINE_TOL) continue;
    const r = goldenMax((x) => percentAtT(p, x), a, b, REFINE_TOL);
    if (r.v > worstV) {
      worstV = r.v;
      worstT = r.t;
    }
  }
  const worstHit = tippingAt(p, slewAt(p, worstT));
  return {
    t, percent, line,
    worst: { t: worstT, slew: slewAt(p, worstT), percentOfTipping: worstHit.percent, line: worstHit.line },
    changes: lineChanges(p, t, line),
  };
}

/** Where the governing line changes between samples, bisected to REFINE_TOL. */
function lineChanges(p: PreparedLift, t: Float64Array, line: Int32Array): LineChange[] {
  const out: LineChange[] = [];
  for (let k = 1; k < t.length; k++) {
    if (line[k] === line[k - 1]) continue;
    let a = t[k - 1];
    let b = t[k];
    while (b - a > REFINE_TOL) {
      const m = (a + b) / 2;
      if (tippingAt(p, slewAt(p, m)).line === line[k - 1]) a = m;
      else b = m;
    }
    out.push({ slew: slewAt(p, (a + b) / 2), from: p.lines[line[k - 1]].id, to: p.lines[line[k]].id });
  }
  return out;
}

/** The sweep samples as chart points (at most `step` ≤ 1° apart, both arc ends included). */
export function sweepSamples(p: PreparedLift, s: SweepResult): SweepSample[] {
  return Array.from(s.t, (t, k) => ({ slew: slewAt(p, t), percentOfTipping: s.percent[k], line: p.lines[s.line[k]].id }));
}
