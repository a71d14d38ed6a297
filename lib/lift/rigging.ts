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
  /** What results call it (the input's name, else its id). */
  name: string;
  element: 'sling' | 'shackle' | 'winch';
  /** The element's share of the load, kg (line pull for the winch). */
  demand: number;
  /** What it may carry, kg (rated line pull for the winch). */
  capacity: number;
  /** How it is used, as data: legs, hitch and angle; shackle size; parts of line and sheaves. */
  facts: RiggingFacts;
}

export interface RiggingFacts {
  legs: number | null;
  hitch: SlingInput['hitch'] | null;
  /** Leg angle from horizontal, degrees. */
  angleFromHorizontal: number | null;
  /** Round-sling colour when the rating comes from the colour table. */
  colour: SlingInput['colour'] | null;
  /** Nominal shackle size, inches ("5/8"). */
  size: string | null;
  parts: number | null;
  sheaves: WinchInput['sheaves'] | null;
  leadSheaves: number | null;
  leadLineFactor: number | null;
}

const NO_FACTS: RiggingFacts = {
  legs: null, hitch: null, angleFromHorizontal: null, colour: null, size: null, parts: null, sheaves: null, leadSheaves: null, leadLineFactor: null,
};

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
  return {
    id: s.id, name: s.name ?? s.id, element: 'sling', demand: loadMass, capacity: slingCapacity(s),
    facts: { ...NO_FACTS, legs: s.legs, hitch: s.hitch, angleFromHorizontal: s.angleFromHorizontal, colour: s.colour ?? null },
  };
}

export function shackleVerdict(s: ShackleInput, loadMass: number): RiggingVerdict {
  const wll = s.wll ?? (s.size ? shackleWll(s.size) : null);
  if (wll === null) {
    const what = s.size ? `size "${s.size}" is not in the shackle table` : 'needs a size or a working load limit';
    throw new LiftError('invalid-rigging', `Shackle "${s.id}": ${what}.`, 'rigging.shackles');
  }
  return {
    id: s.id, name: s.name ?? s.id, element: 'shackle', demand: loadMass / (s.legs * sinDeg(s.angleFromHorizontal)), capacity: wll,
    facts: { ...NO_FACTS, legs: s.legs, angleFromHorizontal: s.angleFromHorizontal, size: s.size ?? null },
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
    id: 'winch', name: 'winch', element: 'winch', demand: hookLoad * f, capacity: w.ratedLinePull,
    facts: { ...NO_FACTS, parts: w.parts, sheaves: w.sheaves, leadSheaves: w.leadSheaves, leadLineFactor: f },
  };
}
