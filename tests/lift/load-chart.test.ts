import { describe, expect, it } from 'vitest';
import { analyzeLift, chartLookup, LiftError, percentOfRated } from '@/lib/lift';
import { squareOfPads } from './scenarios';

// An invented chart (not any real truck's): rows are boom lengths, columns radii.
const chart = {
  radii: [3, 4, 5, 6, 7],
  boomLengths: [6, 8, 10],
  rated: [
    [20000, 16000, 13000, 11000, null],
    [18000, 15000, 12000, 10000, 8500],
    [16000, 14000, 11000, 9500, 8000],
  ],
};

describe('load chart lookup, no upward interpolation', () => {
  // Source: common practice (no published source): next greater radius and next longer boom.
  it('reads an exact grid point as it is', () => {
    expect(chartLookup(chart, 5, 8).rated).toBe(12000);
  });
  it('takes the next greater radius and the next longer boom, never an interpolated value', () => {
    const look = chartLookup(chart, 5.2, 7.1);
    expect(look).toMatchObject({ rated: 10000, radiusUsed: 6, boomLengthUsed: 8 });
    expect(percentOfRated(chart, 5.2, 7.1, 5000).percent).toBeCloseTo(50, 12);
  });
  it('a radius beyond the chart fails the check instead of extrapolating', () => {
    const look = chartLookup(chart, 7.5, 8);
    expect(look.rated).toBeNull();
    expect(look.missing).toEqual({ why: 'radius-beyond-chart', chartLimit: 7 });
    const r = analyzeLift(squareOfPads({ loadChart: chart, boom: { pivot: { x: 0, y: 0, z: 2 }, length: 7.5, elevation: 0, mass: 0, cgFraction: 0.5 } }));
    const check = r.checks.find((c) => c.id === 'load-chart');
    expect(check).toMatchObject({ ok: false, value: null });
  });
  it('a boom longer than the chart, and a blank cell, give no rating', () => {
    expect(chartLookup(chart, 4, 10.5).rated).toBeNull();
    expect(chartLookup(chart, 6.5, 6).rated).toBeNull();
  });
  it('in the analysis, percent of rated uses the hook load at the hook radius', () => {
    // Radius 6 m, boom 6 m: rated 11 000 kg; hook load 5 000 + 100 + 50 kg.
    const r = analyzeLift(squareOfPads({ loadChart: chart, hook: { blockMass: 100, riggingMass: 50 } }));
    expect(r.loadChart?.percent).toBeCloseTo((100 * 5150) / 11000, 9);
    expect(r.checks.find((c) => c.id === 'load-chart')?.ok).toBe(true);
  });
  it('a chart whose rows do not match its radii is a typed error', () => {
    expect(() => analyzeLift(squareOfPads({ loadChart: { ...chart, rated: [[1, 2], [3, 4], [5, 6]] } }))).toThrow(LiftError);
  });
});
