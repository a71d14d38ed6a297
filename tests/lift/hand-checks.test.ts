import { describe, expect, it } from 'vitest';
import { analyzeLift, prepareLift, tippingAt } from '@/lib/lift';
import { squareOfPads } from './scenarios';

describe('square of pads at (±2, ±2) m, 20 000 kg carrier centred', () => {
  it('tips at 10 000 kg with the load at 6 m over a side', () => {
    // Source: reference.md "Stability", hand-checkable case 20 000·2/(6 − 2) = 10 000 kg [derived].
    const r = analyzeLift(squareOfPads({ swing: { from: 330, to: 30, direction: 'ccw' } }));
    expect(r.worstCase.slew).toBeCloseTo(0, 1);
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

describe('named edge cases', () => {
  it('load exactly on a tipping line: no tipping moment from the load', () => {
    // Source: statics; the hook at 2 m reaches the side x = 2 at slew 0, lever arm 0 [derived].
    const input = squareOfPads({ boom: { pivot: { x: 0, y: 0, z: 2 }, length: 2, elevation: 0, mass: 0, cgFraction: 0.5 } });
    const p = prepareLift(input);
    expect(tippingAt(p, 0).percent).toBe(0);
    const r = analyzeLift(input);
    expect(r.worstCase.percentOfTipping).toBe(0);
    expect(r.worstCase.tippingLoad).toBeNull();
    const longer = prepareLift({ ...input, boom: { ...input.boom, length: 2.001 } });
    expect(tippingAt(longer, 0).percent).toBeCloseTo((100 * 5000 * 0.001) / 40000, 9);
  });

  it('three pads: three tipping lines and reactions that are the barycentric weights of the CG', () => {
    // Source: statics of three supports (statically determinate, Shapiro, Cranes and Derricks §5) [derived].
    const input = squareOfPads({
      supports: [
        { id: 'F', x: 3, y: 0, area: 0.25 },
        { id: 'L', x: -2, y: 2.5, area: 0.25 },
        { id: 'R', x: -2, y: -2.5, area: 0.25 },
      ],
      load: { mass: 1000, footprint: { kind: 'circle', diameter: 1 }, height: 1, hang: 1 },
      boom: { pivot: { x: 0, y: 0, z: 2 }, length: 1, elevation: 0, mass: 0, cgFraction: 0.5 },
      swing: { from: 90, to: 90, direction: 'ccw' },
    });
    const r = analyzeLift(input);
    expect(r.tippingLines.map((l) => l.id)).toEqual(['R-F', 'F-L', 'L-R']);
    // CG of 20 000 kg at (0, 0) and 1 000 kg at (0, 1): (0, 1/21). Barycentric weights in F, L, R:
    const cx = 0, cy = 1 / 21, W = 21000;
    const det = (-2 - 3) * (-2.5 - 0) - (-2 - 3) * (2.5 - 0);
    const wL = ((cx - 3) * (-2.5 - 0) - (-2 - 3) * (cy - 0)) / det;
    const wR = ((-2 - 3) * (cy - 0) - (cx - 3) * (2.5 - 0)) / det;
    const byId = Object.fromEntries(r.reactions.atWorstCase.map((x) => [x.support, x.mass]));
    expect(byId.L).toBeCloseTo(W * wL, 6);
    expect(byId.R).toBeCloseTo(W * wR, 6);
    expect(byId.F).toBeCloseTo(W * (1 - wL - wR), 6);
  });

  it('leg partly extended: the worst case falls strictly inside the arc, on the skewed line', () => {
    // Source: statics; with no rotating mass the lever arm peaks where the boom is square to the line,
    // at the angle of its outward normal [derived].
    const input = squareOfPads({
      supports: [
        { id: 'FL', x: 2, y: 2, area: 0.25 },
        { id: 'RL', x: -2, y: 2, area: 0.25 },
        { id: 'RR', x: -2, y: -2, area: 0.25 },
        { id: 'FR', x: 2, y: -0.8, area: 0.25 },
      ],
      swing: { from: 280, to: 340, direction: 'ccw' },
    });
    const r = analyzeLift(input);
    const nx = 1.2 / Math.hypot(1.2, 4), ny = -4 / Math.hypot(1.2, 4);
    const expected = 360 + (Math.atan2(ny, nx) * 180) / Math.PI;
    const c = nx * -2 + ny * -2;
    expect(r.worstCase.line).toBe('RR-FR');
    expect(r.worstCase.slew).toBeGreaterThan(280);
    expect(r.worstCase.slew).toBeLessThan(340);
    expect(Math.abs(r.worstCase.slew - expected)).toBeLessThan(0.1);
    const exactPct = (100 * 5000 * (6 - c)) / (20000 * c);
    expect(Math.abs(r.worstCase.percentOfTipping - exactPct)).toBeLessThan(0.01);
  });

  it('fully extended, the same arc has its worst case at an arc end', () => {
    // Source: statics; the lever arm about y = −2 falls monotonically away from slew 270 [derived].
    const r = analyzeLift(squareOfPads({ swing: { from: 280, to: 340, direction: 'ccw' } }));
    expect(r.worstCase.slew).toBeCloseTo(280, 6);
    expect(r.worstCase.percentOfTipping).toBeCloseTo((100 * 5000 * (6 * Math.sin((80 * Math.PI) / 180) - 2)) / 40000, 6);
  });

  it('a clockwise arc across 0° covers the short way round', () => {
    // Source: the slew convention of issue 3 (counter-clockwise positive) [derived].
    const r = analyzeLift(squareOfPads({ swing: { from: 20, to: 340, direction: 'cw' } }));
    expect(r.sweep[0].slew).toBe(20);
    expect(r.sweep[r.sweep.length - 1].slew).toBe(340);
    expect(r.sweep.length).toBe(41);
    expect(r.worstCase.slew).toBeCloseTo(0, 6);
    for (let i = 1; i < r.sweep.length; i++) {
      const gap = (r.sweep[i - 1].slew - r.sweep[i].slew + 360) % 360;
      expect(gap).toBeLessThanOrEqual(1 + 1e-9);
    }
  });
});
