import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { analyzeLift, type Check, type LiftInputIn } from '@/lib/lift';
import { checksHeadline, describeCheck, groupChecks } from '@/lib/format/checks';
import { formatNumber } from '@/lib/format/number';
import { ftToM, inToM, kgToKn, lbToKg, psfToKpa } from '@/lib/units';

/**
 * The one check formatter, in both unit systems, on records made of exact imperial figures (so the
 * expected words can be worked out by hand) and on whole analyses of the golden fixtures.
 * Conversions: 1 ft = 0.3048 m, 1 lb = 0.45359237 kg (1959 international yard and pound), g = 9.80665 m/s².
 */
const base = { ratio: null, sense: 'at-most', slew: null, upperWeight: null } as const;

const bearing: Check = {
  ...base, id: 'bearing:FL', code: 'bearing', subject: { kind: 'pad', ids: ['FL'], names: ['left front'] }, quantity: 'pressure',
  value: psfToKpa(2400), limit: psfToKpa(3000), ratio: 0.8, status: 'within', ok: true, slew: 135,
  facts: { force: kgToKn(lbToKg(20000)), underCribbing: true, liftsOff: false },
};

const clearance: Check = {
  ...base, id: 'clearance:obstacle-6c1am4', code: 'clearance', subject: { kind: 'obstacle', ids: ['obstacle-6c1am4'], names: ['shed'] }, quantity: 'length',
  value: ftToM(2.5), limit: ftToM(1), ratio: 2.5, sense: 'at-least', status: 'within', ok: true, slew: 90,
  facts: { horizontal: ftToM(2.5), vertical: -1, overlapsInPlan: false, conflict: false, part: 'load' },
};

const stability: Check = {
  ...base, id: 'stability', code: 'stability', quantity: 'percent', value: 88.25, limit: 85, ratio: 88.25 / 85, status: 'beyond', ok: false, slew: 187.3,
  subject: { kind: 'tipping-line', ids: ['RL', 'RR'], names: ['left rear', 'right rear'], line: { code: 'RL-RR', side: 'rear' } },
  facts: { tippingLoad: 9000 },
};

const sling: Check = {
  ...base, id: 'rigging:sling:HR-RS-06:upper-weight', code: 'rigging', subject: { kind: 'sling', ids: ['HR-RS-06'], names: ['HR-RS-06'] }, quantity: 'mass',
  value: lbToKg(20000), limit: lbToKg(24000), ratio: 20000 / 24000, status: 'within', ok: true, upperWeight: { percent: 10, loadMass: lbToKg(20000) },
  facts: {
    element: 'sling', legs: 2, legsCounted: 2, hitch: 'basket', angleFromHorizontal: 60, lowAngle: false, colour: null, material: 'other', grade: null, size: null,
    choke: null, bend: null, lineAngle: null, linePull: null, linePullFrom: null, parts: null, sheaves: null, leadSheaves: null, leadLineFactor: null, ratingSource: 'the tag', refused: null,
  },
};

const powerLine: Check = {
  ...base, id: 'power-line:obstacle-pl9x2k', code: 'power-line', subject: { kind: 'power-line', ids: ['obstacle-pl9x2k'], names: ['Dell Road feeder'] }, quantity: 'length',
  value: ftToM(14), limit: ftToM(10), ratio: 1.4, sense: 'at-least', status: 'within', ok: true, slew: 270,
  facts: { nearest: 'boom', rule: { source: 'table-a', upToKV: 50, feet: 10 } },
};

describe('describeCheck, imperial (the default)', () => {
  it('ground bearing: psf and lbf from the exact figures, the pad by name, the margin below the allowable', () => {
    const w = describeCheck(bearing, 'imperial');
    expect(w.title).toBe('Ground under the left front pad');
    expect([w.value, w.limit, w.status, w.margin]).toEqual(['2,400 psf', 'allowable 3,000 psf', 'within limit', '20 % below']);
    expect(w.sentence).toBe('The left front pad presses 2,400 psf on the ground under its cribbing at slew 135.0° (20,000 lbf); allowable 3,000 psf (within limit, 20 % below).');
  });
  it('clearance: feet-inches, the obstacle by its name and never its id', () => {
    const w = describeCheck(clearance, 'imperial');
    expect(w.sentence).toBe('The load passes 2′ 6″ from “shed” in plan (nearest at slew 90.0°); limit 1′ 0″ (within limit, 1′ 6″ to spare).');
    expect(w.title).toBe('Load clear of shed');
  });
  it('tipping: the line as its two pads with the short code second, points over the limit', () => {
    const w = describeCheck(stability, 'imperial');
    expect(w.title).toBe('Tipping about the left rear–right rear pads (rear line, RL-RR)');
    expect(w.sentence).toBe(
      "Worst case at slew 187.3°: the hook load is 88.3 % of the load that would tip the truck about the left rear–right rear pads (rear line, RL-RR); the plan's limit is 85 % (over limit, 3.3 points over).",
    );
  });
  it('rigging at the upper weight: pounds, the share of capacity used', () => {
    const w = describeCheck(sling, 'imperial');
    expect(w.sentence).toBe(
      'At the upper weight (10 % over, 20,000 lb): Sling HR-RS-06 (2 × sling, basket hitch at 60° from horizontal) carries 20,000 lb against a capacity of 24,000 lb (within limit, 83 % of capacity used).',
    );
  });
  it("power line: the rule's own feet shown exactly", () => {
    expect(describeCheck(powerLine, 'imperial').sentence).toBe(
      'The boom comes within 14′ 0″ of the line “Dell Road feeder” at slew 270.0°; 29 CFR 1926.1408 Table A requires 10′ 0″ up to 50 kV (within limit, 4′ 0″ to spare).',
    );
  });
});

describe('describeCheck, metric', () => {
  it('ground bearing in kPa and kN: 2,400 psf = 114.9 kPa, 20,000 lbf = 88.96 kN', () => {
    expect(describeCheck(bearing, 'metric').sentence).toBe('The left front pad presses 115 kPa on the ground under its cribbing at slew 135.0° (89.0 kN); allowable 144 kPa (within limit, 20 % below).');
  });
  it('clearance in metres: 2.5 ft = 0.762 m, 1 ft = 0.3048 m', () => {
    expect(describeCheck(clearance, 'metric').sentence).toBe('The load passes 0.76 m from “shed” in plan (nearest at slew 90.0°); limit 0.30 m (within limit, 0.46 m to spare).');
  });
  it('rigging in kilograms: 20,000 lb = 9,072 kg, 24,000 lb = 10,886 kg', () => {
    const w = describeCheck(sling, 'metric');
    expect([w.value, w.limit]).toEqual(['9,072 kg', 'limit 10,886 kg']);
  });
  it('power line: 10 ft = 3.05 m', () => {
    expect(describeCheck(powerLine, 'metric').sentence).toContain('Table A requires 3.05 m up to 50 kV (within limit, 1.22 m to spare)');
  });
  it('a load passing over a truck part, below its top: the strike is named, the depth shown', () => {
    const strike: Check = { ...clearance, id: 'clearance:cab', subject: { kind: 'truck-part', ids: ['cab'], names: ['cab'] }, value: -inToM(3), status: 'beyond', ok: false, facts: { horizontal: 0, vertical: -inToM(3), overlapsInPlan: true, conflict: true, part: 'load' } };
    expect(describeCheck(strike, 'imperial').sentence).toBe("The load passes over the truck's cab (from slew 90.0°) with its bottom 0′ 3″ below its top: the load would strike it (over limit, 1′ 3″ short).");
    expect(describeCheck(strike, 'metric').sentence).toBe("The load passes over the truck's cab (from slew 90.0°) with its bottom 0.08 m below its top: the load would strike it (over limit, 0.38 m short).");
  });
});

describe('the number formatter', () => {
  it('groups thousands, fixes decimals, writes a true minus and no negative zero', () => {
    expect([formatNumber(1234567.891, 2), formatNumber(-1500), formatNumber(-0.04, 1), formatNumber(999.96, 1), formatNumber(0)]).toEqual(['1,234,567.89', '−1,500', '0.0', '1,000.0', '0']);
  });
});

const fixtures = path.join(__dirname, '..', 'lift', 'fixtures', 'in');
const inputs = fs.readdirSync(fixtures).filter((f) => f.endsWith('.json')).map((f) => JSON.parse(fs.readFileSync(path.join(fixtures, f), 'utf8')) as LiftInputIn);

/** Object ids as the editor makes them, and check ids: none may reach the words. */
const ID_PATTERN = /\b(obstacle|trailer|load|truck)-[a-z0-9]{5,}\b|\b(bearing|clearance|power-line|rigging|stability|load-chart):|upper-weight/;

describe('names, never ids', () => {
  it('an editor scene: obstacles and power lines with generated ids read by their names', () => {
    const input = inputs.find((i) => (i.powerLines ?? []).length > 0 && (i.obstacles ?? []).length > 0)!;
    const named: LiftInputIn = {
      ...input,
      obstacles: input.obstacles!.map((o, i) => ({ ...o, id: `obstacle-6c1am${i}`, name: `stack ${i + 1}` })),
      powerLines: input.powerLines!.map((l, i) => ({ ...l, id: `obstacle-pl9x2${i}`, name: `feeder ${i + 1}` })),
    };
    const r = analyzeLift(named);
    const ids = r.checks.flatMap((c) => c.subject.ids).filter((id) => id.startsWith('obstacle-'));
    expect(ids.length).toBeGreaterThanOrEqual(3);
    for (const units of ['imperial', 'metric'] as const) {
      for (const c of r.checks) {
        const w = describeCheck(c, units);
        for (const text of [w.title, w.value, w.limit, w.margin, w.sentence]) {
          expect(text).not.toMatch(ID_PATTERN);
          for (const id of ids) expect(text).not.toContain(id);
        }
      }
    }
    expect(describeCheck(r.checks.find((c) => c.id === 'power-line:obstacle-pl9x20')!, 'imperial').sentence).toContain('“feeder 1”');
  });
  it('every check of every golden fixture, both unit systems: no id, no SI unit in imperial, never "safe"', () => {
    let n = 0;
    for (const input of inputs) {
      const r = analyzeLift(input);
      for (const c of r.checks) {
        const imperial = describeCheck(c, 'imperial').sentence;
        const metric = describeCheck(c, 'metric').sentence;
        for (const t of [imperial, metric]) {
          expect(t).not.toMatch(ID_PATTERN);
          expect(t).not.toMatch(/\bsafe/i);
        }
        expect(imperial).not.toMatch(/\d (m|kg|kPa|kN)\b/);
        expect(metric).not.toMatch(/\d (lb|psf|lbf)\b|″/);
        n++;
      }
      expect(groupChecks(r.checks).reduce((a, g) => a + g.checks.length, 0)).toBe(r.checks.length);
    }
    // 46 load, mass and line checks, and 10 of the boom against the fixtures' parts and obstacles.
    expect(n).toBe(66);
  });
});

describe('the headline', () => {
  it('counts checks over the limits, and those near them', () => {
    expect(checksHeadline([bearing, clearance])).toBe("All 2 checks within the plan's limits");
    expect(checksHeadline([bearing, { ...clearance, status: 'near' }])).toBe("All 2 checks within the plan's limits, 1 near them");
    expect(checksHeadline([bearing, stability, sling])).toBe("1 of 3 checks over the plan's limits");
  });
});
