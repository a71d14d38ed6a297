import { KG_PER_LB } from '@/lib/units';
import { LiftError } from './errors';
import type { SlingMaterial } from './ratings/hitch';
import { shackleRow } from './ratings/shackle';
import { describeSource } from './ratings/source';
import type { HookInput, Rigging, ShackleInput, SlingInput, SlingInputIn, SnatchBlockInput, WinchInput } from './rigging-schema';
import { loadLegs, LOW_SLING_ANGLE, sinDeg, slingRating, withSlingDefaults, type Refusal } from './rigging-sling';

/**
 * Each rigging element against its share of the load. Slings: see rigging-sling.ts. Shackles and leg
 * hooks: WLL against the tension in their leg, load ÷ (legs carrying · sin angle), with the same
 * three-leg rule as the sling. Snatch block: 2·T·cos(θ/2), θ the angle between its two parts of line
 * (standard statics). Winch: with N parts of line the line pull is load × F, F = Kᴺ(K − 1)/(Kᴺ − 1), times
 * K for each lead sheave, K = 1.09 plain-bushed, 1.04 roller (Wire Rope Technical Board, Wire Rope
 * Users Manual, 4th ed.).
 */
export interface RiggingVerdict {
  id: string;
  /** What results call it (the input's name, else its id). */
  name: string;
  element: 'sling' | 'shackle' | 'hook' | 'snatch-block' | 'winch';
  /** The element's share of the load, kg (line pull for the winch, the block's load for a snatch block). */
  demand: number;
  /** What it may carry, kg (rated line pull for the winch); 0 when the item is refused. */
  capacity: number;
  /** How it is used and rated, as data. */
  facts: RiggingFacts;
}

export interface RiggingFacts {
  legs: number | null;
  /** Legs counted as carrying the load: at most 3 (ASME B30.9, OSHA 1910.184). */
  legsCounted: number | null;
  hitch: SlingInput['hitch'] | null;
  /** Leg angle from horizontal, degrees. */
  angleFromHorizontal: number | null;
  /** Under 30° from horizontal: the check may pass, but the angle is to be avoided. */
  lowAngle: boolean;
  /** Round-sling colour when the rating comes from the colour table. */
  colour: SlingInput['colour'] | null;
  material: SlingMaterial | null;
  /** Chain grade; shackle or chain size, inches ("5/8"). */
  grade: string | null;
  size: string | null;
  /** Choker: the choke angle used, its factor, and whether a free-hanging choke was assumed. */
  choke: { angle: number; factor: number; assumed: boolean } | null;
  /** Basket with a D/d: the factor applied, null where the material has no D/d table. */
  bend: { ratio: number; factor: number | null } | null;
  /** Snatch block: angle between its lines, the line pull and where that pull came from. */
  lineAngle: number | null;
  linePull: number | null;
  linePullFrom: 'given' | 'winch' | 'hook-load' | null;
  parts: number | null;
  sheaves: WinchInput['sheaves'] | null;
  leadSheaves: number | null;
  leadLineFactor: number | null;
  /** Where the rating comes from: the table row with its source, or the tag. */
  ratingSource: string;
  /** Not lifting rigging at all: the check fails with no limit. */
  refused: Refusal | null;
}

const NO_FACTS: RiggingFacts = {
  legs: null, legsCounted: null, hitch: null, angleFromHorizontal: null, lowAngle: false, colour: null, material: null, grade: null, size: null,
  choke: null, bend: null, lineAngle: null, linePull: null, linePullFrom: null, parts: null, sheaves: null, leadSheaves: null, leadLineFactor: null,
  ratingSource: '', refused: null,
};

export function slingVerdict(raw: SlingInputIn, loadMass: number): RiggingVerdict {
  const s = withSlingDefaults(raw);
  const r = slingRating(s);
  return {
    id: s.id, name: s.name ?? s.id, element: 'sling', demand: loadMass, capacity: r.capacity,
    facts: {
      ...NO_FACTS, legs: s.legs, legsCounted: r.legsCounted, hitch: s.hitch, angleFromHorizontal: s.angleFromHorizontal, lowAngle: r.lowAngle,
      colour: s.colour ?? null, material: r.material, grade: s.grade ?? null, size: s.size ?? null, choke: r.choke, bend: r.bend,
      ratingSource: r.ratingSource, refused: r.refused,
    },
  };
}

/** Tension in one leg of an assembly, kg: the three-leg rule applies to the demand as to the capacity. */
export function legTension(loadMass: number, legs: number, angleFromHorizontal: number): number {
  return loadMass / (loadLegs(legs) * sinDeg(angleFromHorizontal));
}

const legFacts = (legs: number, angle: number) => ({ legs, legsCounted: loadLegs(legs), angleFromHorizontal: angle, lowAngle: angle < LOW_SLING_ANGLE });

export function shackleWll(size: string): number | null {
  const row = shackleRow(size);
  return row ? row.tons * 2000 * KG_PER_LB : null;
}

export function shackleVerdict(s: ShackleInput, loadMass: number): RiggingVerdict {
  const row = s.wll === undefined && s.size ? shackleRow(s.size) : null;
  const wll = s.wll ?? (row ? row.tons * 2000 * KG_PER_LB : null);
  if (wll === null) {
    const what = s.size ? `size "${s.size}" is not in the shackle table` : 'needs a size or a working load limit';
    throw new LiftError('invalid-rigging', `Shackle "${s.id}": ${what}.`, 'rigging.shackles');
  }
  return {
    id: s.id, name: s.name ?? s.id, element: 'shackle', demand: legTension(loadMass, s.legs, s.angleFromHorizontal), capacity: wll,
    facts: { ...NO_FACTS, ...legFacts(s.legs, s.angleFromHorizontal), size: s.size ?? null, ratingSource: row ? `${row.size} in: ${row.tons} t, ${describeSource(row.source)}` : 'the marking (entered WLL)' },
  };
}

export function hookVerdict(h: HookInput, loadMass: number): RiggingVerdict {
  return {
    id: h.id, name: h.name ?? h.id, element: 'hook', demand: legTension(loadMass, h.legs, h.angleFromHorizontal), capacity: h.wll,
    facts: { ...NO_FACTS, ...legFacts(h.legs, h.angleFromHorizontal), ratingSource: 'the marking (entered WLL)' },
  };
}

/** Resultant on a snatch block (and its anchor): 2·T·cos(θ/2), θ between the two parts of line. */
export function snatchBlockLoad(linePull: number, lineAngle: number): number {
  return 2 * linePull * Math.cos((lineAngle * Math.PI) / 360);
}

export function snatchBlockVerdict(b: SnatchBlockInput, hookLoad: number, winch?: WinchInput): RiggingVerdict {
  const from: RiggingFacts['linePullFrom'] = b.linePull !== undefined ? 'given' : winch ? 'winch' : 'hook-load';
  const pull = b.linePull ?? (winch ? winchLinePull(winch, hookLoad) : hookLoad);
  return {
    id: b.id, name: b.name ?? b.id, element: 'snatch-block', demand: snatchBlockLoad(pull, b.lineAngle), capacity: b.wll,
    facts: { ...NO_FACTS, lineAngle: b.lineAngle, linePull: pull, linePullFrom: from, ratingSource: 'the marking (entered WLL)' },
  };
}

export const SHEAVE_K = { bushed: 1.09, roller: 1.04 } as const;

/** Lead-line factor: line pull ÷ load for N parts and the given lead sheaves. */
export function leadLineFactor(parts: number, k: number, leadSheaves = 0): number {
  const kn = k ** parts;
  return ((kn * (k - 1)) / (kn - 1)) * k ** leadSheaves;
}

export const winchLinePull = (w: WinchInput, hookLoad: number) => hookLoad * leadLineFactor(w.parts, SHEAVE_K[w.sheaves], w.leadSheaves);

/** Largest hook load the winch can raise: rated line pull ÷ lead-line factor. */
export function winchCapacity(w: WinchInput): number {
  return w.ratedLinePull / leadLineFactor(w.parts, SHEAVE_K[w.sheaves], w.leadSheaves);
}

export function winchVerdict(w: WinchInput, hookLoad: number): RiggingVerdict {
  const f = leadLineFactor(w.parts, SHEAVE_K[w.sheaves], w.leadSheaves);
  return {
    id: 'winch', name: 'winch', element: 'winch', demand: hookLoad * f, capacity: w.ratedLinePull,
    facts: { ...NO_FACTS, parts: w.parts, sheaves: w.sheaves, leadSheaves: w.leadSheaves, leadLineFactor: f, ratingSource: 'the winch’s rated line pull (entered)' },
  };
}

/** Every rigging verdict of a lift: slings, shackles and hooks on the load's mass; blocks and winch on the hook load. */
export function riggingVerdicts(r: Rigging | undefined, loadMass: number, hookLoad: number): RiggingVerdict[] {
  if (!r) return [];
  return [
    ...r.slings.map((s) => slingVerdict(s, loadMass)),
    ...r.shackles.map((s) => shackleVerdict(s, loadMass)),
    ...r.hooks.map((h) => hookVerdict(h, loadMass)),
    ...r.snatchBlocks.map((b) => snatchBlockVerdict(b, hookLoad, r.winch)),
    ...(r.winch ? [winchVerdict(r.winch, hookLoad)] : []),
  ];
}
