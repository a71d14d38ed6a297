import { KG_PER_LB } from '@/lib/units';
import type { roundSlingColours } from './schema';

/**
 * Polyester round slings, WSTDA RS-1 colour code: rated capacity in lb for vertical, choker and vertical
 * basket hitches (value from memory; see reference.md). The basket column is twice the vertical one.
 */
export type RoundSlingColour = (typeof roundSlingColours)[number];

export const ROUND_SLING_LB: Record<RoundSlingColour, { vertical: number; choker: number; basket: number }> = {
  purple: { vertical: 2600, choker: 2100, basket: 5200 },
  green: { vertical: 5300, choker: 4200, basket: 10600 },
  yellow: { vertical: 8400, choker: 6700, basket: 16800 },
  tan: { vertical: 10600, choker: 8500, basket: 21200 },
  red: { vertical: 13200, choker: 10600, basket: 26400 },
  white: { vertical: 16800, choker: 13400, basket: 33600 },
  blue: { vertical: 21200, choker: 17000, basket: 42400 },
  grey: { vertical: 25000, choker: 20000, basket: 50000 },
  brown: { vertical: 31000, choker: 24800, basket: 62000 },
  olive: { vertical: 40000, choker: 32000, basket: 80000 },
  black: { vertical: 53000, choker: 42400, basket: 106000 },
};

export function roundSlingRating(colour: RoundSlingColour): { vertical: number; choker: number; basket: number } {
  const lb = ROUND_SLING_LB[colour];
  return { vertical: lb.vertical * KG_PER_LB, choker: lb.choker * KG_PER_LB, basket: lb.basket * KG_PER_LB };
}

/**
 * Screw-pin anchor shackles: working load limit in short tons of 2 000 lb (value from memory; the 1/2,
 * 5/8 and 3/4 rows equal the RR-C-271D minimum strengths ÷ 5).
 */
export const SHACKLE_WLL_TONS: Record<string, number> = {
  '1/4': 0.5,
  '5/16': 0.75,
  '3/8': 1,
  '7/16': 1.5,
  '1/2': 2,
  '5/8': 3.25,
  '3/4': 4.75,
  '7/8': 6.5,
  '1': 8.5,
  '1-1/8': 9.5,
  '1-1/4': 12,
  '1-3/8': 13.5,
  '1-1/2': 17,
  '1-3/4': 25,
  '2': 35,
};

export const SHACKLE_SIZES = Object.keys(SHACKLE_WLL_TONS);

/** WLL of a shackle size in kg, or null for a size not in the table. */
export function shackleWll(size: string): number | null {
  const tons = SHACKLE_WLL_TONS[size.trim().replace(/\s*(in|")$/i, '').replace(/\s+/g, '-')];
  return tons === undefined ? null : tons * 2000 * KG_PER_LB;
}

/**
 * Choker hitch: 0.8 of the vertical rating at a choke angle of 120° or more, reduced for tighter angles
 * to 82 %, 71 %, 58 % and 50 % of that (ASME B30.9; value from memory).
 */
export function chokerFactor(chokeAngle = 120): number {
  const reduction = chokeAngle >= 120 ? 1 : chokeAngle >= 105 ? 0.82 : chokeAngle >= 90 ? 0.71 : chokeAngle >= 60 ? 0.58 : 0.5;
  return 0.8 * reduction;
}

/** Vertical 1, choker per chokerFactor, vertical basket 2 (ASME B30.9; value from memory). */
export function hitchFactor(hitch: 'vertical' | 'choker' | 'basket', chokeAngle?: number): number {
  return hitch === 'vertical' ? 1 : hitch === 'basket' ? 2 : chokerFactor(chokeAngle);
}
