import type { QuantityKind } from '@/lib/lift/checks';
import { kgToLb, knToKg, kpaToPsf, mToIn, type UnitSystem } from '@/lib/units';
import { formatNumber } from './number';

/**
 * SI figures in the viewer's units: feet-inches, pounds, psf and lbf by default, metres, kilograms, kPa
 * and kN as the metric setting. Conversions are the exact ones of lib/units.ts; rounding happens once,
 * here, on the converted figure.
 */

/** 12.5 m → 41′ 0″ (rounded to the nearest inch, carrying 12″ into the feet). */
export function formatFeetInches(m: number): string {
  const totalIn = Math.round(Math.abs(mToIn(m)));
  const ft = Math.floor(totalIn / 12);
  const sign = m < 0 && totalIn !== 0 ? '−' : '';
  return `${sign}${formatNumber(ft)}′ ${totalIn - ft * 12}″`;
}

export function formatLength(m: number, units: UnitSystem): string {
  return units === 'metric' ? `${formatNumber(m, 2)} m` : formatFeetInches(m);
}

export function formatMass(kg: number, units: UnitSystem): string {
  return units === 'metric' ? `${formatNumber(kg)} kg` : `${formatNumber(kgToLb(kg))} lb`;
}

export function formatPressure(kpa: number, units: UnitSystem): string {
  return units === 'metric' ? `${formatNumber(kpa)} kPa` : `${formatNumber(kpaToPsf(kpa))} psf`;
}

export function formatForce(kn: number, units: UnitSystem): string {
  return units === 'metric' ? `${formatNumber(kn, 1)} kN` : `${formatNumber(kgToLb(knToKg(kn)))} lbf`;
}

/** Degrees to a tenth: slews and angles read the same in both unit systems. */
export const formatAngle = (deg: number, decimals = 1) => `${formatNumber(deg, decimals)}°`;

export const formatPercent = (pct: number, decimals = 1) => `${formatNumber(pct, decimals)} %`;

/** Any quantity kind the engine reports, in the viewer's units. */
export function formatQuantity(kind: QuantityKind, si: number, units: UnitSystem): string {
  switch (kind) {
    case 'length':
      return formatLength(si, units);
    case 'mass':
      return formatMass(si, units);
    case 'pressure':
      return formatPressure(si, units);
    case 'force':
      return formatForce(si, units);
    case 'angle':
      return formatAngle(si);
    case 'percent':
      return formatPercent(si);
  }
}
