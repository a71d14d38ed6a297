import { KG_PER_LB } from '@/lib/units';
import { src, type RowSource } from './source';

/**
 * Polyester round slings by WSTDA RS-1 colour code: rated capacity in lb, vertical / choker / vertical
 * basket. Every row is [memory] (reference.md); the basket column is twice the vertical one, which is
 * common practice for round slings.
 */
export const roundSlingColours = ['purple', 'green', 'yellow', 'tan', 'red', 'white', 'blue', 'grey', 'brown', 'olive', 'black'] as const;
export type RoundSlingColour = (typeof roundSlingColours)[number];

export interface RoundSlingRow {
  colour: RoundSlingColour;
  vertical: number;
  choker: number;
  basket: number;
  source: RowSource;
}

const RS1 = src('memory', 'WSTDA RS-1 round sling colour code table');

export const ROUND_SLING_ROWS: readonly RoundSlingRow[] = [
  { colour: 'purple', vertical: 2600, choker: 2100, basket: 5200, source: RS1 },
  { colour: 'green', vertical: 5300, choker: 4200, basket: 10600, source: RS1 },
  { colour: 'yellow', vertical: 8400, choker: 6700, basket: 16800, source: RS1 },
  { colour: 'tan', vertical: 10600, choker: 8500, basket: 21200, source: RS1 },
  { colour: 'red', vertical: 13200, choker: 10600, basket: 26400, source: RS1 },
  { colour: 'white', vertical: 16800, choker: 13400, basket: 33600, source: RS1 },
  { colour: 'blue', vertical: 21200, choker: 17000, basket: 42400, source: RS1 },
  { colour: 'grey', vertical: 25000, choker: 20000, basket: 50000, source: RS1 },
  { colour: 'brown', vertical: 31000, choker: 24800, basket: 62000, source: RS1 },
  { colour: 'olive', vertical: 40000, choker: 32000, basket: 80000, source: RS1 },
  { colour: 'black', vertical: 53000, choker: 42400, basket: 106000, source: RS1 },
];

/** lb by colour, for callers that only want the figures. */
export const ROUND_SLING_LB = Object.fromEntries(ROUND_SLING_ROWS.map((r) => [r.colour, { vertical: r.vertical, choker: r.choker, basket: r.basket }])) as Record<
  RoundSlingColour,
  { vertical: number; choker: number; basket: number }
>;

export const roundSlingRow = (colour: RoundSlingColour): RoundSlingRow => ROUND_SLING_ROWS.find((r) => r.colour === colour)!;

/** The colour's ratings in kg. */
export function roundSlingRating(colour: RoundSlingColour): { vertical: number; choker: number; basket: number } {
  const r = roundSlingRow(colour);
  return { vertical: r.vertical * KG_PER_LB, choker: r.choker * KG_PER_LB, basket: r.basket * KG_PER_LB };
}
