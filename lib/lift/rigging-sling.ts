import { KG_PER_LB } from '@/lib/units';
import { LiftError } from './errors';
import { alloyChainRow, chainGradeUse, chainSizeUse, RECOVERY_STRAP } from './ratings';
import { chokeAngleFactor } from './ratings/choke-angle';
import { hitchRow } from './ratings/hitch';
import { roundSlingRow } from './ratings/round-sling';
import { describeSource } from './ratings/source';
import { basketBendFactor, BASKET_RATED_AT } from './ratings/wire-rope-bend';
import type { SlingInput, SlingInputIn } from './rigging-schema';

/**
 * A sling assembly's capacity: the hitch's rating × sin(angle from horizontal) × the legs that carry the
 * load, at most three. ASME B30.9 and OSHA 1910.184 rate a quadruple leg sling as a triple: with four
 * legs one cannot be relied on to share the load. E.g. 4-leg 3/8 in grade 80 chain at 60°:
 * 3 × 7 100 lb × sin 60° ≈ 18 400 lb, the makers' published figure.
 */
export const MAX_LOAD_LEGS = 3;
/** Sling angles under this (from horizontal) draw a warning: avoid them (ASME B30.9 guidance, reference.md). */
export const LOW_SLING_ANGLE = 30;

export const sinDeg = (d: number) => Math.sin((d * Math.PI) / 180);
export const loadLegs = (legs: number) => Math.min(legs, MAX_LOAD_LEGS);

export interface SlingRating {
  /** What the whole assembly may carry, kg; 0 when refused. */
  capacity: number;
  /** The rating in the chosen hitch for one sling, vertical legs, kg. */
  hitchRating: number;
  ratingSource: string;
  assumptions: string[];
  warnings: string[];
  refused: string | null;
}

interface Base {
  vertical: number;
  choker?: number;
  basket?: number;
  source: string;
}

const lb = (x: number) => x * KG_PER_LB;

function baseRating(s: SlingInput): Base | { refused: string } {
  if (s.material === 'recovery-strap') return { refused: RECOVERY_STRAP.reason };
  if (s.material === 'chain') {
    const no = chainGradeUse(s.grade) ?? chainSizeUse(s.grade!, s.size ?? null);
    if (no) return { refused: no.reason };
    const row = alloyChainRow(s.grade!, s.size!)!;
    const table = { vertical: lb(row.lb), source: `grade ${row.grade} ${row.size} in: ${row.lb.toLocaleString('en-US')} lb, ${describeSource(row.source)}` };
    // A tag lower than the table governs (a worn or derated sling); never a tag above it.
    return s.verticalRating !== undefined && s.verticalRating < table.vertical ? { vertical: s.verticalRating, source: 'the tag (below the grade table)' } : table;
  }
  if (s.colour) {
    const r = roundSlingRow(s.colour);
    return { vertical: lb(r.vertical), choker: lb(r.choker), basket: lb(r.basket), source: `${s.colour} round sling, ${describeSource(r.source)}` };
  }
  if (s.verticalRating !== undefined) return { vertical: s.verticalRating, choker: s.chokerRating, basket: s.basketRating, source: 'the tag (entered rating)' };
  throw new LiftError('invalid-rigging', `Sling "${s.id}" needs a vertical rating, a round-sling colour or a chain grade and size.`, 'rigging.slings');
}

/** The schema's defaults, for callers that pass a sling without parsing it. */
export const withSlingDefaults = (raw: SlingInputIn): SlingInput => ({ material: 'other', legs: 1, angleFromHorizontal: 90, ...raw });

export function slingRating(raw: SlingInputIn): SlingRating {
  const s = withSlingDefaults(raw);
  const base = baseRating(s);
  if ('refused' in base) return { capacity: 0, hitchRating: 0, ratingSource: 'none', assumptions: [], warnings: [], refused: base.refused };
  const material = s.colour ? 'round-sling' : s.material;
  const factors = hitchRow(material);
  const assumptions: string[] = [];
  const sources = [base.source];
  let rating = base.vertical;
  if (s.hitch === 'choker') {
    const choke = chokeAngleFactor(s.chokeAngle);
    rating = (base.choker ?? base.vertical * factors.choker) * choke.factor;
    if (base.choker === undefined) sources.push(`choker ${factors.choker} × vertical, ${describeSource(factors.chokerSource)}`);
    sources.push(`choke angle ${choke.band.label} × ${choke.factor.toFixed(2)}, ${describeSource(choke.band.source)}`);
    if (choke.assumed) assumptions.push(`No choke angle given: a free-hanging choke (about ${choke.angle}°, factor ${choke.factor.toFixed(2)}) is assumed.`);
  } else if (s.hitch === 'basket') {
    rating = base.basket ?? base.vertical * factors.basket;
    if (base.basket === undefined) sources.push(`basket ${factors.basket} × vertical, ${describeSource(factors.basketSource)}`);
    if (s.bendRatio !== undefined && material === 'wire-rope') {
      const bend = basketBendFactor(s.bendRatio);
      rating *= bend.factor;
      sources.push(bend.row ? `D/d ${s.bendRatio} × ${bend.factor.toFixed(3)} (efficiency at D/d ${bend.row.ratio} ÷ at ${BASKET_RATED_AT}), ${describeSource(bend.row.source)}` : `D/d ${s.bendRatio} is below the table: no rating`);
    } else if (s.bendRatio !== undefined) {
      assumptions.push(`No D/d reduction table for this material: the basket rating is used as given at D/d ${s.bendRatio}.`);
    }
  }
  const legsCounted = loadLegs(s.legs);
  if (s.legs > MAX_LOAD_LEGS) assumptions.push(`${s.legs} legs are rated as ${MAX_LOAD_LEGS} carrying the load (ASME B30.9, OSHA 1910.184).`);
  const warnings = s.angleFromHorizontal < LOW_SLING_ANGLE ? [lowAngleWarning(s.angleFromHorizontal)] : [];
  return { capacity: rating * sinDeg(s.angleFromHorizontal) * legsCounted, hitchRating: rating, ratingSource: sources.join('; '), assumptions, warnings, refused: null };
}

export function lowAngleWarning(angle: number): string {
  return `Leg angle ${angle}° from horizontal is under ${LOW_SLING_ANGLE}°: each leg pulls ${(1 / sinDeg(angle)).toFixed(2)} × its share of the load; avoid angles under ${LOW_SLING_ANGLE}° (ASME B30.9 guidance).`;
}

export function slingCapacity(s: SlingInputIn): number {
  return slingRating(s).capacity;
}
