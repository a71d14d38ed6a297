import type { Pt, Polygon } from '../geometry/vec';
import type { TruckSpec } from '@/lib/equipment/truck-spec';
import { DEG } from '../geometry/vec';

/**
 * What the editor needs to know about a truck profile to draw it and place its pads: plan outline parts,
 * outrigger legs and the boom's ranges, all in the truck frame (origin at the slew axis, x to the cab,
 * y left, m). Read from the equipment library's spec (lib/equipment) by ./from-spec.
 */
export interface TruckLegModel {
  id: string;
  mount: Pt;
  /** Direction the leg runs out, degrees CCW from truck +x. */
  direction: number;
  /** Distances from the mount to the pad centre at each stage, m. */
  retracted: number;
  intermediate: number | null;
  full: number;
  pad: { length: number; width: number };
  /** Largest load a pad is rated for, kg (null when the profile gives none). */
  padRatingKg: number | null;
}

export interface TruckPartModel {
  id: string;
  kind: string;
  polygon: Polygon;
  top: number;
}

export interface TruckModel {
  profileId: number;
  profileVersion: number;
  name: string;
  unitNumber: string | null;
  parts: TruckPartModel[];
  legs: TruckLegModel[];
  boom: { pivot: { x: number; y: number; z: number }; minLength: number; maxLength: number; minElevation: number; maxElevation: number };
  /** True when the profile carried no usable geometry and the outline is the built-in example. */
  exampleOutline: boolean;
  /** The validated spec, for the engine adapter; null for the example outline (no analysis). */
  spec: TruckSpec | null;
}

/** Pad centre for a leg set `extension` metres out from retracted (truck frame). */
export function padCentre(leg: TruckLegModel, extension: number): Pt {
  const reach = leg.retracted + Math.max(0, Math.min(extension, leg.full - leg.retracted));
  return { x: leg.mount.x + reach * Math.cos(leg.direction * DEG), y: leg.mount.y + reach * Math.sin(leg.direction * DEG) };
}

export const maxExtension = (leg: TruckLegModel) => leg.full - leg.retracted;

/** Pad outline (truck frame), long side along the leg. */
export function padPolygon(leg: TruckLegModel, extension: number, scale = 1): Polygon {
  const c = padCentre(leg, extension);
  const l = (leg.pad.length * scale) / 2;
  const w = (leg.pad.width * scale) / 2;
  const cos = Math.cos(leg.direction * DEG);
  const sin = Math.sin(leg.direction * DEG);
  return [
    [-l, -w],
    [l, -w],
    [l, w],
    [-l, w],
  ].map(([u, v]) => ({ x: c.x + cos * u - sin * v, y: c.y + sin * u + cos * v }));
}
