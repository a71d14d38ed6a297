import type { SceneObject } from '../objects';
import { boundsOf, distanceToPolygonEdge, pointInPolygon, type Bounds, type Polygon, type Pt } from './vec';
import type { TruckModel } from '../truck/truck-model';
import { loadFootprints } from './load';
import { noteFootprints } from './note';
import { obstacleFootprints } from './obstacle';
import { tapeFootprints } from './tape';
import { trailerFootprints } from './trailer';
import { truckFootprints } from './truck';

/** What footprint geometry depends on besides the object: the truck profile and the screen scale. */
export interface GeometryContext {
  truck: TruckModel | null;
  pxPerM: number;
}

/** Footprint polygons of any object, site frame. Used for hit-testing, bounds and the engine input. */
export function footprintsOf(o: SceneObject, ctx: GeometryContext): Polygon[] {
  switch (o.kind) {
    case 'truck':
      return ctx.truck ? truckFootprints(o, ctx.truck) : [];
    case 'load':
      return loadFootprints(o);
    case 'trailer':
      return trailerFootprints(o);
    case 'obstacle':
      return obstacleFootprints(o);
    case 'note':
      return noteFootprints(o, ctx.pxPerM);
    case 'tape':
      return tapeFootprints(o, 6 / ctx.pxPerM);
  }
}

export function objectBounds(o: SceneObject, ctx: GeometryContext): Bounds | null {
  return boundsOf(footprintsOf(o, ctx).flat());
}

/** True when p is inside a footprint or within `tolerance` metres of its edge. */
export function hitsObject(o: SceneObject, p: Pt, ctx: GeometryContext, tolerance: number): boolean {
  return footprintsOf(o, ctx).some((poly) => pointInPolygon(p, poly) || distanceToPolygonEdge(p, poly) <= tolerance);
}

/** Top-most object under p (later objects are drawn on top). */
export function objectAt(objects: readonly SceneObject[], p: Pt, ctx: GeometryContext, tolerance: number): SceneObject | null {
  for (let i = objects.length - 1; i >= 0; i--) if (hitsObject(objects[i], p, ctx, tolerance)) return objects[i];
  return null;
}
