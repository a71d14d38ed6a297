import type { SceneDocument } from '@/lib/scene/schema';
import { cribbingSchema, legSetupSchema, type TruckObject } from '@/lib/scene/objects';
import { maxExtension, type TruckModel } from '@/lib/scene/truck/truck-model';
import { padName } from '@/lib/lift/names';
import { wrap360 } from '@/lib/angles';
import { inToM, kpaToPsf, mToIn, psfToKpa, type UnitSystem } from '@/lib/units';
import { limitsSchema, soilSchema } from '@/lib/scene/schema';
import { formatLength } from '@/lib/format/quantity';
import type { Command } from '../../commands/command';
import { setBoom, setDocumentFields, setLegCribbing, setLegExtension, setSwing } from '../../commands/truck';
import type { FieldSpec } from '../field-logic';
import { lengthSpec, massSpec, numberSpec } from '../field-specs';

/**
 * The inspector's numeric fields for the truck and the scene settings, each bound to the document: what it
 * reads (the figure the plan uses) and the command its commit runs. The inspector renders these, and the
 * property test (tests/editor/fields-agree.test.ts) drives them, so both see the same fields.
 */
export interface BoundField {
  key: string;
  label: string;
  testId: string;
  spec: FieldSpec;
  read(doc: SceneDocument): number;
  write(v: number): Command;
  /** Shown but not editable (e.g. a mat's weight with no mat). */
  inert?(doc: SceneDocument): boolean;
}

const truckOf = (doc: SceneDocument) => doc.objects.find((o): o is TruckObject => o.kind === 'truck');
/** The schema's own bounds, so a field never lets through what the document would refuse. */
const EXT_MAX = legSetupSchema.shape.extension.maxValue ?? 15;
const MAT_AREA_MAX = cribbingSchema.shape.area.maxValue ?? 20;
const MAT_MASS_MAX = 5000;

/** "left front (FL)": the pad's name with its code second. */
export const legTitle = (leg: TruckModel['legs'][number]) => {
  const name = padName(leg.id, leg.mount.x, leg.mount.y);
  return `${name.charAt(0).toUpperCase()}${name.slice(1)} (${leg.id})`;
};

export function legFields(model: TruckModel, leg: TruckModel['legs'][number], units: UnitSystem): BoundField[] {
  const reach = Math.min(maxExtension(leg), EXT_MAX);
  const setup = (doc: SceneDocument) => truckOf(doc)?.legs[leg.id] ?? { extension: 0, cribbing: null };
  return [
    {
      key: `ext-${leg.id}`,
      label: 'Out',
      testId: `ext-${leg.id}`,
      spec: lengthSpec(units, { min: 0, max: reach, outOfRange: 'clamp', rangeWhy: 'this leg reaches' }),
      // The pad sits at most fully out whatever the document says (padCentre clamps), so the field does too.
      read: (doc) => Math.min(Math.max(0, setup(doc).extension), reach),
      write: (v) => setLegExtension(leg.id, v, 'commit'),
    },
    {
      key: `mat-${leg.id}`,
      label: 'Mat, square side (0 = none)',
      testId: `crib-${leg.id}`,
      // A square mat: its side is what a crew measures; the document keeps the area (side²).
      spec: lengthSpec(units, { min: 0, max: Math.sqrt(MAT_AREA_MAX), rangeWhy: 'a mat side is' }),
      read: (doc) => Math.sqrt(setup(doc).cribbing?.area ?? 0),
      write: (v) => (doc) => {
        const c = setup(doc).cribbing;
        return setLegCribbing(leg.id, v > 0 ? { area: v * v, mass: c?.mass ?? 0, label: c?.label ?? '' } : null)(doc);
      },
    },
    {
      key: `matmass-${leg.id}`,
      label: 'Mat weight',
      testId: `cribmass-${leg.id}`,
      spec: massSpec(units, { min: 0, max: MAT_MASS_MAX, rangeWhy: 'a mat weighs' }),
      read: (doc) => setup(doc).cribbing?.mass ?? 0,
      inert: (doc) => !setup(doc).cribbing,
      write: (v) => (doc) => {
        const c = setup(doc).cribbing;
        return c ? setLegCribbing(leg.id, { ...c, mass: v })(doc) : { document: doc, capture: 'none' };
      },
    },
  ];
}

export function boomFields(model: TruckModel | null, units: UnitSystem): BoundField[] {
  const boom = (doc: SceneDocument) => truckOf(doc)?.boom ?? { slew: 0, elevation: 0, length: 1 };
  const b = model?.boom;
  return [
    {
      key: 'slew',
      label: 'Slew (° from over the cab, counter-clockwise)',
      testId: 'field-slew',
      spec: numberSpec({ unit: '°', min: 0, max: 360, normalise: wrap360 }),
      read: (doc) => boom(doc).slew,
      write: (slew) => setBoom({ slew }),
    },
    {
      key: 'elevation',
      label: 'Elevation',
      testId: 'field-elevation',
      spec: numberSpec({ unit: '°', min: b?.minElevation ?? -10, max: b?.maxElevation ?? 89, rangeWhy: 'this boom raises' }),
      read: (doc) => boom(doc).elevation,
      write: (elevation) => setBoom({ elevation }),
    },
    {
      key: 'length',
      label: b ? `Length (${formatLength(b.minLength, units)} – ${formatLength(b.maxLength, units)})` : 'Length',
      testId: 'field-boom-length',
      spec: lengthSpec(units, b ? { min: b.minLength, max: b.maxLength, outOfRange: 'clamp', rangeWhy: 'this boom runs' } : { min: 0.1, max: 80 }),
      read: (doc) => boom(doc).length,
      write: (length) => setBoom({ length }),
    },
  ];
}

const PRESSURE_MAX = soilSchema.shape.allowable.maxValue ?? 10_000;
const CLEARANCE_MAX = limitsSchema.shape.clearance.unwrap().maxValue ?? 10;

export function sceneFields(units: UnitSystem): BoundField[] {
  const metric = units === 'metric';
  const pct = (key: 'percentOfTipping' | 'percentOfRated', label: string): BoundField => ({
    key,
    label,
    testId: `field-${key}`,
    spec: numberSpec({ unit: '%', min: 1, max: 100 }),
    read: (doc) => doc.limits[key],
    write: (v) => (doc) => setDocumentFields({ limits: { ...doc.limits, [key]: v } })(doc),
  });
  return [
    { key: 'pick', label: 'Pick at slew', testId: 'field-pick', spec: numberSpec({ unit: '°', min: 0, max: 360 }), read: (d) => d.swing.from, write: (from) => setSwing({ from }) },
    { key: 'set', label: 'Set at slew', testId: 'field-set', spec: numberSpec({ unit: '°', min: 0, max: 360 }), read: (d) => d.swing.to, write: (to) => setSwing({ to }) },
    {
      key: 'allowable',
      label: 'Allowable pressure',
      testId: 'field-allowable',
      spec: numberSpec({ unit: metric ? 'kPa' : 'psf', digits: 0, min: 1, max: PRESSURE_MAX, toShown: metric ? undefined : kpaToPsf, fromShown: metric ? undefined : psfToKpa }),
      read: (d) => d.soil.allowable,
      write: (allowable) => setDocumentFields({ soil: { preset: 'custom', allowable } }),
    },
    pct('percentOfTipping', 'Percent of tipping'),
    {
      key: 'clearance',
      label: 'Clearance',
      testId: 'field-clearance',
      spec: numberSpec({ unit: metric ? 'm' : 'in', digits: metric ? 2 : 0, min: 0, max: CLEARANCE_MAX, toShown: metric ? undefined : mToIn, fromShown: metric ? undefined : inToM }),
      read: (d) => d.limits.clearance,
      write: (v) => (doc) => setDocumentFields({ limits: { ...doc.limits, clearance: v } })(doc),
    },
    pct('percentOfRated', 'Percent of load chart'),
  ];
}

