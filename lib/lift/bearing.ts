import { G } from '@/lib/units';
import { padName } from './names';
import { slewAt, type PreparedLift } from './prepare';
import { createReactionState, reactionsAt } from './reactions';
import { goldenMax } from './search';
import { REFINE_TOL } from './sweep';

/**
 * Largest reaction of each support over the planned swing, with the slew where it occurs: sampled at
 * the sweep step, then refined by golden-section search around each support's largest sample.
 */
export interface ReactionMaximum {
  support: string;
  /** The pad's name ("left rear"): the input's name, else the usual name for its code. */
  name: string;
  /** kN */
  force: number;
  mass: number;
  slew: number;
  /** Ground pressure at that slew (over the cribbing when there is cribbing), kPa. */
  pressure: number;
  /** True if at some slew of the swing this support lifts off (carries nothing). */
  liftsOff: boolean;
}

export function reactionMaxima(p: PreparedLift, sweepStep = 1): ReactionMaximum[] {
  // Reactions vary smoothly (sinusoids between lift-offs): 1° samples plus refinement are enough.
  const step = Math.max(sweepStep, 1);
  const n = p.supportX.length;
  const state = createReactionState(n);
  const bestT = new Float64Array(n);
  const bestM = new Float64Array(n).fill(-Infinity);
  const liftsOff = new Uint8Array(n);
  const samples = p.span > 0 ? Math.ceil(p.span / step - 1e-9) + 1 : 1;
  for (let k = 0; k < samples; k++) {
    const t = Math.min(k * step, p.span);
    reactionsAt(p, slewAt(p, t), state);
    for (let i = 0; i < n; i++) {
      const m = state.mass[i];
      if (!state.active[i] || m <= 0) liftsOff[i] = 1;
      if (m > bestM[i]) {
        bestM[i] = m;
        bestT[i] = t;
      }
    }
  }
  return p.input.supports.map((sup, i) => {
    const f = (t: number) => reactionsAt(p, slewAt(p, t), state).mass[i];
    const a = Math.max(0, bestT[i] - step);
    const b = Math.min(p.span, bestT[i] + step);
    let t = bestT[i];
    let m = bestM[i];
    if (b - a > REFINE_TOL) {
      const r = goldenMax(f, a, b, REFINE_TOL);
      if (r.v > m) {
        t = r.t;
        m = r.v;
      }
    }
    m = Math.max(0, m);
    const force = (m * G) / 1000;
    const pressure = sup.cribbingArea ? ((m + (sup.cribbingMass ?? 0)) * G) / 1000 / sup.cribbingArea : force / sup.area;
    return { support: sup.id, name: sup.name ?? padName(sup.id, sup.x, sup.y), force, mass: m, slew: slewAt(p, t), pressure, liftsOff: liftsOff[i] === 1 };
  });
}
