/**
 * Plain-number 2D geometry on flat coordinate arrays ([x0, y0, x1, y1, ...]). These run in the swing
 * sweep thousands of times per analysis, so they take numbers and typed arrays and allocate nothing.
 */
export type Flat = Float64Array | number[];

export function toFlat(points: readonly { x: number; y: number }[]): Float64Array {
  const out = new Float64Array(points.length * 2);
  points.forEach((p, i) => {
    out[2 * i] = p.x;
    out[2 * i + 1] = p.y;
  });
  return out;
}

/** Twice the signed area (positive when counter-clockwise), shoelace formula. */
export function signedArea2(poly: Flat, n: number): number {
  let a = 0;
  for (let i = 0, j = n - 1; i < n; j = i++) a += poly[2 * j] * poly[2 * i + 1] - poly[2 * i] * poly[2 * j + 1];
  return a;
}

/** Squared distance from (px, py) to the segment a–b. */
export function pointSegmentDist2(px: number, py: number, ax: number, ay: number, bx: number, by: number): number {
  const dx = bx - ax;
  const dy = by - ay;
  const len2 = dx * dx + dy * dy;
  let t = len2 > 0 ? ((px - ax) * dx + (py - ay) * dy) / len2 : 0;
  t = t < 0 ? 0 : t > 1 ? 1 : t;
  const ex = ax + t * dx - px;
  const ey = ay + t * dy - py;
  return ex * ex + ey * ey;
}

/** Even-odd ray casting; points on the boundary may fall either way (distance is then ~0 anyway). */
export function pointInPolygon(px: number, py: number, poly: Flat, n: number): boolean {
  let inside = false;
  for (let i = 0, j = n - 1; i < n; j = i++) {
    const xi = poly[2 * i];
    const yi = poly[2 * i + 1];
    const xj = poly[2 * j];
    const yj = poly[2 * j + 1];
    if (yi > py !== yj > py && px < ((xj - xi) * (py - yi)) / (yj - yi) + xi) inside = !inside;
  }
  return inside;
}

function orient(ax: number, ay: number, bx: number, by: number, cx: number, cy: number): number {
  return (bx - ax) * (cy - ay) - (by - ay) * (cx - ax);
}

/** Proper or touching intersection of segments p1–p2 and q1–q2. */
export function segmentsIntersect(
  p1x: number, p1y: number, p2x: number, p2y: number,
  q1x: number, q1y: number, q2x: number, q2y: number,
): boolean {
  const d1 = orient(q1x, q1y, q2x, q2y, p1x, p1y);
  const d2 = orient(q1x, q1y, q2x, q2y, p2x, p2y);
  const d3 = orient(p1x, p1y, p2x, p2y, q1x, q1y);
  const d4 = orient(p1x, p1y, p2x, p2y, q2x, q2y);
  return ((d1 > 0 && d2 < 0) || (d1 < 0 && d2 > 0) || d1 === 0 || d2 === 0) &&
    ((d3 > 0 && d4 < 0) || (d3 < 0 && d4 > 0) || d3 === 0 || d4 === 0) &&
    !(d1 === 0 && d2 === 0 && d3 === 0 && d4 === 0 && !collinearOverlap(p1x, p1y, p2x, p2y, q1x, q1y, q2x, q2y));
}

function collinearOverlap(p1x: number, p1y: number, p2x: number, p2y: number, q1x: number, q1y: number, q2x: number, q2y: number): boolean {
  const useX = Math.abs(p2x - p1x) >= Math.abs(p2y - p1y);
  const [a0, a1] = useX ? [Math.min(p1x, p2x), Math.max(p1x, p2x)] : [Math.min(p1y, p2y), Math.max(p1y, p2y)];
  const [b0, b1] = useX ? [Math.min(q1x, q2x), Math.max(q1x, q2x)] : [Math.min(q1y, q2y), Math.max(q1y, q2y)];
  return a0 <= b1 && b0 <= a1;
}

/** Distance from a point to a polygon's area: 0 inside, else to the nearest edge. */
export function pointPolygonDistance(px: number, py: number, poly: Flat, n: number): number {
  if (pointInPolygon(px, py, poly, n)) return 0;
  let best = Infinity;
  for (let i = 0, j = n - 1; i < n; j = i++) {
    const d = pointSegmentDist2(px, py, poly[2 * j], poly[2 * j + 1], poly[2 * i], poly[2 * i + 1]);
    if (d < best) best = d;
  }
  return Math.sqrt(best);
}

/**
 * Gap between two polygons' areas: 0 when they overlap or touch, else the smallest vertex-to-edge
 * distance either way (exact for simple polygons that do not intersect).
 */
export function polygonGap(a: Flat, na: number, b: Flat, nb: number): number {
  let best = Infinity;
  for (let i = 0, j = na - 1; i < na; j = i++) {
    const ax = a[2 * j], ay = a[2 * j + 1], bx = a[2 * i], by = a[2 * i + 1];
    for (let k = 0, l = nb - 1; k < nb; l = k++) {
      const cx = b[2 * l], cy = b[2 * l + 1], dx = b[2 * k], dy = b[2 * k + 1];
      if (segmentsIntersect(ax, ay, bx, by, cx, cy, dx, dy)) return 0;
      const d1 = pointSegmentDist2(bx, by, cx, cy, dx, dy);
      const d2 = pointSegmentDist2(dx, dy, ax, ay, bx, by);
      if (d1 < best) best = d1;
      if (d2 < best) best = d2;
    }
  }
  if (pointInPolygon(a[0], a[1], b, nb) || pointInPolygon(b[0], b[1], a, na)) return 0;
  return Math.sqrt(best);
}

/** Smallest and largest distance of a polygon's area from the origin (the slew axis). */
export function radialRange(poly: Flat, n: number): [number, number] {
  let max = 0;
  for (let i = 0; i < n; i++) max = Math.max(max, Math.hypot(poly[2 * i], poly[2 * i + 1]));
  return [pointPolygonDistance(0, 0, poly, n), max];
}
