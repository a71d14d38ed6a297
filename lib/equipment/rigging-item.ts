import type { FieldIssue } from '@/lib/api/errors';
import type { RiggingItemData } from '@/lib/validations/rigging';
import { standardRating } from './rigging-ratings';

export interface ResolvedRiggingItem extends RiggingItemData {
  ratingSource: string;
}

/**
 * Fills ratings from the built-in table when none were entered and one applies; otherwise keeps the
 * entered ones. An item needs a vertical rating either way: the editor cannot check rigging without it.
 */
export function resolveRatings(item: RiggingItemData): { ok: true; item: ResolvedRiggingItem } | { ok: false; issues: FieldIssue[] } {
  const r = item.ratings;
  const noneEntered = r.vertical === null && r.choker === null && r.basket === null;
  if (noneEntered) {
    const std = standardRating(item.kind, item.size);
    if (std) return { ok: true, item: { ...item, ratings: { vertical: std.vertical, choker: std.choker, basket: std.basket }, ratingSource: std.source } };
    return {
      ok: false,
      issues: [{ path: 'ratings.vertical', message: `Enter a vertical rating: no built-in table covers a ${item.kind} of size "${item.size || 'blank'}"` }],
    };
  }
  if (r.vertical === null) return { ok: false, issues: [{ path: 'ratings.vertical', message: 'Vertical rating is required when other ratings are entered' }] };
  return { ok: true, item: { ...item, ratingSource: 'entered' } };
}
