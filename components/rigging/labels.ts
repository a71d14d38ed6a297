import type { RiggingKind, RiggingStatus } from '@/db/schema';

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

export const STATUS_LABEL: Record<RiggingStatus, string> = { in_service: 'In service', tagged_out: 'Tagged out', retired: 'Retired' };

export type DueState = 'overdue' | 'due-soon' | 'ok' | 'none';

/** Overdue: due before today; due soon: within 30 days. Dates are YYYY-MM-DD strings, which sort as dates. */
export function dueState(next: string | null, today: string): DueState {
  if (!next) return 'none';
  if (next < today) return 'overdue';
  const soon = new Date(Date.parse(`${today}T00:00:00Z`) + 30 * 86_400_000).toISOString().slice(0, 10);
  return next <= soon ? 'due-soon' : 'ok';
}
