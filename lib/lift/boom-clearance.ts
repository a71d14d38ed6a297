import { pointInPolygon, pointPolygonDistance, pointSegmentDist2, segmentsIntersect } from './geometry';
import { slewAt, type PreparedLift, type Target } from './prepare';
import { lipschitzMin } from './search';
import { closest, segmentSegmentDistance } from './segment3d';

/**
 * The boom against obstacles and the truck's own parts, in 3D. The boom is a capsule: its axis runs from
 * the pivot to the tip, its radius is half its width (boom.width, from the truck profile; schema BOOM_WIDTH when
 * not given). A part is a right prism from the ground to its top. The gap is the distance from the axis to
 * the prism less the radius; 0 and `strikes` when they meet. Below the part's top the nearest point of the
 * prism is level with the boom, so the distance there is a plan distance; above it, the nearest point is
 * on the top face (its edges, or straight below an end of the boom).
 *
 * Not checked against the boom: the body part under the slew axis (the turret stands on it; the boom's
 * heel is fixed above it, not swung into it).
 */
export interface BoomClearance {
  target: string;
  /** What results call the part or obstacle (the input's name, else its id). */
  name: string;
  kind: 'body' | 'obstacle';
  /** Smallest gap between the boom's surface and the part over the swing, m (0 when they meet). */
  distance: number;
  slew: number;
  /** Where on the boom it comes nearest: metres from the pivot along the boom, and that point's height, m. */
  alongBoom: number;
  height: number;
  strikes: boolean;
}


/** Parameter along the boom (0 pivot, 1 tip) of the last nearest point found. */
let nearestU = 0;

/** Plan distance from segment a–b to a polygon's area; sets planT to the parameter of the nearest point on a–b. */
let planT = 0;
function planSegmentPolygon(ax: number, ay: number, bx: number, by: number, poly: Float64Array, n: number): number {
  if (pointInPolygon(ax, ay, poly, n)) {
    planT = 0;
    return 0;
  }
  let best = Infinity;
  const dx = bx - ax, dy = by - ay, len2 = dx * dx + dy * dy;
  for (let i = 0, j = n - 1; i < n; j = i++) {
    const cx = poly[2 * j], cy = poly[2 * j + 1], ex = poly[2 * i], ey = poly[2 * i + 1];
    if (segmentsIntersect(ax, ay, bx, by, cx, cy, ex, ey)) {
      // Where the boom's plan line crosses this edge (the first crossing is near enough for "where").
      const fx = ex - cx, fy = ey - cy, den = dx * fy - dy * fx;
      planT = den !== 0 ? Math.min(1, Math.max(0, ((cx - ax) * fy - (cy - ay) * fx) / den)) : 0;
      return 0;
    }
    const dv = pointSegmentDist2(cx, cy, ax, ay, bx, by);
    if (dv < best) {
      best = dv;
      planT = len2 > 0 ? Math.min(1, Math.max(0, ((cx - ax) * dx + (cy - ay) * dy) / len2)) : 0;
    }
  }
  // The two ends of a–b (no arrays: this runs thousands of times per analysis).
  const d0 = pointPolygonDistance(ax, ay, poly, n);
  if (d0 * d0 < best) {
    best = d0 * d0;
    planT = 0;
  }
  const d1 = pointPolygonDistance(bx, by, poly, n);
  if (d1 * d1 < best) {
    best = d1 * d1;
    planT = 1;
  }
  return Math.sqrt(best);
}

/** Distance from the boom's axis (pivot p, tip q) to a prism from the ground to `top`; sets nearestU. */
export function boomAxisToPrism(px: number, py: number, pz: number, qx: number, qy: number, qz: number, t: Target): number {
  const dz = qz - pz;
  // Parameters of the part of the axis at or below the top: [lo0, lo1]; the rest is above.
  let lo0 = 0, lo1 = 1;
  if (dz === 0) {
    if (pz > t.top) lo1 = -1;
  } else {
    const ut = (t.top - pz) / dz;
    if (dz > 0) lo1 = Math.min(1, ut);
    else lo0 = Math.max(0, ut);
  }
  let best = Infinity;
  if (lo1 >= lo0) {
    const ax = px + (qx - px) * lo0, ay = py + (qy - py) * lo0, bx = px + (qx - px) * lo1, by = py + (qy - py) * lo1;
    best = planSegmentPolygon(ax, ay, bx, by, t.poly, t.n);
    nearestU = lo0 + (lo1 - lo0) * planT;
    if (best === 0) return 0;
  }
  // Above the top: the two ends of the upper piece straight over the face, and the face's edges.
  let u0: number, u1: number;
  if (lo1 < lo0) {
    u0 = 0;
    u1 = 1;
  } else if (dz > 0) {
    u0 = Math.max(0, lo1);
    u1 = 1;
  } else {
    u0 = 0;
    u1 = Math.min(1, lo0);
  }
  if (u1 <= u0 && lo1 >= lo0) return best;
  const sx = px + (qx - px) * u0, sy = py + (qy - py) * u0, sz = pz + dz * u0;
  const ex = px + (qx - px) * u1, ey = py + (qy - py) * u1, ez = pz + dz * u1;
  const top = t.top, poly = t.poly, n = t.n;
  if (sz - top < best && pointInPolygon(sx, sy, poly, n)) {
    best = sz - top;
    nearestU = u0;
  }
  if (ez - top < best && pointInPolygon(ex, ey, poly, n)) {
    best = ez - top;
    nearestU = u1;
  }
  // An edge whose plan box lies farther from the upper piece's plan box than the best so far cannot be
  // nearer (the 3D distance is at least the plan distance); the margin covers rounding, so the minimum
  // found is the same as without the test.
  const x0 = sx < ex ? sx : ex, x1 = sx < ex ? ex : sx, y0 = sy < ey ? sy : ey, y1 = sy < ey ? ey : sy;
  for (let i = 0, j = n - 1; i < n; j = i++) {
    const cx = poly[2 * j], cy = poly[2 * j + 1], fx = poly[2 * i], fy = poly[2 * i + 1];
    if (best < Infinity) {
      const gx = Math.max(0, (cx < fx ? cx : fx) - x1, x0 - (cx < fx ? fx : cx));
      const gy = Math.max(0, (cy < fy ? cy : fy) - y1, y0 - (cy < fy ? fy : cy));
      if (gx * gx + gy * gy > best * best * (1 + 1e-9) + 1e-18) continue;
    }
    const d = segmentSegmentDistance(sx, sy, sz, ex, ey, ez, cx, cy, top, fx, fy, top);
    if (d < best) {
      best = d;
      nearestU = u0 + (u1 - u0) * closest.s;
    }
  }
  return best;
}

/**
 * Outside a polygon's box, pointInPolygon is false: a point above or below the box crosses no edge's span
 * in y, and one to the left or right of it (by more than the rounding of the crossing's x, hence the
 * margin) lies on the same side of every crossing, of which a closed outline has an even number.
 */
function outsideBox(x: number, y: number, t: Target): boolean {
  const m = 1e-9 * (1 + Math.abs(t.x0) + Math.abs(t.x1));
  return y > t.y1 || y < t.y0 || x > t.x1 + m || x < t.x0 - m;
}

/** Least squared distance from (x, y) to the polygon's edges: pointPolygonDistance's loop, for a point known to lie outside. */
function edgeDist2(x: number, y: number, poly: Float64Array, n: number): number {
  let best = Infinity;
  for (let i = 0, j = n - 1; i < n; j = i++) {
    const d = pointSegmentDist2(x, y, poly[2 * j], poly[2 * j + 1], poly[2 * i], poly[2 * i + 1]);
    if (d < best) best = d;
  }
  return best;
}

/**
 * planSegmentPolygon's distance, the same number, without its point-in-polygon tests where they are known
 * false: at the first end after planSegmentPolygon's own test of it, and at either end outside the box.
 */
function planSegmentGap(ax: number, ay: number, bx: number, by: number, t: Target): number {
  const poly = t.poly, n = t.n;
  if (!outsideBox(ax, ay, t) && pointInPolygon(ax, ay, poly, n)) return 0;
  let best = Infinity;
  for (let i = 0, j = n - 1; i < n; j = i++) {
    const cx = poly[2 * j], cy = poly[2 * j + 1], ex = poly[2 * i], ey = poly[2 * i + 1];
    if (segmentsIntersect(ax, ay, bx, by, cx, cy, ex, ey)) return 0;
    const dv = pointSegmentDist2(cx, cy, ax, ay, bx, by);
    if (dv < best) best = dv;
  }
  const d0 = Math.sqrt(edgeDist2(ax, ay, poly, n));
  if (d0 * d0 < best) best = d0 * d0;
  const d1 = outsideBox(bx, by, t) ? Math.sqrt(edgeDist2(bx, by, poly, n)) : pointPolygonDistance(bx, by, poly, n);
  if (d1 * d1 < best) best = d1 * d1;
  return Math.sqrt(best);
}

/**
 * boomAxisToPrism's distance, the same number bit for bit, for the clearance walks (which need only the
 * distance, not where on the boom it is). The candidates and their order are boomAxisToPrism's: the piece at
 * or below the top (planSegmentPolygon's distance, by planSegmentGap), each end of the piece above it straight
 * over the face, and each edge of the face, passed over by the same plan test. What it leaves out are the
 * point-in-polygon tests known to be false: an end outside the face's box (outsideBox) is not over the face.
 */
export function boomAxisGap(px: number, py: number, pz: number, qx: number, qy: number, qz: number, t: Target): number {
  const dz = qz - pz;
  let lo0 = 0, lo1 = 1;
  if (dz === 0) {
    if (pz > t.top) lo1 = -1;
  } else {
    const ut = (t.top - pz) / dz;
    if (dz > 0) lo1 = Math.min(1, ut);
    else lo0 = Math.max(0, ut);
  }
  let best = Infinity;
  if (lo1 >= lo0) {
    const ax = px + (qx - px) * lo0, ay = py + (qy - py) * lo0, bx = px + (qx - px) * lo1, by = py + (qy - py) * lo1;
    best = planSegmentGap(ax, ay, bx, by, t);
    if (best === 0) return 0;
  }
  let u0: number, u1: number;
  if (lo1 < lo0) {
    u0 = 0;
    u1 = 1;
  } else if (dz > 0) {
    u0 = Math.max(0, lo1);
    u1 = 1;
  } else {
    u0 = 0;
    u1 = Math.min(1, lo0);
  }
  if (u1 <= u0 && lo1 >= lo0) return best;
  const sx = px + (qx - px) * u0, sy = py + (qy - py) * u0, sz = pz + dz * u0;
  const ex = px + (qx - px) * u1, ey = py + (qy - py) * u1, ez = pz + dz * u1;
  const top = t.top, poly = t.poly, n = t.n;
  if (sz - top < best && !outsideBox(sx, sy, t) && pointInPolygon(sx, sy, poly, n)) best = sz - top;
  if (ez - top < best && !outsideBox(ex, ey, t) && pointInPolygon(ex, ey, poly, n)) best = ez - top;
  const x0 = sx < ex ? sx : ex, x1 = sx < ex ? ex : sx, y0 = sy < ey ? sy : ey, y1 = sy < ey ? ey : sy;
  for (let i = 0, j = n - 1; i < n; j = i++) {
    const cx = poly[2 * j], cy = poly[2 * j + 1], fx = poly[2 * i], fy = poly[2 * i + 1];
    if (best < Infinity) {
      const gx = Math.max(0, (cx < fx ? cx : fx) - x1, x0 - (cx < fx ? fx : cx));
      const gy = Math.max(0, (cy < fy ? cy : fy) - y1, y0 - (cy < fy ? fy : cy));
      if (gx * gx + gy * gy > best * best * (1 + 1e-9) + 1e-18) continue;
    }
    const d = segmentSegmentDistance(sx, sy, sz, ex, ey, ez, cx, cy, top, fx, fy, top);
    if (d < best) best = d;
  }
  return best;
}

/** Gap between the boom's surface and a part at slew `deg`, m (negative: they overlap). */
export function boomGapAt(p: PreparedLift, t: Target, deg: number): number {
  const a = (deg * Math.PI) / 180;
  return boomGapCS(p, t, Math.cos(a), Math.sin(a));
}

/** boomGapAt with the slew given as its cosine and sine. */
function boomGapCS(p: PreparedLift, t: Target, c: number, s: number): number {
  const px = c * p.pivotX0 - s * p.pivotY0, py = s * p.pivotX0 + c * p.pivotY0;
  const qx = c * p.hookX0 - s * p.hookY0, qy = s * p.hookX0 + c * p.hookY0;
  return boomAxisGap(px, py, p.pivotZ, qx, qy, p.tipZ, t) - p.boomRadius;
}

/** boomGapAt by boomAxisToPrism, which also leaves where on the boom it came nearest in nearestU. */
function boomGapWhere(p: PreparedLift, t: Target, deg: number): number {
  const a = (deg * Math.PI) / 180, c = Math.cos(a), s = Math.sin(a);
  const px = c * p.pivotX0 - s * p.pivotY0, py = s * p.pivotX0 + c * p.pivotY0;
  const qx = c * p.hookX0 - s * p.hookY0, qy = s * p.hookX0 + c * p.hookY0;
  return boomAxisToPrism(px, py, p.pivotZ, qx, qy, p.tipZ, t) - p.boomRadius;
}

/** A cheap lower bound on the gap: bounding circle in plan, and the boom's lowest point in height. */
function roughBoomGapCS(p: PreparedLift, t: Target, c: number, s: number): number {
  const px = c * p.pivotX0 - s * p.pivotY0, py = s * p.pivotX0 + c * p.pivotY0;
  const qx = c * p.hookX0 - s * p.hookY0, qy = s * p.hookX0 + c * p.hookY0;
  const plan = Math.sqrt(pointSegmentDist2(t.cx, t.cy, px, py, qx, qy)) - t.r;
  return Math.max(plan, Math.min(p.pivotZ, p.tipZ) - t.top) - p.boomRadius;
}

/** Body parts the boom is checked against: every one except the part under the slew axis. */
export const boomMeets = (t: Target) => t.kind === 'obstacle' || !pointInPolygon(0, 0, t.poly, t.n);

const WALK = { tolAbs: 0.002, tolRel: 0.002, minStep: 0.005, coarseStep: 15 };

export function boomClearanceOver(p: PreparedLift, t: Target): BoomClearance {
  // No point of the boom moves faster than the larger of the pivot's and the tip's radius, m per radian.
  const lipschitz = (Math.max(p.radius, Math.hypot(p.pivotX0, p.pivotY0)) * Math.PI) / 180;
  let best = Infinity;
  const gap = (u: number) => {
    // One cosine and sine per angle, shared by the bound and the exact gap.
    const a = (slewAt(p, u) * Math.PI) / 180, c = Math.cos(a), s = Math.sin(a);
    const rough = roughBoomGapCS(p, t, c, s);
    if (rough > best * (1 + WALK.tolRel) + 4 * WALK.tolAbs) return rough;
    const g = Math.max(0, boomGapCS(p, t, c, s));
    if (g < best) best = g;
    return g;
  };
  const r = lipschitzMin(gap, p.span, lipschitz, WALK);
  return boomClearanceAt(p, t, slewAt(p, r.t));
}

export function boomClearanceAt(p: PreparedLift, t: Target, slew: number): BoomClearance {
  const g = boomGapWhere(p, t, slew);
  const along = nearestU * p.input.boom.length;
  const height = p.pivotZ + (p.tipZ - p.pivotZ) * nearestU;
  return { target: t.id, name: t.name, kind: t.kind, distance: Math.max(0, g), slew, alongBoom: along, height, strikes: g <= 0 };
}
