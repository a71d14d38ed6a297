import { src, type RowSource } from './source';

/**
 * Alloy chain slings for overhead lifting, grade 80 and grade 100: single-leg vertical working load
 * limit in lb, by the size name chain is sold under for lifting. Source: ASTM A906/A906M (scope read) and
 * the WLL tables chain makers publish to it and to ASME B30.9; two independent makers' tables agree on
 * every [read] row (reference.md). Grade 100 in 7/32 is [memory]; no grade 100 row for 1 in.
 * Only these grades are lifting chain: see lifting-use.ts.
 */
export const LIFTING_CHAIN_GRADES = ['80', '100'] as const;
export type LiftingChainGrade = (typeof LIFTING_CHAIN_GRADES)[number];

export interface AlloyChainRow {
  grade: LiftingChainGrade;
  size: string;
  lb: number;
  source: RowSource;
}

const A906 = src('read', "ASTM A906 alloy chain sling WLL, makers' tables");
const A906_MEM = src('memory', "ASTM A906 alloy chain sling WLL, makers' tables");

export const ALLOY_CHAIN_ROWS: readonly AlloyChainRow[] = [
  { grade: '80', size: '7/32', lb: 2100, source: A906 },
  { grade: '80', size: '9/32', lb: 3500, source: A906 },
  { grade: '80', size: '5/16', lb: 4500, source: A906 },
  { grade: '80', size: '3/8', lb: 7100, source: A906 },
  { grade: '80', size: '1/2', lb: 12000, source: A906 },
  { grade: '80', size: '5/8', lb: 18100, source: A906 },
  { grade: '80', size: '3/4', lb: 28300, source: A906 },
  { grade: '80', size: '7/8', lb: 34200, source: A906 },
  { grade: '80', size: '1', lb: 47700, source: A906 },
  { grade: '100', size: '7/32', lb: 2700, source: A906_MEM },
  { grade: '100', size: '9/32', lb: 4300, source: A906 },
  { grade: '100', size: '5/16', lb: 5700, source: A906 },
  { grade: '100', size: '3/8', lb: 8800, source: A906 },
  { grade: '100', size: '1/2', lb: 15000, source: A906 },
  { grade: '100', size: '5/8', lb: 22600, source: A906 },
  { grade: '100', size: '3/4', lb: 35300, source: A906 },
  { grade: '100', size: '7/8', lb: 42700, source: A906 },
];

/** The lifting size names, smallest first. */
export const LIFTING_CHAIN_SIZES = ['7/32', '9/32', '5/16', '3/8', '1/2', '5/8', '3/4', '7/8', '1'] as const;

export function alloyChainRow(grade: string, size: string): AlloyChainRow | null {
  return ALLOY_CHAIN_ROWS.find((r) => r.grade === grade && r.size === size) ?? null;
}
