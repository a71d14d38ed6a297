import { describe, expect, it } from 'vitest';
import { applyWhatIf, SANDBOX_MAT } from '@/canvas/replay/what-if';
import { DEMO_SCENES } from '@/db/seed/demo-scenes';
import { DEMO_TRUCKS } from '@/db/seed/demo-trucks';
import { analyzeLift } from '@/lib/lift';
import { sceneToLiftInput } from '@/lib/scene/to-lift-input';
import { truckModelFromProfile } from '@/lib/scene/truck/from-spec';
import type { SceneDocument } from '@/lib/scene/schema';
import type { LoadObject, TruckObject } from '@/lib/scene/objects';

const coil = DEMO_SCENES.find((s) => s.title.startsWith('Coil transfer'))!.document as SceneDocument;
const hr7 = DEMO_TRUCKS.find((t) => t.unitNumber === 'HR-7')!;
const model = truckModelFromProfile({ id: 1, version: 1, name: hr7.name, unitNumber: hr7.unitNumber, spec: hr7.spec });
const truckOf = (d: SceneDocument) => d.objects.find((o): o is TruckObject => o.kind === 'truck')!;
const loadOf = (d: SceneDocument) => d.objects.find((o): o is LoadObject => o.kind === 'load')!;
const worst = (d: SceneDocument) => {
  const lift = sceneToLiftInput(d, model);
  if (!lift.ok) throw new Error(lift.problem.message);
  return analyzeLift(lift.input).worstCase.percentOfTipping;
};

describe('the replay sandbox (what-if)', () => {
  it('never changes the saved document, and an empty what-if changes nothing', () => {
    const before = structuredClone(coil);
    const same = applyWhatIf(coil, {});
    applyWhatIf(coil, { loadMassKg: 30_000, legs: { RR: { extension: 0.5, cribbing: false } }, pick: 10, set: 200 });
    expect(coil).toEqual(before);
    expect(same).toEqual(before);
  });

  it('a heavier load is weighed (given, not estimated) and raises the worst % of tipping', () => {
    // The demo coil's weight is estimated from its size; the sandbox starts from the mass the engine uses.
    const lift = sceneToLiftInput(coil, model);
    if (!lift.ok) throw new Error(lift.problem.message);
    const mass = lift.input.load.mass;
    expect(loadOf(coil).massMode).toBe('estimate');
    const heavier = applyWhatIf(coil, { loadMassKg: mass * 1.25 });
    expect(loadOf(heavier)).toMatchObject({ massMode: 'given', massKg: mass * 1.25 });
    expect(worst(heavier)).toBeGreaterThan(worst(coil));
    // A negative mass typed into the sandbox is held at zero, not passed on.
    expect(loadOf(applyWhatIf(coil, { loadMassKg: -5 })).massKg).toBe(0);
  });

  it('pulling one outrigger in changes that leg only and shrinks the margin; cribbing toggles a mat', () => {
    const legs = truckOf(coil).legs;
    const id = Object.keys(legs)[0]!;
    const pulled = applyWhatIf(coil, { legs: { [id]: { extension: 0 } } });
    expect(truckOf(pulled).legs[id]!.extension).toBe(0);
    for (const other of Object.keys(legs).filter((k) => k !== id)) expect(truckOf(pulled).legs[other]).toEqual(legs[other]);
    expect(worst(pulled)).toBeGreaterThanOrEqual(worst(coil));
    const bare = applyWhatIf(coil, { legs: { [id]: { cribbing: false } } });
    expect(truckOf(bare).legs[id]!.cribbing).toBeNull();
    const matted = applyWhatIf(bare, { legs: { [id]: { cribbing: true } } });
    expect(truckOf(matted).legs[id]!.cribbing).toEqual(SANDBOX_MAT);
    // An unknown leg id is ignored.
    expect(truckOf(applyWhatIf(coil, { legs: { ZZ: { extension: 1 } } })).legs).toEqual(legs);
  });

  it('pick and set angles are normalised into [0, 360)', () => {
    const d = applyWhatIf(coil, { pick: -90, set: 725 });
    expect(d.swing).toMatchObject({ from: 270, to: 5, direction: coil.swing.direction });
  });
});
