import { normalizeDegrees } from './types';

/**
 * The one rule for a planned swing `{ from, to, direction }` (README "The lift engine", schema.ts):
 * - `from` is normalised to [0°, 360°); the arc runs from it in `direction` (ccw: slew grows; cw: it falls).
 * - raw = to − from, signed so that it is positive in the direction of travel.
 * - A raw span within FULL_TURN_TOL of a non-zero whole number of turns (0→360 cw is −360, 360→0 ccw,
 *   0→720, −720→0, 10→370 cw, 152.2→512.2 ccw = 360.00000000000006) is a FULL TURN: every slew is analysed.
 * - A raw span of more than one turn in the direction of travel (0→400 ccw) covers every slew at least
 *   once, so it is analysed as a full turn too (never refused, never cut to its remainder).
 * - A raw span within FULL_TURN_TOL of zero is one slew (pick and set at the same angle): `span` 0,
 *   reported as such in the result's `arc`.
 * - Otherwise the arc runs the short way in `direction` to the first time it reaches `to` (mod 360).
 * Never a silent single angle: only from ≈ to gives span 0.
 */
export const FULL_TURN_TOL = 1e-9;

export interface Arc {
  /** Start slew, degrees in [0, 360). */
  from: number;
  /** Degrees along the arc, in [0, 360]. */
  span: number;
  /** +1 counter-clockwise, −1 clockwise. */
  sign: 1 | -1;
  fullTurn: boolean;
}

export function arcOf(swing: { from: number; to: number; direction: 'ccw' | 'cw' }): Arc {
  const sign = swing.direction === 'ccw' ? 1 : -1;
  const from = normalizeDegrees(swing.from);
  const raw = sign * (swing.to - swing.from);
  const turns = Math.round(raw / 360);
  if (turns !== 0 && Math.abs(raw - 360 * turns) <= FULL_TURN_TOL) return { from, span: 360, sign, fullTurn: true };
  if (Math.abs(raw) <= FULL_TURN_TOL) return { from, span: 0, sign, fullTurn: false };
  if (raw > 360) return { from, span: 360, sign, fullTurn: true };
  return { from, span: normalizeDegrees(raw), sign, fullTurn: false };
}
