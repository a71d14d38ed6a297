import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyzeLift, analyzeAtSlew, LiftError, prepareLift, RANGE, type LiftInputIn } from '@/lib/lift';
import { fieldWords } from '@/lib/lift/validate';
import { squareOfPads } from './scenarios';

/** Field named by the typed error for an input, or 'none'. */
function fieldOf(input: unknown): string {
  try {
    analyzeLift(input as LiftInputIn);
    return 'none';
  } catch (e) {
    if (e instanceof LiftError) return `${e.code} ${e.field}`;
    throw e;
  }
}

/** Every number anywhere in a result. */
function numbers(v: unknown, at = '', out: [string, number][] = []): [string, number][] {
  if (typeof v === 'number') out.push([at, v]);
  else if (Array.isArray(v)) v.forEach((x, i) => numbers(x, `${at}[${i}]`, out));
  else if (v && typeof v === 'object') for (const [k, x] of Object.entries(v)) numbers(x, `${at}.${k}`, out);
  return out;
}

// Source for each case: issue 9 item 5 — masses near 1e308 or coordinates ×1e300 overflowed to 0 % and passed.
describe('bounds on every number of the engine input', () => {
  const base = squareOfPads();
  it.each([
    ['masses.0.mass', { ...base, masses: [{ id: 'carrier', mass: 1e308, x: 0, y: 0, z: 1 }] }, 'invalid-mass'],
    ['load.mass', { ...base, load: { ...base.load, mass: 1e300 } }, 'invalid-mass'],
    ['hook.blockMass', { ...base, hook: { blockMass: 2e7, riggingMass: 0 } }, 'invalid-mass'],
    ['supports.0.x', { ...base, supports: base.supports.map((s, i) => (i === 0 ? { ...s, x: 2e300 } : s)) }, 'invalid-input'],
    ['supports.1.area', { ...base, supports: base.supports.map((s, i) => (i === 1 ? { ...s, area: 1e-9 } : s)) }, 'invalid-input'],
    ['boom.length', { ...base, boom: { ...base.boom, length: 1e6 } }, 'invalid-input'],
    ['boom.pivot.z', { ...base, boom: { ...base.boom, pivot: { x: 0, y: 0, z: 1e5 } } }, 'invalid-input'],
    ['load.hang', { ...base, load: { ...base.load, hang: 1e9 } }, 'invalid-input'],
    ['swing.to', { ...base, swing: { from: 0, to: 1e12, direction: 'ccw' } }, 'invalid-input'],
    ['obstacles.0.top', { ...base, obstacles: [{ id: 'x', polygon: [{ x: 5, y: 0 }, { x: 6, y: 0 }, { x: 6, y: 1 }], top: 1e6 }] }, 'invalid-input'],
    ['obstacles.0.polygon.1.x', { ...base, obstacles: [{ id: 'x', polygon: [{ x: 5, y: 0 }, { x: 6e300, y: 0 }, { x: 6, y: 1 }], top: 1 }] }, 'invalid-input'],
    ['soil.allowable', { ...base, soil: { allowable: 1e-300 } }, 'invalid-input'],
    ['rigging.snatchBlocks.0.wll', { ...base, rigging: { snatchBlocks: [{ id: 'B1', wll: 1e300 }] } }, 'invalid-input'],
    ['rigging.snatchBlocks.0.linePull', { ...base, rigging: { snatchBlocks: [{ id: 'B1', wll: 8000, linePull: 1e300 }] } }, 'invalid-input'],
    ['rigging.hooks.0.wll', { ...base, rigging: { hooks: [{ id: 'H1', wll: 2e7 }] } }, 'invalid-input'],
  ])('%s out of range → typed error naming it', (field, input, code) => {
    expect(fieldOf(input)).toBe(`${code} ${field}`);
  });

  it('the message names the field in words, counted from 1, while `field` keeps the path for machines', () => {
    const messageOf = (input: unknown) => {
      try {
        analyzeLift(input as LiftInputIn);
        return 'none';
      } catch (e) {
        return (e as LiftError).message;
      }
    };
    const crib = messageOf({ ...base, supports: base.supports.map((s, i) => (i === 2 ? { ...s, cribbingArea: 1, cribbingMass: 2e7 } : s)) });
    expect(crib).toBe(`Support 3 cribbing mass: must be from 0 to ${RANGE.mass} kg`);
    const corner = messageOf({ ...base, obstacles: [{ id: 'x', polygon: [{ x: 5, y: 0 }, { x: 6e300, y: 0 }, { x: 6, y: 1 }], top: 1 }] });
    expect(corner).toMatch(/^Obstacle 1 outline point 2 x: must be from /);
    expect(fieldWords(['powerLines', 0, 'kV'])).toBe('Power line 1 voltage');
    expect(fieldWords(['boom', 'pivot', 'z'])).toBe('Boom pivot height');
    expect(fieldWords([])).toBe('Input');
  });

  it('a step under 0.01° is refused, naming the step', () => {
    expect(() => analyzeLift(base, { step: 1e-7 })).toThrow(LiftError);
    try {
      analyzeLift(base, { step: Number.NaN });
    } catch (e) {
      expect((e as LiftError).field).toBe('step');
    }
  });

  it('the ranges are physical and stated', () => {
    // Source: common practice (no published source): far above any truck, load or site, far below overflow.
    expect(RANGE.mass).toBe(1e7);
    expect(RANGE.site * RANGE.mass * RANGE.site).toBeLessThan(1e300);
  });

  // A random lift anywhere in the ranges: 3–8 supports, masses, a boom, a load, obstacles and a wire.
  const coord = (r: number) => fc.double({ min: -r, max: r, noNaN: true, noDefaultInfinity: true });
  const span = (lo: number, hi: number) => fc.double({ min: lo, max: hi, noNaN: true, noDefaultInfinity: true });
  // Supports on a 1 cm grid and distinct (two on one spot are refused); the first mass stands at their
  // centroid so that most draws stand unloaded and reach the analysis; the rest roam the whole range.
  const cmGrid = fc.integer({ min: -RANGE.truck * 100, max: RANGE.truck * 100 }).map((v) => v / 100);
  const lift = fc.record({
    supports: fc.uniqueArray(fc.record({ x: cmGrid, y: cmGrid, area: span(RANGE.areaMin, RANGE.areaMax) }), { minLength: 3, maxLength: 8, selector: (p) => `${p.x},${p.y}` }),
    masses: fc.array(fc.record({ mass: span(0, RANGE.mass), x: coord(RANGE.truck), y: coord(RANGE.truck), rotates: fc.boolean() }), { minLength: 0, maxLength: 3 }),
    carrier: span(1, RANGE.mass),
    length: span(0.01, RANGE.length),
    elevation: span(-90, 90),
    boomMass: span(0, RANGE.mass),
    load: span(0, RANGE.mass),
    size: span(0.001, RANGE.length),
    hang: span(0, RANGE.height),
    from: coord(RANGE.angle),
    to: coord(RANGE.angle),
    ob: fc.record({ x: coord(RANGE.site - 1000), y: coord(RANGE.site - 1000), w: span(0.01, 1000), top: span(0, RANGE.height) }),
    wire: fc.record({ x: coord(RANGE.site), z: span(0, RANGE.height), kV: span(0.01, 2000) }),
    allowable: span(RANGE.pressureMin, RANGE.pressureMax),
  });

  it('no finite input in range gives NaN or Infinity anywhere in a result', () => {
    fc.assert(
      fc.property(lift, (l) => {
        const input: LiftInputIn = {
          supports: l.supports.map((s, i) => ({ id: `S${i}`, ...s })),
          masses: [
            { id: 'carrier', mass: l.carrier, x: l.supports.reduce((a, p) => a + p.x, 0) / l.supports.length, y: l.supports.reduce((a, p) => a + p.y, 0) / l.supports.length, z: 1 },
            ...l.masses.map((m, i) => ({ id: `M${i}`, z: 1, ...m })),
          ],
          boom: { pivot: { x: 0.1, y: 0, z: 3 }, length: l.length, elevation: l.elevation, mass: l.boomMass, cgFraction: 0.4 },
          load: { mass: l.load, footprint: { kind: 'rect', length: l.size, width: l.size }, height: 1, hang: l.hang },
          swing: { from: l.from, to: l.to, direction: 'ccw' },
          obstacles: [{ id: 'ob', polygon: [{ x: l.ob.x, y: l.ob.y }, { x: l.ob.x + l.ob.w, y: l.ob.y }, { x: l.ob.x, y: l.ob.y + l.ob.w }], top: l.ob.top }],
          powerLines: [{ id: 'wire', a: { x: l.wire.x, y: -50, z: l.wire.z }, b: { x: l.wire.x, y: 50, z: l.wire.z }, kV: l.wire.kV }],
          soil: { allowable: l.allowable },
          weightUncertainty: 10,
        };
        let result;
        try {
          result = analyzeLift(input);
        } catch (e) {
          if (e instanceof LiftError) return;
          throw e;
        }
        const bad = numbers(result).filter(([, v]) => !Number.isFinite(v));
        expect(bad).toEqual([]);
        const snap = analyzeAtSlew(prepareLift(input), l.from);
        expect(numbers(snap).filter(([, v]) => !Number.isFinite(v))).toEqual([]);
      }),
      { numRuns: 150 },
    );
  }, 90_000);
});
