import { LiftError } from './errors';
import { chokerFactor, hitchFactor, roundSlingRating, shackleWll } from './rigging-tables';
import type { ShackleInput, SlingInput, WinchInput } from './schema';

/**
 * Capacity of each rigging element against its share of the load. Slings: vertical rating × hitch
 * factor × sin(angle from horizontal) × legs, the load shared evenly by the legs. Shackles: WLL against
 * the tension in their leg, load ÷ (legs · sin angle). Winch: with N parts of line the line pull is
 * load × F, F = Kᴺ(K − 1)/(Kᴺ − 1), times K for each lead sheave, K = 1.09 plain-bushed, 1.04 roller
 * (Wire Rope Technical Board, Wire Rope Users Manual, 4th ed.).
 */
export interface RiggingVerdict {
  id: string;
  element: 'sling' | 'shackle' | 'winch';
  /** The element's share of the load, kg (line pull for the winch). */
  demand: number;
  /** What it may carry, kg (rated line pull for the winch). */
  capacity: number;
  detail: string;
}

const sinDeg = (d: number) => Math.sin((d * Math.PI) / 180);

export function slingCapacity(s: SlingInput): number {
  let base: number;
  if (s.colour) {
    const r = roundSlingRating(s.colour);
    // The colour table's own choker and basket columns; tighter chokes reduce the choker rating further.
    base = s.hitch === 'vertical' ? r.vertical : s.hitch === 'basket' ? r.basket : (r.choker * chokerFactor(s.chokeAngle)) / 0.8;
  } else if (s.verticalRating !== undefined) {
    base = s.verticalRating * hitchFactor(s.hitch, s.chokeAngle);
  } else {
    throw new LiftError('invalid-rigging', `Sling "${s.id}" needs a vertical rating or a round-sling colour.`, 'rigging.slings');
  }
  return base * sinDeg(s.angleFromHorizontal) * s.legs;
}

export function slingVerdict(s: SlingInput, loadMass: number): RiggingVerdict {
  const how = s.colour ? `${s.colour} round sling` : 'sling';
  return {
    id: s.id, element: 'sling', demand: loadMass, capacity: slingCapacity(s),
    detail: `${s.legs} × ${how}, ${s.hitch} hitch at ${s.angleFromHorizontal}° from horizontal`,
  };
}

export function shackleVerdict(s: ShackleInput, loadMass: number): RiggingVerdict {
  const wll = s.wll ?? (s.size ? shackleWll(s.size) : null);
  if (wll === null) {
    const what = s.size ? `size "${s.size}" is not in the shackle table` : 'needs a size or a working load limit';
    throw new LiftError('invalid-rigging', `Shackle "${s.id}": ${what}.`, 'rigging.shackles');
  }
  return {
    id: s.id, element: 'shackle', demand: loadMass / (s.legs * sinDeg(s.angleFromHorizontal)), capacity: wll,
    detail: s.size ? `${s.size} in shackle, one of ${s.legs}` : `shackle, one of ${s.legs}`,
  };
}

export const SHEAVE_K = { bushed: 1.09, roller: 1.04 } as const;

/** Lead-line factor: line pull ÷ load for N parts and the given lead sheaves. */
export function leadLineFactor(parts: number, k: number, leadSheaves = 0): number {
  const kn = k ** parts;
  return ((kn * (k - 1)) / (kn - 1)) * k ** leadSheaves;
}

/** Largest hook load the winch can raise: rated line pull ÷ lead-line factor. */
export function winchCapacity(w: WinchInput): number {
  return w.ratedLinePull / leadLineFactor(w.parts, SHEAVE_K[w.sheaves], w.leadSheaves);
}

export function winchVerdict(w: WinchInput, hookLoad: number): RiggingVerdict {
  const f = leadLineFactor(w.parts, SHEAVE_K[w.sheaves], w.leadSheaves);
  return {
    id: 'winch', element: 'winch', demand: hookLoad * f, capacity: w.ratedLinePull,
    detail: `${w.parts} parts of line over ${w.sheaves} sheaves, ${w.leadSheaves} lead sheave(s), lead-line factor ${f.toFixed(4)}`,
  };
}
