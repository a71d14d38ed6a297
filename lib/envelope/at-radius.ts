import { upperWeight, withLoadMass, type LiftInputIn, type PreparedLift } from '@/lib/lift';

/**
 * The reach envelope moves the hook to other radii by luffing the boom at its planned length (raising or
 * lowering it), as a rotator sets a load nearer or farther. Elevation runs from horizontal (0°, the
 * longest radius) to ELEVATION_MAX (the shortest). The boom's own CG moves with it; nothing else does.
 */
export const ELEVATION_MAX = 80;
/** The hook must stand this far out along the boom's direction from the slew axis, m, for its slew to mean a direction. */
const MIN_HOOK_X = 0.5;

/** Hook reach along the boom's direction at slew 0 for a radius r, or null when the boom cannot put it there. */
export function reachFor(p: PreparedLift, r: number): number | null {
  const y = p.pivotY0;
  if (!(r > Math.abs(y))) return null;
  const x = Math.sqrt(r * r - y * y);
  const reach = x - p.pivotX0;
  const length = p.input.boom.length;
  if (x < MIN_HOOK_X || reach < length * Math.cos((ELEVATION_MAX * Math.PI) / 180) - 1e-9 || reach > length + 1e-9) return null;
  return Math.min(length, reach);
}

/** The radii the boom can reach at its planned length: [at ELEVATION_MAX, horizontal]. */
export function radiusRange(p: PreparedLift): { min: number; max: number } {
  const length = p.input.boom.length;
  const hx = (reach: number) => p.pivotX0 + reach;
  const lo = Math.max(length * Math.cos((ELEVATION_MAX * Math.PI) / 180), MIN_HOOK_X - p.pivotX0);
  return { min: Math.hypot(hx(lo), p.pivotY0) + 1e-9, max: Math.hypot(hx(length), p.pivotY0) - 1e-9 };
}

export const elevationFor = (p: PreparedLift, reach: number) => (Math.acos(Math.min(1, reach / p.input.boom.length)) * 180) / Math.PI;

/** The prepared lift with the boom luffed to `reach` (see reachFor): hook, boom CG, tip and load heights move. */
export function atReach(p: PreparedLift, reach: number): PreparedLift {
  const { pivot, length, elevation, mass, cgFraction } = p.input.boom;
  const reach0 = length * Math.cos((elevation * Math.PI) / 180);
  const el = (elevationFor(p, reach) * Math.PI) / 180;
  const tipZ = pivot.z + length * Math.sin(el);
  const loadBottom = tipZ - p.input.load.hang;
  const hookX0 = pivot.x + reach;
  return {
    ...p,
    rotMx0: p.rotMx0 + mass * cgFraction * (reach - reach0),
    hookX0,
    radius: Math.hypot(hookX0, p.hookY0),
    tipZ,
    loadBottom,
    loadTop: loadBottom + p.input.load.height,
  };
}

/** The load mass the envelope is drawn for: the upper end of a stated uncertainty, else the plan's. */
export const envelopeLift = (p: PreparedLift) => (p.input.weightUncertainty ? withLoadMass(p, upperWeight(p.input.load.mass, p.input.weightUncertainty)) : p);

/**
 * The engine input for holding the load at radius r and slew `to`, reached from the pick in `direction`:
 * what the property test analyses in full to check a point of the envelope.
 */
export function inputAtPoint(input: LiftInputIn, p: PreparedLift, reach: number, to: number, direction: 'ccw' | 'cw'): LiftInputIn {
  return { ...input, boom: { ...input.boom, elevation: elevationFor(p, reach) }, swing: { from: p.from, to, direction } };
}
