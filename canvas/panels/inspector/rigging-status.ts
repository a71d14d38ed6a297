import { formatDate } from '@/lib/format/date';

/**
 * What the rigging picker says about an inventory item: on rows already in the plan, and when adding one.
 * Pure, so the wording and the rules are unit-tested. Dates are the inventory's YYYY-MM-DD strings, and
 * `today` is the server's calendar day, so the comparison is a plain string order.
 */
export interface InventoryStatus {
  id: number;
  tag: string;
  status: string;
  nextInspectionDue?: string | null;
  /** Why the item is not lifting rigging (from the inventory), or null. */
  notForLifting?: string | null;
  ratings: { vertical?: number | null; choker?: number | null; basket?: number | null };
}

export interface RiggingNotice {
  /** `stop`: the item must not be used; `warn`: it may be used, with the reason in view. */
  tone: 'stop' | 'warn';
  text: string;
}

export const isOverdue = (item: Pick<InventoryStatus, 'nextInspectionDue'>, today: string) => !!item.nextInspectionDue && item.nextInspectionDue < today;

const OUT_OF_SERVICE: Record<string, string> = { tagged_out: 'Tagged out', retired: 'Retired' };

/** Notices for a row in the plan; `item` is the inventory's current record, undefined when it is gone. */
export function pickNotices(pick: { itemId: number | null }, item: InventoryStatus | undefined, today: string): RiggingNotice[] {
  if (pick.itemId === null) return [];
  if (!item) return [{ tone: 'stop', text: 'No longer in the inventory: check the item before the lift' }];
  const out: RiggingNotice[] = [];
  const label = OUT_OF_SERVICE[item.status];
  if (label) out.push({ tone: 'stop', text: `${label}: remove it from the plan` });
  if (item.notForLifting) out.push({ tone: 'stop', text: `Not lifting rigging: ${item.notForLifting} Remove it from the plan.` });
  if (isOverdue(item, today)) out.push({ tone: 'warn', text: `Inspection overdue since ${formatDate(item.nextInspectionDue!)}` });
  return out;
}

/** The rating copied into a new pick: the vertical hitch's, else another the item has. */
export const firstRating = (item: InventoryStatus) => item.ratings.vertical ?? item.ratings.basket ?? item.ratings.choker ?? null;

export type AddVerdict = { ok: false; reason: string } | { ok: true; warning: string | null };

/** Whether an item may be added to the plan, from its current inventory record. */
export function addVerdict(item: InventoryStatus, today: string): AddVerdict {
  const label = OUT_OF_SERVICE[item.status];
  if (label) return { ok: false, reason: `${item.tag} is ${label.toLowerCase()} and cannot be added to a plan.` };
  if (item.status !== 'in_service') return { ok: false, reason: `${item.tag} is not in service and cannot be added to a plan.` };
  if (item.notForLifting) return { ok: false, reason: `${item.tag} is not lifting rigging and cannot be added to a lift plan: ${item.notForLifting}` };
  const rating = firstRating(item);
  if (!(rating !== null && rating > 0)) return { ok: false, reason: `${item.tag} has no working load limit in the inventory; add its rating there first.` };
  if (isOverdue(item, today)) return { ok: true, warning: `${item.tag} added, but its inspection has been overdue since ${formatDate(item.nextInspectionDue!)}: have it inspected before the lift.` };
  return { ok: true, warning: null };
}
