import { KG_PER_LB } from '@/lib/units';
import { LiftError } from './errors';
import { shackleRow } from './ratings/shackle';
import { describeSource } from './ratings/source';
import type { HookInput, Rigging, ShackleInput, SlingInputIn, SnatchBlockInput, WinchInput } from './rigging-schema';
import { loadLegs, lowAngleWarning, LOW_SLING_ANGLE, MAX_LOAD_LEGS, sinDeg, slingRating, withSlingDefaults } from './rigging-sling';

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
  element: 'sling' | 'shackle' | 'hook' | 'snatch-block' | 'winch';
  /** The element's share of the load, kg (line pull for the winch, the block's load for a snatch block). */
  demand: number;
  /** What it may carry, kg (rated line pull for the winch); 0 when the item is refused. */
  capacity: number;
  detail: string;
  /** Where the rating comes from: the table row with its source, or the tag. */
  ratingSource: string;
  /** Assumptions the figures rest on, in words. */
  assumptions: string[];
  /** Points to look at that do not by themselves fail the check. */
  warnings: string[];
  /** Why the item is not lifting rigging at all; the check then fails. */
  refused: string | null;
}

const base = { assumptions: [] as string[], warnings: [] as string[], refused: null };

export function slingVerdict(raw: SlingInputIn, loadMass: number): RiggingVerdict {
  const s = withSlingDefaults(raw);
  const r = slingRating(s);
  const how = s.colour ? `${s.colour} round sling` : s.material === 'chain' ? `grade ${s.grade ?? '?'} chain${s.size ? ` ${s.size} in` : ''}` : s.material === 'other' ? 'sling' : s.material.replace('-', ' ');
  const choke = s.hitch === 'choker' && s.chokeAngle !== undefined ? `, choke angle ${s.chokeAngle}°` : '';
  return {
    id: s.id, element: 'sling', demand: loadMass, capacity: r.capacity,
    detail: `${s.legs} × ${how}, ${s.hitch} hitch${choke} at ${s.angleFromHorizontal}° from horizontal`,
    ratingSource: r.ratingSource, assumptions: r.assumptions, warnings: r.warnings, refused: r.refused,
  };
}

/** Tension in one leg of an assembly, kg: the three-leg rule applies to the demand as to the capacity. */
export function legTension(loadMass: number, legs: number, angleFromHorizontal: number): number {
  return loadMass / (loadLegs(legs) * sinDeg(angleFromHorizontal));
}

function legNotes(legs: number, angle: number) {
  return {
    assumptions: legs > MAX_LOAD_LEGS ? [`${legs} legs: the load is shared by ${MAX_LOAD_LEGS} (ASME B30.9, OSHA 1910.184).`] : [],
    warnings: angle < LOW_SLING_ANGLE ? [lowAngleWarning(angle)] : [],
  };
}

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
    ...base, ...legNotes(s.legs, s.angleFromHorizontal),
    id: s.id, element: 'shackle', demand: legTension(loadMass, s.legs, s.angleFromHorizontal), capacity: wll,
    detail: `${s.size ? `${s.size} in shackle` : 'shackle'}, ${s.legs > 1 ? `one in each of ${s.legs} legs` : 'single leg'} at ${s.angleFromHorizontal}° from horizontal`,
    ratingSource: row ? `${row.size} in: ${row.tons} t, ${describeSource(row.source)}` : 'the marking (entered WLL)',
  };
}

export function hookVerdict(h: HookInput, loadMass: number): RiggingVerdict {
  const master = h.legs === 1 && h.angleFromHorizontal === 90;
  return {
    ...base, ...legNotes(h.legs, h.angleFromHorizontal),
    id: h.id, element: 'hook', demand: legTension(loadMass, h.legs, h.angleFromHorizontal), capacity: h.wll,
    detail: master ? 'hook carrying the whole load' : `hook on each of ${h.legs} legs at ${h.angleFromHorizontal}° from horizontal`,
    ratingSource: 'the marking (entered WLL)',
  };
}

/** Resultant on a snatch block (and its anchor): 2·T·cos(θ/2), θ between the two parts of line. */
export function snatchBlockLoad(linePull: number, lineAngle: number): number {
  return 2 * linePull * Math.cos((lineAngle * Math.PI) / 360);
}

export function snatchBlockVerdict(b: SnatchBlockInput, hookLoad: number, winch?: WinchInput): RiggingVerdict {
  let pull = b.linePull;
  const assumptions: string[] = [];
  if (pull === undefined && winch) {
    pull = winchLinePull(winch, hookLoad);
    assumptions.push('Line pull taken as the winch’s line pull for this hook load.');
  } else if (pull === undefined) {
    pull = hookLoad;
    assumptions.push('No line pull given: the line is taken to carry the whole hook load.');
  }
  return {
    ...base, assumptions,
    id: b.id, element: 'snatch-block', demand: snatchBlockLoad(pull, b.lineAngle), capacity: b.wll,
    detail: `snatch block, ${b.lineAngle}° between its lines, line pull ${Math.round(pull)} kg, load 2·T·cos(θ/2)`,
    ratingSource: 'the marking (entered WLL)',
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
    ...base,
    id: 'winch', element: 'winch', demand: hookLoad * f, capacity: w.ratedLinePull,
    detail: `${w.parts} parts of line over ${w.sheaves} sheaves, ${w.leadSheaves} lead sheave(s), lead-line factor ${f.toFixed(4)}`,
    ratingSource: 'the winch’s rated line pull (entered)',
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
