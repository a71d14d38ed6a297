import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyzeCoarse, analyzePrepared, coarseCeiling, coarseMargins, leastMargin, limitsOf, prepareLift, resultMargins, tippingAt, slewAt, type LiftInputIn, type PreparedLift } from '@/lib/lift';
import { rotator } from './scenarios';

/**
 * The coarse mode against the exact analysis over random scenes (invented values): for every limit the
 * coarse margin is never higher than the exact one. Source: the bounds of lib/lift/coarse-bounds.ts
 * [derived: closed-form extremum of a ratio of sinusoids; Piyavskii's Lipschitz bound, 1972].
 */
const box = (cx: number, cy: number, hw: number, hd: number) => [
  { x: cx - hw, y: cy - hd }, { x: cx + hw, y: cy - hd }, { x: cx + hw, y: cy + hd }, { x: cx - hw, y: cy + hd },
];

const obstacle = fc.record({
  r: fc.double({ min: 3, max: 20, noNaN: true }),
  a: fc.double({ min: 0, max: 2 * Math.PI, noNaN: true }),
  hw: fc.double({ min: 0.2, max: 2, noNaN: true }),
  hd: fc.double({ min: 0.2, max: 3, noNaN: true }),
  top: fc.double({ min: 0.3, max: 9, noNaN: true }),
});

const footprint = fc.oneof(
  fc.record({ kind: fc.constant('rect' as const), length: fc.double({ min: 0.5, max: 8, noNaN: true }), width: fc.double({ min: 0.5, max: 3, noNaN: true }) }),
  fc.record({ kind: fc.constant('circle' as const), diameter: fc.double({ min: 0.3, max: 3, noNaN: true }) }),
);

const scene = fc
  .record({
    pads: fc.array(fc.double({ min: 1.5, max: 3.2, noNaN: true }), { minLength: 8, maxLength: 8 }),
    jack: fc.option(fc.double({ min: 3.5, max: 6, noNaN: true })),
    cw: fc.double({ min: 500, max: 6000, noNaN: true }),
    length: fc.double({ min: 5, max: 14, noNaN: true }),
    elevation: fc.double({ min: -5, max: 75, noNaN: true }),
    load: fc.double({ min: 300, max: 9000, noNaN: true }),
    hang: fc.double({ min: 0.5, max: 8, noNaN: true }),
    footprint,
    from: fc.double({ min: 0, max: 360, noNaN: true }),
    span: fc.oneof(fc.double({ min: 0, max: 360, noNaN: true }), fc.constant(360)),
    cw_: fc.boolean(),
    obstacles: fc.array(obstacle, { maxLength: 8 }),
    line: fc.option(fc.record({ y: fc.double({ min: 4, max: 25, noNaN: true }), z: fc.double({ min: 5, max: 15, noNaN: true }), kV: fc.constantFrom(13.8, 34.5, 138, null) })),
    uncertainty: fc.option(fc.double({ min: 1, max: 30, noNaN: true })),
    clearance: fc.double({ min: 0, max: 1, noNaN: true }),
    cribbing: fc.boolean(),
  })
  .map((s): LiftInputIn => {
    const base = rotator();
    const crib = s.cribbing ? { cribbingArea: 1.44, cribbingMass: 120 } : {};
    const d = s.pads;
    return {
      ...base,
      supports: [
        { id: 'FL', x: d[0], y: d[1], area: 0.36, ...crib },
        { id: 'RL', x: -d[2], y: d[3], area: 0.36, ...crib },
        { id: 'RR', x: -d[4], y: -d[5], area: 0.36, ...crib },
        { id: 'FR', x: d[6], y: -d[7], area: 0.36, ...crib },
        ...(s.jack === null ? [] : [{ id: 'FJ', x: s.jack, y: 0, area: 0.25 }]),
      ],
      masses: base.masses.map((m) => (m.id === 'counterweight' ? { ...m, mass: s.cw } : m)),
      boom: { ...base.boom, length: s.length, elevation: s.elevation },
      load: { mass: s.load, footprint: s.footprint, height: 1.5, hang: s.hang },
      swing: { from: s.from, to: s.from + (s.cw_ ? -s.span : s.span), direction: s.cw_ ? 'cw' : 'ccw' },
      obstacles: s.obstacles.map((o, i) => ({ id: `o${i}`, polygon: box(o.r * Math.cos(o.a), o.r * Math.sin(o.a), o.hw, o.hd), top: o.top })),
      powerLines: s.line ? [{ id: 'wire', a: { x: -40, y: s.line.y, z: s.line.z }, b: { x: 40, y: s.line.y + 3, z: s.line.z }, kV: s.line.kV }] : [],
      limits: { percentOfTipping: 85, clearance: s.clearance, percentOfRated: 100 },
      loadChart: { radii: [3, 6, 9, 12, 15], boomLengths: [6, 10, 15], rated: [[20000, 12000, 8000, 5000, 3000], [18000, 11000, 7000, 4500, 2500], [15000, 9000, 6000, 4000, 2000]] },
      ...(s.uncertainty === null ? {} : { weightUncertainty: s.uncertainty }),
    };
  });

/** The prepared lift, or null for a scene both modes refuse (it tips with nothing on the hook). */
function preparedOrNull(input: LiftInputIn): PreparedLift | null {
  try {
    const p = prepareLift(input);
    analyzePrepared(p, { sensitivity: false });
    return p;
  } catch {
    return null;
  }
}

describe('coarse mode (fast-check)', () => {
  it('never gives a higher margin than the exact analysis, for every limit', () => {
    let compared = 0;
    fc.assert(
      fc.property(scene, (input) => {
        const p = preparedOrNull(input);
        if (!p) return;
        const exact = new Map(resultMargins(analyzePrepared(p, { sensitivity: false })).map((m) => [m.id, m.margin]));
        const coarse = coarseMargins(analyzeCoarse(p), limitsOf(p));
        expect(coarse.length).toBe(exact.size);
        for (const m of coarse) {
          const e = exact.get(m.id);
          expect(e, m.id).toBeDefined();
          if (e === -Infinity) expect(m.margin).toBe(-Infinity);
          else expect(m.margin, m.id).toBeLessThanOrEqual(e! + 1e-9);
          compared++;
        }
      }),
      { numRuns: 150, seed: 17 },
    );
    expect(compared).toBeGreaterThan(1000);
  });

  it('its worst percent of tipping is the true maximum of the arc, not an undershoot', () => {
    // The closed form against a 0.01° scan of the same engine function [derived].
    fc.assert(
      fc.property(scene, (input) => {
        const p = preparedOrNull(input);
        if (!p) return;
        const c = analyzeCoarse(p).percentOfTipping;
        let scanned = 0;
        for (let t = 0; t <= p.span; t += 0.01) scanned = Math.max(scanned, tippingAt(p, slewAt(p, t)).percent);
        expect(c).toBeGreaterThanOrEqual(scanned);
        expect(c - scanned).toBeLessThan(1e-3 + 1e-6 * scanned);
      }),
      { numRuns: 40, seed: 5 },
    );
  });

  it('its ceiling (tipping, chart and a few power-line samples) is never below the coarse least margin', () => {
    // The least margin is the smallest of all the terms, and each term of the ceiling is one of them or
    // the same sampled distance before the Lipschitz allowance [derived]; the advisor skips on it.
    let lines = 0;
    fc.assert(
      fc.property(scene, (input) => {
        const p = preparedOrNull(input);
        if (!p) return;
        const least = leastMargin(coarseMargins(analyzeCoarse(p), limitsOf(p))).margin;
        const ceiling = coarseCeiling(p);
        if (least === -Infinity) return;
        expect(ceiling).toBeGreaterThanOrEqual(least);
        if (p.powerLines.length > 0) lines++;
      }),
      { numRuns: 150, seed: 23 },
    );
    expect(lines).toBeGreaterThan(20);
  });
});
