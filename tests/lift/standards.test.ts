import { describe, expect, it } from 'vitest';
import {
  chokeAngleFactor, coilMass, IBC_1806_2, leadLineFactor, presumptiveBearing, requiredClearance, ROUND_SLING_LB,
  roundSlingRating, shackleWll, SHEAVE_K, slingCapacity, SOIL_CHOICES, STEEL_DENSITY, winchCapacity, boxMass, upperWeight,
} from '@/lib/lift';
import { KG_PER_LB, M_PER_FT, M_PER_IN } from '@/lib/units';

const line = (kV: number | null, extra: { atMost350kV?: boolean; required?: number } = {}) => requiredClearance({ kV, ...extra }).required;

describe('29 CFR 1926.1408 Table A, band edges (upper bound included)', () => {
  // Source: eCFR 29 CFR 1926.1408 Table A [read].
  it('50 kV → 10 ft, 50.1 kV → 15 ft, 200 kV → 15 ft, 200.1 kV → 20 ft', () => {
    expect(line(50)).toBeCloseTo(10 * M_PER_FT, 12);
    expect(line(50.1)).toBeCloseTo(15 * M_PER_FT, 12);
    expect(line(200)).toBeCloseTo(15 * M_PER_FT, 12);
    expect(line(200.1)).toBeCloseTo(20 * M_PER_FT, 12);
  });
  it('350 → 20, 500 → 25, 750 → 35, 1 000 → 45 ft; over 1 000 kV is left to the utility', () => {
    expect(line(350)).toBeCloseTo(20 * M_PER_FT, 12);
    expect(line(500)).toBeCloseTo(25 * M_PER_FT, 12);
    expect(line(750)).toBeCloseTo(35 * M_PER_FT, 12);
    expect(line(1000)).toBeCloseTo(45 * M_PER_FT, 12);
    expect(line(1000.1)).toBeNull();
    expect(line(1200, { required: 20 })).toBe(20);
  });
  it('unknown voltage: 20 ft when confirmed up to 350 kV, otherwise 50 ft', () => {
    // Source: 1926.1408(a) [read]; 50 ft from 1926.1409 (value from memory).
    expect(line(null, { atMost350kV: true })).toBeCloseTo(20 * M_PER_FT, 12);
    expect(line(null)).toBeCloseTo(50 * M_PER_FT, 12);
  });
});

describe('IBC Table 1806.2 presumptive load-bearing values', () => {
  // Source: International Building Code (2012 and later), Table 1806.2 [read]; psf → Pa, NIST SP 811 App. B [read].
  it('has the five classes in psf', () => {
    expect(IBC_1806_2.map((s) => s.psf)).toEqual([12000, 4000, 3000, 2000, 1500]);
  });
  it('converts exactly: 1 psf = 47.880 26 Pa, so 1 500 psf = 71.82 kPa', () => {
    expect(presumptiveBearing('clay').kPa).toBeCloseTo((1500 * 47.88026) / 1000, 3);
    expect(presumptiveBearing('sandy-gravel').kPa).toBeCloseTo((3000 * KG_PER_LB * 9.80665) / M_PER_FT ** 2 / 1000, 12);
    expect(SOIL_CHOICES).toHaveLength(5);
  });
});

describe('round slings and hitches', () => {
  it('WSTDA RS-1 colour table, converted to kg', () => {
    // Source: WSTDA RS-1 colour code table in reference.md (value from memory).
    expect(ROUND_SLING_LB.purple).toEqual({ vertical: 2600, choker: 2100, basket: 5200 });
    expect(ROUND_SLING_LB.black).toEqual({ vertical: 53000, choker: 42400, basket: 106000 });
    expect(roundSlingRating('blue').vertical).toBeCloseTo(21200 * KG_PER_LB, 9);
  });
  it('basket = 2 × vertical for every colour', () => {
    // Source: common practice (no published source); blue 42 400 lb.
    for (const r of Object.values(ROUND_SLING_LB)) expect(r.basket).toBe(2 * r.vertical);
    expect(ROUND_SLING_LB.blue.basket).toBe(42400);
  });
  it('hitch factors and the sling angle factor sin θ', () => {
    // Source: ASME B30.9 hitch factors (value from memory); sin 60° = 0.866, 45° = 0.707, 30° = 0.5 [derived].
    // Choke factor from the corrected ASME B30.9 choke-angle table [read]; a 100° choke is in the 90–120° band.
    expect(chokeAngleFactor(100).factor).toBe(0.87);
    const base = { id: 's', verticalRating: 1000, hitch: 'vertical' as const, legs: 2 };
    expect(slingCapacity({ ...base, angleFromHorizontal: 60 })).toBeCloseTo(2 * 1000 * 0.8660254, 4);
    expect(slingCapacity({ ...base, angleFromHorizontal: 45 })).toBeCloseTo(2 * 1000 * 0.7071068, 4);
    expect(slingCapacity({ ...base, angleFromHorizontal: 30 })).toBeCloseTo(1000, 9);
    expect(slingCapacity({ ...base, hitch: 'basket', angleFromHorizontal: 90, legs: 1 })).toBeCloseTo(2000, 9);
    // A web sling in a choker at 100°: 1 000 × 0.8 (memory) × 0.87 (read).
    expect(slingCapacity({ ...base, material: 'web-sling', hitch: 'choker', chokeAngle: 100, angleFromHorizontal: 90, legs: 1 })).toBeCloseTo(1000 * 0.8 * 0.87, 9);
    expect(slingCapacity({ id: 'b', colour: 'blue', hitch: 'basket', angleFromHorizontal: 90, legs: 1 })).toBeCloseTo(42400 * KG_PER_LB, 6);
  });
});

describe('shackles', () => {
  it('WLL = minimum breaking strength ÷ 5 for 1/2, 5/8, 3/4 in', () => {
    // Source: RR-C-271D via Seattle City Light material standard: 20 000, 32 500, 47 500 lb [read].
    expect(shackleWll('1/2')).toBeCloseTo((20000 / 5) * KG_PER_LB, 9);
    expect(shackleWll('5/8')).toBeCloseTo((32500 / 5) * KG_PER_LB, 9);
    expect(shackleWll('3/4 in')).toBeCloseTo((47500 / 5) * KG_PER_LB, 9);
  });
  it('other sizes from the screw-pin table (value from memory); unknown size is null', () => {
    expect(shackleWll('1-1/4')).toBeCloseTo(12 * 2000 * KG_PER_LB, 9);
    expect(shackleWll('9/16')).toBeNull();
  });
});

describe('lead-line factors, Wire Rope Users Manual', () => {
  // Source: Wire Rope Technical Board, Wire Rope Users Manual, 4th ed.; F = Kᴺ(K−1)/(Kᴺ−1) [read].
  const table = {
    bushed: [1.09, 0.5685, 0.3951, 0.3087, 0.2571, 0.2229, 0.1987, 0.1807],
    roller: [1.04, 0.5302, 0.3603, 0.2755, 0.2246, 0.1908, 0.1666, 0.1485],
  };
  it('reproduces the table for N = 1…8', () => {
    for (const kind of ['bushed', 'roller'] as const) {
      table[kind].forEach((f, i) => expect(Math.abs(leadLineFactor(i + 1, SHEAVE_K[kind]) - f)).toBeLessThan(0.00006));
    }
  });
  it('worked example: 4 parts plain bearings 0.309, with 2 lead sheaves 0.367; 6 000 lb → 2 202 lb', () => {
    expect(leadLineFactor(4, 1.09)).toBeCloseTo(0.309, 3);
    expect(leadLineFactor(4, 1.09, 2)).toBeCloseTo(0.367, 3);
    // The manual rounds the factor to 0.367 before multiplying; unrounded it is 2 200 lb (0.1 % apart).
    expect(Math.round(6000 * Number(leadLineFactor(4, 1.09, 2).toFixed(3)))).toBe(2202);
    expect(Math.abs(6000 * leadLineFactor(4, 1.09, 2) - 2202) / 2202).toBeLessThan(0.001);
    // Winch capacity is the rated line pull over the same factor.
    expect(winchCapacity({ ratedLinePull: 2202, parts: 4, sheaves: 'bushed', leadSheaves: 2 })).toBeCloseTo(6000, -1);
  });
});

describe('load weight from dimensions', () => {
  it('steel coil from handbook density: 0.2836 lb/in³ ≈ 7 850 kg/m³', () => {
    // Source: handbook steel density (Machinery's Handbook / Engineering ToolBox), value from memory.
    expect((0.2836 * KG_PER_LB) / M_PER_IN ** 3).toBeCloseTo(STEEL_DENSITY, -1);
    // Coil OD 60 in, ID 20 in, width 48 in: V = π/4·(60² − 20²)·48 in³ = 120 637 in³ → 34 213 lb.
    const lb = (Math.PI / 4) * (60 ** 2 - 20 ** 2) * 48 * 0.2836;
    expect(lb).toBeCloseTo(34213, -1);
    const kgEstimate = coilMass(60 * M_PER_IN, 20 * M_PER_IN, 48 * M_PER_IN);
    expect(Math.abs(kgEstimate / KG_PER_LB - lb) / lb).toBeLessThan(0.0005);
  });
  it('box from size and density, and the upper weight from the uncertainty', () => {
    // Source: W = ρ·V [derived].
    expect(boxMass(2, 1, 0.5, 7850)).toBe(7850);
    expect(upperWeight(8000, 5)).toBeCloseTo(8400, 9);
    expect(() => coilMass(1, 1.2, 1)).toThrow(RangeError);
  });
});
