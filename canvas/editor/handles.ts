import type { SceneObject, TruckObject } from '@/lib/scene/objects';
import { placePoint, type Pt } from '@/lib/scene/geometry/vec';
import type { GeometryContext } from '@/lib/scene/geometry/footprints';
import { objectBounds } from '@/lib/scene/geometry/footprints';
import { hookSitePoint, truckPads } from '@/lib/scene/geometry/truck';
import type { TruckModel } from '@/lib/scene/truck/truck-model';

/** Grab points drawn over the selection; hit-tested before the objects themselves. */
export type Handle =
  | { kind: 'boom-tip'; at: Pt }
  | { kind: 'pad'; legId: string; at: Pt }
  | { kind: 'rotate'; objectId: string; at: Pt }
  | { kind: 'tape-end'; objectId: string; end: 'a' | 'b'; at: Pt };

/** Handle radius on screen, px: large enough for a gloved finger (44 px target). */
export const HANDLE_RADIUS_PX = 12;
export const HANDLE_HIT_PX = 22;
/** Smallest size an obstacle is drawn at on screen, px: a pole must not shrink to a dot you cannot find or press. */
export const MIN_DRAWN_PX = 18;

export function rotateHandlePoint(o: SceneObject, ctx: GeometryContext): Pt | null {
  if (o.kind === 'tape') return null;
  const b = objectBounds(o, ctx);
  if (!b) return null;
  const half = Math.max(Math.hypot(b.maxX - b.minX, b.maxY - b.minY) / 2, 0.5);
  // In front of the object along its own x axis (for the truck: ahead of the cab).
  return placePoint({ x: half + 36 / ctx.pxPerM, y: 0 }, o);
}

export function handlesFor(objects: readonly SceneObject[], selection: readonly string[], ctx: GeometryContext, readOnly: boolean): Handle[] {
  const out: Handle[] = [];
  const truck = objects.find((o): o is TruckObject => o.kind === 'truck');
  if (truck && ctx.truck) out.push({ kind: 'boom-tip', at: hookSitePoint(truck, ctx.truck, truck.boom.slew) });
  if (readOnly) return out;
  const sel = objects.filter((o) => selection.includes(o.id) && !o.locked);
  if (truck && ctx.truck && sel.some((o) => o.id === truck.id)) {
    for (const p of truckPads(truck, ctx.truck as TruckModel)) out.push({ kind: 'pad', legId: p.leg.id, at: p.centre });
  }
  if (sel.length === 1) {
    const o = sel[0];
    if (o.kind === 'tape') {
      out.push({ kind: 'tape-end', objectId: o.id, end: 'a', at: { x: o.x, y: o.y } });
      out.push({ kind: 'tape-end', objectId: o.id, end: 'b', at: { x: o.x2, y: o.y2 } });
    } else {
      const at = rotateHandlePoint(o, ctx);
      if (at) out.push({ kind: 'rotate', objectId: o.id, at });
    }
  }
  return out;
}

export function handleAt(handles: readonly Handle[], p: Pt, pxPerM: number): Handle | null {
  let best: Handle | null = null;
  let bestD = HANDLE_HIT_PX / pxPerM;
  for (const h of handles) {
    const d = Math.hypot(h.at.x - p.x, h.at.y - p.y);
    if (d <= bestD) {
      best = h;
      bestD = d;
    }
  }
  return best;
}
