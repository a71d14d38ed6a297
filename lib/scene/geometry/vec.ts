import type { Point } from '../primitives';

/** Small plane-geometry helpers for the editor (site frame, metres, degrees CCW). */
export type Pt = Point;
export type Polygon = Pt[];

export const DEG = Math.PI / 180;

export function rotate(p: Pt, deg: number): Pt {
  const c = Math.cos(deg * DEG);
  const s = Math.sin(deg * DEG);
  return { x: c * p.x - s * p.y, y: s * p.x + c * p.y };
}

/** Local point (unrotated, relative to origin) → site point for an object at (x, y) turned by rotation. */
export function placePoint(local: Pt, at: { x: number; y: number; rotation: number }): Pt {
  const r = rotate(local, at.rotation);
  return { x: at.x + r.x, y: at.y + r.y };
}

export const placePolygon = (poly: Polygon, at: { x: number; y: number; rotation: number }) => poly.map((p) => placePoint(p, at));

export function rectPolygon(length: number, width: number): Polygon {
  const l = length / 2;
  const w = width / 2;
  return [
    { x: -l, y: -w },
    { x: l, y: -w },
    { x: l, y: w },
    { x: -l, y: w },
  ];
}

/** Regular polygon approximating a circle; 24 sides keeps the area within 1.2 % of the circle's. */
export function circlePolygon(diameter: number, sides = 24): Polygon {
  const r = diameter / 2;
  return Array.from({ length: sides }, (_, i) => ({ x: r * Math.cos((2 * Math.PI * i) / sides), y: r * Math.sin((2 * Math.PI * i) / sides) }));
}

/** Ray-casting point-in-polygon test. */
export function pointInPolygon(p: Pt, poly: Polygon): boolean {
  let inside = false;
  for (let i = 0, j = poly.length - 1; i < poly.length; j = i++) {
    const a = poly[i];
    const b = poly[j];
    if (a.y > p.y !== b.y > p.y && p.x < ((b.x - a.x) * (p.y - a.y)) / (b.y - a.y) + a.x) inside = !inside;
  }
  return inside;
}

export function distanceToSegment(p: Pt, a: Pt, b: Pt): number {
  const dx = b.x - a.x;
  const dy = b.y - a.y;
  const len2 = dx * dx + dy * dy;
  const t = len2 === 0 ? 0 : Math.max(0, Math.min(1, ((p.x - a.x) * dx + (p.y - a.y) * dy) / len2));
  return Math.hypot(p.x - (a.x + t * dx), p.y - (a.y + t * dy));
}

export function distanceToPolygonEdge(p: Pt, poly: Polygon): number {
  let d = Infinity;
  for (let i = 0; i < poly.length; i++) d = Math.min(d, distanceToSegment(p, poly[i], poly[(i + 1) % poly.length]));
  return d;
}

export interface Bounds {
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
}

export function boundsOf(points: readonly Pt[]): Bounds | null {
  if (points.length === 0) return null;
  let minX = Infinity, minY = Infinity, maxX = -Infinity, maxY = -Infinity;
  for (const p of points) {
    if (p.x < minX) minX = p.x;
    if (p.y < minY) minY = p.y;
    if (p.x > maxX) maxX = p.x;
    if (p.y > maxY) maxY = p.y;
  }
  return { minX, minY, maxX, maxY };
}

export const boundsIntersect = (a: Bounds, b: Bounds) => a.minX <= b.maxX && b.minX <= a.maxX && a.minY <= b.maxY && b.minY <= a.maxY;

export const bearing = (from: Pt, to: Pt) => Math.atan2(to.y - from.y, to.x - from.x) / DEG;
