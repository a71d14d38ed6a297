import { placeOutline } from './footprint';
import { pointPolygonDistance, polygonGap } from './geometry';
import { slewAt, type PreparedLift, type Target } from './prepare';
import { lipschitzMin } from './search';

/**
 * Clearance between the load and the truck's own parts and obstacles as the load turns with the boom.
 * Horizontal: the smallest plan gap over the swing (0 where the outlines overlap). Vertical: the load's
 * bottom (tip height − hang) minus the part's top, which matters where they overlap in plan. A conflict
 * is an overlap in plan with a negative vertical clearance.
 */
export interface Clearance {
  target: string;
  /** What results call the part or obstacle (the input's name, else its id). */
  name: string;
  kind: 'body' | 'obstacle';
  /** Smallest plan gap over the swing, m (0 when the outlines overlap in plan). */
  horizontal: number;
  /** Load bottom minus the part's top, m. */
  vertical: number;
  /** Slew of the smallest gap (the first slew of overlap when they overlap). */
  slew: number;
  overlapsInPlan: boolean;
  conflict: boolean;
}

/** Reused outline buffer: the gap function runs thousands of times per analysis. */
let buf = new Float64Array(64);

/** Plan gap between the load outline at slew `deg` and one target. */
export function gapAt(p: PreparedLift, target: Target, deg: number): number {
  const a = (deg * Math.PI) / 180;
  return gapCS(p, target, Math.cos(a), Math.sin(a));
}

/** gapAt with the slew given as its cosine and sine. */
function gapCS(p: PreparedLift, target: Target, c: number, s: number): number {
  const hx = c * p.hookX0 - s * p.hookY0;
  const hy = s * p.hookX0 + c * p.hookY0;
  const fp = p.footprint;
  if (fp.kind === 'circle') return Math.max(0, pointPolygonDistance(hx, hy, target.poly, target.n) - fp.radius);
  if (buf.length < 2 * fp.n) buf = new Float64Array(2 * fp.n);
  placeOutline(fp.local, fp.n, c, s, hx, hy, buf);
  return polygonGap(buf, fp.n, target.poly, target.n);
}

/**
 * A lower bound on the gap from bounding circles: cheap, and as Lipschitz as the gap itself, so the
 * walk can stride on it while it is well above the best gap found.
 */
function roughGapCS(p: PreparedLift, target: Target, c: number, s: number): number {
  const hx = c * p.hookX0 - s * p.hookY0;
  const hy = s * p.hookX0 + c * p.hookY0;
  return Math.hypot(hx - target.cx, hy - target.cy) - target.r - p.footprint.reach;
}

/**
 * Tolerances of the clearance walk: the minimum found is within 2 mm + 0.2 % of the true one. A looser walk
 * is faster but can only overstate a clearance, never understate it, so it is kept tight.
 */
const WALK = { tolAbs: 0.002, tolRel: 0.002, minStep: 0.005, coarseStep: 15 };

export function clearanceOver(p: PreparedLift, target: Target): Clearance {
  // Outline points move at most (radius + reach) metres per radian of slew.
  const lipschitz = ((p.radius + p.footprint.reach) * Math.PI) / 180;
  let best = Infinity;
  const reach = target.r + p.footprint.reach;
  const gap = (t: number) => {
    // One cosine and sine per angle, shared by the bound and the exact gap.
    const a = (slewAt(p, t) * Math.PI) / 180, c = Math.cos(a), s = Math.sin(a);
    const above = best * (1 + WALK.tolRel) + 4 * WALK.tolAbs;
    // The bound is hypot(dx, dy) − reach. When dx² + dy² is clearly below (above + reach)², the bound is
    // not above `above` (the 1e-9 room dwarfs the rounding of either side), so the exact gap is worked
    // out without the hypot; otherwise the test is made as written.
    const dx = c * p.hookX0 - s * p.hookY0 - target.cx, dy = s * p.hookX0 + c * p.hookY0 - target.cy, lim = above + reach;
    if (!(dx * dx + dy * dy < lim * lim * (1 - 1e-9))) {
      const rough = roughGapCS(p, target, c, s);
      // Far above the best so far: the bound is enough to decide the stride.
      if (rough > above) return rough;
    }
    const g = gapCS(p, target, c, s);
    if (g < best) best = g;
    return g;
  };
  const r = lipschitzMin(gap, p.span, lipschitz, WALK);
  const slew = slewAt(p, r.t);
  return describe(p, target, gapAt(p, target, slew), slew);
}

export function clearanceAt(p: PreparedLift, target: Target, deg: number): Clearance {
  return describe(p, target, gapAt(p, target, deg), deg);
}

function describe(p: PreparedLift, target: Target, horizontal: number, slew: number): Clearance {
  const vertical = p.loadBottom - target.top;
  const overlapsInPlan = horizontal <= 0;
  return { target: target.id, name: target.name, kind: target.kind, horizontal, vertical, slew, overlapsInPlan, conflict: overlapsInPlan && vertical < 0 };
}

/** The plan's clearance limit is met when the load passes far enough beside it or far enough above it. */
export const clearanceWithin = (c: Clearance, limit: number) => c.horizontal >= limit || c.vertical >= limit;
