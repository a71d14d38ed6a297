import { describe, expect, it } from 'vitest';
import { bearingCheck, clearanceCheck, loadChartCheck, powerLineCheck, riggingCheck, stabilityCheck } from '@/lib/lift/checks';
import { checkSentence } from '@/canvas/panels/results/check-sentence';
import * as units from '@/lib/units';

// Exact definitions (NIST SP 811): 1 in = 0.0254 m, 1 lb = 0.45359237 kg, standard gravity 9.80665 m/s².
// Written out here rather than imported, so the test checks lib/units instead of repeating it.
const M_PER_IN = 0.0254;
const M_PER_FT = 12 * M_PER_IN;
const KG_PER_LB = 0.45359237;
const G = 9.80665;
/** 1 psi in kPa: one pound-force over one square inch. */
const KPA_PER_PSI = (KG_PER_LB * G) / (M_PER_IN * M_PER_IN) / 1000;
const KPA_PER_PSF = KPA_PER_PSI / 144;
const KN_PER_LBF = (KG_PER_LB * G) / 1000;

describe('the exact conversions the formatter is checked against', () => {
  it('1 psi = 6.894757293168361 kPa, derived from the pound, standard gravity and the inch', () => {
    expect(KPA_PER_PSI).toBeCloseTo(6.894757293168361, 13);
    expect(KPA_PER_PSF * 144).toBeCloseTo(6.894757293168361, 13);
  });

  it('lib/units holds the same exact definitions (NIST SP 811)', () => {
    expect(units.M_PER_IN).toBe(M_PER_IN);
    expect(units.KG_PER_LB).toBe(KG_PER_LB);
    expect(units.G).toBe(G);
    expect(units.PA_PER_PSF / 1000).toBeCloseTo(KPA_PER_PSF, 15);
    expect(units.kpaToPsf(KPA_PER_PSI)).toBeCloseTo(144, 10);
  });
});

describe('check sentences in the imperial view', () => {
  it('m: a clearance of exactly 2 ft 6 in against a 1 ft limit', () => {
    const c = clearanceCheck({ target: 'shed', kind: 'obstacle', horizontal: 30 * M_PER_IN, vertical: 4, slew: 90, overlapsInPlan: false, conflict: false }, M_PER_FT);
    expect(c.reason).toBe('The load passes 0.76 m from obstacle shed in plan (nearest at slew 90.0°); limit 0.30 m, within limit.');
    expect(checkSentence(c, 'imperial')).toBe('The load passes 2′ 6″ from obstacle shed in plan (nearest at slew 90.0°); limit 1′ 0″, within limit.');
  });

  it('m: a load bottom 3 in below the top of a part it passes over', () => {
    const c = clearanceCheck({ target: 'cab', kind: 'body', horizontal: 0, vertical: -3 * M_PER_IN, slew: 12, overlapsInPlan: true, conflict: true }, M_PER_FT);
    expect(checkSentence(c, 'imperial')).toBe('The load passes over truck part cab (from slew 12.0°) with its bottom −0′ 3″ below the top: the load would strike it, over limit.');
  });

  it('kPa and kN: 2,400 psf against an allowable of exactly 3,000 psf, a 20,000 lbf reaction', () => {
    const c = bearingCheck({ support: 'FL', force: 20000 * KN_PER_LBF, mass: 0, slew: 135, pressure: 2400 * KPA_PER_PSF, liftsOff: false }, 3000 * KPA_PER_PSF, true);
    expect(c.reason).toBe('Support FL presses 115 kPa on the ground under the cribbing at slew 135.0° (89.0 kN); allowable 144 kPa, within limit (20 % below).');
    // Converting the printed 144 kPa would give 3,007 psf; the limit itself is exactly 3,000 psf.
    expect(checkSentence(c, 'imperial')).toBe('Support FL presses 2,400 psf on the ground under the cribbing at slew 135.0° (20,000 lbf); allowable 3,000 psf, within limit (20 % below).');
  });

  it('kPa: 1 psi exactly reads 144 psf', () => {
    const c = bearingCheck({ support: 'RR', force: 1, mass: 0, slew: 0, pressure: KPA_PER_PSI, liftsOff: false }, 100 * KPA_PER_PSI, false);
    expect(checkSentence(c, 'imperial')).toMatch(/^Support RR presses 144 psf on the ground under the pad .*; allowable 14,400 psf, within limit/);
  });

  it('kg: a sling carrying exactly 20,000 lb against 24,000 lb', () => {
    const c = riggingCheck({ id: 'HR-RS-06', element: 'sling', demand: 20000 * KG_PER_LB, capacity: 24000 * KG_PER_LB, detail: '2 × round sling, basket hitch at 60° from horizontal', ratingSource: 'the tag', assumptions: [], warnings: [], refused: null });
    expect(c.reason).toBe('Sling HR-RS-06 carries 9,072 kg against a capacity of 10,886 kg (2 × round sling, basket hitch at 60° from horizontal); within limit, 83 % used.');
    expect(checkSentence(c, 'imperial')).toBe('Sling HR-RS-06 carries 20,000 lb against a capacity of 24,000 lb (2 × round sling, basket hitch at 60° from horizontal); within limit, 83 % used.');
  });

  it('%: a stability check has no SI quantity and reads the same', () => {
    const c = stabilityCheck('stability', 72.44, 187.3, 'RL-RR', 85);
    expect(checkSentence(c, 'imperial')).toBe(c.reason);
    expect(c.reason).toBe("Worst case at slew 187.3°: the hook load is 72.4 % of the tipping load about line RL-RR; the plan's limit is 85 % (within limit, margin 12.6 points).");
  });

  it('% check with lengths and a mass in its sentence: the load chart', () => {
    const c = loadChartCheck({ rated: 13500, radiusUsed: 6, boomLengthUsed: 10.4, reason: null, percent: 61.2 }, 20 * M_PER_FT, 100);
    expect(checkSentence(c, 'imperial')).toBe("At 20′ 0″ radius the hook load is 61.2 % of the chart's rated 29,762 lb (read at 19′ 8″ radius, 34′ 1″ boom, no interpolation); limit 100 %, within limit.");
  });

  it('power lines: the distance and the required 10 ft exactly', () => {
    const c = powerLineCheck({ id: 'feeder', distance: 14 * M_PER_FT, required: 10 * M_PER_FT, rule: '29 CFR 1926.1408 Table A, up to 50 kV: 10 ft', slew: 270, nearest: 'boom' });
    expect(checkSentence(c, 'imperial')).toBe('The boom comes within 14′ 0″ of line feeder at slew 270.0°; required 10′ 0″ (29 CFR 1926.1408 Table A, up to 50 kV: 10 ft), within limit.');
  });

  it('the metric view shows the engine’s sentence as written', () => {
    const c = riggingCheck({ id: 'HR-SH-01', element: 'shackle', demand: 2000, capacity: 3250, detail: '5/8 in shackle, one of 2', ratingSource: 'the tag', assumptions: [], warnings: [], refused: null });
    expect(checkSentence(c, 'metric')).toBe(c.reason);
  });
});
