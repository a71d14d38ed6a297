import { src, type RowSource } from './source';

/**
 * Choke-angle factors: the choker rating is multiplied by the factor of the band the choke angle falls in
 * (the angle the sling body makes at the choke point). Source: the ASME B30.9 choke-angle table as
 * reproduced in several sling makers' published instructions, which agree [read] (reference.md,
 * corrected). The bands are whole degrees; an angle between two bands (89.5°) takes the lower band's
 * factor, so a fraction never raises a rating.
 */
export interface ChokeBand {
  /** Lowest angle in the band, degrees (inclusive). */
  from: number;
  /** Highest angle in the band, degrees (inclusive); null = no upper end. */
  to: number | null;
  /** True when `from` itself is excluded ("over 120°"). */
  fromExclusive?: boolean;
  factor: number;
  label: string;
  source: RowSource;
}

const B309 = src('read', 'ASME B30.9 choke-angle table');

export const CHOKE_BANDS: readonly ChokeBand[] = [
  { from: 120, to: null, fromExclusive: true, factor: 1.0, label: 'over 120°', source: B309 },
  { from: 90, to: 120, factor: 0.87, label: '90–120°', source: B309 },
  { from: 60, to: 89, factor: 0.74, label: '60–89°', source: B309 },
  { from: 30, to: 59, factor: 0.62, label: '30–59°', source: B309 },
  { from: 0, to: 29, factor: 0.49, label: '0–29°', source: B309 },
];

/** A choke left to hang freely settles at about 135° (reference.md); used when no angle is given. */
export const FREE_HANGING_CHOKE = 135;

export interface ChokeFactor {
  factor: number;
  band: ChokeBand;
  /** The angle used, degrees. */
  angle: number;
  /** True when no angle was given and a free-hanging choke was assumed. */
  assumed: boolean;
}

export function chokeAngleFactor(angle?: number): ChokeFactor {
  const a = angle ?? FREE_HANGING_CHOKE;
  // Bands from the top: the first whose lower end the angle reaches.
  const band = CHOKE_BANDS.find((b) => (b.fromExclusive ? a > b.from : a >= b.from)) ?? CHOKE_BANDS[CHOKE_BANDS.length - 1];
  return { factor: band.factor, band, angle: a, assumed: angle === undefined };
}
