import { wrap360 } from '@/lib/angles';
import type { SceneDocument } from './schema';
import type { TruckObject } from './objects';
import { DEG, bearing, type Pt } from './geometry/vec';
import type { TruckModel } from './truck/truck-model';

/** Slew angle (truck frame) that points the boom at a site point. */
export function slewToward(truck: Pick<TruckObject, 'x' | 'y' | 'rotation'>, p: Pt): number {
  return Math.round(wrap360(bearing(truck, p) - truck.rotation) * 10) / 10;
}

/**
 * Boom length and elevation that hang the hook `radius` metres from the slew axis, within the profile's
 * ranges: the current length when it reaches, otherwise the shortest that does at the lowest useful
 * elevation. Rounded as the editor shows them (1 cm, 0.1°).
 */
export function boomFor(model: TruckModel, currentLength: number, radius: number): { length: number; elevation: number } {
  const reach = Math.max(0.5, radius - model.boom.pivot.x);
  const { minLength, maxLength, minElevation, maxElevation } = model.boom;
  let length = currentLength;
  if (reach > length * Math.cos(Math.max(minElevation, 0) * DEG)) length = Math.min(maxLength, reach);
  if (length < minLength) length = minLength;
  const elevation = Math.min(maxElevation, Math.max(minElevation, Math.acos(Math.min(1, reach / length)) / DEG));
  return { length: Math.round(length * 100) / 100, elevation: Math.round(elevation * 10) / 10 };
}

/**
 * Points the boom at a site point and sets length and elevation so the hook hangs over it, within the
 * profile's ranges. Used when the load is placed or moved, and for the pick end of the swing.
 */
export function aimBoom(doc: SceneDocument, model: TruckModel, p: Pt, end: 'from' | 'to' | null): SceneDocument {
  const truck = doc.objects.find((o): o is TruckObject => o.kind === 'truck');
  if (!truck) return doc;
  const slew = slewToward(truck, p);
  const nextTruck: TruckObject = { ...truck, boom: { slew, ...boomFor(model, truck.boom.length, Math.hypot(p.x - truck.x, p.y - truck.y)) } };
  return {
    ...doc,
    objects: doc.objects.map((o) => (o.id === truck.id ? nextTruck : o)),
    swing: end ? { ...doc.swing, [end]: slew } : doc.swing,
  };
}
