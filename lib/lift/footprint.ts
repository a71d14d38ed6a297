import { convexHull } from './support-polygon';
import type { Footprint } from './schema';

/**
 * The load's plan outline in the boom frame: centred on the hook, local x along the boom. It turns with
 * the slew, so at slew θ a local point (u, v) sits at hook + R(θ)·(u, v).
 */
export interface FootprintLocal {
  kind: 'polygon' | 'circle';
  /** Polygon outline (flat), or empty for a circle. */
  local: Float64Array;
  n: number;
  /** Convex hull of the outline (flat), used for 3D distances; the circle keeps its radius. */
  hull: Float64Array;
  hullN: number;
  radius: number;
  /** Largest distance of any outline point from the hook, m. */
  reach: number;
}

export function footprintLocal(fp: Footprint): FootprintLocal {
  if (fp.kind === 'circle') {
    const r = fp.diameter / 2;
    return { kind: 'circle', local: new Float64Array(0), n: 0, hull: new Float64Array(0), hullN: 0, radius: r, reach: r };
  }
  const pts =
    fp.kind === 'rect'
      ? [
          { x: -fp.length / 2, y: -fp.width / 2 },
          { x: fp.length / 2, y: -fp.width / 2 },
          { x: fp.length / 2, y: fp.width / 2 },
          { x: -fp.length / 2, y: fp.width / 2 },
        ]
      : fp.points;
  const local = new Float64Array(pts.length * 2);
  let reach = 0;
  pts.forEach((p, i) => {
    local[2 * i] = p.x;
    local[2 * i + 1] = p.y;
    reach = Math.max(reach, Math.hypot(p.x, p.y));
  });
  const h = convexHull(pts.map((p, i) => ({ id: String(i), x: p.x, y: p.y })));
  const hull = new Float64Array(h.length * 2);
  h.forEach((p, i) => {
    hull[2 * i] = p.x;
    hull[2 * i + 1] = p.y;
  });
  return { kind: 'polygon', local, n: pts.length, hull, hullN: h.length, radius: 0, reach };
}

/** Writes the outline at slew (cos c, sin s) with the hook at (hx, hy) into out (length ≥ 2n). */
export function placeOutline(src: Float64Array, n: number, c: number, s: number, hx: number, hy: number, out: Float64Array): void {
  for (let i = 0; i < n; i++) {
    const u = src[2 * i];
    const v = src[2 * i + 1];
    out[2 * i] = hx + c * u - s * v;
    out[2 * i + 1] = hy + s * u + c * v;
  }
}
