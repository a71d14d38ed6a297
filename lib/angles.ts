/**
 * The app's one pair of angle helpers (degrees). The engine's normalizeDegrees, the editor's rotation and
 * slew commands and the results chart all wrap angles through these.
 */

/** Degrees to [0, 360). */
export function wrap360(d: number): number {
  const r = d % 360;
  const w = r < 0 ? r + 360 : r;
  // A tiny negative remainder rounds up to 360 itself: that is 0 (and −0 is 0).
  return w >= 360 || w === 0 ? 0 : w;
}

/** Degrees to (−180, 180]: the shorter way round from one direction to another. */
export function wrap180(d: number): number {
  const r = wrap360(d + 180) - 180;
  return r === -180 ? 180 : r;
}
