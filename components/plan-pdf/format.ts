import type { Check } from '@/lib/lift';
import type { UnitSystem } from '@/lib/units';
import { STATUS_WORDS, describeCheck, tippingLineWords } from '@/lib/format/checks';
import { formatNumber } from '@/lib/format/number';
import { documentLocale, formatDate, formatDateTime } from '@/lib/format/date';

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

/**
 * A moment in the app's one date format ("Dec 2, 2026, 2:05 PM UTC" for an imperial reader): a document
 * travels, so it is written in UTC and says so.
 */
export function when(iso: string | null | undefined, units: UnitSystem): string {
  if (!iso) return '-';
  return `${formatDateTime(iso, documentLocale(units), 'UTC')} UTC`;
}

/** A calendar date ("2026-11-02") in the same format. */
export const day = (ymd: string, units: UnitSystem) => formatDate(ymd, documentLocale(units));

/** A local date-time typed in the plan details form ("2026-12-03T06:30"), shown as typed (site local time). */
export const localWhen = (s: string) => (s ? `${s.replace('T', ' ')} (site local time)` : '-');

export const yesNo = (b: boolean) => (b ? 'Yes' : 'No');
