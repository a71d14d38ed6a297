import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyzeLift, convexHull, createReactionState, solveReactions } from '@/lib/lift';
import { squareOfPads } from './scenarios';

/**
 * The oracle: every contact set of three or more supports, each solved by plain Gaussian elimination on
 * the (uncentred) normal equations of R_i = a + b·x_i + c·y_i, kept when it meets the optimality
 * conditions of min ΣR² with R ≥ 0 and equilibrium: R_i ≥ 0 in contact, a + b·x_j + c·y_j ≤ 0 released.
 * Source: the Karush–Kuhn–Tucker conditions of a convex quadratic programme [derived]; the rigid-base
 * plane is H. Shapiro, Cranes and Derricks, 4th ed., §5 [read].
 */
function oracle(xs: number[], ys: number[], W: number, mx: number, my: number): number[] | null {
  const n = xs.length;
  let best: number[] | null = null;
  let bestViolation = Infinity;
  for (let mask = 1; mask < 1 << n; mask++) {
    const idx = xs.map((_, i) => i).filter((i) => mask & (1 << i));
    if (idx.length < 3) continue;
    const A = [[0, 0, 0, W], [0, 0, 0, mx], [0, 0, 0, my]];
    for (const i of idx) {
      const v = [1, xs[i], ys[i]];
      for (let r = 0; r < 3; r++) for (let c = 0; c < 3; c++) A[r][c] += v[r] * v[c];
    }
    const sol = gauss(A);
    if (!sol) continue;
    const w = xs.map((x, i) => sol[0] + sol[1] * x + sol[2] * ys[i]);
    const violation = Math.max(...w.map((v, i) => (mask & (1 << i) ? -v : v)));
    if (violation < bestViolation) {
      bestViolation = violation;
      best = w.map((v, i) => (mask & (1 << i) ? Math.max(0, v) : 0));
    }
  }
  return bestViolation <= 1e-7 * W ? best : null;
}

function gauss(m: number[][]): number[] | null {
  const a = m.map((r) => [...r]);
  for (let c = 0; c < 3; c++) {
    let p = c;
    for (let r = c + 1; r < 3; r++) if (Math.abs(a[r][c]) > Math.abs(a[p][c])) p = r;
    if (Math.abs(a[p][c]) < 1e-9 * (Math.abs(a[0][0]) + 1)) return null;
    [a[c], a[p]] = [a[p], a[c]];
    for (let r = 0; r < 3; r++) {
      if (r === c) continue;
      const f = a[r][c] / a[c][c];
      for (let k = c; k < 4; k++) a[r][k] -= f * a[c][k];
    }
  }
  return [a[0][3] / a[0][0], a[1][3] / a[1][1], a[2][3] / a[2][2]];
}

const solve = (xs: number[], ys: number[], W: number, cx: number, cy: number) =>
  solveReactions(Float64Array.from(xs), Float64Array.from(ys), W, W * cx, W * cy, createReactionState(xs.length));

describe('exact contact solver', () => {
  it('regression: a released pad comes back into contact; the greedy release reported a tip', () => {
    // Four outriggers and a belly jack J at (0.9, −0.3); 30 000 kg with its CG at (2.3, −2.8), inside the pads.
    // The greedy method released FL for good and then reported a tip. The exact contact set is FL, FR, J:
    // three supports, so the reactions are W times the barycentric weights of the CG (hand calculation):
    //   det = (B − A) × (C − A) = (−0.5)(−2.9) − (−5.5)(−1.9) = −9.00 with A = FL, B = FR, C = J
    //   w_FL = ((B − P) × (C − P)) / det = (0·2.5 − (−0.1)(−1.4)) / −9 = 0.01556 → 466.7 kg
    //   w_FR = ((C − P) × (A − P)) / det = (−1.4·5.4 − 2.5·0.5) / −9 = 0.97889 → 29 366.7 kg
    //   w_J  = ((A − P) × (B − P)) / det = (0.5·(−0.1) − 5.4·0) / −9 = 0.00556 → 166.7 kg
    const xs = [2.8, -2.5, -2.6, 2.3, 0.9], ys = [2.6, 2.8, -2.8, -2.9, -0.3];
    const r = solve(xs, ys, 30000, 2.3, -2.8);
    expect(r.tips).toBe(false);
    expect(r.mass[0]).toBeCloseTo((30000 * 0.14) / 9, 6);
    expect(r.mass[3]).toBeCloseTo((30000 * 8.81) / 9, 6);
    expect(r.mass[4]).toBeCloseTo((30000 * 0.05) / 9, 6);
    expect(r.mass[1]).toBe(0);
    expect(r.mass[2]).toBe(0);
  });

  it('a CG outside the pads tips; the limit state puts the whole weight on the tipping line', () => {
    // Square of pads (±2, ±2), CG at (2.5, 1): outside the front line x = 2. Lever rule along FR–FL
    // (y −2 → 2): FL carries W·(1 + 2)/4 = 0.75 W, FR 0.25 W [derived].
    const r = solve([2, -2, -2, 2], [2, 2, -2, -2], 20000, 2.5, 1);
    expect(r.tips).toBe(true);
    expect(r.mass[0]).toBeCloseTo(15000, 6);
    expect(r.mass[3]).toBeCloseTo(5000, 6);
    expect(r.mass[0] + r.mass[1] + r.mass[2] + r.mass[3]).toBeCloseTo(20000, 6);
  });

  // Trucks with 3 to 8 supports: outriggers round the outside and jacks inside, on a 1 cm grid.
  const cm = (lo: number, hi: number) => fc.integer({ min: lo * 100, max: hi * 100 }).map((v) => v / 100);
  const truck = fc
    .record({
      outer: fc.uniqueArray(fc.record({ a: fc.integer({ min: 0, max: 359 }), r: cm(1.5, 4) }), { minLength: 3, maxLength: 6, selector: (p) => p.a }),
      jacks: fc.array(fc.record({ x: cm(-1, 1), y: cm(-0.8, 0.8) }), { maxLength: 2 }),
      edge: fc.nat(),
      along: fc.double({ min: 0.05, max: 0.95, noNaN: true }),
      inward: fc.oneof(fc.double({ min: 1e-4, max: 0.05, noNaN: true }), fc.double({ min: 0.05, max: 1.5, noNaN: true })),
      W: fc.double({ min: 1000, max: 80000, noNaN: true }),
    })
    .map(({ outer, jacks, ...rest }) => ({
      pts: [
        ...outer.map(({ a, r }) => ({ x: Math.round(r * Math.cos((a * Math.PI) / 180) * 100) / 100, y: Math.round(r * Math.sin((a * Math.PI) / 180) * 100) / 100 })),
        ...jacks,
      ],
      ...rest,
    }));

  it('matches exhaustive enumeration on random trucks with 3–8 supports, interior jacks, near tipping', () => {
    fc.assert(
      fc.property(truck, ({ pts, edge, along, inward, W }) => {
        const distinct = new Set(pts.map((p) => `${p.x},${p.y}`)).size === pts.length;
        const hull = convexHull(pts.map((p, i) => ({ id: String(i), ...p })));
        let area = 0;
        for (let i = 0; i < hull.length; i++) area += hull[i].x * hull[(i + 1) % hull.length].y - hull[(i + 1) % hull.length].x * hull[i].y;
        fc.pre(distinct && hull.length >= 3 && area > 2);
        // CG a little inside a hull edge: near tipping, where contact sets change.
        const a = hull[edge % hull.length], b = hull[(edge + 1) % hull.length];
        const len = Math.hypot(b.x - a.x, b.y - a.y);
        const cx = a.x + along * (b.x - a.x) - (inward * (b.y - a.y)) / len;
        const cy = a.y + along * (b.y - a.y) + (inward * (b.x - a.x)) / len;
        const xs = pts.map((p) => p.x), ys = pts.map((p) => p.y);
        const want = oracle(xs, ys, W, W * cx, W * cy);
        fc.pre(want !== null);
        const got = solve(xs, ys, W, cx, cy);
        expect(got.tips).toBe(false);
        got.mass.forEach((m, i) => expect(Math.abs(m - want![i])).toBeLessThan(1e-6 * W));
        // Equilibrium always: ΣR = W, ΣR·x = W·x̄, ΣR·y = W·ȳ.
        let sum = 0, mx = 0, my = 0;
        got.mass.forEach((m, i) => {
          expect(m).toBeGreaterThanOrEqual(0);
          sum += m; mx += m * xs[i]; my += m * ys[i];
        });
        expect(Math.abs(sum - W)).toBeLessThan(1e-8 * W);
        expect(Math.abs(mx - W * cx)).toBeLessThan(1e-8 * W * 4);
        expect(Math.abs(my - W * cy)).toBeLessThan(1e-8 * W * 4);
      }),
      { numRuns: 400 },
    );
  });

  it('over a whole swing with a belly jack the reactions always sum to the weight', () => {
    // Source: static equilibrium, ΣF = 0 [derived]. Swing a load round a truck with a jack under its middle.
    const input = squareOfPads({
      supports: [
        { id: 'FL', x: 2, y: 2, area: 0.25 },
        { id: 'RL', x: -2, y: 2, area: 0.25 },
        { id: 'RR', x: -2, y: -2, area: 0.25 },
        { id: 'FR', x: 2, y: -2, area: 0.25 },
        { id: 'J', x: 0.4, y: -0.2, area: 0.25 },
      ],
      load: { mass: 9000, footprint: { kind: 'circle', diameter: 1 }, height: 1, hang: 1 },
    });
    const r = analyzeLift(input);
    const total = 20000 + 9000;
    const sum = r.reactions.atWorstCase.reduce((s, x) => s + x.mass, 0);
    expect(r.reactions.tipsAtWorstCase).toBe(false);
    expect(Math.abs(sum - total)).toBeLessThan(1e-6 * total);
  });
});
