import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyzeLift, isLiftError, prepareLift, type LiftInputIn } from '@/lib/lift';
import { envelopeGrid, holdAt, inputAtPoint } from '@/lib/envelope';
import { cornerPads } from '@/tests/lift/scenarios';

/** A random, asymmetric rotator on four pads (invented values), sometimes with a load chart and a stated uncertainty. */
const scene = fc
  .record({
    pads: fc.array(fc.double({ min: 1.6, max: 3, noNaN: true }), { minLength: 8, maxLength: 8 }),
    cw: fc.double({ min: 1000, max: 6000, noNaN: true }),
    length: fc.double({ min: 5, max: 12, noNaN: true }),
    elevation: fc.double({ min: 5, max: 60, noNaN: true }),
    pivotY: fc.double({ min: -0.3, max: 0.3, noNaN: true }),
    load: fc.oneof(fc.double({ min: 300, max: 2500, noNaN: true }), fc.double({ min: 2500, max: 9000, noNaN: true })),
    pick: fc.double({ min: 0, max: 360, noNaN: true }),
    chart: fc.boolean(),
    uncertainty: fc.constantFrom(0, 10),
  })
  .map(({ pads: d, cw, length, elevation, pivotY, load, pick, chart, uncertainty }): LiftInputIn => ({
    supports: cornerPads(d),
    masses: [
      { id: 'carrier', mass: 20000, x: 0.3, y: 0.1, z: 1 },
      { id: 'counterweight', mass: cw, x: -1.2, y: 0, z: 2, rotates: true },
    ],
    boom: { pivot: { x: -0.4, y: pivotY, z: 3 }, length, elevation, mass: 2500, cgFraction: 0.4 },
    hook: { blockMass: 100, riggingMass: 50 },
    load: { mass: load, footprint: { kind: 'rect', length: 1.2, width: 1 }, height: 1, hang: 3 },
    swing: { from: pick, to: pick + 90, direction: 'ccw' },
    soil: { allowable: 500 },
    ...(chart ? { loadChart: { radii: [3, 5, 7, 9, 11, 13], boomLengths: [12], rated: [[14000, 9000, 6500, 5000, 4000, 3200]] } } : {}),
    ...(uncertainty ? { weightUncertainty: uncertainty } : {}),
  }));

/** The engine's full analysis of the lift swung from the pick to the point: are its tipping and chart checks (nominal and upper weight) all within? */
function enginePasses(input: LiftInputIn, prepared: ReturnType<typeof prepareLift>, reach: number, slew: number, direction: 'ccw' | 'cw'): boolean {
  try {
    const r = analyzeLift(inputAtPoint(input, prepared, reach, slew, direction), { sensitivity: false });
    return r.checks.filter((c) => c.code === 'stability' || c.code === 'load-chart').every((c) => c.ok);
  } catch (e) {
    if (isLiftError(e) && e.code === 'tips-unloaded') return false;
    throw e;
  }
}

describe('reach envelope (property: inside passes the engine, outside fails it)', () => {
  it('random scenes and random points', () => {
    let inside = 0, outside = 0, byGrid = 0, byEngine = 0;
    fc.assert(
      fc.property(scene, fc.array(fc.tuple(fc.double({ min: 0.001, max: 0.999, noNaN: true }), fc.double({ min: 0, max: 360, noNaN: true })), { minLength: 6, maxLength: 6 }), (input, points) => {
        const prepared = prepareLift(input);
        const g = envelopeGrid(prepared, { radii: 24, slews: 120 });
        if (!g) return;
        // Points anywhere, and points inside cells the boundary crosses (where the engine decides).
        const band: [number, number][] = [];
        for (let j = 0; j + 1 < g.nR && band.length < 3; j++) {
          for (let k = 0; k < g.nS && band.length < 3; k++) {
            const n = [j * g.nS + k, j * g.nS + ((k + 1) % g.nS), (j + 1) * g.nS + k, (j + 1) * g.nS + ((k + 1) % g.nS)].map((i) => Math.min(g.ccw[i], g.cw[i]) <= g.limits.tipping);
            if (n.some((x) => x) && n.some((x) => !x) && (j * 7 + k) % 5 === 0) band.push([(j + 0.5) / (g.nR - 1), (k + 0.5) * g.step]);
          }
        }
        for (const [u, deg] of [...points, ...band]) {
          const r = g.radii[0] + u * (g.radii[g.nR - 1] - g.radii[0]);
          const h = holdAt(g, prepared, r * Math.cos((deg * Math.PI) / 180), r * Math.sin((deg * Math.PI) / 180));
          expect(h.reachable).toBe(true);
          if (h.exact) byEngine++;
          else byGrid++;
          if (h.inside) {
            inside++;
            expect(enginePasses(input, prepared, h.reach, h.slew, h.direction!)).toBe(true);
          } else {
            outside++;
            expect(enginePasses(input, prepared, h.reach, h.slew, 'ccw')).toBe(false);
            expect(enginePasses(input, prepared, h.reach, h.slew, 'cw')).toBe(false);
          }
        }
      }),
      { numRuns: 40, seed: 1701 },
    );
    // The run must exercise both answers and both ways of deciding them.
    console.log(`envelope property: ${inside} inside, ${outside} outside; ${byGrid} decided by the grid, ${byEngine} by the engine`);
    expect(inside).toBeGreaterThan(10);
    expect(outside).toBeGreaterThan(10);
    expect(byGrid).toBeGreaterThan(10);
    expect(byEngine).toBeGreaterThan(10);
  });

  it('a point beyond the boom at its planned length is not reachable', () => {
    const input: LiftInputIn = fc.sample(scene, { seed: 3, numRuns: 1 })[0];
    const prepared = prepareLift(input);
    const g = envelopeGrid(prepared)!;
    expect(holdAt(g, prepared, g.radii[g.nR - 1] + 0.5, 0)).toMatchObject({ inside: false, reachable: false, governs: 'reach' });
  });
});
