import { describe, expect, it } from 'vitest';
import { wrap180, wrap360 } from '@/lib/angles';
import { formatNumber } from '@/lib/format/number';
import { parseLength, parseMass, parseNumber } from '@/lib/format/parse';
import { formatFeetInches, formatLength, formatMass } from '@/lib/format/quantity';

/** Exact factors: 1 ft = 0.3048 m, 1 in = 0.0254 m, 1 lb = 0.45359237 kg (1959 international agreement). */
describe('parseNumber', () => {
  it('reads grouped thousands, a decimal comma, a true minus and exponents; refuses the rest', () => {
    expect([parseNumber('1,250'), parseNumber('12,500.5'), parseNumber('12,5'), parseNumber('−3.5'), parseNumber('4.2e-1'), parseNumber(' .5 ')]).toEqual([1250, 12500.5, 12.5, -3.5, 0.42, 0.5]);
    expect([parseNumber(''), parseNumber('abc'), parseNumber('1.2.3'), parseNumber('12,50,0'), parseNumber('5 kg')]).toEqual([null, null, null, null, null]);
  });
});

describe('parseLength', () => {
  it("imperial: feet and inches in every usual spelling; a bare number is feet", () => {
    const m = 41 * 0.3048 + 6 * 0.0254;
    for (const t of [`41' 6"`, `41'6`, '41 ft 6 in', '41′ 6″', '498"', '498 in']) expect(parseLength(t, 'imperial')).toBeCloseTo(m, 12);
    expect(parseLength('41.5', 'imperial')).toBeCloseTo(41.5 * 0.3048, 12);
    expect(parseLength(`-0' 3"`, 'imperial')).toBeCloseTo(-0.0762, 12);
  });
  it('metric: a bare number is metres; m, cm and mm are honoured in either system', () => {
    expect(parseLength('12.65', 'metric')).toBe(12.65);
    expect(parseLength('12,5 m', 'metric')).toBe(12.5);
    expect(parseLength('350 mm', 'imperial')).toBeCloseTo(0.35, 12);
    expect(parseLength('45 cm', 'metric')).toBeCloseTo(0.45, 12);
    expect(parseLength(`10'`, 'metric')).toBeCloseTo(3.048, 12);
    expect([parseLength('abc', 'metric'), parseLength('12 yd', 'imperial')]).toEqual([null, null]);
  });
  it('reads back what the formatters write', () => {
    for (const m of [0.3048, 3.7, 12.5, 152.4]) {
      expect(parseLength(formatLength(m, 'metric'), 'metric')).toBeCloseTo(Math.round(m * 100) / 100, 12);
      expect(Math.abs(parseLength(formatFeetInches(m), 'imperial')! - m)).toBeLessThanOrEqual(0.0127 + 1e-12);
    }
  });
});

describe('parseMass', () => {
  it('a bare number is pounds (imperial) or kilograms (metric); a typed unit wins', () => {
    expect(parseMass('20,000', 'imperial')).toBeCloseTo(9071.8474, 9);
    expect(parseMass('9,072', 'metric')).toBe(9072);
    expect(parseMass('2 t', 'imperial')).toBe(2000);
    expect(parseMass('500 lb', 'metric')).toBeCloseTo(226.796185, 9);
    expect(parseMass('heavy', 'metric')).toBeNull();
  });
  it('reads back what formatMass writes', () => {
    expect(parseMass(formatMass(9071.8474, 'imperial').replace(' lb', ''), 'imperial')).toBeCloseTo(9071.8474, 4);
    expect(parseMass(formatMass(12345, 'metric'), 'metric')).toBe(12345);
    expect(formatNumber(parseMass('1,234.5 kg', 'imperial')!, 1)).toBe('1,234.5');
  });
});

describe('the angle helpers', () => {
  it('wrap to [0, 360) and (−180, 180], a tiny negative to 0, never to 360', () => {
    expect([wrap360(-90), wrap360(720.5), wrap360(-1e-15), wrap360(-0), wrap360(360)]).toEqual([270, 0.5, 0, 0, 0]);
    expect([wrap180(190), wrap180(-180), wrap180(180), wrap180(-190), wrap180(45)]).toEqual([-170, 180, 180, 170, 45]);
  });
});
