import { G } from '@/lib/units';
import type { PreparedLift } from './prepare';

/**
 * Support reactions on a rigid base: R_i = a + b·x_i + c·y_i over the supports in contact, fitted so
 * that ΣR = W, ΣR·x = W·x̄ and ΣR·y = W·ȳ. With four pads this is the four-float formula
 * R_i = V/n + M_x·y_i/Σy² + M_y·x_i/Σx² (about the pads' centroid on principal axes); with three it is
 * statically determinate; with more it is the least-squares (smallest ΣR²) distribution. A support that
 * comes out in tension is released and the rest re-solved; if one still lifts with three left, the
 * truck tips (H. Shapiro, Cranes and Derricks, 4th ed., §5, Eq. 5.22).
 */
export interface ReactionState {
  /** Reaction of each support, kg (0 for a released support). */
  mass: Float64Array;
  /** Which supports carry load. */
  active: Uint8Array;
  /** True when no set of three or more supports can balance the load without tension. */
  tips: boolean;
}

export function createReactionState(n: number): ReactionState {
  return { mass: new Float64Array(n), active: new Uint8Array(n), tips: false };
}

/** Solves for weight W (kg) with first moments mx, my (kg·m) about the axis; writes into `out`. */
export function solveReactions(xs: Float64Array, ys: Float64Array, W: number, mx: number, my: number, out: ReactionState): ReactionState {
  const n = xs.length;
  out.active.fill(1);
  out.tips = false;
  let count = n;
  for (;;) {
    let sx = 0, sy = 0, sxx = 0, sxy = 0, syy = 0;
    for (let i = 0; i < n; i++) {
      if (!out.active[i]) continue;
      const x = xs[i], y = ys[i];
      sx += x; sy += y; sxx += x * x; sxy += x * y; syy += y * y;
    }
    // Normal equations [[count, sx, sy], [sx, sxx, sxy], [sy, sxy, syy]]·[a, b, c] = [W, mx, my], by Cramer's rule.
    const c00 = sxx * syy - sxy * sxy;
    const c01 = sy * sxy - sx * syy;
    const c02 = sx * sxy - sy * sxx;
    const det = count * c00 + sx * c01 + sy * c02;
    if (Math.abs(det) < 1e-12) {
      out.tips = true;
      break;
    }
    const c11 = count * syy - sy * sy;
    const c12 = sx * sy - count * sxy;
    const c22 = count * sxx - sx * sx;
    const a = (c00 * W + c01 * mx + c02 * my) / det;
    const b = (c01 * W + c11 * mx + c12 * my) / det;
    const c = (c02 * W + c12 * mx + c22 * my) / det;
    let worst = -1;
    let worstR = -1e-9 * Math.abs(W);
    for (let i = 0; i < n; i++) {
      const r = out.active[i] ? a + b * xs[i] + c * ys[i] : 0;
      out.mass[i] = r;
      if (out.active[i] && r < worstR) {
        worstR = r;
        worst = i;
      }
    }
    if (worst < 0) break;
    if (count <= 3) {
      out.tips = true;
      break;
    }
    out.active[worst] = 0;
    count--;
  }
  return out;
}

/** Reactions at one slew: total weight including the hook load, all moments turned to that slew. */
export function reactionsAt(p: PreparedLift, deg: number, out: ReactionState): ReactionState {
  const a = (deg * Math.PI) / 180;
  const c = Math.cos(a);
  const s = Math.sin(a);
  const rx = p.rotMx0 + p.hookLoad * p.hookX0;
  const ry = p.rotMy0 + p.hookLoad * p.hookY0;
  const W = p.fixedMass + p.rotMass + p.hookLoad;
  return solveReactions(p.supportX, p.supportY, W, p.fixedMx + c * rx - s * ry, p.fixedMy + s * rx + c * ry, out);
}

export interface SupportReaction {
  support: string;
  /** Reaction as a mass, kg. */
  mass: number;
  /** Reaction force, kN. */
  force: number;
  /** Over the pad area, kPa. */
  pressure: number;
  /** Over the cribbing area with the cribbing's own mass, kPa; null without cribbing. */
  pressureWithCribbing: number | null;
  /** The pressure that bears on the ground: with cribbing when there is cribbing, else under the pad. */
  groundPressure: number;
  inContact: boolean;
}

export function describeReactions(p: PreparedLift, r: ReactionState): SupportReaction[] {
  return p.input.supports.map((sup, i) => {
    const m = Math.max(0, r.mass[i]);
    const force = (m * G) / 1000;
    const pressure = force / sup.area;
    const pressureWithCribbing = sup.cribbingArea ? ((m + (sup.cribbingMass ?? 0)) * G) / 1000 / sup.cribbingArea : null;
    return {
      support: sup.id, mass: m, force, pressure, pressureWithCribbing,
      groundPressure: pressureWithCribbing ?? pressure,
      inContact: r.active[i] === 1 && r.mass[i] > 0,
    };
  });
}
