import { kgToLb, type UnitSystem } from '@/lib/units';
import { formatNumber } from '@/lib/format/number';
import { parseLength, parseMass, parseNumber } from '@/lib/format/parse';
import { formatFeetInches } from '@/lib/format/quantity';
import type { FieldSpec } from './field-logic';

type Range = Pick<FieldSpec, 'min' | 'max' | 'outOfRange' | 'rangeWhy'>;

/** A length in the viewer's units: feet-inches or metres to the centimetre. */
export function lengthSpec(units: UnitSystem, range: Range = {}): FieldSpec {
  const metric = units === 'metric';
  return {
    ...range,
    unit: metric ? 'm' : undefined,
    hint: metric ? 'metres, e.g. 4.25' : `feet and inches, e.g. 14' 6"`,
    format: (v) => (metric ? formatNumber(v, 2) : formatFeetInches(v)),
    parse: (s) => parseLength(s, units),
  };
}

/** A mass in pounds or kilograms, to the unit. */
export function massSpec(units: UnitSystem, range: Range = {}): FieldSpec {
  const metric = units === 'metric';
  return {
    min: 0,
    ...range,
    unit: metric ? 'kg' : 'lb',
    hint: metric ? 'kilograms, e.g. 1,250' : 'pounds, e.g. 2,750',
    format: (v) => formatNumber(metric ? v : kgToLb(v)),
    parse: (s) => parseMass(s, units),
  };
}

/**
 * A plain number shown in some unit: `toShown`/`fromShown` convert between the stored SI figure and the
 * figure typed (kPa ↔ psf, m² ↔ ft²). A trailing ° or % is read as part of the number.
 */
export function numberSpec(opts: Range & { unit?: string; digits?: number; toShown?(si: number): number; fromShown?(v: number): number; normalise?(si: number): number }): FieldSpec {
  const to = opts.toShown ?? ((v: number) => v);
  const from = opts.fromShown ?? ((v: number) => v);
  const { toShown: _t, fromShown: _f, digits, ...rest } = opts;
  return {
    ...rest,
    hint: 'a number, e.g. 12.5',
    format: (v) => (digits === undefined ? formatNumber(to(v), Number.isInteger(Math.round(to(v) * 10) / 10) ? 0 : 1) : formatNumber(to(v), digits)),
    parse: (s) => {
      const v = parseNumber(s.replace(/\s*[°%]$/, ''));
      return v === null ? null : from(v);
    },
  };
}
