import { HttpError } from '@/lib/api/errors';
import { isUniqueViolation } from '@/db/dialect';
import { resolveRatings, type StoredKindSize } from '@/lib/equipment/rigging-item';
import type { RiggingItemData } from '@/lib/validations/rigging';


/** `stored`: the row as it is before an update, so an item stored before the lifting rules can still be edited. */
export function resolvedOr400(data: RiggingItemData, stored?: StoredKindSize) {
  const r = resolveRatings(data, stored);
  if (!r.ok) throw new HttpError(400, `Invalid body: ${r.issues.map((i) => `${i.path}: ${i.message}`).join('; ')}`, r.issues);
  return r.item;
}

/** The unique constraint on (organisation, tag), turned into a 409 that names the field. */
export function tagConflict(err: unknown, tag: string): never {
  if (isUniqueViolation(err, 'rigging_items')) {
    throw new HttpError(409, `tag: ${tag} is already used by another item`, [{ path: 'tag', message: 'Already used' }]);
  }
  throw err;
}
