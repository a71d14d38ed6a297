import type { LiftInput } from './schema';

/**
 * The band of load weights the weight sensitivity covers, percent below and above the plan's load mass.
 *
 * Defaults (common practice, no published source): a load whose weight is given (weighed, or from a
 * manifest) is looked at from −10 % to +25 %; one estimated from its dimensions from −20 % to +50 %.
 * The band reaches further up than down because a load heavier than thought is the dangerous direction
 * and the usual error (water, mud, cargo or attachments not on the paperwork). An estimate is wider
 * because a density times a volume misses hollows, contents and mixed materials. A stated uncertainty
 * (±u %) wider than the default widens the band to ±u; an explicit `weightBand` in the input governs.
 */
export const WEIGHT_BAND_GIVEN = { below: 10, above: 25 } as const;
export const WEIGHT_BAND_ESTIMATED = { below: 20, above: 50 } as const;

export interface WeightBand {
  /** Percent below the plan's load mass (a positive number: 10 means −10 %). */
  below: number;
  /** Percent above it. */
  above: number;
  /** Where the band comes from. */
  source: 'input' | 'given-default' | 'estimated-default';
}

export function weightBandOf(input: Pick<LiftInput, 'weightBand' | 'weightBasis' | 'weightUncertainty'>): WeightBand {
  if (input.weightBand) return { below: input.weightBand.below, above: input.weightBand.above, source: 'input' };
  const estimated = input.weightBasis === 'estimated';
  const d = estimated ? WEIGHT_BAND_ESTIMATED : WEIGHT_BAND_GIVEN;
  const u = input.weightUncertainty ?? 0;
  // Below −100 % there is no load at all.
  return { below: Math.min(100, Math.max(d.below, u)), above: Math.max(d.above, u), source: estimated ? 'estimated-default' : 'given-default' };
}
