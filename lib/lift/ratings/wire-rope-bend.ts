import { src, type RowSource } from './source';

/**
 * Wire rope bent around a pin or the load: efficiency by D/d (diameter bent around ÷ rope diameter),
 * static loads. The curve is the Wire Rope Technical Board's (Wire Rope Users Manual) as reproduced in
 * makers' sling guides [memory]. Makers rate wire rope slings in a basket at D/d 25 [read, makers'
 * guidance], so below 25 the basket rating is scaled by efficiency(D/d) ÷ efficiency(25) [derived].
 * Between rows the smaller D/d's efficiency is used, so no ratio gets more than its row.
 */
export interface BendRow {
  ratio: number;
  efficiency: number;
  source: RowSource;
}

const WRTB = src('memory', 'Wire Rope Users Manual, D/d efficiency curve');

export const WIRE_ROPE_BEND_ROWS: readonly BendRow[] = [
  [1, 0.5], [2, 0.65], [4, 0.75], [6, 0.79], [8, 0.83], [10, 0.86], [15, 0.88], [20, 0.91], [25, 0.92], [30, 0.93], [40, 0.95],
].map(([ratio, efficiency]) => ({ ratio, efficiency, source: WRTB }));

/** D/d at which makers' wire rope basket ratings are given. */
export const BASKET_RATED_AT = 25;

export interface BendFactor {
  /** Multiplier on the basket rating (1 at D/d 25 and above). */
  factor: number;
  /** The table row used, or null when D/d is below the table (no rating). */
  row: BendRow | null;
}

export function basketBendFactor(ratio: number): BendFactor {
  if (ratio >= BASKET_RATED_AT) return { factor: 1, row: WIRE_ROPE_BEND_ROWS.find((r) => r.ratio === BASKET_RATED_AT)! };
  const row = [...WIRE_ROPE_BEND_ROWS].reverse().find((r) => r.ratio <= ratio) ?? null;
  const at25 = WIRE_ROPE_BEND_ROWS.find((r) => r.ratio === BASKET_RATED_AT)!.efficiency;
  return { factor: row ? row.efficiency / at25 : 0, row };
}
