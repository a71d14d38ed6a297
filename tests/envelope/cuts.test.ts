import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { gapAt, prepareLift, type LiftInputIn, type PreparedLift } from '@/lib/lift';
import { atReach, envelopeGrid, envelopeLift, radiusRange, reachFor } from '@/lib/envelope';
import { benchInput } from '@/lib/lift/bench';
import { cornerPads } from '@/tests/lift/scenarios';

/**
 * The envelope's cut-outs (where the load meets a truck part or an obstacle) are found by trying each
 * target only at the columns its bounding circle can reach (grid.ts rowCuts). Checked here against the
 * plain way: every node against every target, in order, through the engine's own gapAt. Same grid,
 * node for node (invented scenes; the rule is the engine's clearance check, lib/lift/clearance.ts).
 */
function referenceCuts(prepared: PreparedLift, nR: number, nS: number): Int16Array {
  const p = envelopeLift(prepared);
  const range = radiusRange(p);
  const step = 360 / nS;
  const clearance = p.input.limits.clearance;
  const cut = new Int16Array(nR * nS).fill(-1);
  for (let j = 0; j < nR; j++) {
    const r = range.min + ((range.max - range.min) * j) / (nR - 1);
    const pr = atReach(p, reachFor(p, r) ?? p.input.boom.length);
    for (let k = 0; k < nS; k++) {
      const deg = k * step;
      for (let i = 0; i < pr.targets.length; i++) {
        const t = pr.targets[i];
        if (pr.loadBottom - t.top >= clearance) continue;
        if (gapAt(pr, t, deg) < clearance) {
          cut[j * nS + k] = i;
          break;
        }
      }
    }
  }
  return cut;
}

const box = (id: string, cx: number, cy: number, hw: number, hd: number, top: number) => ({
  id,
  polygon: [{ x: cx - hw, y: cy - hd }, { x: cx + hw, y: cy - hd }, { x: cx + hw, y: cy + hd }, { x: cx - hw, y: cy + hd }],
  top,
});

const obstacle = fc
  .record({ a: fc.double({ min: 0, max: 2 * Math.PI, noNaN: true }), r: fc.double({ min: 0, max: 16, noNaN: true }), hw: fc.double({ min: 0.1, max: 3, noNaN: true }), hd: fc.double({ min: 0.1, max: 3, noNaN: true }), top: fc.double({ min: 0.2, max: 9, noNaN: true }) })
  .map(({ a, r, hw, hd, top }) => ({ cx: r * Math.cos(a), cy: r * Math.sin(a), hw, hd, top }));

const scene = fc
  .record({
    pads: fc.array(fc.double({ min: 1.6, max: 3, noNaN: true }), { minLength: 8, maxLength: 8 }),
    length: fc.double({ min: 5, max: 12, noNaN: true }),
    elevation: fc.double({ min: 5, max: 60, noNaN: true }),
    pivotY: fc.double({ min: -0.3, max: 0.3, noNaN: true }),
    pick: fc.double({ min: 0, max: 360, noNaN: true }),
    round: fc.boolean(),
    clearance: fc.double({ min: 0, max: 2, noNaN: true }),
    obstacles: fc.array(obstacle, { minLength: 1, maxLength: 40 }),
  })
  .map(({ pads, length, elevation, pivotY, pick, round, clearance, obstacles }): LiftInputIn => ({
    supports: cornerPads(pads),
    masses: [
      { id: 'carrier', mass: 20000, x: 0.3, y: 0.1, z: 1 },
      { id: 'counterweight', mass: 3000, x: -1.2, y: 0, z: 2, rotates: true },
    ],
    boom: { pivot: { x: -0.4, y: pivotY, z: 3 }, length, elevation, mass: 2500, cgFraction: 0.4 },
    hook: { blockMass: 100, riggingMass: 50 },
    load: { mass: 1500, footprint: round ? { kind: 'circle', diameter: 1.4 } : { kind: 'rect', length: 1.6, width: 1 }, height: 1, hang: 3 },
    swing: { from: pick, to: pick + 90, direction: 'ccw' },
    soil: { allowable: 500 },
    limits: { clearance },
    bodies: [box('cab', 2.2, 0, 0.9, 1.2, 2.8)],
    obstacles: obstacles.map((o, i) => box(`o${i}`, o.cx, o.cy, o.hw, o.hd, o.top)),
  }));

describe('reach envelope cut-outs', () => {
  it('match every node tried against every target (random scenes)', () => {
    let cut = 0, clear = 0;
    fc.assert(
      fc.property(scene, (input) => {
        const prepared = prepareLift(input);
        const g = envelopeGrid(prepared, { radii: 12, slews: 90 });
        if (!g) return;
        const ref = referenceCuts(prepared, 12, 90);
        expect(Array.from(g.cut)).toEqual(Array.from(ref));
        for (const c of ref) if (c >= 0) cut++;
        else clear++;
      }),
      { numRuns: 60, seed: 1703 },
    );
    // Both answers must occur, or the comparison proves little.
    expect(cut).toBeGreaterThan(500);
    expect(clear).toBeGreaterThan(500);
  });

  it('match on the engine bench scene at the editor grid size (36 × 240)', () => {
    const prepared = prepareLift(benchInput());
    const g = envelopeGrid(prepared)!;
    const ref = referenceCuts(prepared, 36, 240);
    expect(Array.from(g.cut)).toEqual(Array.from(ref));
    expect(ref.some((c) => c >= 0)).toBe(true);
  });
});
