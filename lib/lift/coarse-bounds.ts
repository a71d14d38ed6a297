import type { PreparedLift } from './prepare';

/**
 * Proven bounds for the coarse mode (coarse.ts). Each one is a bound over a whole arc, never a sample:
 * - tippingOnArc: the percent of tipping about a line is N(θ)/D(θ) with N and D of the form
 *   a + b·cos θ + c·sin θ (tipping.ts), so (N/D)' = 0 reduces to K + P·cos θ + Q·sin θ = 0, solved
 *   exactly; the maximum over the arc is at an end or at one of its two roots [derived].
 * - lipschitzLowerBound: for f with |f(s) − f(t)| ≤ L·|s − t|, the minimum on [t_k, t_k+1] is at least
 *   (f_k + f_k+1 − L·Δ)/2 (the two cones of Piyavskii, 1972, meet there); the same for an upper bound.
 */

/** Relative allowance for floating-point rounding between the closed form and the sampled engine. */
export const ROUNDING = 1e-9;

const DEG = Math.PI / 180;

/** Arc parameters t in [0, span] of the slews θ (degrees) inside the planned arc. */
function onArc(p: PreparedLift, thetaDeg: number): number | null {
  const rel = (((p.sign * (thetaDeg - p.from)) % 360) + 360) % 360;
  return rel <= p.span + 1e-12 ? Math.min(rel, p.span) : null;
}

export interface ArcPeak {
  percent: number;
  line: number;
  slew: number;
}

/** Largest percent of tipping over the planned arc, in closed form (hook load `hookLoad`, kg). */
export function tippingOnArc(p: PreparedLift, hookLoad: number): ArcPeak {
  const M = p.fixedMass + p.rotMass;
  let best: ArcPeak = { percent: 0, line: 0, slew: p.from };
  const ends = [p.from, p.from + p.sign * p.span];
  for (let i = 0; i < p.lines.length; i++) {
    const l = p.lines[i];
    const n0 = -l.c, n1 = l.nx * p.hookX0 + l.ny * p.hookY0, n2 = -l.nx * p.hookY0 + l.ny * p.hookX0;
    const d0 = M * l.c - (l.nx * p.fixedMx + l.ny * p.fixedMy);
    const d1 = -(l.nx * p.rotMx0 + l.ny * p.rotMy0), d2 = l.nx * p.rotMy0 - l.ny * p.rotMx0;
    const at = (deg: number) => {
      const c = Math.cos(deg * DEG), s = Math.sin(deg * DEG);
      const N = n0 + n1 * c + n2 * s, D = d0 + d1 * c + d2 * s;
      return N > 0 && D > 0 ? (100 * hookLoad * N) / D : 0;
    };
    const K = n2 * d1 - n1 * d2, P = n2 * d0 - n0 * d2, Q = n0 * d1 - n1 * d0;
    const R = Math.hypot(P, Q);
    const candidates = p.fullTurn ? [] : [...ends];
    if (R > 0 && Math.abs(K) <= R) {
      const phi = Math.atan2(Q, P), w = Math.acos(-K / R);
      for (const root of [phi + w, phi - w]) {
        const deg = root / DEG;
        const t = onArc(p, deg);
        if (t !== null) candidates.push(p.from + p.sign * t);
      }
    }
    if (p.fullTurn || candidates.length === 0) candidates.push(...ends);
    for (const deg of candidates) {
      const v = at(deg) * (1 + ROUNDING);
      if (v > best.percent) best = { percent: v, line: i, slew: (((deg % 360) + 360) % 360) };
    }
  }
  return best;
}

/**
 * Lower bound on the minimum of f over the arc from samples `step` degrees apart, when f changes by at
 * most `lipschitz` per degree. `f` takes the arc parameter t (degrees from the pick).
 */
export function lipschitzLowerBound(f: (t: number) => number, span: number, step: number, lipschitz: number): number {
  const n = span > 0 ? Math.ceil(span / step - 1e-9) : 0;
  let prevT = 0;
  let prev = f(0);
  let lb = prev;
  for (let k = 1; k <= n; k++) {
    const t = Math.min(k * step, span);
    const v = f(t);
    lb = Math.min(lb, v, (prev + v - lipschitz * (t - prevT)) / 2);
    prev = v;
    prevT = t;
  }
  return lb;
}

/**
 * Largest rate (kg of reaction per kg of weight per metre of CG travel) at which each support's reaction
 * can change: the reactions are a continuous piecewise-affine function of the CG (contact.ts), so the
 * steepest piece bounds it. Pieces: every plane fit on a contact set of three or more supports, and the
 * limit state on each hull edge (the lever rule, slope 1/edge length). Cached per support layout.
 */
const slopes = new WeakMap<object, Float64Array>();

export function reactionSlopes(xs: Float64Array, ys: Float64Array, key: object = xs): Float64Array {
  const hit = slopes.get(key);
  if (hit && hit.length === xs.length) return hit;
  const n = xs.length;
  const L = new Float64Array(n);
  for (let mask = 1; mask < 1 << n; mask++) {
    let k = 0, sx = 0, sy = 0;
    for (let i = 0; i < n; i++) if (mask & (1 << i)) { k++; sx += xs[i]; sy += ys[i]; }
    if (k < 3) continue;
    const mx = sx / k, my = sy / k;
    let suu = 0, suv = 0, svv = 0;
    for (let i = 0; i < n; i++) {
      if (!(mask & (1 << i))) continue;
      const u = xs[i] - mx, v = ys[i] - my;
      suu += u * u; suv += u * v; svv += v * v;
    }
    const det = suu * svv - suv * suv;
    // The engine never fits a plane on supports this close to a line (contact.ts fitPlane).
    if (!(det > 1e-12 * (suu + svv) * (suu + svv))) continue;
    for (let i = 0; i < n; i++) {
      if (!(mask & (1 << i))) continue;
      const u = xs[i] - mx, v = ys[i] - my;
      L[i] = Math.max(L[i], Math.hypot(svv * u - suv * v, suu * v - suv * u) / det);
    }
  }
  // Limit state: the whole weight on the two ends of an edge, split by the lever rule.
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      if (i === j) continue;
      const len = Math.hypot(xs[j] - xs[i], ys[j] - ys[i]);
      if (len > 0) L[i] = Math.max(L[i], 1 / len);
    }
  }
  slopes.set(key, L);
  return L;
}
