/**
 * The part of the site a comment may be pinned to: the box around every object's position (and a tape's
 * second end), grown by EXTENT_MARGIN on each side, or a box of that half-size around the origin for an
 * empty sketch. The margin leaves room to pin a note beside the plan ("stage the second truck here").
 */
export const EXTENT_MARGIN = 50;

export interface Extent {
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
}

type Obj = { id?: unknown; x?: unknown; y?: unknown; x2?: unknown; y2?: unknown };
const num = (v: unknown): v is number => typeof v === 'number' && Number.isFinite(v);

function objectsOf(document: unknown): Obj[] {
  const objects = document && typeof document === 'object' ? (document as { objects?: unknown }).objects : undefined;
  return Array.isArray(objects) ? (objects.filter((o) => o && typeof o === 'object') as Obj[]) : [];
}

export function sceneExtent(document: unknown): Extent {
  const xs: number[] = [0];
  const ys: number[] = [0];
  for (const o of objectsOf(document)) {
    if (num(o.x) && num(o.y)) {
      xs.push(o.x);
      ys.push(o.y);
    }
    if (num(o.x2) && num(o.y2)) {
      xs.push(o.x2);
      ys.push(o.y2);
    }
  }
  return { minX: Math.min(...xs) - EXTENT_MARGIN, minY: Math.min(...ys) - EXTENT_MARGIN, maxX: Math.max(...xs) + EXTENT_MARGIN, maxY: Math.max(...ys) + EXTENT_MARGIN };
}

export const insideExtent = (e: Extent, p: { x: number; y: number }) => p.x >= e.minX && p.x <= e.maxX && p.y >= e.minY && p.y <= e.maxY;

export const objectIds = (document: unknown): Set<string> => new Set(objectsOf(document).flatMap((o) => (typeof o.id === 'string' ? [o.id] : [])));
