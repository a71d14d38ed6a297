import fs from 'node:fs';
import path from 'node:path';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyzeLift, weightBandOf, type LiftInputIn, type LiftResult, type WeightLimit } from '@/lib/lift';
import { G } from '@/lib/units';
import { squareOfPads, rotator } from './scenarios';

const limitOf = (r: LiftResult, kind: WeightLimit['kind'], check?: string) => {
  const l = r.weightSensitivity?.limits.find((x) => x.kind === kind && (check === undefined || x.check === check));
  if (!l) throw new Error(`no ${kind} ${check ?? ''} limit`);
  return l;
};
const withMass = (input: LiftInputIn, mass: number): LiftInputIn => ({ ...input, load: { ...input.load, mass } });
const checkAt = (input: LiftInputIn, mass: number, id: string) => {
  const c = analyzeLift(withMass(input, mass), { sensitivity: false }).checks.find((x) => x.id === id);
  if (!c) throw new Error(`no check ${id}`);
  return c;
};

describe('weight sensitivity: the load mass at which each limit is reached', () => {
  it('tipping: matches the tipping-load formula of reference.md on the square of pads', () => {
    // Source: reference.md "Stability", tipping load for an edge = stabilising moment ÷ the load's lever arm
    // outside it: 20 000 kg · 2 m ÷ (6 − 2) m = 10 000 kg of hook load with the load at 6 m over a side [derived].
    // The plan's limit of 85 % of tipping is ASME B30.5 Table 1 for outriggers (table value from memory).
    // Block 150 kg and rigging 50 kg hang on the hook too, so the load itself may be 200 kg less.
    const input = squareOfPads({ hook: { blockMass: 150, riggingMass: 50 }, swing: { from: 330, to: 30, direction: 'ccw' } });
    const r = analyzeLift(input);
    const atLimit = limitOf(r, 'tipping-limit');
    const at100 = limitOf(r, 'tipping');
    expect(at100.loadMass).toBeCloseTo(10000 - 200, 6);
    expect(atLimit.loadMass).toBeCloseTo(0.85 * 10000 - 200, 6);
    expect(atLimit.limit).toBe(85);
    expect(atLimit.change).toBeCloseTo((100 * (8300 - 5000)) / 5000, 6);
    expect(atLimit.subject).toBe('FR-FL');
    expect(atLimit.method).toBe('proportional');
    // The engine's own full check at that mass sits on the limit.
    expect(analyzeLift(withMass(input, atLimit.loadMass as number)).worstCase.percentOfTipping).toBeCloseTo(85, 6);
  });

  it('pad pressure: matches the four-float formula at the corner of the square', () => {
    // Source: reference.md "Stability", four-pad reactions R_i = V/n + M_x·y_i/Σy² + M_y·x_i/Σx² (Shapiro,
    // Cranes and Derricks, 4th ed., §5). Over a corner (slew 45°) the front-left pad carries
    // 20 000/4 + H·(1/4 + 2·(6/√2)·2/16) kg, its largest over the turn; all four pads stay down while
    // 5 000 + H/4 − 1.06·H > 0. Allowable 500 kPa on 0.25 m² pads: R = 500·0.25·1000/g kg [derived].
    const input = squareOfPads();
    const r = analyzeLift(input);
    const fl = limitOf(r, 'bearing', 'bearing:FL');
    const rAllowed = (500 * 0.25 * 1000) / G;
    const hand = (rAllowed - 5000) / (0.25 + (2 * 2 * 6) / Math.SQRT2 / 16);
    expect(fl.method).toBe('bracketed');
    expect(Math.abs((fl.loadMass as number) - hand)).toBeLessThan(0.05);
    expect(fl.slew).toBeCloseTo(45, 0);
  });

  it('pad pressure both ways: a heavier load overloads the front pads, a lighter one the rear pads', () => {
    // Source: the four-pad formula of reference.md (Shapiro §5). Carrier 20 000 kg at x = −1.5 m, hook load H
    // at 6 m over the front (slew 0 only): front pads 1 250 + H, rear pads 8 750 − H/2 (kg). With the allowable
    // at 8 000 kg on 0.25 m² pads, the front pads reach it at H = 6 750 kg and the rear pads, within it at the
    // planned 3 000 kg, are over it for any load under 1 500 kg [derived].
    const allowable = (8000 * G) / 1000 / 0.25;
    const input = squareOfPads({
      masses: [{ id: 'carrier', mass: 20000, x: -1.5, y: 0, z: 1 }],
      load: { mass: 3000, footprint: { kind: 'rect', length: 1, width: 1 }, height: 1, hang: 1 },
      swing: { from: 0, to: 0, direction: 'ccw' },
      soil: { allowable },
    });
    const r = analyzeLift(input);
    expect(Math.abs((limitOf(r, 'bearing', 'bearing:FL').loadMass as number) - 6750)).toBeLessThan(0.05);
    const rl = limitOf(r, 'bearing', 'bearing:RL');
    expect(rl.loadMass).toBeNull();
    expect(Math.abs((rl.lighter?.loadMass as number) - 1500)).toBeLessThan(0.05);
    expect(checkAt(input, 1490, 'bearing:RL').status).toBe('beyond');
    expect(checkAt(input, 1510, 'bearing:RL').status).not.toBe('beyond');
  });

  it('load chart and rigging: the check passes just below the mass and fails just above it', () => {
    // The coil-transfer example has a chart, a basket sling, a shackle and a winch; each demand is affine in the load.
    const input = JSON.parse(fs.readFileSync(path.join(__dirname, 'fixtures/in/coil-transfer.json'), 'utf8')) as LiftInputIn;
    const r = analyzeLift(input);
    const ws = r.weightSensitivity!;
    const targets = ws.limits.filter((l) => (l.kind === 'load-chart' || l.kind === 'rigging' || l.kind === 'bearing') && l.loadMass !== null && l.loadMass > 1);
    expect(targets.map((l) => l.kind)).toEqual(expect.arrayContaining(['load-chart', 'rigging', 'bearing']));
    for (const l of targets) {
      const m = l.loadMass as number;
      expect(checkAt(input, m * (1 - 1e-4), l.check).status).not.toBe('beyond');
      expect(checkAt(input, m * (1 + 1e-4), l.check).status).toBe('beyond');
    }
    // The first limit is the smallest of them (tipping at 100 % aside).
    const finite = ws.limits.filter((l) => l.kind !== 'tipping' && l.loadMass !== null).map((l) => l.loadMass as number);
    expect(ws.first?.loadMass).toBe(Math.min(...finite));
  });

  it('curves: tipping and chart use grow in proportion to the hook load; the curve spans the band', () => {
    const input = rotator({ weightUncertainty: 5 });
    const ws = analyzeLift(input).weightSensitivity!;
    expect(ws.band).toEqual({ below: 10, above: 25, source: 'given-default' });
    expect(ws.curve[0].change).toBeCloseTo(-10, 9);
    expect(ws.curve[ws.curve.length - 1].change).toBeCloseTo(25, 9);
    const nominal = ws.curve.find((c) => c.change === 0)!;
    expect(nominal.percentOfTipping).toBeCloseTo(analyzeLift(input).worstCase.percentOfTipping, 9);
    const hook = (m: number) => m + 150 + 80;
    for (const c of ws.curve) expect(c.percentOfTipping / hook(c.loadMass)).toBeCloseTo(nominal.percentOfTipping / hook(nominal.loadMass), 12);
    for (let i = 1; i < ws.curve.length; i++) expect(ws.curve[i].padPressure).toBeGreaterThan(ws.curve[i - 1].padPressure);
  });

  it('an estimated weight gets the wider band; a stated uncertainty or an explicit band widens or sets it', () => {
    // Defaults are common practice (no published source), defined in lib/lift/weight-band.ts.
    expect(weightBandOf({ weightBasis: 'estimated' })).toEqual({ below: 20, above: 50, source: 'estimated-default' });
    expect(weightBandOf({ weightUncertainty: 30 })).toEqual({ below: 30, above: 30, source: 'given-default' });
    expect(weightBandOf({ weightBand: { below: 5, above: 15 }, weightBasis: 'estimated' })).toEqual({ below: 5, above: 15, source: 'input' });
    const ws = analyzeLift(rotator({ weightBasis: 'estimated' })).weightSensitivity!;
    expect(ws.curve[ws.curve.length - 1].loadMass).toBeCloseTo(6000 * 1.5, 6);
  });

  it('a limit no load reaches says why', () => {
    // The hook inside every tipping line: no load mass tips the truck.
    const r = analyzeLift(squareOfPads({ boom: { pivot: { x: 0, y: 0, z: 2 }, length: 1, elevation: 0, mass: 0, cgFraction: 0.5 } }));
    expect(limitOf(r, 'tipping-limit')).toMatchObject({ loadMass: null, never: 'no-lever' });
  });

  it('property: over random rotators, each found mass puts the engine\'s own check on its limit', () => {
    const scene = fc.record({
      load: fc.double({ min: 1000, max: 9000, noNaN: true }),
      allowable: fc.double({ min: 120, max: 400, noNaN: true }),
      from: fc.double({ min: 0, max: 360, noNaN: true }),
      span: fc.double({ min: 0, max: 360, noNaN: true }),
      reach: fc.double({ min: 5, max: 12, noNaN: true }),
    });
    fc.assert(
      fc.property(scene, ({ load, allowable, from, span, reach }) => {
        const input = rotator({ load: { mass: load, footprint: { kind: 'rect', length: 2, width: 1.6 }, height: 1.5, hang: 3.5 }, soil: { allowable }, swing: { from, to: from + span, direction: 'ccw' } });
        input.boom = { ...input.boom, length: reach };
        const ws = analyzeLift(input).weightSensitivity!;
        for (const l of ws.limits) {
          if (l.loadMass === null || l.loadMass < 1 || l.kind === 'tipping') continue;
          const id = l.kind === 'tipping-limit' ? 'stability' : l.check;
          expect(checkAt(input, l.loadMass * (1 - 1e-4), id).status).not.toBe('beyond');
          expect(checkAt(input, l.loadMass * (1 + 1e-4), id).status).toBe('beyond');
        }
      }),
      { numRuns: 25, seed: 17 },
    );
  });
});
