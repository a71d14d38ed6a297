import { src, type RowSource } from './source';

/**
 * Hitch factors, applied to a sling's vertical rating when its tag gives no rating for the hitch (a tag's
 * own choker or basket rating always governs). Choker is before the choke-angle factor.
 */
export const slingMaterials = ['round-sling', 'web-sling', 'wire-rope', 'chain', 'recovery-strap', 'other'] as const;
export type SlingMaterial = (typeof slingMaterials)[number];

export interface HitchRow {
  material: SlingMaterial;
  choker: number;
  basket: number;
  chokerSource: RowSource;
  basketSource: RowSource;
}

const B309_MEM = src('memory', 'ASME B30.9 hitch factors');
const WIRE_CHOKER = src('read', "wire rope sling makers' guidance, choker ≈ 0.75 of vertical");

const row = (material: SlingMaterial, choker: number, chokerSource: RowSource): HitchRow => ({ material, choker, basket: 2, chokerSource, basketSource: B309_MEM });

export const HITCH_ROWS: readonly HitchRow[] = [
  row('round-sling', 0.8, B309_MEM),
  row('web-sling', 0.8, B309_MEM),
  row('chain', 0.8, B309_MEM),
  row('wire-rope', 0.75, WIRE_CHOKER),
  // Unknown material: the lower of the choker factors above, so an unnamed sling is not over-rated.
  row('other', 0.75, src('derived', 'lowest choker factor of the known materials')),
];

export const hitchRow = (material: SlingMaterial): HitchRow => HITCH_ROWS.find((r) => r.material === material) ?? HITCH_ROWS[HITCH_ROWS.length - 1];
