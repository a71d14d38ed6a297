import { describe, expect, it } from 'vitest';
import { TestEditor } from './test-editor';
import { newObject } from '@/lib/scene/factories';
import { emptySceneDocument } from '@/lib/scene/empty';
import { kgToLb, kpaToPsf, mToFt } from '@/lib/units';
import { autoFilledSwing } from '@/canvas/panels/inspector/scene-settings';
import { estimateWords } from '@/canvas/panels/inspector/load-estimate';
import { headingOf, rotationOf } from '@/canvas/panels/inspector/object-fields';
import { touchHint } from '@/canvas/panels/use-touch';
import type { LoadObject } from '@/lib/scene/objects';

describe('defaults a user would choose', () => {
  it('a blank scene allows 3,000 psf exactly, a round figure', () => {
    expect(kpaToPsf(emptySceneDocument().soil.allowable)).toBeCloseTo(3000, 9);
  });

  it('new loads come in round feet and pounds for an imperial user, round metres and kilograms for a metric one', () => {
    const imp = newObject('load-coil', 'l1', { x: 0, y: 0 }, null, 'imperial') as LoadObject;
    const met = newObject('load-coil', 'l2', { x: 0, y: 0 }, null, 'metric') as LoadObject;
    expect(kgToLb(imp.blockMassKg)).toBeCloseTo(200, 9);
    expect(met.blockMassKg).toBe(90);
    if (imp.shape.kind !== 'coil' || met.shape.kind !== 'coil') throw new Error('coil expected');
    expect(mToFt(imp.shape.outerDiameter)).toBeCloseTo(6, 9);
    expect(met.shape.outerDiameter).toBe(1.8);
    const box = newObject('load-box', 'b', { x: 0, y: 0 }, null, 'imperial') as LoadObject;
    expect(kgToLb(box.massKg)).toBeCloseTo(4400, 9);
  });

  it('an estimated weight says what it is estimated from', () => {
    const coil = newObject('load-coil', 'l1', { x: 0, y: 0 }, null, 'imperial') as LoadObject;
    // Steel, 7,850 kg/m³ = 490 lb/ft³ (7850 / 16.0185 kg/m³ per lb/ft³).
    expect(estimateWords(coil, 'imperial')).toMatch(/^a coil 6′ 0″ across, 2′ 0″ eye, 5′ 0″ wide, solid at 490 lb\/ft³ \(steel\) ≈ [\d,]+ lb$/);
  });

  it('pick and set filled in by placing the load and the trailer are said to be so, until changed', () => {
    const t = new TestEditor().tool('truck').click(0, 0).tool('load-coil').click(0, 9.144, { alt: true });
    expect(autoFilledSwing(t.doc)).toEqual(['Pick was filled in to point at the load.']);
    t.state.run((doc) => ({ document: { ...doc, swing: { ...doc.swing, from: 45 } }, capture: 'commit' }));
    expect(autoFilledSwing(t.doc)).toEqual([]);
  });
});

describe('heading from north, clockwise', () => {
  it('is 90° less the stored rotation (from east, counter-clockwise), both ways, wrapped', () => {
    expect(headingOf(0)).toBe(90); // facing east
    expect(headingOf(90)).toBe(0); // facing north
    expect(headingOf(180)).toBe(270); // facing west
    expect(rotationOf(45)).toBe(45); // north-east either way
    expect(rotationOf(135)).toBe(315); // south-east
    for (const r of [0, 12.5, 90, 179.9, 270.25, 359]) expect(rotationOf(headingOf(r))).toBeCloseTo(r, 9);
  });
});

describe('small objects and touch', () => {
  it('a pole drawn at its minimum size is pressed where it is drawn', () => {
    const t = new TestEditor().tool('pole').click(10, 10);
    const pole = t.byKind('obstacle')[0];
    t.keyDown('Escape').click(30, 30);
    expect(t.state.selection).toEqual([]);
    // 20 px/m: 0.35 m is 7 px across; the drawn ring is 18 px (0.9 m) across, so 0.4 m off centre still hits it.
    t.click(pole.x + 0.4, pole.y);
    expect(t.state.selection).toEqual([pole.id]);
  });

  it('hints drop their keys on a touch screen', () => {
    expect(touchHint('Place the truck (T) to see the swing check.', true)).toBe('Place the truck to see the swing check.');
    expect(touchHint('Place the truck (T) to see the swing check.', false)).toBe('Place the truck (T) to see the swing check.');
  });
});
