/**
 * Plain names for the engine's subjects, so a result can be read without knowing the short codes.
 * The names are data (words a person uses for a pad or a side of the truck), never a sentence.
 */

/** Which side of the truck a tipping line lies on, from its outward normal (truck frame, x to the cab). */
export type TruckSide = 'front' | 'left front' | 'left' | 'left rear' | 'rear' | 'right rear' | 'right' | 'right front';

const SIDES: readonly TruckSide[] = ['front', 'left front', 'left', 'left rear', 'rear', 'right rear', 'right', 'right front'];

/** The side an outward normal (nx, ny) points to, in eight 45° sectors centred on the axes and corners. */
export function sideOf(nx: number, ny: number): TruckSide {
  const deg = (Math.atan2(ny, nx) * 180) / Math.PI;
  const k = Math.round((((deg % 360) + 360) % 360) / 45) % 8;
  return SIDES[k];
}

/** The names crews use for the usual leg codes (common practice, no published source). */
const KNOWN: Record<string, string> = {
  FL: 'left front',
  FR: 'right front',
  RL: 'left rear',
  RR: 'right rear',
  ML: 'left middle',
  MR: 'right middle',
  FJ: 'front jack',
  RJ: 'rear jack',
};

/**
 * A pad's name: the usual name for a known leg code, otherwise where it stands on the truck (front or
 * rear of the slew axis, left or right of the centreline; a pad on the centreline is a jack), with the
 * code kept so two pads on one side stay apart ("left front pad FL2").
 */
export function padName(id: string, x: number, y: number): string {
  const known = KNOWN[id];
  if (known) return known;
  const along = x >= 0 ? 'front' : 'rear';
  if (Math.abs(y) < 0.3) return `${along} jack ${id}`;
  return `${y > 0 ? 'left' : 'right'} ${along} ${id}`;
}

/** The crews' name for a known leg code ("left front" for FL), or null for a code of a profile's own. */
export const knownPadName = (id: string): string | null => KNOWN[id] ?? null;

/** A pad named from its code alone, for a figure that kept only the code: "front jack (FJ)", else "pad P7". */
export function padLabel(id: string): string {
  const known = KNOWN[id];
  return known ? `${known} (${id})` : `pad ${id}`;
}

/** A tipping line named from its code ("RL-RR") alone: "the line left rear – right rear pads (RL-RR)". */
export function tippingLineLabel(code: string): string {
  const ends = code.split('-');
  if (ends.length === 2 && KNOWN[ends[0]] && KNOWN[ends[1]]) return `the line ${KNOWN[ends[0]]} – ${KNOWN[ends[1]]} (${code})`;
  return `line ${code}`;
}
