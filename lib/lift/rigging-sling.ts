import { KG_PER_LB } from '@/lib/units';
import { LiftError } from './errors';
import { alloyChainRow, chainGradeUse, chainSizeUse, RECOVERY_STRAP, type NotForLifting } from './ratings';
import { chokeAngleFactor } from './ratings/choke-angle';
import { hitchRow, type SlingMaterial } from './ratings/hitch';
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
  material: SlingMaterial;
  legsCounted: number;
  /** Choker: the angle used, its factor, and whether a free-hanging choke was assumed (no angle given). */
  choke: { angle: number; factor: number; assumed: boolean } | null;
  /** Basket with a D/d: the factor applied, or null where the material has no D/d table. */
  bend: { ratio: number; factor: number | null } | null;
  /** Leg angle under 30° from horizontal. */
  lowAngle: boolean;
  refused: Refusal | null;
}

/** Why an item is not lifting rigging: a stable code and the reason in words. */
export interface Refusal {
  code: NotForLifting['code'];
  reason: string;
}

interface Base {
  vertical: number;
  choker?: number;
  basket?: number;
  source: string;
}

const lb = (x: number) => x * KG_PER_LB;

function baseRating(s: SlingInput): Base | { refused: Refusal } {
  if (s.material === 'recovery-strap') return { refused: RECOVERY_STRAP };
  if (s.material === 'chain') {
    const no = chainGradeUse(s.grade) ?? chainSizeUse(s.grade!, s.size ?? null);
    if (no) return { refused: no };
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
  const material = s.colour ? 'round-sling' : s.material;
  const none = { material, legsCounted: loadLegs(s.legs), choke: null, bend: null, lowAngle: s.angleFromHorizontal < LOW_SLING_ANGLE };
  const base = baseRating(s);
  if ('refused' in base) return { ...none, capacity: 0, hitchRating: 0, ratingSource: 'none', refused: base.refused };
  const factors = hitchRow(material);
  const sources = [base.source];
  let rating = base.vertical;
  let choke: SlingRating['choke'] = null;
  let bend: SlingRating['bend'] = null;
  if (s.hitch === 'choker') {
    const c = chokeAngleFactor(s.chokeAngle);
    choke = { angle: c.angle, factor: c.factor, assumed: c.assumed };
    rating = (base.choker ?? base.vertical * factors.choker) * c.factor;
    if (base.choker === undefined) sources.push(`choker ${factors.choker} × vertical, ${describeSource(factors.chokerSource)}`);
    sources.push(`choke angle ${c.band.label} × ${c.factor.toFixed(2)}, ${describeSource(c.band.source)}`);
  } else if (s.hitch === 'basket') {
    rating = base.basket ?? base.vertical * factors.basket;
    if (base.basket === undefined) sources.push(`basket ${factors.basket} × vertical, ${describeSource(factors.basketSource)}`);
    if (s.bendRatio !== undefined && material === 'wire-rope') {
      const b = basketBendFactor(s.bendRatio);
      rating *= b.factor;
      bend = { ratio: s.bendRatio, factor: b.factor };
      sources.push(b.row ? `D/d ${s.bendRatio} × ${b.factor.toFixed(3)} (efficiency at D/d ${b.row.ratio} ÷ at ${BASKET_RATED_AT}), ${describeSource(b.row.source)}` : `D/d ${s.bendRatio} is below the table: no rating`);
    } else if (s.bendRatio !== undefined) {
      bend = { ratio: s.bendRatio, factor: null };
    }
  }
  return { ...none, choke, bend, capacity: rating * sinDeg(s.angleFromHorizontal) * none.legsCounted, hitchRating: rating, ratingSource: sources.join('; '), refused: null };
}

export function slingCapacity(s: SlingInputIn): number {
  return slingRating(s).capacity;
}
