import { describe, expect, it } from 'vitest';
import { picksToRigging, pickVerdict, type RiggingPickLike } from '@/lib/equipment/rigging-to-lift';
import { addVerdict, pickNotices } from '@/canvas/panels/inspector/rigging-status';
import { analyzeLift, riggingSchema } from '@/lib/lift';
import { KG_PER_LB } from '@/lib/units';
import { describeCheck } from '@/lib/format/checks';
import { squareOfPads } from '../lift/scenarios';

const pick = (over: Partial<RiggingPickLike>): RiggingPickLike => ({ tag: 'T', kind: 'round-sling', size: '', hitch: 'vertical', legs: 1, angleFromHorizontal: 90, ratingKg: 1000, ratings: { vertical: 1000, choker: 800, basket: 2000 }, ...over });

describe('picked rigging → the engine: each kind to its own check', () => {
  it('shackles, hooks and snatch blocks are not slings', () => {
    const r = riggingSchema.parse(
      picksToRigging([
        pick({ tag: 'S1' }),
        pick({ tag: 'SH', kind: 'shackle', legs: 2, angleFromHorizontal: 60, ratings: { vertical: 2948, choker: null, basket: null } }),
        pick({ tag: 'HK', kind: 'hook', ratings: { vertical: 6350, choker: null, basket: null } }),
        pick({ tag: 'SB', kind: 'snatch-block', lineAngle: 90, ratings: { vertical: 10886, choker: null, basket: null } }),
      ]),
    );
    expect(r.slings.map((s) => s.id)).toEqual(['S1']);
    expect(r.shackles).toEqual([{ id: 'SH', name: 'SH', wll: 2948, legs: 2, angleFromHorizontal: 60 }]);
    expect(r.hooks).toEqual([{ id: 'HK', name: 'HK', wll: 6350, legs: 1, angleFromHorizontal: 90 }]);
    expect(r.snatchBlocks).toEqual([{ id: 'SB', name: 'SB', wll: 10886, lineAngle: 90 }]);
  });
  it('a chain pick carries its grade and size to the chain table; a grade 70 pick fails the plan', () => {
    // 2-leg 3/8 grade 80 at 60°: 2 × 7 100 × sin 60° = 12 297.6 lb (ASTM A906 makers' tables, read).
    const g80 = pickVerdict(pick({ kind: 'chain', size: '3/8 in grade 80', legs: 2, angleFromHorizontal: 60, ratings: { vertical: 7100 * KG_PER_LB, choker: null, basket: null } }), 3000, 3100)!;
    expect(g80.capacity / KG_PER_LB).toBeCloseTo(12297.6, 0);
    const input = squareOfPads({ rigging: picksToRigging([pick({ tag: 'CF-CH-01', kind: 'chain', size: '3/8 in grade 70', ratings: { vertical: 2993.7, choker: null, basket: null } })]) });
    const check = analyzeLift(input).checks.find((c) => c.id === 'rigging:sling:CF-CH-01')!;
    expect(check.ok).toBe(false);
    expect(describeCheck(check, 'metric').sentence).toMatch(/not lifting rigging: Grade 70/);
  });
  it('a recovery strap in an older plan is refused by the engine, not rated', () => {
    expect(pickVerdict(pick({ kind: 'recovery-strap', ratings: { vertical: 9072, choker: null, basket: null } }), 100, 100)!.facts.refused?.reason).toMatch(/made for pulling/);
  });
  it('the choke angle and D/d go to the engine only with their hitch', () => {
    const [choked] = riggingSchema.parse(picksToRigging([pick({ hitch: 'choker', chokeAngle: 100, bendRatio: 4 })])).slings;
    expect(choked).toMatchObject({ hitch: 'choker', chokeAngle: 100, chokerRating: 800 });
    expect(choked.bendRatio).toBeUndefined();
    // Wire rope basket at D/d 4: 2 000 × 0.75/0.92 (Wire Rope Users Manual curve, value from memory).
    expect(pickVerdict(pick({ kind: 'wire-rope-sling', hitch: 'basket', bendRatio: 4 }), 100, 100)!.capacity).toBeCloseTo((2000 * 0.75) / 0.92, 6);
  });
});

describe('the picker refuses items that are not lifting rigging', () => {
  const strap = { id: 9, tag: 'HR-ST-01', status: 'in_service', nextInspectionDue: null, notForLifting: 'A recovery strap is made for pulling (winching), not for lifting: it has no sling rating.', ratings: { vertical: 9072 } };
  it('on add, with the reason', () => {
    expect(addVerdict(strap, '2026-12-02')).toEqual({ ok: false, reason: 'HR-ST-01 is not lifting rigging and cannot be added to a lift plan: A recovery strap is made for pulling (winching), not for lifting: it has no sling rating.' });
  });
  it('on a row already in a plan', () => {
    expect(pickNotices({ itemId: 9 }, strap, '2026-12-02')).toEqual([{ tone: 'stop', text: `Not lifting rigging: ${strap.notForLifting} Remove it from the plan.` }]);
  });
});
