import type { SceneDocument } from '@/lib/scene/schema';
import type { SceneObject } from '@/lib/scene/objects';
import { SITE_LIMIT } from '@/lib/scene/primitives';
import { wrap360 } from '@/lib/angles';
import type { UnitSystem } from '@/lib/units';
import { updateObject } from '../../commands/objects';
import { lengthSpec, numberSpec } from '../field-specs';
import type { BoundField } from './bound-fields';

/**
 * Compass heading (° from north, clockwise: how crews give a direction) ↔ the document's rotation
 * (° from east, counter-clockwise). Each is 90° minus the other, wrapped to 0–360; rounded to 1e-9° so a
 * round trip gives back the stored figure.
 */
export const headingOf = (rotation: number) => Math.round(wrap360(90 - rotation) * 1e9) / 1e9;
export const rotationOf = (heading: number) => Math.round(wrap360(90 - heading) * 1e9) / 1e9;

/** Position and turn of one object, bound to the document. */
export function objectFields(o: Pick<SceneObject, 'id' | 'kind'>, units: UnitSystem): BoundField[] {
  const get = (doc: SceneDocument) => doc.objects.find((q) => q.id === o.id);
  const site = lengthSpec(units, { min: -SITE_LIMIT, max: SITE_LIMIT, rangeWhy: 'a scene spans' });
  const fields: BoundField[] = [
    { key: 'x', label: 'East (x)', testId: 'field-x', spec: site, read: (d) => get(d)?.x ?? 0, write: (x) => updateObject(o.id, { x }) },
    { key: 'y', label: 'North (y)', testId: 'field-y', spec: site, read: (d) => get(d)?.y ?? 0, write: (y) => updateObject(o.id, { y }) },
  ];
  if (o.kind !== 'tape') {
    fields.push({
      key: 'heading',
      label: o.kind === 'truck' ? 'Heading of the cab (° from north, clockwise)' : 'Turned to (° from north, clockwise)',
      testId: 'field-rotation',
      spec: numberSpec({ unit: '°', min: 0, max: 360, normalise: wrap360 }),
      read: (d) => headingOf(get(d)?.rotation ?? 0),
      write: (h) => updateObject(o.id, { rotation: rotationOf(h) }),
    });
  }
  return fields;
}
