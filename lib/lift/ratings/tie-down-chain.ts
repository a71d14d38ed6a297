import { src, type RowSource } from './source';

/**
 * Chain as a cargo tie-down, 49 CFR 393.108 (read): working load limits in lb for securing cargo on a
 * vehicle. These are NOT lifting ratings. The table is kept only to recognise items that were rated from
 * it and to say so; nothing in Arcline rates a lifting item from it.
 */
export interface TieDownChainRow {
  grade: '70' | '80' | '100';
  /** The regulation's size name (7 mm is listed as 1/4 in). */
  size: string;
  lb: number;
  source: RowSource;
}

const CFR = src('read', '49 CFR 393.108 tie-down WLL table');

export const TIE_DOWN_CHAIN_ROWS: readonly TieDownChainRow[] = (
  [
    ['70', [3150, 4700, 6600, 11300, 15800]],
    ['80', [3500, 4500, 7100, 12000, 18100]],
    ['100', [4300, 5700, 8800, 15000, 22600]],
  ] as const
).flatMap(([grade, lbs]) => lbs.map((lb, i) => ({ grade, size: ['1/4', '5/16', '3/8', '1/2', '5/8'][i], lb, source: CFR })));

/** The tie-down table's id as stored on inventory items rated from it before lifting tables existed. */
export const TIE_DOWN_SOURCE_ID = 'cfr-393-108';
