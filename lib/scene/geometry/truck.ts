import type { TruckObject } from '../objects';
import { DEG, placePoint, placePolygon, type Polygon, type Pt } from './vec';
import { padCentre, padPolygon, type TruckModel } from '../truck/truck-model';

const pose = (t: TruckObject) => ({ x: t.x, y: t.y, rotation: t.rotation });

export const truckToSitePoint = (t: TruckObject, p: Pt) => placePoint(p, pose(t));

export function truckPartFootprints(t: TruckObject, m: TruckModel): { id: string; kind: string; polygon: Polygon; top: number }[] {
  return m.parts.map((p) => ({ ...p, polygon: placePolygon(p.polygon, pose(t)) }));
}

export function truckPads(t: TruckObject, m: TruckModel) {
  return m.legs.map((leg) => {
    const setup = t.legs[leg.id] ?? { extension: 0, cribbing: null };
    const cribSide = setup.cribbing ? Math.sqrt(setup.cribbing.area) : 0;
    return {
      leg,
      setup,
      mount: placePoint(leg.mount, pose(t)),
      centre: placePoint(padCentre(leg, setup.extension), pose(t)),
      pad: placePolygon(padPolygon(leg, setup.extension), pose(t)),
      cribbing: setup.cribbing ? placePolygon(padPolygon({ ...leg, pad: { length: cribSide, width: cribSide } }, setup.extension), pose(t)) : null,
    };
  });
}

/** Boom tip (hook) in the site frame at a slew angle. */
export function hookSitePoint(t: TruckObject, m: TruckModel, slew: number): Pt {
  const reach = t.boom.length * Math.cos(t.boom.elevation * DEG);
  const s = slew * DEG;
  const px = m.boom.pivot.x;
  const py = m.boom.pivot.y;
  const local = { x: Math.cos(s) * (px + reach) - Math.sin(s) * py, y: Math.sin(s) * (px + reach) + Math.cos(s) * py };
  return placePoint(local, pose(t));
}

export function pivotSitePoint(t: TruckObject, m: TruckModel, slew: number): Pt {
  const s = slew * DEG;
  const { x, y } = m.boom.pivot;
  return placePoint({ x: Math.cos(s) * x - Math.sin(s) * y, y: Math.sin(s) * x + Math.cos(s) * y }, pose(t));
}

/** Hook radius from the slew axis, m. */
export function hookRadius(t: TruckObject, m: TruckModel): number {
  const reach = t.boom.length * Math.cos(t.boom.elevation * DEG);
  return Math.hypot(m.boom.pivot.x + reach, m.boom.pivot.y);
}

export const truckFootprints = (t: TruckObject, m: TruckModel): Polygon[] => [
  ...truckPartFootprints(t, m).map((p) => p.polygon),
  ...truckPads(t, m).map((p) => p.pad),
];
