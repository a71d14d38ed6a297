import { KG_PER_LB } from '@/lib/units';
import { roundSlingRating, shackleWll, SHACKLE_SIZES, type RoundSlingColour } from '@/lib/lift/rigging-tables';
import { roundSlingColours } from '@/lib/lift/schema';
import type { RiggingKind } from '@/lib/domain';

/**
 * Ratings filled in from built-in standard tables where one applies. Every table lives in the engine
 * (lib/lift/rigging-tables.ts) or here with its source; values marked "value from memory" follow
 * /work/shared/reference.md and are not yet checked against the primary text.
 */
export interface StandardRating {
  vertical: number;
  choker: number | null;
  basket: number | null;
  /** Short id stored with the item. */
  source: 'wstda-rs1' | 'shackle-wll' | 'cfr-393-108';
  /** What a person reads beside the auto-filled value. */
  note: string;
}

export const ROUND_SLING_COLOURS = roundSlingColours;
export { SHACKLE_SIZES };

/**
 * Chain tie-down working load limits, lb, by grade and nominal size: 49 CFR 393.108 table (read).
 * These are tie-down limits for cargo securement, not overhead lifting ratings.
 */
export const CHAIN_TIEDOWN_LB: Record<'70' | '80' | '100', Record<string, number>> = {
  '70': { '1/4': 3150, '5/16': 4700, '3/8': 6600, '1/2': 11300, '5/8': 15800 },
  '80': { '1/4': 3500, '5/16': 4500, '3/8': 7100, '1/2': 12000, '5/8': 18100 },
  '100': { '1/4': 4300, '5/16': 5700, '3/8': 8800, '1/2': 15000, '5/8': 22600 },
};
export const CHAIN_SIZES = ['1/4', '5/16', '3/8', '1/2', '5/8'] as const;
export const CHAIN_GRADES = ['70', '80', '100'] as const;

/** "3/8 in grade 80", "3/8 G80", "3/8in g80" → { size: '3/8', grade: '80' }. */
export function parseChainSize(text: string): { size: string; grade: '70' | '80' | '100' } | null {
  const m = text.trim().match(/^(\d+\/\d+|\d+)\s*(?:in|")?\s*(?:grade|g)\s*(70|80|100)$/i);
  if (!m || !(CHAIN_SIZES as readonly string[]).includes(m[1])) return null;
  return { size: m[1], grade: m[2] as '70' | '80' | '100' };
}

export function standardRating(kind: RiggingKind, size: string): StandardRating | null {
  const s = size.trim().toLowerCase();
  if (kind === 'round-sling') {
    const colour = s === 'gray' ? 'grey' : s;
    if (!(roundSlingColours as readonly string[]).includes(colour)) return null;
    // The engine's own table, so the inventory and the rigging check read the same ratings.
    return {
      ...roundSlingRating(colour as RoundSlingColour),
      source: 'wstda-rs1',
      note: 'Polyester round sling by colour, WSTDA RS-1 (value from memory). Check the sling’s own tag.',
    };
  }
  if (kind === 'shackle') {
    const wll = shackleWll(s);
    if (wll === null) return null;
    return { vertical: wll, choker: null, basket: null, source: 'shackle-wll', note: 'Screw-pin anchor shackle WLL by size (value from memory; 1/2–3/4 in agree with RR-C-271D ÷ 5). Check the shackle’s marking.' };
  }
  if (kind === 'chain') {
    const c = parseChainSize(s);
    if (!c) return null;
    return {
      vertical: CHAIN_TIEDOWN_LB[c.grade][c.size] * KG_PER_LB,
      choker: null,
      basket: null,
      source: 'cfr-393-108',
      note: 'Chain tie-down WLL, 49 CFR 393.108 table. A tie-down limit, not an overhead lifting rating.',
    };
  }
  return null;
}
