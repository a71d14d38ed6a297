import { afterEach, describe, expect, it, vi } from 'vitest';
import { liftInputSchema, LiftError, parseLiftInput, parseLiftInputIncremental, type LiftInputIn } from '@/lib/lift';
import { rotator } from './scenarios';

/** A seeded generator, so a failing case can be replayed (mulberry32). */
function rng(seed: number) {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const shed = (i: number, x: number): NonNullable<LiftInputIn['obstacles']>[number] => ({
  id: `shed-${i}`,
  polygon: [{ x, y: 4 }, { x: x + 2, y: 4 }, { x: x + 2, y: 6 }, { x, y: 6 }],
  top: 3,
});

/** One random edit of the kinds the editor makes: move, resize, add, remove, set a default, or break a value. */
function edit(input: LiftInputIn, r: () => number): LiftInputIn {
  const next = structuredClone(input);
  const obstacles = next.obstacles ?? [];
  switch (Math.floor(r() * 8)) {
    case 0:
      if (obstacles.length) obstacles[Math.floor(r() * obstacles.length)]!.polygon[0]!.x += r() - 0.5;
      break;
    case 1:
      obstacles.push(shed(obstacles.length, 4 + r() * 6));
      break;
    case 2:
      obstacles.pop();
      break;
    case 3:
      next.load = { ...next.load, mass: 1000 + r() * 9000 };
      break;
    case 4:
      next.supports[Math.floor(r() * next.supports.length)]!.cribbingArea = 0.5 + r() * 2;
      break;
    case 5:
      next.limits = r() < 0.5 ? undefined : { percentOfTipping: 60 + r() * 40 };
      break;
    case 6:
      next.boom = { ...next.boom, elevation: r() < 0.1 ? 200 : 10 + r() * 60 };
      break;
    default:
      next.hook = r() < 0.3 ? undefined : { blockMass: r() * 400 };
  }
  next.obstacles = obstacles;
  return next;
}

const fullParse = (raw: LiftInputIn) => {
  try {
    return { ok: true as const, input: parseLiftInput(structuredClone(raw)) };
  } catch (e) {
    return { ok: false as const, field: (e as LiftError).field };
  }
};

afterEach(() => vi.restoreAllMocks());

describe('incremental parse of the engine input (issue 10 item 5)', () => {
  it('gives what a full parse gives, input or error, over 300 random edit sequences', () => {
    for (let seed = 1; seed <= 300; seed++) {
      const r = rng(seed);
      let raw = rotator({ obstacles: [shed(0, 5)] });
      let memo = parseLiftInputIncremental(raw, null).memo;
      for (let step = 0; step < 6; step++) {
        raw = edit(raw, r);
        const want = fullParse(raw);
        let got: ReturnType<typeof fullParse>;
        try {
          const p = parseLiftInputIncremental(raw, memo);
          memo = p.memo;
          got = { ok: true, input: p.input };
        } catch (e) {
          got = { ok: false, field: (e as LiftError).field };
        }
        expect(got, `seed ${seed} step ${step}`).toEqual(want);
      }
    }
  });

  it('moving one obstacle parses that obstacle only, with no full parse', () => {
    const raw = rotator({ obstacles: [shed(0, 5), shed(1, 9), shed(2, 13)] });
    const first = parseLiftInputIncremental(raw, null);
    const full = vi.spyOn(liftInputSchema, 'safeParse');
    let memo = first.memo;
    for (let frame = 1; frame <= 30; frame++) {
      const moved = structuredClone(raw);
      moved.obstacles![1]!.polygon = moved.obstacles![1]!.polygon.map((p) => ({ x: p.x + frame * 0.05, y: p.y }));
      const p = parseLiftInputIncremental(moved, memo);
      memo = p.memo;
      // Only the moved corners' x values are parsed again, down to the field that changed.
      expect(p.parsed).toEqual([0, 1, 2, 3].map((i) => `obstacles.1.polygon.${i}.x`));
      // Untouched parts are the very objects parsed before.
      expect(p.input.supports).toBe(first.input.supports);
      expect(p.input.bodies).toBe(first.input.bodies);
      expect(p.input.obstacles[0]).toBe(first.input.obstacles[0]);
    }
    expect(full).not.toHaveBeenCalled();
  });

  it('a bad value found on the way is reported by the full parse, naming the field', () => {
    const raw = rotator();
    const memo = parseLiftInputIncremental(raw, null).memo;
    const bad = { ...raw, boom: { ...raw.boom, elevation: 200 } };
    expect(() => parseLiftInputIncremental(bad, memo)).toThrow(LiftError);
    try {
      parseLiftInputIncremental(bad, memo);
    } catch (e) {
      expect((e as LiftError).field).toBe('boom.elevation');
    }
  });
});
