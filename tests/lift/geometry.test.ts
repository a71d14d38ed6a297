import { describe, expect, it } from 'vitest';
import { analyzeAtSlew, analyzeLift, prepareLift, segmentSegmentDistance, siteToTruck, truckToSite, BOOM_WIDTH } from '@/lib/lift';
import { M_PER_FT } from '@/lib/units';
import { squareOfPads } from './scenarios';

const box = (id: string, x0: number, y0: number, x1: number, y1: number, top: number) => ({
  id, top, polygon: [{ x: x0, y: y0 }, { x: x1, y: y0 }, { x: x1, y: y1 }, { x: x0, y: y1 }],
});

describe('clearance as the load turns with the boom', () => {
  it('smallest plan gap and its slew, for a wall square to the boom', () => {
    // Source: plane geometry: the 1 × 1 m load at 6 m reaches x = 6.5 at slew 0; a wall at x = 8 [derived].
    // The outer corner (6.5, ±0.5) swings out to √(6.5² + 0.5²) on the axis line, so the true minimum
    // is 8 − √42.5, just off slew 0.
    const r = analyzeLift(squareOfPads({ obstacles: [box('wall', 8, -1, 9, 1, 3)] }));
    const c = r.clearances[0];
    expect(c.horizontal).toBeCloseTo(8 - Math.sqrt(42.5), 2);
    expect(c.overlapsInPlan).toBe(false);
    expect(Math.abs(((c.slew + 180) % 360) - 180)).toBeLessThan(10);
  });

  it('overlap in plan with the load bottom below the top is a conflict; above it is not', () => {
    // Source: issue 3 definition: conflict = plan overlap AND negative vertical clearance.
    // Tip at 2 m, hang 1 m: load bottom at 1 m.
    const low = analyzeLift(squareOfPads({ obstacles: [box('crate', 5.8, -0.2, 6.2, 0.2, 0.6)] })).clearances[0];
    expect(low).toMatchObject({ horizontal: 0, overlapsInPlan: true, conflict: false });
    expect(low.vertical).toBeCloseTo(0.4, 12);
    const high = analyzeLift(squareOfPads({ obstacles: [box('stack', 5.8, -0.2, 6.2, 0.2, 1.5)] }));
    expect(high.clearances[0].conflict).toBe(true);
    expect(high.checks.find((c) => c.id === 'clearance:stack')?.ok).toBe(false);
  });

  it('a circular load footprint uses its radius exactly', () => {
    // Source: distance from a circle to a line is the centre distance minus the radius [derived].
    const r = analyzeLift(
      squareOfPads({
        load: { mass: 5000, footprint: { kind: 'circle', diameter: 1.2 }, height: 1, hang: 1 },
        obstacles: [box('wall', 8, -20, 9, 20, 3)],
        swing: { from: 0, to: 0, direction: 'ccw' },
      }),
    );
    expect(r.clearances[0].horizontal).toBeCloseTo(8 - 6 - 0.6, 9);
  });

  it('site-frame obstacles are turned into the truck frame', () => {
    // Source: rigid transform, site → truck = rotate by −heading after translating [derived].
    const pose = { x: 50, y: 20, heading: 90 };
    const q = siteToTruck({ x: 50, y: 28 }, pose);
    expect(q.x).toBeCloseTo(8, 12);
    expect(q.y).toBeCloseTo(0, 12);
    const back = truckToSite(q, pose);
    expect(back.x).toBeCloseTo(50, 12);
    expect(back.y).toBeCloseTo(28, 12);
    const inSite = squareOfPads({ site: { ...pose, obstacles: [box('wall', 49, 28, 51, 29, 3)] } });
    const inTruck = squareOfPads({ obstacles: [box('wall', 8, -1, 9, 1, 3)] });
    expect(analyzeLift(inSite).clearances[0].horizontal).toBeCloseTo(analyzeLift(inTruck).clearances[0].horizontal, 6);
  });
});

describe('power lines', () => {
  it('3D segment distance (Ericson, Real-Time Collision Detection §5.1.9)', () => {
    // Source: two skew perpendicular segments 3 m apart in z [derived].
    expect(segmentSegmentDistance(-1, 0, 0, 1, 0, 0, 0, -1, 3, 0, 1, 3)).toBeCloseTo(3, 12);
    expect(segmentSegmentDistance(0, 0, 0, 1, 0, 0, 3, 0, 0, 4, 0, 0)).toBeCloseTo(2, 12);
  });
  it('a line above the boom tip: the nearest part, distance and Table A requirement', () => {
    // Tip at (6, 0, 2) over slew 0; a 13.8 kV line along y at x = 6, z = 9 is 7 m above the boom's axis at
    // the tip, so 7 − 0.45 = 6.55 m above its surface (default boom width 0.9 m, lib/lift/schema.ts).
    // Source: geometry [derived]; 10 ft up to 50 kV, 29 CFR 1926.1408 Table A [read].
    const r = analyzeLift(squareOfPads({
      swing: { from: 0, to: 0, direction: 'ccw' },
      powerLines: [{ id: 'feeder', a: { x: 6, y: -30, z: 9 }, b: { x: 6, y: 30, z: 9 }, kV: 13.8 }],
    }));
    expect(r.powerLines[0]).toMatchObject({ nearest: 'boom', required: 10 * M_PER_FT });
    expect(r.powerLines[0].distance).toBeCloseTo(7 - BOOM_WIDTH / 2, 9);
    expect(r.checks.find((c) => c.id === 'power-line:feeder')?.ok).toBe(true);
  });
  it('over the swing, the smallest distance is found where the boom passes under the line', () => {
    // A line at y = 4, z = 2.5 parallel to x: the boom (z = 2) at slew 90 reaches y = 6, its axis passing
    // 0.5 m below, its surface 0.5 − 0.45 = 0.05 m below [derived].
    const r = analyzeLift(squareOfPads({ powerLines: [{ id: 'drop', a: { x: -20, y: 4, z: 2.5 }, b: { x: 20, y: 4, z: 2.5 }, kV: 7.2 }] }));
    expect(r.powerLines[0].distance).toBeCloseTo(0.5 - BOOM_WIDTH / 2, 2);
    expect(r.checks.find((c) => c.id === 'power-line:drop')?.ok).toBe(false);
  });
});

describe('the editor fast path', () => {
  it('analyzeAtSlew agrees with the full analysis at the worst case', () => {
    const input = squareOfPads({ swing: { from: 250, to: 330, direction: 'ccw' }, obstacles: [box('wall', 8, -1, 9, 1, 3)] });
    const r = analyzeLift(input);
    const snap = analyzeAtSlew(prepareLift(input), r.worstCase.slew);
    expect(snap.governing?.percentOfTipping).toBeCloseTo(r.worstCase.percentOfTipping, 9);
    expect(snap.governing?.line).toBe(r.worstCase.line);
    snap.reactions.forEach((x, i) => expect(x.force).toBeCloseTo(r.reactions.atWorstCase[i].force, 9));
    expect(snap.lines).toHaveLength(4);
    expect(snap.clearances[0].target).toBe('wall');
  });
  it('reports an unloaded tip as a line id rather than a number', () => {
    const base = squareOfPads();
    const p = prepareLift({ ...base, masses: [...base.masses, { id: 'cw', mass: 30000, x: -5, y: 0, z: 2, rotates: true }] });
    const snap = analyzeAtSlew(p, 0);
    expect(snap.governing).toBeNull();
    expect(snap.tipsUnloadedAbout).toBe('RL-RR');
  });
});
