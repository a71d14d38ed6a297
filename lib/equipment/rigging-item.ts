import type { FieldIssue } from '@/lib/api/errors';
import type { RiggingItemData } from '@/lib/validations/rigging';
import { liftingUse } from '@/lib/lift/ratings';
import { standardRating } from './rigging-ratings';

export interface ResolvedRiggingItem extends RiggingItemData {
  ratingSource: string;
}

/** The item as stored before this write, when it is an update. */
export interface StoredKindSize {
  kind: string;
  size: string;
}

/**
 * Fills ratings from the built-in table when none were entered and one applies; otherwise keeps the
 * entered ones. An item needs a vertical rating either way: the editor cannot check rigging without it.
 * Items that are not lifting rigging (recovery straps, chain below grade 80, chain without a lifting
 * size and grade) are refused with the reason. A row stored before these rules may still be saved with
 * its kind and size unchanged (to retire it, or record its dates); it stays flagged.
 */
export function resolveRatings(item: RiggingItemData, stored?: StoredKindSize): { ok: true; item: ResolvedRiggingItem } | { ok: false; issues: FieldIssue[] } {
  const refused = liftingUse(item.kind, item.size);
  const legacy = stored !== undefined && stored.kind === item.kind && stored.size.trim() === item.size.trim();
  if (refused && !legacy) {
    return { ok: false, issues: [{ path: refused.code === 'recovery-strap' ? 'kind' : 'size', message: `Not lifting rigging: ${refused.reason}` }] };
  }
  const r = item.ratings;
  const noneEntered = r.vertical === null && r.choker === null && r.basket === null;
  if (noneEntered) {
    const std = standardRating(item.kind, item.size);
    if (std) return { ok: true, item: { ...item, ratings: { vertical: std.vertical, choker: std.choker, basket: std.basket }, ratingSource: std.source } };
    if (refused) return { ok: true, item: { ...item, ratingSource: 'none' } };
    return {
      ok: false,
      issues: [{ path: 'ratings.vertical', message: `Enter a vertical rating: no built-in table covers a ${item.kind} of size "${item.size || 'blank'}"` }],
    };
  }
  if (r.vertical === null) return { ok: false, issues: [{ path: 'ratings.vertical', message: 'Vertical rating is required when other ratings are entered' }] };
  return { ok: true, item: { ...item, ratingSource: 'entered' } };
}
