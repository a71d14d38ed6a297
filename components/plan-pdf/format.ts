import type { Check } from '@/lib/lift';
import type { UnitSystem } from '@/lib/units';
import { checkSentence } from '@/canvas/panels/results/check-sentence';

/** Words and figures of the plan document. Checks are worded by the app's one check formatter. */
export const pct = (n: number | null | undefined, d = 1) => (n === null || n === undefined || !Number.isFinite(n) ? '-' : `${n.toFixed(d)} %`);
export const deg = (n: number) => `${n.toFixed(1)}°`;
export const checkWords = (c: Check, units: UnitSystem) => checkSentence(c, units);

/** "2026-12-02 14:05 UTC" from an ISO timestamp: a document travels, so the zone is stated. */
export function when(iso: string | null | undefined): string {
  if (!iso) return '-';
  const d = new Date(iso);
  if (Number.isNaN(d.getTime())) return iso;
  return `${d.toISOString().slice(0, 10)} ${d.toISOString().slice(11, 16)} UTC`;
}

/** A local date-time typed in the plan details form ("2026-12-03T06:30"), shown as typed (site local time). */
export const localWhen = (s: string) => (s ? `${s.replace('T', ' ')} (site local time)` : '-');

export const yesNo = (b: boolean) => (b ? 'Yes' : 'No');
