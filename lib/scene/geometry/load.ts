import type { LoadObject, LoadShape } from '../objects';
import { circlePolygon, placePolygon, rectPolygon, type Polygon } from './vec';

/** Plan outline of the load, local frame (x along the object's rotation), centred on its CG column. */
export function loadLocalOutline(shape: LoadShape): Polygon {
  if (shape.kind === 'coil') {
    // Eye vertical: the coil stands on its side face, a disc in plan. Eye horizontal: a width × OD oblong.
    return shape.eye === 'vertical' ? circlePolygon(shape.outerDiameter) : rectPolygon(shape.width, shape.outerDiameter);
  }
  return rectPolygon(shape.length, shape.width);
}

export function loadHeight(shape: LoadShape): number {
  if (shape.kind === 'coil') return shape.eye === 'vertical' ? shape.width : shape.outerDiameter;
  return shape.height;
}

/** Solid volume, m³: a coil is an annular cylinder; a box or vehicle its bounding box. */
export function loadVolume(shape: LoadShape): number {
  if (shape.kind === 'coil') return (Math.PI / 4) * (shape.outerDiameter ** 2 - shape.innerDiameter ** 2) * shape.width;
  return shape.length * shape.width * shape.height;
}

/** The mass the plan uses: given, or estimated as density × volume. */
export function loadMass(load: LoadObject): number {
  return load.massMode === 'estimate' ? load.density * loadVolume(load.shape) : load.massKg;
}

export const loadFootprints = (load: LoadObject): Polygon[] => [placePolygon(loadLocalOutline(load.shape), load)];
