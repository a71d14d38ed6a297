import { describe, expect, it } from 'vitest';
import {
  ALLOY_CHAIN_ROWS, analyzeLift, chokeAngleFactor, CHOKE_BANDS, legTension, shackleVerdict, slingRating, slingVerdict, snatchBlockLoad,
  snatchBlockVerdict, hookVerdict, riggingCheck, type SlingInputIn,
} from '@/lib/lift';
import { describeCheck } from '@/lib/format/checks';
import { KG_PER_LB } from '@/lib/units';
import { squareOfPads } from './scenarios';

/**
 * Rigging against its sources (issue 9 item 4). Each case has its hand calculation in a comment and
 * names its source; reference.md's tags: [read], [memory] (value from memory), [derived].
 */
const lbOf = (kg: number) => kg / KG_PER_LB;
const chain = (over: Partial<SlingInputIn> = {}): SlingInputIn => ({ id: 'bridle', material: 'chain', grade: '80', size: '3/8', hitch: 'vertical', legs: 1, angleFromHorizontal: 90, ...over });

describe('three-leg rule (ASME B30.9; OSHA 1910.184)', () => {
  it('4-leg 3/8 in grade 80 chain bridle at 60° rates 18,400 lb, not 24,595', () => {
    // Hand calculation: 3 legs × 7 100 lb × sin 60° = 3 × 7 100 × 0.866 025 = 18 446.3 lb; makers
    // publish 18 400 lb [read]. The old 4 × 7 100 × 0.866 = 24 595 lb over-rated it by 34 %.
    const lb = lbOf(slingRating(chain({ legs: 4, angleFromHorizontal: 60 })).capacity);
    expect(lb).toBeCloseTo(3 * 7100 * Math.sin(Math.PI / 3), 6);
    expect(Math.abs(lb - 18400) / 18400).toBeLessThan(0.003);
    expect(lb).toBeLessThan(24595 * 0.8);
  });
  it('a double leg of 3/8 grade 80 at 60° carries 12,300 lb; triple and quadruple rate alike', () => {
    // 2 × 7 100 × 0.866 = 12 297 lb, the makers' tabulated 12 300 lb [derived, and read in the same tables].
    expect(lbOf(slingRating(chain({ legs: 2, angleFromHorizontal: 60 })).capacity)).toBeCloseTo(12297.6, 0);
    const triple = slingRating(chain({ legs: 3, angleFromHorizontal: 45 })).capacity;
    expect(slingRating(chain({ legs: 4, angleFromHorizontal: 45 })).capacity).toBe(triple);
    expect(slingRating(chain({ legs: 8, angleFromHorizontal: 45 })).capacity).toBe(triple);
    expect(slingRating(chain({ legs: 4 })).legsCounted).toBe(3);
    expect(describeCheck(riggingCheck(slingVerdict(chain({ legs: 4 }), 1000)), 'imperial').sentence).toMatch(/4 legs are rated as 3 carrying the load/);
  });
  it('shackle demand follows the same legs: 4 legs at 60° under 10,000 kg → 3,849 kg per shackle', () => {
    // 10 000 / (3 × sin 60°) = 10 000 / 2.598 08 = 3 849.0 kg; the old 4-leg split gave 2 886.8 kg (25 % low).
    const v = shackleVerdict({ id: 's', size: '5/8', legs: 4, angleFromHorizontal: 60 }, 10000);
    expect(v.demand).toBeCloseTo(3849.0, 1);
    expect(legTension(10000, 2, 60)).toBeCloseTo(10000 / (2 * Math.sin(Math.PI / 3)), 9);
  });
  it('no false pass: a 9,000 kg load on that 4-leg bridle is over limit in the full analysis', () => {
    // Capacity 18 446 lb = 8 367 kg < 9 000 kg. The old rating (24 595 lb = 11 156 kg) passed it.
    const r = analyzeLift(squareOfPads({ load: { mass: 9000, footprint: { kind: 'rect', length: 1, width: 1 }, height: 1, hang: 1 }, boom: { pivot: { x: 0, y: 0, z: 2 }, length: 1, elevation: 0, mass: 0, cgFraction: 0.5 }, rigging: { slings: [chain({ legs: 4, angleFromHorizontal: 60 })] } }));
    const c = r.checks.find((k) => k.id === 'rigging:sling:bridle')!;
    expect(c.ok).toBe(false);
    expect(c.limit!).toBeCloseTo(18446.3 * KG_PER_LB, 0);
  });
});

describe('alloy chain slings, grade 80 and 100 (ASTM A906, makers\u2019 WLL tables)', () => {
  it('rows as read: grade 80 7/32 2,100 lb, 9/32 3,500, 5/16 4,500, 3/8 7,100, 1/2 12,000, 5/8 18,100, 3/4 28,300, 7/8 34,200, 1 47,700', () => {
    // Source: reference.md, "Chain for lifting" [read]; two makers' tables agree on every row.
    const g80 = Object.fromEntries(ALLOY_CHAIN_ROWS.filter((r) => r.grade === '80').map((r) => [r.size, r.lb]));
    expect(g80).toEqual({ '7/32': 2100, '9/32': 3500, '5/16': 4500, '3/8': 7100, '1/2': 12000, '5/8': 18100, '3/4': 28300, '7/8': 34200, '1': 47700 });
    const g100 = Object.fromEntries(ALLOY_CHAIN_ROWS.filter((r) => r.grade === '100').map((r) => [r.size, r.lb]));
    expect(g100).toEqual({ '7/32': 2700, '9/32': 4300, '5/16': 5700, '3/8': 8800, '1/2': 15000, '5/8': 22600, '3/4': 35300, '7/8': 42700 });
    // Grade 100 7/32 is value from memory; every other row was read.
    expect(ALLOY_CHAIN_ROWS.filter((r) => r.source.tag === 'memory').map((r) => `${r.grade} ${r.size}`)).toEqual(['100 7/32']);
  });
  it('a real 7/32 in grade 80 sling is 2,100 lb, not 3,500', () => {
    expect(lbOf(slingRating(chain({ size: '7/32' })).capacity)).toBeCloseTo(2100, 9);
  });
  it('grade 70 transport chain is refused with the reason, and its check fails', () => {
    // 49 CFR 393.108 lists 3/8 grade 70 at 6 600 lb as a tie-down limit [read]; it is no lifting rating.
    const r = slingRating(chain({ grade: '70' }));
    expect(r.capacity).toBe(0);
    expect(r.refused).toMatchObject({ code: 'chain-grade', reason: expect.stringMatching(/Grade 70 chain is tie-down and towing chain, not a lifting sling/) });
    const c = riggingCheck(slingVerdict(chain({ grade: '70' }), 500));
    expect(c).toMatchObject({ ok: false, status: 'beyond', limit: null });
    expect(describeCheck(c, 'metric').sentence).toMatch(/^Sling bridle is not lifting rigging: Grade 70/);
  });
  it('"1/4 in" is the tie-down name: refused, pointing to 9/32; a chain without a grade is refused', () => {
    expect(slingRating(chain({ size: '1/4' })).refused?.reason).toMatch(/9\/32/);
    expect(slingRating(chain({ grade: undefined })).refused?.reason).toMatch(/grade is not given/);
    // Grade 100 has no 1 in row in the makers' tables.
    expect(slingRating(chain({ grade: '100', size: '1' })).refused?.reason).toMatch(/Grade 100 chain sling sizes are 7\/32, 9\/32/);
  });
  it('a tag below the table governs; a tag above it does not raise the rating', () => {
    expect(slingRating(chain({ verticalRating: 3000 })).capacity).toBe(3000);
    expect(slingRating(chain({ verticalRating: 9000 })).capacity).toBeCloseTo(7100 * KG_PER_LB, 9);
  });
  it('recovery straps are not lifting rigging', () => {
    // Common practice (no published source): a recovery strap is made for pulling, not lifting.
    const v = slingVerdict({ id: 'strap', material: 'recovery-strap', verticalRating: 9072, hitch: 'vertical' }, 100);
    expect(v.facts.refused?.code).toBe('recovery-strap');
    expect(riggingCheck(v).ok).toBe(false);
  });
});

describe('choke-angle factors (ASME B30.9 table as reproduced by sling makers, read; reference.md corrected)', () => {
  it('band edges: over 120° 1.00; 90–120° 0.87 (exactly 120° is 0.87); 60–89° 0.74; 30–59° 0.62; 0–29° 0.49', () => {
    const f = (a: number) => chokeAngleFactor(a).factor;
    expect([180, 135, 121, 120.5].map(f)).toEqual([1, 1, 1, 1]);
    expect([120, 105, 90].map(f)).toEqual([0.87, 0.87, 0.87]);
    // 89.5° lies between the printed bands: it takes the lower band, so a fraction never raises a rating.
    expect([89.5, 89, 60].map(f)).toEqual([0.74, 0.74, 0.74]);
    expect([59, 30].map(f)).toEqual([0.62, 0.62]);
    expect([29.9, 29, 0].map(f)).toEqual([0.49, 0.49, 0.49]);
    expect(CHOKE_BANDS.every((b) => b.source.tag === 'read')).toBe(true);
  });
  it('the factor multiplies the choker rating: blue round sling choked at 120° → 17,000 × 0.87 = 14,790 lb', () => {
    // WSTDA RS-1 blue choker 17 000 lb (value from memory) × 0.87 [read].
    const r = slingRating({ id: 'b', colour: 'blue', hitch: 'choker', chokeAngle: 120 });
    expect(lbOf(r.capacity)).toBeCloseTo(14790, 6);
  });
  it('a tag\u2019s own choker rating governs; with only a vertical rating, chain uses 0.8 (value from memory)', () => {
    expect(slingRating({ id: 't', verticalRating: 1000, chokerRating: 700, hitch: 'choker', chokeAngle: 70 }).capacity).toBeCloseTo(700 * 0.74, 9);
    // 3/8 grade 80 choked at 45°: 7 100 × 0.8 × 0.62 = 3 521.6 lb.
    expect(lbOf(slingRating(chain({ hitch: 'choker', chokeAngle: 45 })).capacity)).toBeCloseTo(3521.6, 6);
  });
  it('no angle given: the result says it assumed a free-hanging choke (factor 1.00)', () => {
    const v = slingVerdict({ id: 'c', colour: 'green', hitch: 'choker' }, 1000);
    expect(lbOf(v.capacity)).toBeCloseTo(4200, 6);
    expect(v.facts.choke).toEqual({ angle: 135, factor: 1, assumed: true });
    expect(describeCheck(riggingCheck(v), 'imperial').sentence).toMatch(/No choke angle given: a free-hanging choke \(about 135°, factor 1\.00\) is assumed\./);
  });
});

describe('snatch blocks, hooks and shackles as their own kinds', () => {
  it('snatch block load = 2·T·cos(θ/2): 0° → 2T, 90° → 1.414T, 120° → 1.0T, 180° → 0', () => {
    // Standard statics [derived], reference.md "Blocks and lines".
    expect(snatchBlockLoad(1000, 0)).toBe(2000);
    expect(snatchBlockLoad(1000, 90)).toBeCloseTo(1414.2136, 4);
    expect(snatchBlockLoad(1000, 120)).toBeCloseTo(1000, 9);
    expect(snatchBlockLoad(1000, 180)).toBeCloseTo(0, 9);
  });
  it('a block checked on its own WLL, not as a sling: 3,000 kg line at 60° → 5,196 kg on a 5,000 kg block, over limit', () => {
    // 2 × 3 000 × cos 30° = 5 196.2 kg.
    const v = snatchBlockVerdict({ id: 'SB', wll: 5000, lineAngle: 60, linePull: 3000 }, 9999);
    expect(v.element).toBe('snatch-block');
    expect(v.demand).toBeCloseTo(5196.15, 2);
    const c = riggingCheck(v);
    expect(c.id).toBe('rigging:snatch-block:SB');
    expect(c.ok).toBe(false);
  });
  it('with no line pull the winch\u2019s pull is used, else the hook load, and the assumption is stated', () => {
    const v = snatchBlockVerdict({ id: 'SB', wll: 5000, lineAngle: 0 }, 2000);
    expect(v.demand).toBe(4000);
    expect(v.facts.linePullFrom).toBe('hook-load');
    expect(describeCheck(riggingCheck(v), 'metric').sentence).toMatch(/no line pull given: the whole hook load/);
    // Winch: 2 parts, roller, no lead sheave: F = 1.04²·0.04/(1.04² − 1) = 0.5302 (Wire Rope Users Manual).
    const w = snatchBlockVerdict({ id: 'SB', wll: 5000, lineAngle: 0 }, 2000, { ratedLinePull: 5000, parts: 2, sheaves: 'roller', leadSheaves: 0 });
    expect(w.demand).toBeCloseTo(2 * 2000 * 0.530196, 3);
  });
  it('a master hook carries the whole load; a hook per leg takes its leg\u2019s tension', () => {
    expect(hookVerdict({ id: 'H', wll: 3000, legs: 1, angleFromHorizontal: 90 }, 3200).demand).toBe(3200);
    expect(hookVerdict({ id: 'H', wll: 3000, legs: 2, angleFromHorizontal: 30 }, 3200).demand).toBeCloseTo(3200, 9);
  });
  it('the analysis checks hooks and snatch blocks under their own ids', () => {
    const r = analyzeLift(squareOfPads({ rigging: { hooks: [{ id: 'H1', wll: 6000 }], snatchBlocks: [{ id: 'B1', wll: 8000, lineAngle: 120 }] } }));
    expect(r.checks.find((c) => c.id === 'rigging:hook:H1')).toMatchObject({ ok: true, value: 5000, limit: 6000 });
    // Hook load 5 000 kg on the line at 120°: 2 × 5 000 × cos 60° = 5 000 kg.
    expect(r.checks.find((c) => c.id === 'rigging:snatch-block:B1')!.value).toBeCloseTo(5000, 9);
  });
});

describe('sling angle warning and the basket D/d reduction', () => {
  it('under 30° from horizontal warns (the check can still pass); at 30° it does not', () => {
    // Each leg pulls 1/sin 25° = 2.37 × its share. Source: sling angle guidance, ASME B30.9 [derived factor].
    const low = slingVerdict({ id: 'w', verticalRating: 10000, hitch: 'vertical', legs: 2, angleFromHorizontal: 25 }, 1000);
    expect(low.facts.lowAngle).toBe(true);
    expect(riggingCheck(low).ok).toBe(true);
    expect(describeCheck(riggingCheck(low), 'metric').sentence).toMatch(/under 30° from horizontal: each leg pulls 2\.37 ×/);
    expect(slingVerdict({ id: 'w', verticalRating: 10000, hitch: 'vertical', legs: 2, angleFromHorizontal: 30 }, 1000).facts.lowAngle).toBe(false);
    expect(shackleVerdict({ id: 's', wll: 5000, legs: 2, angleFromHorizontal: 20 }, 1000).facts.lowAngle).toBe(true);
  });
  it('wire rope in a basket at D/d 10 keeps 0.86/0.92 of its basket rating; at D/d 25 and above, all of it', () => {
    // Efficiency curve (Wire Rope Users Manual, value from memory): D/d 10 → 86 %, D/d 25 → 92 %; makers
    // rate wire rope baskets at D/d 25 [read], so 10 000 kg × 0.86 / 0.92 = 9 347.8 kg [derived].
    const s = { id: 'wr', material: 'wire-rope' as const, verticalRating: 5000, basketRating: 10000, hitch: 'basket' as const };
    expect(slingRating({ ...s, bendRatio: 10 }).capacity).toBeCloseTo(9347.83, 2);
    expect(slingRating({ ...s, bendRatio: 12 }).capacity).toBeCloseTo(9347.83, 2);
    expect(slingRating({ ...s, bendRatio: 25 }).capacity).toBe(10000);
    expect(slingRating({ ...s, bendRatio: 0.5 }).capacity).toBe(0);
  });
  it('no D/d table for a round sling: no reduction, and the result says so', () => {
    const r = slingRating({ id: 'rs', colour: 'red', hitch: 'basket', bendRatio: 2 });
    expect(lbOf(r.capacity)).toBeCloseTo(26400, 6);
    expect(r.bend).toEqual({ ratio: 2, factor: null });
    expect(describeCheck(riggingCheck(slingVerdict({ id: 'rs', colour: 'red', hitch: 'basket', bendRatio: 2 }, 100)), 'metric').sentence).toMatch(/No D\/d reduction table/);
  });
});
