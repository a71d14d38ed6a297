import type { RiggingKind, RiggingStatus } from '@/lib/domain';
import { addDays, DUE_SOON_DAYS } from '@/lib/dates';

export const KIND_LABEL: Record<RiggingKind, string> = {
  'round-sling': 'Round sling',
  'web-sling': 'Web sling',
  'wire-rope-sling': 'Wire rope sling',
  chain: 'Chain',
  shackle: 'Shackle',
  'snatch-block': 'Snatch block',
  hook: 'Hook',
  'recovery-strap': 'Recovery strap',
};

/** A kind as people say it; a kind this build does not know is shown as it was stored. */
export const kindLabel = (kind: string) => KIND_LABEL[kind as RiggingKind] ?? kind;

export const STATUS_LABEL: Record<RiggingStatus, string> = { in_service: 'In service', tagged_out: 'Tagged out', retired: 'Retired' };

export type DueState = 'overdue' | 'due-soon' | 'ok' | 'none';

/** Overdue: due before today; due soon: within DUE_SOON_DAYS. Dates are YYYY-MM-DD strings, which sort as dates. */
export function dueState(next: string | null, today: string): DueState {
  if (!next) return 'none';
  if (next < today) return 'overdue';
  return next <= addDays(today, DUE_SOON_DAYS) ? 'due-soon' : 'ok';
}
