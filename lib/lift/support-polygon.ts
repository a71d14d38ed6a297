import { LiftError } from './errors';
import { padName } from './names';

/**
 * The support polygon is the convex hull of the pads (and any tyres left on the ground); its edges are
 * the tipping lines. Each line keeps an outward unit normal (nx, ny) and offset c = n·a, so that the
 * signed distance of a point outside the line is n·p − c (negative inside).
 */
export interface SupportPoint {
  id: string;
  x: number;
  y: number;
}

export interface TippingLineGeom {
  id: string;
  from: string;
  to: string;
  ax: number;
  ay: number;
  bx: number;
  by: number;
  nx: number;
  ny: number;
  c: number;
  /** Perpendicular distance from the slew axis to the line, positive when the axis is inside. */
  distanceFromAxis: number;
}

const cross = (o: SupportPoint, a: SupportPoint, b: SupportPoint) => (a.x - o.x) * (b.y - o.y) - (a.y - o.y) * (b.x - o.x);

/** Andrew's monotone chain; counter-clockwise, collinear and repeated points dropped. */
export function convexHull(points: readonly SupportPoint[]): SupportPoint[] {
  const p = [...points].sort((a, b) => a.x - b.x || a.y - b.y);
  if (p.length < 3) return p;
  const lower: SupportPoint[] = [];
  for (const q of p) {
    while (lower.length >= 2 && cross(lower[lower.length - 2], lower[lower.length - 1], q) <= 0) lower.pop();
    lower.push(q);
  }
  const upper: SupportPoint[] = [];
  for (let i = p.length - 1; i >= 0; i--) {
    const q = p[i];
    while (upper.length >= 2 && cross(upper[upper.length - 2], upper[upper.length - 1], q) <= 0) upper.pop();
    upper.push(q);
  }
  return lower.slice(0, -1).concat(upper.slice(0, -1));
}

/** Two supports nearer than this (m) stand on the same spot: no pad is that small, and the reactions would be ill-posed. */
export const MIN_SUPPORT_SPACING = 0.01;

/** Hull of the supports and its tipping lines; typed errors for too few, coincident or collinear supports. */
export function supportPolygon(supports: readonly SupportPoint[]): { hull: SupportPoint[]; lines: TippingLineGeom[] } {
  if (supports.length < 3) {
    throw new LiftError(
      'too-few-supports',
      `A support polygon needs at least three supports; the plan has ${supports.length}.`,
      'supports',
    );
  }
  for (let i = 0; i < supports.length; i++) {
    for (let j = i + 1; j < supports.length; j++) {
      const d = Math.hypot(supports[i].x - supports[j].x, supports[i].y - supports[j].y);
      if (d < MIN_SUPPORT_SPACING) {
        // Pads by name, never by id: this sentence reaches the editor's results panel as it is.
        const a = padName(supports[i].id, supports[i].x, supports[i].y);
        const b = padName(supports[j].id, supports[j].x, supports[j].y);
        throw new LiftError('coincident-supports', `The ${a} and ${b} pads stand at the same spot (within a hair's breadth); each pad needs its own place.`, `supports.${j}`);
      }
    }
  }
  const hull = convexHull(supports);
  let extent = 0;
  for (const s of supports) extent = Math.max(extent, Math.abs(s.x), Math.abs(s.y));
  let area2 = 0;
  for (let i = 0; i < hull.length; i++) {
    const a = hull[i];
    const b = hull[(i + 1) % hull.length];
    area2 += a.x * b.y - b.x * a.y;
  }
  // A sliver thinner than a millimetre over the truck's extent is treated as a line.
  if (hull.length < 3 || area2 <= 1e-3 * Math.max(extent, 1)) {
    throw new LiftError('collinear-supports', 'The supports lie on one line, so they enclose no area to stand on.', 'supports');
  }
  const lines = hull.map((a, i) => {
    const b = hull[(i + 1) % hull.length];
    const len = Math.hypot(b.x - a.x, b.y - a.y);
    const nx = (b.y - a.y) / len;
    const ny = -(b.x - a.x) / len;
    const c = nx * a.x + ny * a.y;
    return { id: `${a.id}-${b.id}`, from: a.id, to: b.id, ax: a.x, ay: a.y, bx: b.x, by: b.y, nx, ny, c, distanceFromAxis: c };
  });
  return { hull, lines };
}

/** Signed distance of a point inside a tipping line (positive inside, as for the axis). */
export const insideDistance = (line: TippingLineGeom, x: number, y: number) => line.c - (line.nx * x + line.ny * y);
