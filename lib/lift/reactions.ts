import { G } from '@/lib/units';
import { solveContact } from './contact';
import type { PreparedLift } from './prepare';

/**
 * Support reactions on a rigid base: the exact contact solution of contact.ts (supports push, never pull;
 * a released support comes back into contact when the base reaches it again). With every support in
 * contact on four pads this is the four-float formula R_i = V/n + M_x·y_i/Σy² + M_y·x_i/Σx²; with three it
 * is statically determinate (H. Shapiro, Cranes and Derricks, 4th ed., §5, Eq. 5.22).
 */
export interface ReactionState {
  /** Reaction of each support, kg (0 for a released support). */
  mass: Float64Array;
  /** Which supports carry load. */
  active: Uint8Array;
  /** True when the combined CG lies outside the support polygon: no contact set balances it (the truck tips). */
  tips: boolean;
}

export function createReactionState(n: number): ReactionState {
  return { mass: new Float64Array(n), active: new Uint8Array(n), tips: false };
}

/** Solves for weight W (kg) with first moments mx, my (kg·m) about the axis; writes into `out`. */
export function solveReactions(xs: Float64Array, ys: Float64Array, W: number, mx: number, my: number, out: ReactionState): ReactionState {
  return solveContact(xs, ys, W, mx, my, out);
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
