import type { SceneDocument } from '@/lib/scene/schema';
import type { LoadObject, TruckObject } from '@/lib/scene/objects';
import type { TruckModel } from '@/lib/scene/truck/truck-model';
import type { LiveAnalysis } from './live-analysis-types';
import { closest, segmentSegmentDistance, sideOf, type LiftResult, type PreparedLift, type TruckSide } from '@/lib/lift';
import { DEG, placePoint, placePolygon, type Polygon, type Pt } from '@/lib/scene/geometry/vec';
import { hookSitePoint, hookRadius } from '@/lib/scene/geometry/truck';
import { loadLocalOutline } from '@/lib/scene/geometry/load';
import { arcOf } from '@/lib/lift/prepare';
import { closestPoints } from './closest-points';

export interface TippingLineMark {
  id: string;
  /** Which side of the truck the line lies on, for its label. */
  side: TruckSide;
  a: Pt;
  b: Pt;
  percent: number;
  /** Limit minus percent, percentage points (negative: over). */
  margin: number;
  governing: boolean;
  over: boolean;
}

export interface ClearanceMark {
  target: string;
  name: string;
  kind: 'body' | 'obstacle';
  p: Pt;
  q: Pt;
  value: number;
  vertical: boolean;
  ok: boolean;
  slew: number;
}

/**
 * The boom's nearest approach to a part, obstacle or power line over the swing: the boom's plan line at
 * that slew, its nearest point `p` and the nearest point `q` of what it passes (in plan), the engine's 3D
 * gap and the height of the boom's point there.
 */
export interface BoomClearanceMark {
  target: string;
  name: string;
  kind: 'body' | 'obstacle' | 'power-line';
  boom: [Pt, Pt];
  p: Pt;
  q: Pt;
  value: number;
  /** The limit it is held to (the plan's clearance, or the line's required distance; null: set by the utility). */
  limit: number | null;
  height: number;
  ok: boolean;
  strikes: boolean;
  slew: number;
}

export interface PowerZone {
  id: string;
  name: string;
  polygon: Polygon;
  required: number | null;
  distance: number;
  ok: boolean;
  at: Pt;
}

export interface OverlayGeometry {
  axis: Pt;
  hull: Polygon;
  lines: TippingLineMark[];
  /** Hook path from pick to set, and the band the load sweeps. */
  arc: Pt[];
  band: Polygon;
  direction: 'ccw' | 'cw';
  pick: Pt;
  set: Pt;
  worst: { slew: number; percent: number; line: string; side: TruckSide; from: Pt; to: Pt; over: boolean } | null;
  clearances: ClearanceMark[];
  /** The boom's tightest clearances (every failing one, and the nearest parts and power lines). */
  boomClearances: BoomClearanceMark[];
  nearestNow: ClearanceMark | null;
  powerZones: PowerZone[];
  loadAt(slew: number): Polygon;
}

/** How many of the tightest obstacle clearances get a mark on the plan (all failing ones always do). */
const SHOWN_CLEARANCES = 5;
/** The same for the boom's clearances to parts and obstacles. */
const SHOWN_BOOM_CLEARANCES = 2;

type ClearanceLike = { target: string; kind: 'body' | 'obstacle'; horizontal: number; vertical: number; slew: number; overlapsInPlan: boolean };

/** The slew-independent part of the overlays, with what the per-slew part needs to finish the job. */
interface SwingGeometry {
  shared: Omit<OverlayGeometry, 'lines' | 'nearestNow'>;
  /** Each tipping line's ends in the site frame, in the order of the prepared lift's lines. */
  lineEnds: { a: Pt; b: Pt }[];
  mark(c: ClearanceLike): ClearanceMark | null;
}

/** Per analysis object: a slew step makes a new one, so this holds one frame's answer. */
const cache = new WeakMap<LiveAnalysis, OverlayGeometry | null>();
/**
 * What does not move with the slew (arc, band, worst-case ray, clearance marks, approach zones), per
 * prepared lift and full result: a slew step keeps both, so scrubbing only redoes the tipping lines' figures
 * and the nearest clearance now.
 */
const swingCache = new WeakMap<PreparedLift, { result: LiftResult | null; model: TruckModel; g: SwingGeometry }>();

/** Everything the overlays draw, in the site frame, worked out once per analysis snapshot. */
export function overlayGeometry(a: LiveAnalysis | null, doc: SceneDocument, model: TruckModel | null): OverlayGeometry | null {
  if (!a || !a.prepared || !model) return null;
  const hit = cache.get(a);
  if (hit !== undefined) return hit;
  const s = swingGeometryOf(a, doc, model);
  if (!s) return null;
  const p = a.prepared;
  const limit = p.input.limits.percentOfTipping;
  const governing = a.snapshot?.governing?.line ?? null;
  const lines: TippingLineMark[] = p.lines.map((l, i) => {
    const pct = a.snapshot?.lines[i]?.percentOfTipping ?? 0;
    return { id: l.id, side: sideOf(l.nx, l.ny), ...s.lineEnds[i], percent: pct, margin: limit - pct, governing: l.id === governing, over: pct > limit };
  });
  let nearestNow: ClearanceMark | null = null;
  if (a.snapshot && a.snapshot.clearances.length) {
    const c = a.snapshot.clearances.reduce((x, y) => ((x.overlapsInPlan ? x.vertical : x.horizontal) <= (y.overlapsInPlan ? y.vertical : y.horizontal) ? x : y));
    nearestNow = s.mark(c);
  }
  const g: OverlayGeometry = { ...s.shared, lines, nearestNow };
  cache.set(a, g);
  return g;
}

function swingGeometryOf(a: LiveAnalysis, doc: SceneDocument, model: TruckModel): SwingGeometry | null {
  const p = a.prepared!;
  const hit = swingCache.get(p);
  if (hit && hit.result === a.result && hit.model === model) return hit.g;
  const truck = doc.objects.find((o): o is TruckObject => o.kind === 'truck');
  const load = doc.objects.find((o): o is LoadObject => o.kind === 'load');
  if (!truck || !load) return null;
  const pose = { x: truck.x, y: truck.y, rotation: truck.rotation };
  const toSite = (q: Pt) => placePoint(q, pose);
  const limit = p.input.limits.percentOfTipping;
  const r = hookRadius(truck, model);
  const { from, span, sign } = arcOf(p.input.swing);
  const reach = p.footprint.reach;
  const steps = Math.max(2, Math.ceil(span / 2));
  const at = (deg: number, rad: number) => {
    const s = (truck.rotation + deg) * DEG;
    return { x: truck.x + rad * Math.cos(s), y: truck.y + rad * Math.sin(s) };
  };
  const ts = Array.from({ length: steps + 1 }, (_, i) => from + (sign * span * i) / steps);
  const arc = ts.map((t) => hookSitePoint(truck, model, t));
  const band = [...ts.map((t) => at(t, r + reach)), ...ts.reverse().map((t) => at(t, Math.max(0, r - reach)))];
  const loadAt = (slew: number) => placePolygon(loadLocalOutline(load.shape), { ...hookSitePoint(truck, model, slew), rotation: load.rotation + slew - p.input.swing.from });

  const res = a.result;
  const worst = res
    ? { slew: res.worstCase.slew, percent: res.worstCase.percentOfTipping, line: res.worstCase.line, side: res.tippingLines.find((l) => l.id === res.worstCase.line)?.side ?? 'front', from: { x: truck.x, y: truck.y }, to: at(res.worstCase.slew, r + reach + 2), over: res.worstCase.percentOfTipping > limit }
    : null;

  const names = a.lift.ok ? a.lift.names : {};
  const targetPoly = (id: string): Polygon | null => {
    const t = p.targets.find((q) => q.id === id);
    if (!t) return null;
    const poly: Pt[] = [];
    for (let i = 0; i < t.n; i++) poly.push(toSite({ x: t.poly[2 * i], y: t.poly[2 * i + 1] }));
    return poly;
  };
  const climit = p.input.limits.clearance;
  const mark = (c: ClearanceLike): ClearanceMark | null => {
    const poly = targetPoly(c.target);
    if (!poly) return null;
    const [pp, qq] = closestPoints(loadAt(c.slew), poly);
    const ok = c.horizontal >= climit || c.vertical >= climit;
    return { target: c.target, name: names[c.target] ?? (c.kind === 'body' ? 'the truck' : 'an obstacle'), kind: c.kind, p: pp, q: qq, value: c.overlapsInPlan ? c.vertical : c.horizontal, vertical: c.overlapsInPlan, ok, slew: c.slew };
  };
  const clearances: ClearanceMark[] = [];
  if (res) {
    const sorted = [...res.clearances].sort((x, y) => (x.overlapsInPlan ? x.vertical : x.horizontal) - (y.overlapsInPlan ? y.vertical : y.horizontal));
    const shown = sorted.filter((c, i) => c.kind === 'body' || i < SHOWN_CLEARANCES || !(c.horizontal >= climit || c.vertical >= climit));
    for (const c of shown) {
      const m = mark(c);
      if (m) clearances.push(m);
    }
  }
  // The boom at a slew, in the truck frame (as the engine turns it), and its plan line on the site.
  const boomAt = (slew: number) => {
    const c = Math.cos(slew * DEG), sn = Math.sin(slew * DEG);
    return { px: c * p.pivotX0 - sn * p.pivotY0, py: sn * p.pivotX0 + c * p.pivotY0, qx: c * p.hookX0 - sn * p.hookY0, qy: sn * p.hookX0 + c * p.hookY0 };
  };
  const boomClearances: BoomClearanceMark[] = [];
  if (res) {
    const sorted = [...res.boomClearances].sort((x, y) => x.distance - y.distance);
    sorted.forEach((c, i) => {
      const ok = !c.strikes && c.distance >= climit;
      if (ok && i >= SHOWN_BOOM_CLEARANCES) return;
      const poly = targetPoly(c.target);
      if (!poly) return;
      const b = boomAt(c.slew);
      const u = p.input.boom.length > 0 ? Math.min(1, Math.max(0, c.alongBoom / p.input.boom.length)) : 0;
      const at = toSite({ x: b.px + (b.qx - b.px) * u, y: b.py + (b.qy - b.py) * u });
      const [, q] = closestPoints([at], poly);
      boomClearances.push({
        target: c.target, name: names[c.target] ?? c.name, kind: c.kind, boom: [toSite({ x: b.px, y: b.py }), toSite({ x: b.qx, y: b.qy })],
        p: at, q, value: c.distance, limit: climit, height: c.height, ok, strikes: c.strikes, slew: c.slew,
      });
    });
    // Power lines the boom comes nearest to (the hoist line or the load may be nearer for others).
    for (const l of res.powerLines) {
      if (l.nearest !== 'boom') continue;
      const wire = p.powerLines.find((w) => w.id === l.id);
      if (!wire) continue;
      const b = boomAt(l.slew);
      segmentSegmentDistance(b.px, b.py, p.pivotZ, b.qx, b.qy, p.tipZ, wire.a.x, wire.a.y, wire.a.z, wire.b.x, wire.b.y, wire.b.z);
      const { s: u, t: v } = closest;
      const ok = l.required !== null && l.distance >= l.required;
      boomClearances.push({
        target: l.id, name: names[l.id] ?? l.name, kind: 'power-line', boom: [toSite({ x: b.px, y: b.py }), toSite({ x: b.qx, y: b.qy })],
        p: toSite({ x: b.px + (b.qx - b.px) * u, y: b.py + (b.qy - b.py) * u }),
        q: toSite({ x: wire.a.x + (wire.b.x - wire.a.x) * v, y: wire.a.y + (wire.b.y - wire.a.y) * v }),
        value: l.distance, limit: l.required, height: p.pivotZ + (p.tipZ - p.pivotZ) * u, ok, strikes: false, slew: l.slew,
      });
    }
  }
  const powerZones: PowerZone[] = (p.input.site?.powerLines ?? []).map((l) => {
    const over = res?.powerLines.find((q) => q.id === l.id);
    const required = over?.required ?? null;
    const w = required ?? 15.24;
    const len = Math.hypot(l.b.x - l.a.x, l.b.y - l.a.y) || 1;
    const ux = (l.b.x - l.a.x) / len;
    const uy = (l.b.y - l.a.y) / len;
    // Plan view of the approach zone: every point within `required` of the wire, drawn as a capsule.
    const cap = (c: Pt, start: number) => Array.from({ length: 13 }, (_, i) => {
      const ang = Math.atan2(uy, ux) + start + (Math.PI * i) / 12;
      return { x: c.x + w * Math.cos(ang), y: c.y + w * Math.sin(ang) };
    });
    return {
      id: l.id,
      name: names[l.id] ?? 'power line',
      polygon: [...cap(l.b, -Math.PI / 2), ...cap(l.a, Math.PI / 2)],
      required,
      distance: over?.distance ?? NaN,
      ok: over ? required !== null && over.distance >= required : true,
      at: { x: (l.a.x + l.b.x) / 2, y: (l.a.y + l.b.y) / 2 },
    };
  });
  const shared: SwingGeometry['shared'] = {
    axis: { x: truck.x, y: truck.y },
    hull: p.hull.map((h) => toSite(h)),
    arc,
    band,
    direction: p.input.swing.direction,
    pick: hookSitePoint(truck, model, p.input.swing.from),
    set: hookSitePoint(truck, model, p.input.swing.to),
    worst,
    clearances,
    boomClearances,
    powerZones,
    loadAt,
  };
  const g: SwingGeometry = { shared, lineEnds: p.lines.map((l) => ({ a: toSite({ x: l.ax, y: l.ay }), b: toSite({ x: l.bx, y: l.by }) })), mark };
  swingCache.set(p, { result: a.result, model, g });
  return g;
}
