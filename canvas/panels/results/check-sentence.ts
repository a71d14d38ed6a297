import type { Check } from '@/lib/lift';
import { formatFeetInches, kgToLb, knToKg, kpaToPsf, type UnitSystem } from '@/lib/units';

/**
 * The engine writes every check's sentence in SI (lib/lift/checks.ts). In the imperial view the panel
 * shows it in feet-inches, pounds and psf instead, without touching the engine: each "<number> <unit>"
 * in the sentence is converted. A number that is the check's own value or limit, rounded, is replaced by
 * that exact figure converted (so "allowable 144 kPa" reads 3,000 psf when the limit is exactly 3,000 psf,
 * not the 3,007 psf that converting the rounded 144 would give). Other numbers are converted from the
 * sentence and kept to the significant figures the engine printed.
 */
const QUANTITY = /(−|-)?(\d{1,3}(?:,\d{3})+|\d+)(\.\d+)? (m|kg|kPa|kN)(?![\p{L}\p{N}²³])/gu;

type SiUnit = 'm' | 'kg' | 'kPa' | 'kN';

/** Whole numbers with thousands separators (the engine's own style, independent of the browser's locale). */
function grouped(n: number): string {
  const r = Math.round(Math.abs(n));
  const s = String(r).replace(/\B(?=(\d{3})+(?!\d))/g, ',');
  return (n < 0 && r !== 0 ? '−' : '') + s;
}

function roundToSignificant(n: number, digits: number): number {
  if (n === 0) return 0;
  const p = Math.pow(10, digits - Math.ceil(Math.log10(Math.abs(n))));
  return Math.round(n * p) / p;
}

function imperial(v: number, unit: SiUnit, significant: number | null): string {
  const keep = (x: number) => (significant === null ? x : roundToSignificant(x, significant));
  switch (unit) {
    case 'm':
      return formatFeetInches(v);
    case 'kg':
      return `${grouped(keep(kgToLb(v)))} lb`;
    case 'kPa':
      return `${grouped(keep(kpaToPsf(v)))} psf`;
    case 'kN':
      return `${grouped(keep(kgToLb(knToKg(v))))} lbf`;
  }
}

/** The check's sentence in the user's units. Metric is the engine's sentence as written. */
export function checkSentence(check: Pick<Check, 'reason' | 'value' | 'limit' | 'unit'>, units: UnitSystem): string {
  if (units === 'metric') return check.reason;
  const exact = [check.value, check.limit].filter((x): x is number => x !== null && Number.isFinite(x));
  return check.reason.replace(QUANTITY, (_all, minus: string | undefined, int: string, frac: string | undefined, unit: SiUnit) => {
    const decimals = frac ? frac.length - 1 : 0;
    const printed = (minus ? -1 : 1) * Number(int.replace(/,/g, '') + (frac ?? ''));
    const half = 0.5 * Math.pow(10, -decimals) + 1e-9;
    const own = unit === check.unit ? exact.find((x) => Math.abs(x - printed) <= half) : undefined;
    if (own !== undefined) return imperial(own, unit, null);
    const digits = (int.replace(/,/g, '') + (frac ?? '').slice(1)).replace(/^0+/, '').length;
    return imperial(printed, unit, Math.max(2, digits));
  });
}
