import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyzeLift, convexHull, createReactionState, solveReactions } from '@/lib/lift';
import { squareOfPads } from './scenarios';

const xs = Float64Array.from([3, -3, -3, 3]);
const ys = Float64Array.from([2.5, 2.5, -2.5, -2.5]);

describe('four-pad reactions on a rigid base', () => {
  it('match R_i = V/n + M_x·y_i/Σy² + M_y·x_i/Σx²', () => {
    // Source: four-float formula, reference.md "Stability" (value from memory; standard statics).
    const V = 30000, cgx = 0.4, cgy = -0.3;
    const out = solveReactions(xs, ys, V, V * cgx, V * cgy, createReactionState(4));
    const sy2 = 4 * 2.5 ** 2, sx2 = 4 * 3 ** 2;
    for (let i = 0; i < 4; i++) expect(out.mass[i]).toBeCloseTo(V / 4 + (V * cgy * ys[i]) / sy2 + (V * cgx * xs[i]) / sx2, 8);
    expect(out.tips).toBe(false);
  });

  it('one negative float: released and the other three re-solved', () => {
    // Source: H. Shapiro, Cranes and Derricks, 4th ed., §5, Eq. 5.22: set it to 0, re-solve on three [read].
    const V = 30000, cgx = 2.0, cgy = -1.8;
    const formula = V / 4 + (V * cgy * ys[1]) / (4 * 6.25) + (V * cgx * xs[1]) / 36;
    expect(formula).toBeLessThan(0); // the rear-left float would pull
    const out = solveReactions(xs, ys, V, V * cgx, V * cgy, createReactionState(4));
    expect(out.mass[1]).toBe(0);
    expect(out.active[1]).toBe(0);
    // Three supports: the reactions are V times the barycentric weights of the CG in triangle 0-2-3.
    const [ax, ay, bx, by, cx, cy] = [xs[0], ys[0], xs[2], ys[2], xs[3], ys[3]];
    const det = (by - cy) * (ax - cx) + (cx - bx) * (ay - cy);
    const w0 = ((by - cy) * (cgx - cx) + (cx - bx) * (cgy - cy)) / det;
    const w2 = ((cy - ay) * (cgx - cx) + (ax - cx) * (cgy - cy)) / det;
    expect(out.mass[0]).toBeCloseTo(V * w0, 6);
    expect(out.mass[2]).toBeCloseTo(V * w2, 6);
    expect(out.mass[3]).toBeCloseTo(V * (1 - w0 - w2), 6);
    expect(out.tips).toBe(false);
  });

  it('two negative floats: the crane tips', () => {
    // Source: H. Shapiro, Cranes and Derricks, 4th ed., §5, Eq. 5.22 [read].
    const V = 30000;
    const out = solveReactions(xs, ys, V, V * 3.6, 0, createReactionState(4));
    expect(out.tips).toBe(true);
  });

  it('pressure over the pad, and over the cribbing with the cribbing mass', () => {
    // Source: q = R / A; for a mat (P + W_mat) / A (D. Duerr, Effective Bearing Length of Crane Mats, 2010) [read].
    const input = squareOfPads({
      swing: { from: 0, to: 0, direction: 'ccw' },
      supports: [
        { id: 'FL', x: 2, y: 2, area: 0.25, cribbingArea: 1, cribbingMass: 100 },
        { id: 'RL', x: -2, y: 2, area: 0.25 },
        { id: 'RR', x: -2, y: -2, area: 0.25 },
        { id: 'FR', x: 2, y: -2, area: 0.25 },
      ],
    });
    const fl = analyzeLift(input).reactions.atWorstCase[0];
    // 25 000 kg with 5 000 kg at x = 6: R = 6 250 + 30 000·2/16 = 10 000 kg per front pad.
    expect(fl.mass).toBeCloseTo(10000, 8);
    expect(fl.force).toBeCloseTo((10000 * 9.80665) / 1000, 9);
    expect(fl.pressure).toBeCloseTo(fl.force / 0.25, 9);
    expect(fl.pressureWithCribbing).toBeCloseTo((10100 * 9.80665) / 1000, 9);
  });
});

describe('reactions, properties (fast-check)', () => {
  // Pads on a 1 cm grid and never two on one spot: the engine refuses supports nearer than
  // MIN_SUPPORT_SPACING (coincident-supports), as the reactions of two supports on one spot are not determined.
  const cm = fc.integer({ min: -400, max: 400 }).map((v) => v / 100);
  const pt = fc.record({ x: cm, y: cm });
  const pads = fc.uniqueArray(pt, { minLength: 3, maxLength: 7, selector: (p) => `${p.x},${p.y}` });
  it('sum to the total weight and balance its moments whenever no support is in tension', () => {
    // Source: static equilibrium, ΣF = 0 and ΣM = 0 [derived].
    fc.assert(
      fc.property(pads, fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 1000, max: 60000, noNaN: true }), (pts, u, v, W) => {
        const hull = convexHull(pts.map((p, i) => ({ id: String(i), ...p })));
        let area = 0;
        for (let i = 0; i < hull.length; i++) area += hull[i].x * hull[(i + 1) % hull.length].y - hull[(i + 1) % hull.length].x * hull[i].y;
        fc.pre(hull.length >= 3 && area > 1);
        // CG inside the hull: a convex combination of three hull points.
        const [a, b, c] = [hull[0], hull[1], hull[2]];
        const s = Math.min(u, 1 - v * 0.999), t = (1 - s) * v;
        const cx = a.x + s * (b.x - a.x) + t * (c.x - a.x), cy = a.y + s * (b.y - a.y) + t * (c.y - a.y);
        const X = Float64Array.from(pts, (p) => p.x), Y = Float64Array.from(pts, (p) => p.y);
        const r = solveReactions(X, Y, W, W * cx, W * cy, createReactionState(pts.length));
        fc.pre(!r.tips);
        let sum = 0, mx = 0, my = 0;
        r.mass.forEach((m, i) => {
          expect(m).toBeGreaterThanOrEqual(-1e-6 * W);
          sum += m; mx += m * X[i]; my += m * Y[i];
        });
        // To a relative 1e-8 of the weight (and of its moment over the 4 m half-extent): double precision
        // on thin, ill-conditioned pad layouts still lands near 1e-9.
        expect(Math.abs(sum - W)).toBeLessThan(1e-8 * W);
        expect(Math.abs(mx - W * cx)).toBeLessThan(1e-8 * W * 4);
        expect(Math.abs(my - W * cy)).toBeLessThan(1e-8 * W * 4);
      }),
      { numRuns: 150 },
    );
  });
});
