import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyzeAtSlew, analyzeLift, arcOf, LiftError, prepareLift, tippingAt, type LiftInputIn } from '@/lib/lift';
import { squareOfPads } from './scenarios';

/**
 * The swing rule (lib/lift/swing.ts, README "The lift engine"): a span within 1e-9° of a non-zero whole
 * number of turns is a full turn; more than a turn is a full turn; only from ≈ to is one slew.
 */
const fullTurns: [number, number, 'ccw' | 'cw'][] = [
  [0, 360, 'ccw'],
  [0, 360, 'cw'],
  [360, 0, 'ccw'],
  [360, 0, 'cw'],
  [0, 720, 'ccw'],
  [-720, 0, 'ccw'],
  [10, 370, 'cw'],
  [152.2, 512.2, 'ccw'],
  [0, 400, 'ccw'],
  [0, -360, 'ccw'],
];

describe('swings, defined once', () => {
  it.each(fullTurns)('%s → %s %s is a full turn', (from, to, direction) => {
    // Source: issue 9 item 1, the swing rule [derived]. 512.2 − 152.2 = 360.00000000000006 in doubles.
    const a = arcOf({ from, to, direction });
    expect(a.fullTurn).toBe(true);
    expect(a.span).toBe(360);
    expect(a.from).toBeGreaterThanOrEqual(0);
    expect(a.from).toBeLessThan(360);
  });

  it('ordinary arcs keep their span, across 0° either way', () => {
    // Source: the slew convention (counter-clockwise positive) [derived].
    expect(arcOf({ from: 300, to: 60, direction: 'ccw' })).toEqual({ from: 300, span: 120, sign: 1, fullTurn: false });
    expect(arcOf({ from: 20, to: 340, direction: 'cw' })).toEqual({ from: 20, span: 40, sign: -1, fullTurn: false });
    expect(arcOf({ from: -90, to: 90, direction: 'ccw' })).toEqual({ from: 270, span: 180, sign: 1, fullTurn: false });
    // Pick and set at the same slew: one slew, said so in the result's arc.
    expect(arcOf({ from: 45, to: 45, direction: 'cw' })).toEqual({ from: 45, span: 0, sign: -1, fullTurn: false });
  });

  it('regression: 0 → 360 clockwise finds the worst case at 270°, not the slew-0 figure', () => {
    // Hand calculation (reference.md "Stability", tipping load = stabilising moment ÷ lever arm):
    // pads at x = ±2, left y = +2, right y = −1.5; carrier 20 000 kg at the axis; 5 000 kg at 6 m.
    // Over the right side (slew 270°) the line y = −1.5 is 1.5 m from the axis:
    //   tipping load = 20 000·1.5 / (6 − 1.5) = 6 666.7 kg → 5 000 / 6 666.7 = 75.0 %.
    // At slew 0 (over the front, x = 2): 20 000·2 / (6 − 2) = 10 000 kg → 50.0 % (what a single-angle analysis said).
    const input = squareOfPads({
      supports: [
        { id: 'FL', x: 2, y: 2, area: 0.25 },
        { id: 'RL', x: -2, y: 2, area: 0.25 },
        { id: 'RR', x: -2, y: -1.5, area: 0.25 },
        { id: 'FR', x: 2, y: -1.5, area: 0.25 },
      ],
      swing: { from: 0, to: 360, direction: 'cw' },
    });
    const r = analyzeLift(input);
    expect(r.arc).toEqual({ from: 0, to: 0, direction: 'cw', span: 360, fullTurn: true });
    expect(r.worstCase.percentOfTipping).toBeCloseTo(75, 6);
    expect(r.worstCase.slew).toBeCloseTo(270, 3);
    expect(r.worstCase.tippingLoad).toBeCloseTo(20000 / 3, 3);
    expect(tippingAt(prepareLift(input), 0).percent).toBeCloseTo(50, 9);
  });

  it('regression: 152.2 → 512.2 ccw sweeps past a trailer the load strikes', () => {
    // Hand calculation: hook at 6 m; at slew 180° the 1 × 1 m load spans x −6.5…−5.5, inside the trailer
    // x −7…−5, y −1…1; load bottom = tip 2 m − hang 1 m = 1 m, below the 3 m deck → strike.
    // At 152.2° alone the load centre is at (−5.31, 2.80): 1.30 m from the trailer's y = 1 edge (what the
    // floating-point remainder 5.7e-14 reported).
    const trailer = { id: 'trailer', polygon: [{ x: -7, y: -1 }, { x: -5, y: -1 }, { x: -5, y: 1 }, { x: -7, y: 1 }], top: 3 };
    const r = analyzeLift(squareOfPads({ obstacles: [trailer], swing: { from: 152.2, to: 512.2, direction: 'ccw' } }));
    const c = r.clearances.find((x) => x.target === 'trailer')!;
    expect(r.arc.fullTurn).toBe(true);
    expect(c.conflict).toBe(true);
    expect(r.checks.find((k) => k.id === 'clearance:trailer')!.ok).toBe(false);
  });

  it('every way of typing a full turn gives the same result', () => {
    // Source: the swing rule [derived]; all of them cover every slew once.
    const base = squareOfPads({
      supports: [
        { id: 'FL', x: 2.3, y: 2.1, area: 0.25 },
        { id: 'RL', x: -2.6, y: 1.8, area: 0.25 },
        { id: 'RR', x: -2.1, y: -2.4, area: 0.25 },
        { id: 'FR', x: 1.7, y: -1.2, area: 0.25 },
      ],
      masses: [
        { id: 'carrier', mass: 20000, x: 0.2, y: 0.1, z: 1 },
        { id: 'counterweight', mass: 3000, x: -1.4, y: 0, z: 2, rotates: true },
      ],
    });
    fc.assert(
      fc.property(fc.double({ min: -720, max: 720, noNaN: true }), fc.constantFrom(...fullTurns), (phi, [from, to, direction]) => {
        const shift = ((from - phi) % 360) + phi; // any start; a whole turn stays a whole turn
        const typed = analyzeLift({ ...base, swing: { from: shift, to: shift + (to - from), direction } });
        const plain = analyzeLift({ ...base, swing: { from: 0, to: 360, direction: 'ccw' } });
        expect(typed.arc.fullTurn).toBe(true);
        expect(Math.abs(typed.worstCase.percentOfTipping - plain.worstCase.percentOfTipping)).toBeLessThan(1e-3);
        typed.reactions.maxima.forEach((m, i) => expect(Math.abs(m.mass - plain.reactions.maxima[i].mass)).toBeLessThan(1e-3 * plain.reactions.maxima[i].mass + 1));
      }),
      { numRuns: 25 },
    );
  });

  it('rotation invariance with fractional angles: turning truck and swing together keeps every figure', () => {
    // Source: rotational symmetry of the statics about the slew axis [derived].
    const rot = (p: { x: number; y: number }, a: number) => ({ x: p.x * Math.cos(a) - p.y * Math.sin(a), y: p.x * Math.sin(a) + p.y * Math.cos(a) });
    const base = squareOfPads({ swing: { from: 12.345, to: 97.125, direction: 'ccw' } });
    fc.assert(
      fc.property(fc.double({ min: -400, max: 400, noNaN: true }), (phi) => {
        const a = (phi * Math.PI) / 180;
        const turned: LiftInputIn = {
          ...base,
          supports: base.supports.map((s) => ({ ...s, ...rot(s, a) })),
          masses: base.masses.map((m) => ({ ...m, ...rot(m, a) })),
          swing: { ...base.swing, from: base.swing.from + phi, to: base.swing.to + phi },
        };
        const r0 = analyzeLift(base);
        const r1 = analyzeLift(turned);
        expect(r1.arc.span).toBeCloseTo(r0.arc.span, 9);
        expect(Math.abs(r1.worstCase.percentOfTipping - r0.worstCase.percentOfTipping)).toBeLessThan(0.01);
      }),
      { numRuns: 40 },
    );
  });

  it('analyzeAtSlew refuses a slew that is not a finite number', () => {
    // Source: issue 9 item 5; a NaN slew made every figure NaN and every check pass.
    const p = prepareLift(squareOfPads());
    for (const bad of [Number.NaN, Infinity, -Infinity]) {
      expect(() => analyzeAtSlew(p, bad)).toThrow(LiftError);
    }
    expect(analyzeAtSlew(p, 450).slew).toBe(90);
  });
});
