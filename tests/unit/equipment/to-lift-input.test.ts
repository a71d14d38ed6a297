import { describe, expect, it } from 'vitest';
import { truckToLiftParts, TruckSetupError, boomCgFraction, padPosition } from '@/lib/equipment/to-lift-input';
import { lookupRated, toEngineLoadChart } from '@/lib/equipment/load-chart';
import { HR4_SPEC, HR7_SPEC } from '@/db/seed/demo-trucks';
import { liftInputSchema, analyzeLift } from '@/lib/lift';

// Hand-checked against the HR-7 example profile: slew axis 3.4 m forward of the tailboard's rear edge.
const fullOut = { FL: { extension: 2.2 }, FR: { extension: 2.2 }, RL: { extension: 2.2 }, RR: { extension: 2.2 } };

describe('truckToLiftParts: pads', () => {
  it('places fully extended pads at mount + full reach, shifted to the slew axis', () => {
    const parts = truckToLiftParts(HR7_SPEC, { legs: fullOut, boom: { length: 6.4, elevation: 30 } });
    const byId = Object.fromEntries(parts.supports.map((s) => [s.id, s]));
    // FL: mount (8.7, 0.6), direction 90°, reach 0.7 + 2.2 = 2.9 → (8.7, 3.5) → truck frame (5.3, 3.5).
    expect(byId.FL.x).toBeCloseTo(5.3, 9);
    expect(byId.FL.y).toBeCloseTo(3.5, 9);
    // RR: mount (1.4, −0.6), direction −90° → (1.4, −3.5) → (−2.0, −3.5).
    expect(byId.RR.x).toBeCloseTo(-2.0, 9);
    expect(byId.RR.y).toBeCloseTo(-3.5, 9);
    // 24 in square pad, 0.61 m a side: 0.3721 m².
    expect(byId.FL.area).toBeCloseTo(0.3721, 9);
    expect(parts.supports.map((s) => s.id)).toEqual(['FL', 'FR', 'RL', 'RR']);
  });

  it('places a partly extended leg and carries its cribbing', () => {
    const parts = truckToLiftParts(HR7_SPEC, {
      legs: { ...fullOut, RR: { extension: 1.1, cribbing: { area: 1.44, mass: 95 } } },
      boom: { length: 6.4, elevation: 30 },
    });
    const rr = parts.supports.find((s) => s.id === 'RR')!;
    // Reach 0.7 + 1.1 = 1.8 (the intermediate stop) → (1.4, −2.4) → (−2.0, −2.4).
    expect(rr.x).toBeCloseTo(-2.0, 9);
    expect(rr.y).toBeCloseTo(-2.4, 9);
    expect(rr.cribbingArea).toBe(1.44);
    expect(rr.cribbingMass).toBe(95);
    expect(parts.supports.find((s) => s.id === 'FL')!.cribbingArea).toBeUndefined();
  });

  it('places an angled leg with cos/sin of its direction', () => {
    // HR-4 RL: mount (1.2, 0.5), direction 135°, reach 0.6 + 2.0 = 2.6; slew axis at x 2.9.
    const p = padPosition(HR4_SPEC, HR4_SPEC.outriggers.legs.find((l) => l.id === 'RL')!, 2.0);
    const d = 2.6 * Math.SQRT1_2; // 1.838478…
    expect(p.x).toBeCloseTo(1.2 - d - 2.9, 9);
    expect(p.y).toBeCloseTo(0.5 + d, 9);
    expect(p.x).toBeCloseTo(-3.538478, 6);
  });

  it('leaves out legs that are not set down, and includes the front jack when asked', () => {
    const three = truckToLiftParts(HR7_SPEC, { legs: { FL: { extension: 0 }, FR: { extension: 0 }, FJ: { extension: 0.55 } }, boom: { length: 6.4, elevation: 0 } });
    expect(three.supports.map((s) => s.id)).toEqual(['FL', 'FR', 'FJ']);
    const fj = three.supports[2];
    // FJ: mount (12.0, 0), direction 0°, reach 0.35 + 0.55 = 0.9 → (12.9, 0) → (9.5, 0); pad 0.5 × 0.5.
    expect(fj.x).toBeCloseTo(9.5, 9);
    expect(fj.y).toBeCloseTo(0, 9);
    expect(fj.area).toBeCloseTo(0.25, 9);
    expect(three.padRatings).toEqual({ FL: 18000, FR: 18000, FJ: 9000 });
  });
});

describe('truckToLiftParts: bodies, masses, boom', () => {
  const parts = truckToLiftParts(HR7_SPEC, { legs: fullOut, boom: { length: 12.5, elevation: 40 } });

  it('gives the body outline as rectangles in the truck frame with their tops', () => {
    expect(parts.bodies.map((b) => b.id)).toEqual(['tailboard', 'body', 'cab']);
    const cab = parts.bodies[2];
    // Cab 8.8–12.2 m from the rear, 2.5 m wide → x 5.4 to 8.8, y ±1.25.
    expect(cab.polygon.map((p) => [+p.x.toFixed(6), +p.y.toFixed(6)])).toEqual([
      [5.4, -1.25],
      [8.8, -1.25],
      [8.8, 1.25],
      [5.4, 1.25],
    ]);
    expect(cab.top).toBe(3.3);
    const tail = parts.bodies[0];
    expect(tail.polygon[0].x).toBeCloseTo(-3.4, 9);
    expect(tail.polygon[1].x).toBeCloseTo(-2.5, 9);
    expect(tail.top).toBe(1.3);
  });

  it('gives the carrier as fixed and the turret and counterweight as rotating masses', () => {
    expect(parts.masses).toEqual([
      { id: 'carrier', mass: 19500, x: expect.closeTo(3.4, 9), y: 0, z: 1.1, rotates: false },
      { id: 'turret', mass: 3200, x: -0.3, y: 0, z: 1.9, rotates: true },
      { id: 'counterweight', mass: 2300, x: -1.4, y: 0, z: 1.6, rotates: true },
    ]);
    const total = parts.masses.reduce((s, m) => s + m.mass, 0) + parts.boom.mass;
    expect(total).toBe(19500 + 3200 + 2300 + 4800);
  });

  it('omits a counterweight of 0 kg', () => {
    const spec = structuredClone(HR7_SPEC);
    spec.upper.counterweight.mass = 0;
    const p = truckToLiftParts(spec, { legs: fullOut, boom: { length: 6.4, elevation: 0 } });
    expect(p.masses.map((m) => m.id)).toEqual(['carrier', 'turret']);
  });

  it('gives the boom at the set length and elevation, CG fraction interpolated between stages', () => {
    expect(parts.boom).toEqual({ pivot: { x: -0.9, y: 0, z: 2.4 }, length: 12.5, elevation: 40, mass: 4800, cgFraction: expect.closeTo(0.485, 9) });
    // 12.5 m is halfway from 10.4 m (0.47) to 14.6 m (0.50).
    expect(boomCgFraction(HR7_SPEC, 6.4)).toBe(0.45);
    expect(boomCgFraction(HR7_SPEC, 14.6)).toBe(0.5);
  });
});

describe('truckToLiftParts: setup errors name the field', () => {
  const setupErr = (fn: () => unknown) => {
    try {
      fn();
    } catch (e) {
      expect(e).toBeInstanceOf(TruckSetupError);
      return e as TruckSetupError;
    }
    throw new Error('expected a TruckSetupError');
  };
  it('refuses a leg past its travel', () => {
    const e = setupErr(() => truckToLiftParts(HR7_SPEC, { legs: { ...fullOut, FL: { extension: 2.3 } }, boom: { length: 6.4, elevation: 0 } }));
    expect(e.field).toBe('legs.FL.extension');
    expect(e.message).toBe('The left front (FL) leg extends from 0 to 2.200 m; 2.3 m is outside that');
  });
  it('refuses a leg the truck does not have', () => {
    expect(setupErr(() => truckToLiftParts(HR4_SPEC, { legs: { FL: { extension: 2.0 }, FJ: { extension: 0 } }, boom: { length: 5.8, elevation: 0 } })).field).toBe('legs.FJ');
  });
  it('refuses a boom length and an elevation out of range', () => {
    expect(setupErr(() => truckToLiftParts(HR7_SPEC, { legs: fullOut, boom: { length: 15, elevation: 0 } })).field).toBe('boom.length');
    expect(setupErr(() => truckToLiftParts(HR7_SPEC, { legs: fullOut, boom: { length: 10, elevation: 80 } })).field).toBe('boom.elevation');
  });
});

describe('load chart lookup: no upward interpolation (common practice, no published source)', () => {
  const chart = HR7_SPEC.loadChart;
  it('takes the next greater radius', () => {
    expect(lookupRated(chart, 4.5, 10.4)).toEqual({ rated: 20000, radiusUsed: 5, boomLengthUsed: 10.4, missing: null });
    expect(lookupRated(chart, 4.01, 14.6).rated).toBe(16000);
  });
  it('takes the next longer boom', () => {
    expect(lookupRated(chart, 5, 8).boomLengthUsed).toBe(10.4);
    expect(lookupRated(chart, 5, 8).rated).toBe(20000);
    expect(lookupRated(chart, 3, 10.41).rated).toBe(24000);
  });
  it('takes an exact row and column as they are, with a millimetre for rounding', () => {
    expect(lookupRated(chart, 6.0, 14.6).rated).toBe(13500);
    expect(lookupRated(chart, 6.0004, 14.6004).rated).toBe(13500);
  });
  it('uses the first row and column below the chart', () => {
    expect(lookupRated(chart, 1.0, 5.0)).toEqual({ rated: 45000, radiusUsed: 2.5, boomLengthUsed: 6.4, missing: null });
  });
  it('gives no rating beyond the chart, with the reason', () => {
    expect(lookupRated(chart, 12.5, 14.6)).toEqual({ rated: null, radiusUsed: null, boomLengthUsed: 14.6, missing: { why: 'radius-beyond-chart', chartLimit: 12 } });
    expect(lookupRated(chart, 5, 15)).toEqual({ rated: null, radiusUsed: 5, boomLengthUsed: null, missing: { why: 'boom-beyond-chart', chartLimit: 14.6 } });
  });
  it('gives no rating where the chart cell is empty', () => {
    expect(lookupRated(chart, 6, 6.4)).toEqual({ rated: null, radiusUsed: 6, boomLengthUsed: 6.4, missing: { why: 'no-rating', chartLimit: null } });
  });
  it("transposes to the engine's rated[boom][radius]", () => {
    const e = toEngineLoadChart(chart);
    expect(e.rated.length).toBe(3);
    expect(e.rated[1].length).toBe(8);
    expect(e.rated[1][4]).toBe(16500);
    expect(e.rated[0][4]).toBeNull();
    expect(e.rated[2][7]).toBe(5900);
  });
});

describe('truckToLiftParts feeds the lift engine', () => {
  it('passes liftInputSchema and the engine finds the four pads as its tipping lines', () => {
    const parts = truckToLiftParts(HR7_SPEC, { legs: fullOut, boom: { length: 10.4, elevation: 30 } });
    const input = liftInputSchema.parse({
      supports: parts.supports,
      masses: parts.masses,
      boom: parts.boom,
      bodies: parts.bodies,
      load: { mass: 2000, footprint: { kind: 'rect', length: 2, width: 2 }, height: 1, hang: 3 },
      swing: { from: 0, to: 90, direction: 'ccw' },
      soil: { allowable: 144 },
      loadChart: parts.loadChart,
    });
    const result = analyzeLift(input);
    // Pads at (5.3, ±3.5) and (−2.0, ±3.5): four edges; the front line is 5.3 m ahead of the slew axis.
    expect(result.tippingLines).toHaveLength(4);
    const distances = result.tippingLines.map((l: { distanceFromAxis: number }) => +l.distanceFromAxis.toFixed(6)).sort((a: number, b: number) => a - b);
    expect(distances).toEqual([2, 3.5, 3.5, 5.3]);
  });
});
