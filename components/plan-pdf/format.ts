import type { Check } from '@/lib/lift';
import type { UnitSystem } from '@/lib/units';
import { STATUS_WORDS, describeCheck, tippingLineWords } from '@/lib/format/checks';
import { formatNumber } from '@/lib/format/number';

/** Words and figures of the plan document. Checks are worded by the app's one check formatter (lib/format/checks). */
export const pct = (n: number | null | undefined, d = 1) => (n === null || n === undefined || !Number.isFinite(n) ? '-' : `${formatNumber(n, d)} %`);
export const deg = (n: number) => `${formatNumber(n, 1)}°`;
export const checkWords = (c: Check, units: UnitSystem) => describeCheck(c, units).sentence;
export const checkStatus = (c: Check) => STATUS_WORDS[c.status].replace(/^./, (x) => x.toUpperCase());

/** The governing tipping line in words ("left rear–right rear pads (rear line, RL-RR)"), from the stability check. */
export function governingLineWords(checks: readonly Check[], code: string): string {
  const c = checks.find((x) => x.code === 'stability' && !x.upperWeight);
  const line = c?.subject.line;
  return line ? tippingLineWords({ names: c.subject.names, side: line.side, code: line.code }) : code;
}

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
