import { describe, expect, it } from 'vitest';
import { analyzeLift } from '@/lib/lift';
import { formatMass } from '@/lib/format/quantity';
import { bandWords, changeWords, sensitivityHeadline, weightLimitFigure } from '@/lib/format/weight-sensitivity';
import { squareOfPads } from '../lift/scenarios';

describe('weight sensitivity in words', () => {
  // The square of pads: the front-left pad reaches 500 kPa at 5 910.3 kg of load (four-pad formula, tests/lift/sensitivity.test.ts).
  const ws = analyzeLift(squareOfPads()).weightSensitivity!;

  it('says the first weight at which a limit is reached, in the viewer’s units, with the change', () => {
    // 5 910.34 kg ÷ 0.453 592 37 kg/lb = 13 030 lb (exact pound, NIST SP 811); +18 % of 5 000 kg.
    // The square is symmetric: all four pads reach it together, so any one of them may come first.
    expect(sensitivityHeadline(ws, (kg) => formatMass(kg, 'imperial'))).toMatch(/^Limits reached at 13,030 lb \(\+18 %\): first the ground’s allowable pressure under the (left|right) (front|rear) pad\.$/);
    expect(sensitivityHeadline(ws, (kg) => formatMass(kg, 'metric'))).toMatch(/^Limits reached at 5,910 kg \(\+18 %\)/);
  });

  it('says when a limit is already reached at the planned weight', () => {
    const heavy = analyzeLift(squareOfPads({ load: { mass: 9000, footprint: { kind: 'rect', length: 1, width: 1 }, height: 1, hang: 1 } })).weightSensitivity!;
    expect(sensitivityHeadline(heavy, (kg) => formatMass(kg, 'metric'))).toMatch(/^Limits already reached at 5,910 kg \(−34 %\), at or below the planned weight/);
  });

  it('says when a lighter load would overload a pad', () => {
    // The case of tests/lift/sensitivity.test.ts: carrier at x = −1.5 m, rear pads over their allowable under 1 500 kg of load.
    const ws2 = analyzeLift(squareOfPads({
      masses: [{ id: 'carrier', mass: 20000, x: -1.5, y: 0, z: 1 }],
      load: { mass: 3000, footprint: { kind: 'rect', length: 1, width: 1 }, height: 1, hang: 1 },
      swing: { from: 0, to: 0, direction: 'ccw' },
      soil: { allowable: (8000 * 9.80665) / 1000 / 0.25 },
    })).weightSensitivity!;
    expect(sensitivityHeadline(ws2, (kg) => formatMass(kg, 'metric'))).toMatch(
      /^Limits reached at 6,750 kg \(\+125 %\): first the ground’s allowable pressure under the (left|right) front pad\. A lighter load would reach the ground’s allowable pressure under the (left|right) rear pad: under 1,500 kg \(−50 %\)\.$/,
    );
  });

  it('words the band, the change and a limit never reached', () => {
    expect(bandWords(ws, (kg) => formatMass(kg, 'metric'))).toBe('From 4,500 kg (−10 %) to 6,250 kg (+25 %), as the weight is given.');
    expect(changeWords(0.2)).toBe('±0 %');
    expect(changeWords(-12.4)).toBe('−12 %');
    const inside = analyzeLift(squareOfPads({ boom: { pivot: { x: 0, y: 0, z: 2 }, length: 1, elevation: 0, mass: 0, cgFraction: 0.5 } })).weightSensitivity!;
    const tip = inside.limits.find((l) => l.kind === 'tipping-limit')!;
    expect(weightLimitFigure(tip, String)).toBe('not reached: the hook stays inside the tipping lines');
  });
});
