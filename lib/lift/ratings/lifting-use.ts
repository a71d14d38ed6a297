import { alloyChainRow, LIFTING_CHAIN_GRADES, LIFTING_CHAIN_SIZES } from './alloy-chain';

/**
 * Which items may be used as lifting rigging at all, and why not. One rule for the inventory, the
 * editor's picker and the engine, so an item refused in one place is refused everywhere.
 * - Chain slings are alloy chain of grade 80 or 100 (ASTM A906 scope [read]; ASME B30.9 chain slings are
 *   alloy steel). Grade 70 "transport" chain (ASTM A413) and grades 30/43 are for tie-down and towing:
 *   excluding them is common practice.
 * - A recovery strap is made for pulling (winching), not lifting: it has no sling rating (common practice).
 */
export interface NotForLifting {
  code: 'recovery-strap' | 'chain-grade' | 'chain-no-grade' | 'chain-size' | 'tie-down-rating';
  reason: string;
}

export const RECOVERY_STRAP: NotForLifting = {
  code: 'recovery-strap',
  reason: 'A recovery strap is made for pulling (winching), not for lifting: it has no sling rating.',
};

export const TIE_DOWN_RATED: NotForLifting = {
  code: 'tie-down-rating',
  reason:
    'Its rating was taken from the cargo tie-down table (49 CFR 393.108), which is not a lifting rating. Enter the working load limit from the sling’s tag, or clear the ratings to take them from the grade 80/100 sling table.',
};

/** "3/8 in grade 80", "3/8 G80", '9/32" g100' → size and grade as written; either may be null. */
export function parseChain(text: string): { size: string | null; grade: string | null } {
  const t = text.trim().toLowerCase();
  const size = t.match(/^(\d+\/\d+|\d+)\s*(?:in\b|")?/)?.[1] ?? null;
  const grade = t.match(/(?:grade|gr\.?|g)\s*(\d{2,3})\b/)?.[1] ?? null;
  return { size, grade };
}

export function chainGradeUse(grade: string | null | undefined): NotForLifting | null {
  if (!grade) {
    return { code: 'chain-no-grade', reason: 'The chain’s grade is not given. Only alloy chain of grade 80 or 100 is a lifting sling (ASTM A906); write the size and grade, e.g. “3/8 in grade 80”.' };
  }
  if ((LIFTING_CHAIN_GRADES as readonly string[]).includes(grade)) return null;
  return {
    code: 'chain-grade',
    reason: `Grade ${grade} chain is tie-down and towing chain, not a lifting sling: only alloy chain of grade 80 or 100 is rated for overhead lifting (ASTM A906, ASME B30.9). Its 49 CFR 393.108 figure is a cargo tie-down limit.`,
  };
}

/** A lifting grade whose size is not a lifting size name in the sling table. */
export function chainSizeUse(grade: string, size: string | null): NotForLifting | null {
  if (size && alloyChainRow(grade, size)) return null;
  const known = LIFTING_CHAIN_SIZES.filter((s) => alloyChainRow(grade, s)).join(', ');
  const quarter = size === '1/4' ? ' “1/4 in” is the tie-down table’s name for 7 mm chain; for lifting that chain is sold as 9/32 in.' : '';
  return { code: 'chain-size', reason: `Grade ${grade} chain sling sizes are ${known} in.${quarter} Enter the size on the sling’s tag.` };
}

/** Whether an inventory item of this kind and size can be a lifting item; null when it can. */
export function liftingUse(kind: string, size: string): NotForLifting | null {
  if (kind === 'recovery-strap') return RECOVERY_STRAP;
  if (kind !== 'chain') return null;
  const c = parseChain(size);
  return chainGradeUse(c.grade) ?? chainSizeUse(c.grade!, c.size);
}
