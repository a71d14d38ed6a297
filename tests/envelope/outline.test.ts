import { describe, expect, it } from 'vitest';
import { prepareLift } from '@/lib/lift';
import { envelopeGrid, envelopeShapes, holdAt } from '@/lib/envelope';
import { squareOfPads } from '../lift/scenarios';

describe('reach envelope against a hand calculation', () => {
  // Source: reference.md "Stability": tipping load about an edge = stabilising moment ÷ the load's lever arm
  // outside it. Square of pads at (±2, ±2) m, 20 000 kg carrier centred, boom without mass, 5 000 kg load:
  // over a side percent = 100·5 000·(r − 2) ÷ (20 000·2) = 12.5·(r − 2), so the plan's 85 % is reached at
  // r = 2 + 85/12.5 = 8.8 m [derived]. Every swing from the pick passes over a side, so the envelope is the
  // disc of radius 8.8 m.
  const input = squareOfPads({ boom: { pivot: { x: 0, y: 0, z: 2 }, length: 12, elevation: 30, mass: 0, cgFraction: 0.5 }, swing: { from: 0, to: 90, direction: 'ccw' } });
  const p = prepareLift(input);
  const g = envelopeGrid(p, { radii: 30, slews: 180 })!;

  it('holds the load inside 8.8 m and not beyond, at any slew', () => {
    for (const deg of [0, 45, 90, 200, 315]) {
      const a = (deg * Math.PI) / 180;
      expect(holdAt(g, p, 8.79 * Math.cos(a), 8.79 * Math.sin(a)).inside).toBe(true);
      expect(holdAt(g, p, 8.81 * Math.cos(a), 8.81 * Math.sin(a))).toMatchObject({ inside: false, reachable: true, governs: 'tipping' });
    }
  });

  it('draws its tipping edge at 8.8 m and its inner edge where the boom stands at 80°', () => {
    const s = envelopeShapes(g);
    const e = s.edges.tipping;
    expect(e.length).toBeGreaterThan(100);
    for (let i = 0; i < e.length; i += 2) expect(Math.hypot(e[i], e[i + 1])).toBeCloseTo(8.8, 6);
    expect(s.edges.chart).toHaveLength(0);
    // The inner row is inside, bounded by the boom's reach at 80°: 12·cos 80° = 2.08 m.
    expect(Math.hypot(s.edges.reach[0], s.edges.reach[1])).toBeCloseTo(12 * Math.cos((80 * Math.PI) / 180), 6);
    expect(s.cut).toHaveLength(0);
  });

  it('marks where the load meets an obstacle inside the envelope, by name', () => {
    const shed = { id: 'shed', name: 'shed', polygon: [{ x: 5, y: -1 }, { x: 7, y: -1 }, { x: 7, y: 1 }, { x: 5, y: 1 }], top: 20 };
    const q = prepareLift({ ...input, obstacles: [shed] });
    const s = envelopeShapes(envelopeGrid(q, { radii: 30, slews: 180 })!);
    expect(s.cutBy).toEqual(['shed']);
    expect(s.cut.length).toBeGreaterThan(0);
  });

  it('a load chart that rates less draws its own edge', () => {
    // Rated 4 000 kg out to 6 m and 1 000 kg beyond (next greater radius, load-chart.ts): a 3 000 kg load is within the chart only inside 6 m.
    const q = prepareLift({ ...input, load: { ...input.load, mass: 3000 }, loadChart: { radii: [6, 12], boomLengths: [12], rated: [[4000, 1000]] } });
    const gq = envelopeGrid(q, { radii: 30, slews: 180 })!;
    expect(holdAt(gq, q, 5.9, 0)).toMatchObject({ inside: true });
    expect(holdAt(gq, q, 6.1, 0)).toMatchObject({ inside: false, governs: 'chart' });
    expect(envelopeShapes(gq).edges.chart.length).toBeGreaterThan(0);
  });
});
