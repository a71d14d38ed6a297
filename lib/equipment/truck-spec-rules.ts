import type { z } from 'zod';
import { BODY_PART_IDS, truckSpecShape, type TruckSpec } from './truck-spec';

/** Rounds for messages: a person reads "12.2 m", not "12.199999999 m". */
const m = (v: number) => `${Math.round(v * 1000) / 1000} m`;
const kg = (v: number) => `${Math.round(v)} kg`;
const PART_LABEL = { tailboard: 'Tailboard', body: 'Body', cab: 'Cab' } as const;
// Below this two lengths are the same: a millimetre is finer than anyone measures a truck.
const EPS = 1e-6;

type Issue = { path: (string | number)[]; message: string };

export function padCentre(leg: TruckSpec['outriggers']['legs'][number], reach: number) {
  const a = (leg.direction * Math.PI) / 180;
  return { x: leg.mount.x + reach * Math.cos(a), y: leg.mount.y + reach * Math.sin(a) };
}

/** Inside the body outline in plan; a gap between two parts (cab and body) counts as inside, at the narrower width. */
export function insideBodyOutline(spec: TruckSpec, p: { x: number; y: number }): boolean {
  const parts = BODY_PART_IDS.map((id) => spec.carrier[id]);
  return parts.some((part, i) => {
    const next = parts[i + 1];
    const front = next ? Math.max(part.front, next.rear) : part.front;
    const inGap = p.x > part.front;
    const halfWidth = (inGap && next ? Math.min(part.width, next.width) : part.width) / 2;
    return p.x > part.rear + EPS && p.x < front - EPS && Math.abs(p.y) < halfWidth - EPS;
  });
}

function carrierRules(spec: TruckSpec, out: Issue[]) {
  const c = spec.carrier;
  for (const id of BODY_PART_IDS) {
    const p = c[id];
    const label = PART_LABEL[id];
    if (p.front <= p.rear + EPS) out.push({ path: ['carrier', id, 'front'], message: `${label} front edge (${m(p.front)}) must be ahead of its rear edge (${m(p.rear)})` });
    if (p.front > c.length + EPS) out.push({ path: ['carrier', id, 'front'], message: `${label} front edge (${m(p.front)}) is beyond the overall length (${m(c.length)})` });
    if (p.width > c.width + EPS) out.push({ path: ['carrier', id, 'width'], message: `${label} width (${m(p.width)}) is more than the overall width (${m(c.width)})` });
  }
  if (c.body.rear < c.tailboard.front - EPS) out.push({ path: ['carrier', 'body', 'rear'], message: `Body rear edge (${m(c.body.rear)}) overlaps the tailboard, which ends at ${m(c.tailboard.front)}` });
  if (c.cab.rear < c.body.front - EPS) out.push({ path: ['carrier', 'cab', 'rear'], message: `Cab rear edge (${m(c.cab.rear)}) overlaps the body, which ends at ${m(c.body.front)}` });
  if (c.cg.x < 0 || c.cg.x > c.length || Math.abs(c.cg.y) > c.width / 2) out.push({ path: ['carrier', 'cg', 'x'], message: 'Carrier CG must lie within the overall length and width' });
  const s = spec.upper.slewAxis;
  if (s.x < 0 || s.x > c.length || Math.abs(s.y) > c.width / 2) out.push({ path: ['upper', 'slewAxis', 'x'], message: 'Slew axis must lie within the overall length and width' });
  const lim = spec.upper.slewLimits;
  if (lim && Math.abs(lim.max - lim.min) < EPS) out.push({ path: ['upper', 'slewLimits', 'max'], message: 'Slew limits must differ; leave them empty for full rotation' });
}

function boomRules(spec: TruckSpec, out: Issue[]) {
  const st = spec.boom.stages;
  for (let i = 1; i < st.length; i++) {
    if (st[i].length <= st[i - 1].length + EPS) {
      out.push({ path: ['boom', 'stages', i - 1, 'length'], message: `Boom stage "${st[i - 1].name}" (${m(st[i - 1].length)}) must be shorter than the next stage "${st[i].name}" (${m(st[i].length)}): stage lengths increase` });
    }
  }
  const e = spec.boom.elevation;
  if (e.min >= e.max) out.push({ path: ['boom', 'elevation', 'max'], message: `Highest elevation (${e.max}°) must be above the lowest (${e.min}°)` });
}

function legRules(spec: TruckSpec, out: Issue[]) {
  const c = spec.carrier;
  const seen = new Set<string>();
  spec.outriggers.legs.forEach((leg, i) => {
    const at = (...p: (string | number)[]) => ['outriggers', 'legs', i, ...p];
    if (seen.has(leg.id)) out.push({ path: at('id'), message: `Leg id ${leg.id} is used twice` });
    seen.add(leg.id);
    const { retracted, intermediate, full } = leg.stages;
    if (intermediate !== null && intermediate <= retracted + EPS) out.push({ path: at('stages', 'retracted'), message: `Leg ${leg.id}: retracted reach (${m(retracted)}) must be shorter than the intermediate reach (${m(intermediate)})` });
    const before = intermediate ?? retracted;
    if (full <= before + EPS) out.push({ path: at('stages', intermediate === null ? 'retracted' : 'intermediate'), message: `Leg ${leg.id}: ${intermediate === null ? 'retracted' : 'intermediate'} reach (${m(before)}) must be shorter than the full reach (${m(full)})` });
    if (leg.mount.x < -EPS || leg.mount.x > c.length + EPS || Math.abs(leg.mount.y) > c.width / 2 + EPS) {
      out.push({ path: at('mount', 'x'), message: `Leg ${leg.id} mount must be on the carrier, within its overall length and width` });
    }
    if (insideBodyOutline(spec, padCentre(leg, full))) {
      out.push({ path: at('stages', 'full'), message: `Leg ${leg.id}: at full reach the pad is still inside the body outline; check the mount, direction and reach` });
    }
  });
}

function chartRules(spec: TruckSpec, out: Issue[]) {
  const ch = spec.loadChart;
  const at = (...p: (string | number)[]) => ['loadChart', ...p];
  for (let i = 1; i < ch.radii.length; i++) {
    if (ch.radii[i] <= ch.radii[i - 1] + EPS) out.push({ path: at('radii', i), message: `Load chart radius ${m(ch.radii[i])} must be more than the row above (${m(ch.radii[i - 1])}): radii strictly increase` });
  }
  for (let j = 1; j < ch.boomLengths.length; j++) {
    if (ch.boomLengths[j] <= ch.boomLengths[j - 1] + EPS) out.push({ path: at('boomLengths', j), message: `Load chart boom length ${m(ch.boomLengths[j])} must be more than the column before (${m(ch.boomLengths[j - 1])})` });
  }
  const stages = spec.boom.stages;
  const shortest = stages[0]?.length ?? 0;
  const longest = stages[stages.length - 1]?.length ?? 0;
  ch.boomLengths.forEach((b, j) => {
    if (b < shortest - 0.01 || b > longest + 0.01) out.push({ path: at('boomLengths', j), message: `Load chart boom length ${m(b)} is outside the boom's range (${m(shortest)} to ${m(longest)})` });
  });
  if (ch.rated.length !== ch.radii.length) {
    out.push({ path: at('rated'), message: `Load chart has ${ch.radii.length} radii but ${ch.rated.length} rows of rated loads: every radius needs its row` });
  }
  ch.rated.forEach((row, i) => {
    if (row.length !== ch.boomLengths.length) out.push({ path: at('rated', i), message: `Load chart row ${i + 1} has ${row.length} cells but there are ${ch.boomLengths.length} boom lengths` });
    else if (row.every((v) => v === null)) out.push({ path: at('rated', i), message: `Load chart row at ${m(ch.radii[i] ?? NaN)} has no rated loads: fill it or remove the radius` });
  });
  // Rated loads may not rise with radius: compare each cell with the last rated cell above it in its column.
  for (let j = 0; j < ch.boomLengths.length; j++) {
    let prev: { v: number; i: number } | null = null;
    for (let i = 0; i < ch.rated.length; i++) {
      const v = ch.rated[i]?.[j];
      if (v === null || v === undefined) continue;
      if (prev && v > prev.v) {
        out.push({ path: at('rated', i, j), message: `Rated load ${kg(v)} at ${m(ch.radii[i] ?? NaN)}, boom ${m(ch.boomLengths[j])} is more than ${kg(prev.v)} at the smaller radius ${m(ch.radii[prev.i] ?? NaN)}: rated loads must not rise with radius` });
      }
      prev = { v, i };
    }
  }
  const sec = ch.conditions.sector;
  if (sec && Math.abs(sec.to - sec.from) < EPS) out.push({ path: at('conditions', 'sector', 'to'), message: 'Chart sector must span some angle; leave it empty for 360°' });
}

/** Rules that tie several fields together; each issue names its field by path and in words. */
export function checkTruckSpec(spec: TruckSpec, ctx: z.RefinementCtx) {
  const out: Issue[] = [];
  carrierRules(spec, out);
  boomRules(spec, out);
  legRules(spec, out);
  chartRules(spec, out);
  for (const i of out) ctx.addIssue({ code: 'custom', path: i.path, message: i.message });
}

/** The validated truck profile: shapes first (truck-spec.ts), then the rules that tie fields together. */
export const truckSpecSchema = truckSpecShape.superRefine(checkTruckSpec);
