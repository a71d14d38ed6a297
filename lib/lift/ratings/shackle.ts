import { src, type RowSource } from './source';

/**
 * Screw-pin anchor shackles: working load limit in short tons of 2 000 lb. The 1/2, 5/8 and 3/4 in rows
 * are [derived]: RR-C-271D's minimum ultimate strengths (20 000, 32 500, 47 500 lb, read in a utility's
 * material standard citing it) ÷ the design factor 5. The other rows are [memory] (reference.md).
 */
export interface ShackleRow {
  size: string;
  tons: number;
  source: RowSource;
}

const MEM = src('memory', 'screw-pin anchor shackle WLL table');
const RR = src('derived', 'RR-C-271D minimum strength ÷ 5');

export const SHACKLE_ROWS: readonly ShackleRow[] = [
  { size: '1/4', tons: 0.5, source: MEM },
  { size: '5/16', tons: 0.75, source: MEM },
  { size: '3/8', tons: 1, source: MEM },
  { size: '7/16', tons: 1.5, source: MEM },
  { size: '1/2', tons: 2, source: RR },
  { size: '5/8', tons: 3.25, source: RR },
  { size: '3/4', tons: 4.75, source: RR },
  { size: '7/8', tons: 6.5, source: MEM },
  { size: '1', tons: 8.5, source: MEM },
  { size: '1-1/8', tons: 9.5, source: MEM },
  { size: '1-1/4', tons: 12, source: MEM },
  { size: '1-3/8', tons: 13.5, source: MEM },
  { size: '1-1/2', tons: 17, source: MEM },
  { size: '1-3/4', tons: 25, source: MEM },
  { size: '2', tons: 35, source: MEM },
];

export const SHACKLE_WLL_TONS: Record<string, number> = Object.fromEntries(SHACKLE_ROWS.map((r) => [r.size, r.tons]));
export const SHACKLE_SIZES = SHACKLE_ROWS.map((r) => r.size);

/** "5/8", "5/8 in", '1 1/4"' → the table's row, or null. */
export function shackleRow(size: string): ShackleRow | null {
  const key = size.trim().replace(/\s*(in|")$/i, '').replace(/\s+/g, '-');
  return SHACKLE_ROWS.find((r) => r.size === key) ?? null;
}
