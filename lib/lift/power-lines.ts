import { M_PER_FT } from '@/lib/units';
import { placeOutline } from './footprint';
import { pointPolygonDistance } from './geometry';
import { slewAt, type PreparedLift } from './prepare';
import type { PowerLine } from './schema';
import { goldenMin, lipschitzMin } from './search';
import { segmentSegmentDistance } from './segment3d';

/**
 * Power-line clearance: the minimum clearance distance of 29 CFR 1926.1408 Table A by nominal voltage
 * (upper bound of each band included), and the smallest 3D distance from the boom, the hoist line and
 * the load to each line over the swing.
 */
const TABLE_A: readonly [maxKV: number, feet: number][] = [
  [50, 10],
  [200, 15],
  [350, 20],
  [500, 25],
  [750, 35],
  [1000, 45],
];

/**
 * Which rule set the required clearance: `table-a` (29 CFR 1926.1408 Table A, band up to `upToKV`),
 * `unknown-voltage-350` (1926.1408(a), voltage unknown but confirmed at most 350 kV), `unknown-voltage`
 * (1926.1409), `over-table` (over 1 000 kV: the utility or a registered engineer sets it) or `set-for-line`
 * (given for this line by the utility or a registered engineer). `feet` is the rule's own figure.
 */
export interface PowerLineRule {
  source: 'table-a' | 'unknown-voltage-350' | 'unknown-voltage' | 'over-table' | 'set-for-line';
  upToKV: number | null;
  feet: number | null;
}

export interface RequiredClearance {
  /** Metres, or null when the utility or a registered engineer must set it. */
  required: number | null;
  rule: PowerLineRule;
}

export function requiredClearance(line: Pick<PowerLine, 'kV' | 'atMost350kV' | 'required'>): RequiredClearance {
  if (line.required !== undefined) return { required: line.required, rule: { source: 'set-for-line', upToKV: null, feet: null } };
  if (line.kV === null) {
    // Unknown voltage: 20 ft when confirmed up to 350 kV, 1926.1408(a); 50 ft otherwise, 1926.1409.
    return line.atMost350kV
      ? { required: 20 * M_PER_FT, rule: { source: 'unknown-voltage-350', upToKV: 350, feet: 20 } }
      : { required: 50 * M_PER_FT, rule: { source: 'unknown-voltage', upToKV: null, feet: 50 } };
  }
  for (const [maxKV, feet] of TABLE_A) {
    if (line.kV <= maxKV) return { required: feet * M_PER_FT, rule: { source: 'table-a', upToKV: maxKV, feet } };
  }
  return { required: null, rule: { source: 'over-table', upToKV: null, feet: null } };
}

export interface PowerLineClearance {
  id: string;
  /** What results call the line (the input's name, else its id). */
  name: string;
  /** Smallest 3D distance from boom, hoist line or load to the line over the swing, m. */
  distance: number;
  required: number | null;
  rule: PowerLineRule;
  slew: number;
  /** Which part came nearest. */
  nearest: 'boom' | 'hoist line' | 'load';
}

let buf = new Float64Array(64);
let nearest: PowerLineClearance['nearest'] = 'boom';

/** Smallest distance from the boom, hoist line and load (as a prism of its outline's hull) at one slew. */
export function powerLineDistanceAt(p: PreparedLift, line: PowerLine, deg: number): number {
  const a = (deg * Math.PI) / 180;
  const c = Math.cos(a);
  const s = Math.sin(a);
  const px = c * p.pivotX0 - s * p.pivotY0, py = s * p.pivotX0 + c * p.pivotY0;
  const hx = c * p.hookX0 - s * p.hookY0, hy = s * p.hookX0 + c * p.hookY0;
  const { a: la, b: lb } = line;
  // The boom's surface: its axis less its radius (a capsule, as in boom-clearance.ts).
  const boom = Math.max(0, segmentSegmentDistance(px, py, p.pivotZ, hx, hy, p.tipZ, la.x, la.y, la.z, lb.x, lb.y, lb.z) - p.boomRadius);
  const hoist = segmentSegmentDistance(hx, hy, p.tipZ, hx, hy, p.loadTop, la.x, la.y, la.z, lb.x, lb.y, lb.z);
  const fp = p.footprint;
  if (fp.kind === 'polygon') {
    if (buf.length < 2 * fp.hullN) buf = new Float64Array(2 * fp.hullN);
    placeOutline(fp.hull, fp.hullN, c, s, hx, hy, buf);
  }
  // Distance to a right prism is √(plan distance² + height distance²); along the line it is convex.
  const toLoad = (u: number) => {
    const x = la.x + (lb.x - la.x) * u, y = la.y + (lb.y - la.y) * u, z = la.z + (lb.z - la.z) * u;
    const dh = fp.kind === 'circle' ? Math.max(0, Math.hypot(x - hx, y - hy) - fp.radius) : pointPolygonDistance(x, y, buf, fp.hullN);
    const dv = z < p.loadBottom ? p.loadBottom - z : z > p.loadTop ? z - p.loadTop : 0;
    return Math.sqrt(dh * dh + dv * dv);
  };
  let d = Math.min(boom, hoist);
  // The load counts only when its bounding sphere comes nearer than the boom and hoist line do.
  const zc = (p.loadBottom + p.loadTop) / 2;
  const sphere = Math.hypot(fp.reach, (p.loadTop - p.loadBottom) / 2);
  const toCentre = segmentSegmentDistance(hx, hy, zc, hx, hy, zc, la.x, la.y, la.z, lb.x, lb.y, lb.z);
  const load = toCentre - sphere < d ? Math.min(toLoad(0), toLoad(1), goldenMin(toLoad, 0, 1, 1e-4).v) : Infinity;
  d = Math.min(d, load);
  nearest = d === boom ? 'boom' : d === hoist ? 'hoist line' : 'load';
  return d;
}

export function powerLineOver(p: PreparedLift, line: PowerLine): PowerLineClearance {
  // No point of the boom, hoist line or load moves faster than (radius + load reach) m per radian.
  const lipschitz = ((Math.max(p.radius, Math.hypot(p.pivotX0, p.pivotY0)) + p.footprint.reach) * Math.PI) / 180;
  const r = lipschitzMin((t) => powerLineDistanceAt(p, line, slewAt(p, t)), p.span, lipschitz, {
    tolAbs: 0.005, tolRel: 0.001, minStep: 0.005, coarseStep: 10,
  });
  return powerLineAt(p, line, slewAt(p, r.t));
}

export function powerLineAt(p: PreparedLift, line: PowerLine, deg: number): PowerLineClearance {
  const distance = powerLineDistanceAt(p, line, deg);
  const req = requiredClearance(line);
  return { id: line.id, name: line.name ?? line.id, distance, required: req.required, rule: req.rule, slew: deg, nearest };
}
