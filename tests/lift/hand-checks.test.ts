import { describe, expect, it } from 'vitest';
import { analyzeLift, prepareLift, tippingAt } from '@/lib/lift';
import { squareOfPads } from './scenarios';

describe('square of pads at (±2, ±2) m, 20 000 kg carrier centred', () => {
  it('tips at 10 000 kg with the load at 6 m over a side', () => {
    // Source: reference.md "Stability", hand-checkable case 20 000·2/(6 − 2) = 10 000 kg [derived].
    const r = analyzeLift(squareOfPads());
    expect(r.worstCase.tippingLoad).toBeCloseTo(10000, 6);
    expect(r.worstCase.percentOfTipping).toBeCloseTo(50, 6);
    expect(r.worstCase.line).toBe('FR-FL');
  });

  it('reports four tipping lines counter-clockwise, 2 m from the axis', () => {
    // Source: the convex hull of (±2, ±2) is the square itself [derived].
    const r = analyzeLift(squareOfPads());
    expect(r.tippingLines.map((l) => l.id)).toEqual(['RR-FR', 'FR-FL', 'FL-RL', 'RL-RR']);
    for (const l of r.tippingLines) expect(l.distanceFromAxis).toBeCloseTo(2, 12);
  });

  it('over a corner the lever arm is 6·cos 45° − 2 about each adjacent side', () => {
    // Source: same statics; tipping load = 40 000 kg·m / (6/√2 − 2) m [derived].
    const p = prepareLift(squareOfPads());
    const hit = tippingAt(p, 45);
    expect(hit.percent).toBeCloseTo((100 * 5000 * (6 / Math.SQRT2 - 2)) / 40000, 9);
  });
});
