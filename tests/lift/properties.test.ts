import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyzeLift, prepareLift, slewAt, tippingAt, withLoadMass, type LiftInputIn } from '@/lib/lift';
import { REFINE_TOL } from '@/lib/lift/sweep';
import { cornerPads } from './scenarios';

/** A random, asymmetric rotator on four pads (invented values), full or partial arc. */
const scene = fc
  .record({
    pads: fc.array(fc.double({ min: 1.6, max: 3, noNaN: true }), { minLength: 8, maxLength: 8 }),
    carrierX: fc.double({ min: -0.5, max: 0.5, noNaN: true }),
    cw: fc.double({ min: 1000, max: 6000, noNaN: true }),
    reach: fc.double({ min: 4, max: 9, noNaN: true }),
    load: fc.double({ min: 500, max: 6000, noNaN: true }),
    from: fc.double({ min: 0, max: 360, noNaN: true }),
    span: fc.double({ min: 5, max: 360, noNaN: true }),
  })
  .map(({ pads: d, carrierX, cw, reach, load, from, span }): LiftInputIn => ({
    supports: cornerPads(d),
    masses: [
      { id: 'carrier', mass: 20000, x: carrierX, y: 0.1, z: 1 },
      { id: 'counterweight', mass: cw, x: -1.2, y: 0, z: 2, rotates: true },
    ],
    boom: { pivot: { x: -0.4, y: 0, z: 3 }, length: reach / Math.cos(0.5), elevation: (0.5 * 180) / Math.PI, mass: 2500, cgFraction: 0.4 },
    hook: { blockMass: 100, riggingMass: 50 },
    load: { mass: load, footprint: { kind: 'rect', length: 1.2, width: 1 }, height: 1, hang: 3 },
    swing: { from, to: from + span, direction: 'ccw' },
    soil: { allowable: 500 },
  }));

const rot = (p: { x: number; y: number }, a: number) => ({
  x: p.x * Math.cos(a) - p.y * Math.sin(a),
  y: p.x * Math.sin(a) + p.y * Math.cos(a),
});
const circ = (a: number, b: number) => Math.abs(((a - b + 540) % 360) - 180);

describe('engine properties (fast-check)', () => {
  it('rotating the whole input about the slew axis shifts the worst-case angle by the same amount', () => {
    // Source: rotational symmetry of the statics about the vertical slew axis [derived].
    fc.assert(
      fc.property(scene, fc.double({ min: -180, max: 180, noNaN: true }), (input, phi) => {
        const a = (phi * Math.PI) / 180;
        const turned: LiftInputIn = {
          ...input,
          supports: input.supports.map((s) => ({ ...s, ...rot(s, a) })),
          // Masses that rotate, and the boom, are given at slew 0 and stay; fixed ones turn.
          masses: input.masses.map((m) => (m.rotates ? m : { ...m, ...rot(m, a) })),
          swing: { ...input.swing, from: input.swing.from + phi, to: input.swing.to + phi },
        };
        const r0 = analyzeLift(input);
        const r1 = analyzeLift(turned);
        expect(Math.abs(r1.worstCase.percentOfTipping - r0.worstCase.percentOfTipping)).toBeLessThan(0.01);
        const p1 = prepareLift(turned);
        const atShifted = tippingAt(p1, r0.worstCase.slew + phi).percent;
        expect(Math.abs(atShifted - r1.worstCase.percentOfTipping)).toBeLessThan(0.01);
        if (r0.worstCase.percentOfTipping > 0) expect(circ(r1.worstCase.slew, r0.worstCase.slew + phi)).toBeLessThan(0.1);
      }),
      { numRuns: 60 },
    );
  });

  it('percent of tipping rises with the load mass', () => {
    // Source: percent = hook load × lever arm ÷ stabilising moment, linear in the hook load [derived].
    fc.assert(
      fc.property(scene, fc.double({ min: 0, max: 360, noNaN: true }), fc.double({ min: 1, max: 3000, noNaN: true }), (input, slew, extra) => {
        const p = prepareLift(input);
        const a = tippingAt(p, slew).percent;
        const b = tippingAt(withLoadMass(p, p.input.load.mass + extra), slew).percent;
        expect(b).toBeGreaterThanOrEqual(a);
        if (a > 0) expect(b).toBeGreaterThan(a);
      }),
      { numRuns: 200 },
    );
  });

  it('the refined worst case is at least as bad as every sampled angle', () => {
    // Source: definition of the maximum over the arc [derived]; checked on a 0.05° grid.
    fc.assert(
      fc.property(scene, (input) => {
        const r = analyzeLift(input);
        const p = prepareLift(input);
        let sampled = 0;
        for (let t = 0; t <= p.span; t += 0.05) sampled = Math.max(sampled, tippingAt(p, slewAt(p, t)).percent);
        for (const s of r.sweep) sampled = Math.max(sampled, s.percentOfTipping);
        // The refinement stops once its bracket is REFINE_TOL wide, so a grid angle can sit above the
        // reported peak by at most the slope beside the peak times that width (twice the steepest
        // 1° secant bounds the slope of these sinusoidal pieces).
        let slope = 0;
        for (let k = 1; k < r.sweep.length; k++) {
          const dt = circ(r.sweep[k].slew, r.sweep[k - 1].slew);
          if (dt > 1e-9) slope = Math.max(slope, Math.abs(r.sweep[k].percentOfTipping - r.sweep[k - 1].percentOfTipping) / dt);
        }
        expect(sampled).toBeLessThanOrEqual(r.worstCase.percentOfTipping + 2 * slope * REFINE_TOL + 1e-9);
        // …and never by more than a hundredth of a percent point on these scenes.
        expect(sampled - r.worstCase.percentOfTipping).toBeLessThan(0.01);
      }),
      { numRuns: 40 },
    );
  });

  it('tailboard rule of thumb: a load kept outside the pads everywhere on the arc clears the tailboard', () => {
    // Source: common practice (no published source). The tailboard lies inside the support polygon.
    fc.assert(
      fc.property(scene, fc.double({ min: 0.2, max: 2, noNaN: true }), (input, beyond) => {
        const farPad = Math.max(...input.supports.map((s) => Math.hypot(s.x, s.y)));
        const rearX = Math.max(...input.supports.filter((s) => s.x < 0).map((s) => s.x)) + 0.1;
        // Hook far enough out that the whole 1.2 × 1 m footprint stays outside the pads' circle.
        const reach = farPad + Math.hypot(0.6, 0.5) + beyond + 0.4;
        const withTail: LiftInputIn = {
          ...input,
          boom: { ...input.boom, length: reach / Math.cos(0.5) },
          bodies: [{ id: 'tailboard', polygon: [{ x: rearX - 0.6, y: -1.2 }, { x: rearX, y: -1.2 }, { x: rearX, y: 1.2 }, { x: rearX - 0.6, y: 1.2 }], top: 20 }],
          swing: { from: 0, to: 360, direction: 'ccw' },
        };
        const r = analyzeLift(withTail);
        const tail = r.clearances.find((c) => c.target === 'tailboard')!;
        expect(tail.overlapsInPlan).toBe(false);
        expect(tail.horizontal).toBeGreaterThan(0);
        expect(tail.conflict).toBe(false);
      }),
      { numRuns: 40 },
    );
  });
});
