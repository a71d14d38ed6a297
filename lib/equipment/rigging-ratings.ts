import { KG_PER_LB } from '@/lib/units';
import {
  alloyChainRow, describeSource, LIFTING_CHAIN_GRADES, LIFTING_CHAIN_SIZES, liftingUse, parseChain, roundSlingColours, roundSlingRating,
  roundSlingRow, shackleRow, SHACKLE_SIZES, TIE_DOWN_RATED, TIE_DOWN_SOURCE_ID, type NotForLifting, type RoundSlingColour,
} from '@/lib/lift/ratings';
import type { RiggingKind } from '@/lib/domain';

/**
 * Ratings filled in from the engine's rating tables (lib/lift/ratings, one file per table, each row with
 * its source) where one applies, so the inventory and the rigging check read the same figures.
 */
export interface StandardRating {
  vertical: number;
  choker: number | null;
  basket: number | null;
  /** Short id stored with the item. */
  source: 'wstda-rs1' | 'shackle-wll' | 'astm-a906';
  /** What a person reads beside the auto-filled value. */
  note: string;
}

export const ROUND_SLING_COLOURS = roundSlingColours;
export { SHACKLE_SIZES };

/** "3/8 in grade 80" and so on: the lifting chain sizes the form offers. */
export const LIFTING_CHAIN_CHOICES = LIFTING_CHAIN_GRADES.flatMap((g) => LIFTING_CHAIN_SIZES.filter((s) => alloyChainRow(g, s)).map((s) => `${s} in grade ${g}`));

export function standardRating(kind: RiggingKind, size: string): StandardRating | null {
  const s = size.trim().toLowerCase();
  if (kind === 'round-sling') {
    const colour = (s === 'gray' ? 'grey' : s) as RoundSlingColour;
    if (!(roundSlingColours as readonly string[]).includes(colour)) return null;
    return { ...roundSlingRating(colour), source: 'wstda-rs1', note: `Polyester round sling by colour, ${describeSource(roundSlingRow(colour).source)}. Check the sling’s own tag.` };
  }
  if (kind === 'shackle') {
    const row = shackleRow(s);
    if (!row) return null;
    return { vertical: row.tons * 2000 * KG_PER_LB, choker: null, basket: null, source: 'shackle-wll', note: `Screw-pin anchor shackle WLL by size, ${describeSource(row.source)}. Check the shackle’s marking.` };
  }
  if (kind === 'chain') {
    const c = parseChain(s);
    const row = c.grade && c.size ? alloyChainRow(c.grade, c.size) : null;
    if (!row) return null;
    return {
      vertical: row.lb * KG_PER_LB,
      choker: null,
      basket: null,
      source: 'astm-a906',
      note: `Alloy chain sling, single leg vertical WLL, ${describeSource(row.source)}. Choker and basket follow the hitch factors; check the sling’s tag.`,
    };
  }
  return null;
}

/**
 * Why an inventory row cannot be used as lifting rigging, or null. Rows entered before the lifting rules
 * keep their stored figures and are flagged here, never re-rated or deleted behind the user's back.
 */
export function notForLifting(kind: RiggingKind, size: string, ratingSource: string): NotForLifting | null {
  return liftingUse(kind, size) ?? (ratingSource === TIE_DOWN_SOURCE_ID ? TIE_DOWN_RATED : null);
}
