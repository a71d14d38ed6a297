import { polygonGap, toFlat } from '@/lib/lift/geometry';
import { obstacleFootprints } from '@/lib/scene/geometry/obstacle';
import { loadFootprints } from '@/lib/scene/geometry/load';
import { trailerFootprints } from '@/lib/scene/geometry/trailer';
import { boundsOf, pointInPolygon, type Bounds, type Polygon, type Pt } from '@/lib/scene/geometry/vec';
import { padPolygon, type TruckLegModel, type TruckModel } from '@/lib/scene/truck/truck-model';
import type { SceneDocument } from '@/lib/scene/schema';

/**
 * Where the truck may stand: its body outline and every pad inside the usable area (when one is marked)
 * and clear of every obstacle, trailer and the load on the ground. Power lines are overhead: the engine
 * checks them, they do not stop the truck standing under them.
 */
interface Blocker {
  flat: Float64Array;
  n: number;
  box: Bounds;
}

export interface Ground {
  area: { flat: Float64Array; poly: Polygon } | null;
  blockers: Blocker[];
}

const blocker = (poly: Polygon): Blocker => ({ flat: toFlat(poly), n: poly.length, box: boundsOf(poly)! });

export function groundOf(doc: SceneDocument, usableArea: Pt[] | null): Ground {
  const polys: Polygon[] = [];
  for (const o of doc.objects) {
    if (o.kind === 'obstacle' && o.shape.kind !== 'line') polys.push(...obstacleFootprints(o));
    if (o.kind === 'trailer') polys.push(...trailerFootprints(o));
    if (o.kind === 'load') polys.push(...loadFootprints(o));
  }
  return { area: usableArea && usableArea.length >= 3 ? { flat: toFlat(usableArea), poly: usableArea } : null, blockers: polys.map(blocker) };
}

/** Truck-frame polygon → site frame at a pose. */
function place(poly: Polygon, x: number, y: number, c: number, s: number): Polygon {
  return poly.map((p) => ({ x: x + c * p.x - s * p.y, y: y + s * p.x + c * p.y }));
}

function clear(g: Ground, poly: Polygon): boolean {
  if (g.area) {
    for (const p of poly) if (!pointInPolygon(p, g.area.poly)) return false;
    // A notch of the area reaching into the outline.
    for (const q of g.area.poly) if (pointInPolygon(q, poly)) return false;
  }
  const box = boundsOf(poly)!;
  const flat = toFlat(poly);
  for (const b of g.blockers) {
    if (b.box.minX > box.maxX || b.box.maxX < box.minX || b.box.minY > box.maxY || b.box.maxY < box.minY) continue;
    if (polygonGap(flat, poly.length, b.flat, b.n) <= 0) return false;
  }
  return true;
}

const DEG = Math.PI / 180;

/**
 * True when the truck's body outline stands clear at this pose, with the pads of the legs the plan does
 * not set down where they ride, retracted.
 */
export function bodyClear(g: Ground, model: TruckModel, x: number, y: number, heading: number, inUse: readonly TruckLegModel[]): boolean {
  const c = Math.cos(heading * DEG), s = Math.sin(heading * DEG);
  return (
    model.parts.every((part) => clear(g, place(part.polygon, x, y, c, s))) &&
    model.legs.every((leg) => inUse.includes(leg) || clear(g, place(padPolygon(leg, 0), x, y, c, s)))
  );
}

/** True when this leg's pad, `extension` metres out, stands clear at this pose. */
export function padClear(g: Ground, leg: TruckLegModel, extension: number, x: number, y: number, heading: number): boolean {
  const c = Math.cos(heading * DEG), s = Math.sin(heading * DEG);
  return clear(g, place(padPolygon(leg, extension), x, y, c, s));
}
