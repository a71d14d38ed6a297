import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { TestEditor } from './test-editor';
import { starterSpec } from '@/lib/equipment/starter-spec';
import { sceneDocumentSchema } from '@/lib/scene/schema';
import { truckPads } from '@/lib/scene/geometry/truck';
import { maxExtension, padCentre } from '@/lib/scene/truck/truck-model';
import { commitField, initialField, syncField, typeInField, type FieldState } from '@/canvas/panels/field-logic';
import { boomFields, legFields, sceneFields, type BoundField } from '@/canvas/panels/inspector/bound-fields';
import { objectFields } from '@/canvas/panels/inspector/object-fields';
import { setLegExtension, setSlew } from '@/canvas/commands/truck';
import { ftToM } from '@/lib/units';
import type { TruckObject } from '@/lib/scene/objects';

/**
 * Inputs never lie: after any sequence of edits (typing into the inspector's fields, drags, undo and redo,
 * a change of units), every field shows the figure the plan uses, and the document stays valid.
 * The fields run field-logic.ts, the same code the inspector's boxes run.
 */

const PROFILE = { id: 9, version: 1, name: 'Starter rotator (example values)', unitNumber: 'HR-9', spec: starterSpec() };

type Step =
  | { kind: 'type'; field: number; text: string }
  | { kind: 'undo' }
  | { kind: 'redo' }
  | { kind: 'units' }
  | { kind: 'drag-leg'; leg: number; metres: number }
  | { kind: 'slew'; deg: number };

/** What a person types: lengths in either system, masses, angles, percents, too big, negative, nonsense. */
const typed = fc.oneof(
  fc.double({ min: -50, max: 5000, noNaN: true }).map((v) => String(Math.round(v * 100) / 100)),
  fc.tuple(fc.integer({ min: 0, max: 40 }), fc.integer({ min: 0, max: 11 })).map(([f, i]) => `${f}' ${i}"`),
  fc.double({ min: 0, max: 20, noNaN: true }).map((v) => `${Math.round(v * 100) / 100} m`),
  fc.integer({ min: -400, max: 800 }).map((v) => `${v}°`),
  fc.constantFrom('', 'abc', '8\' 6"', '7 ft 3 in', '1,250', '12,5', '−3', '1e9', '100 %', '0'),
);

const step: fc.Arbitrary<Step> = fc.oneof(
  { weight: 6, arbitrary: fc.record({ kind: fc.constant('type' as const), field: fc.nat(), text: typed }) },
  { weight: 1, arbitrary: fc.constant({ kind: 'undo' as const }) },
  { weight: 1, arbitrary: fc.constant({ kind: 'redo' as const }) },
  { weight: 1, arbitrary: fc.constant({ kind: 'units' as const }) },
  { weight: 1, arbitrary: fc.record({ kind: fc.constant('drag-leg' as const), leg: fc.nat(), metres: fc.double({ min: -2, max: 20, noNaN: true }) }) },
  { weight: 1, arbitrary: fc.record({ kind: fc.constant('slew' as const), deg: fc.double({ min: -720, max: 720, noNaN: true }) }) },
);

function fieldsOf(t: TestEditor): BoundField[] {
  const model = t.state.truck!;
  const units = t.state.units;
  const truck = t.byKind('truck')[0];
  return [...boomFields(model, units), ...model.legs.flatMap((l) => legFields(model, l, units)), ...sceneFields(units), ...objectFields(truck, units)];
}

function setUp() {
  const t = new TestEditor({ profiles: [PROFILE] });
  t.tool('truck').click(0, 0);
  // Undo goes back as far as the placed truck, not before it.
  t.state.set({ undoStack: [], redoStack: [] });
  return t;
}

describe('every field shows what the plan uses (property, fast-check)', () => {
  it('after any edit sequence the document and every field agree', () => {
    fc.assert(
      fc.property(fc.array(step, { minLength: 1, maxLength: 20 }), (steps) => {
        const t = setUp();
        const states = new Map<string, FieldState>();
        /** A render: each field takes the plan's value as it is now. */
        const render = () => {
          for (const f of fieldsOf(t)) {
            const v = f.read(t.doc);
            states.set(f.key, syncField(states.get(f.key) ?? initialField(f.spec, v), f.spec, v));
          }
        };
        render();
        for (const s of steps) {
          const fields = fieldsOf(t);
          if (s.kind === 'type') {
            const f = fields[s.field % fields.length];
            if (f.inert?.(t.doc)) continue;
            const r = commitField(typeInField(states.get(f.key)!, s.text), f.spec, f.read(t.doc));
            states.set(f.key, r.state);
            if (r.commit !== undefined) t.state.run(f.write(r.commit));
            // What was typed and read lands in the plan, clamped when the field clamps.
            const read = f.spec.parse(s.text.trim());
            if (read !== null && f.spec.outOfRange === 'clamp') {
              const clamped = Math.min(f.spec.max!, Math.max(f.spec.min!, read));
              expect(f.spec.format(f.read(t.doc))).toBe(f.spec.format(clamped));
            }
          } else if (s.kind === 'undo') t.state.undo();
          else if (s.kind === 'redo') t.state.redo();
          else if (s.kind === 'units') t.state.set({ units: t.state.units === 'metric' ? 'imperial' : 'metric' });
          else if (s.kind === 'drag-leg') {
            const legs = t.state.truck!.legs;
            t.state.run(setLegExtension(legs[s.leg % legs.length].id, s.metres, 'commit'));
          } else t.state.run(setSlew(s.deg, 'commit'));
          render();
          for (const f of fieldsOf(t)) expect(states.get(f.key)!.text, f.key).toBe(f.spec.format(f.read(t.doc)));
          expect(sceneDocumentSchema.safeParse(t.doc).success).toBe(true);
          // The pads stand where the extension fields say.
          const truck = t.byKind('truck')[0] as TruckObject;
          for (const pad of truckPads(truck, t.state.truck!)) {
            const ext = legFields(t.state.truck!, pad.leg, 'metric')[0].read(t.doc);
            const c = padCentre(pad.leg, ext);
            expect(Math.hypot(c.x, c.y)).toBeCloseTo(Math.hypot(padCentre(pad.leg, pad.setup.extension).x, padCentre(pad.leg, pad.setup.extension).y), 9);
          }
        }
      }),
      { numRuns: 100 },
    );
  });
});

describe('an outrigger typed past its reach', () => {
  it('shows the clamped value with a notice, even when the leg is already fully out', () => {
    const t = setUp();
    const leg = t.state.truck!.legs[0];
    const ext = legFields(t.state.truck!, leg, 'imperial')[0];
    expect(t.byKind('truck')[0].legs[leg.id].extension).toBeCloseTo(maxExtension(leg), 9);
    const state = initialField(ext.spec, ext.read(t.doc));
    const r = commitField(typeInField(state, `${Math.ceil(maxExtension(leg) / ftToM(1)) + 1}' 6"`), ext.spec, ext.read(t.doc));
    // Already fully out: nothing to change, and the box goes back to the reach instead of keeping the typed figure.
    expect(r.commit).toBeUndefined();
    expect(r.state.text).toBe(ext.spec.format(maxExtension(leg)));
    expect(r.state.message?.tone).toBe('notice');
    expect(r.state.message?.text).toContain(`this leg reaches 0′ 0″ – ${ext.spec.format(maxExtension(leg))}`);
  });

  it('a boom elevation out of range is refused with the range named, and the plan keeps its value', () => {
    const t = setUp();
    const el = boomFields(t.state.truck!, 'imperial').find((f) => f.key === 'elevation')!;
    const before = el.read(t.doc);
    const r = commitField(typeInField(initialField(el.spec, before), '95'), el.spec, before);
    expect(r.commit).toBeUndefined();
    expect(r.state.text).toBe(el.spec.format(before));
    expect(r.state.message).toEqual({ tone: 'error', text: `95 is out of range: this boom raises ${el.spec.format(t.state.truck!.boom.minElevation)} – ${el.spec.format(t.state.truck!.boom.maxElevation)} °. Kept ${el.spec.format(before)} °.` });
  });
});
