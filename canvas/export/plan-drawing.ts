import type { SceneDocument } from '@/lib/scene/schema';
import type { LoadObject, ObstacleObject, TrailerObject, TruckObject } from '@/lib/scene/objects';
import type { TruckModel } from '@/lib/scene/truck/truck-model';
import type { LiveAnalysis } from '../analysis/live-analysis-types';
import { overlayGeometry } from '../analysis/overlay-geometry';
import { truckPads, truckPartFootprints } from '@/lib/scene/geometry/truck';
import { obstacleFootprints, wireEnds } from '@/lib/scene/geometry/obstacle';
import { trailerFootprints } from '@/lib/scene/geometry/trailer';
import { boundsOf, type Polygon, type Pt } from '@/lib/scene/geometry/vec';
import { PAL } from '../view/palette';
import { dualLength } from '@/lib/format/dual';
import { tippingLineShort } from '@/lib/format/checks';
import { padName } from '@/lib/lift/names';
import type { UnitSystem } from '@/lib/units';
import { chooseScale, clipPolygon, clipPolyline, toPaper } from './paper';
import { placeLabels, type LabelRequest } from './labels';
import { northArrow, scaleBar } from './furniture';
import type { DrawItem, LegendEntry, PlanDrawing } from './drawing-types';

/**
 * The plan drawing, to scale, from the same geometry the editor draws (canvas/shapes, the overlay geometry
 * of canvas/analysis): truck, pads and cribbing, load at pick and set, the swing band and arc, the tipping
 * lines with the governing one marked, the worst-case position, obstacles and power lines with their
 * required approach distance, a scale bar and a north arrow. Site +y is north.
 */
export interface PlanDrawingInput {
  doc: SceneDocument;
  model: TruckModel;
  /** Prepared lift, full result, and a snapshot at the worst-case slew. */
  analysis: LiveAnalysis;
  names: Record<string, string>;
  units: UnitSystem;
  width: number;
  height: number;
}

/** Site metres kept around the lift when framing the drawing. */
const FRAME_MARGIN = 3;
const GOVERNING = PAL.over;

type SitePoly = { pts: Polygon; closed: boolean; stroke: string | null; fill: string | null; width: number; dash?: [number, number]; opacity?: number };

export function planDrawing(input: PlanDrawingInput): PlanDrawing | null {
  const { doc, model, analysis, names, units, width, height } = input;
  const geo = overlayGeometry(analysis, doc, model);
  const truck = doc.objects.find((o): o is TruckObject => o.kind === 'truck');
  const load = doc.objects.find((o): o is LoadObject => o.kind === 'load');
  const result = analysis.result;
  if (!geo || !truck || !load || !result) return null;
  const { from, to } = doc.swing;
  const polys: SitePoly[] = [];
  const labels: (LabelRequest & { site: Pt })[] = [];

  const obstacles = doc.objects.filter((o): o is ObstacleObject => o.kind === 'obstacle');
  const trailers = doc.objects.filter((o): o is TrailerObject => o.kind === 'trailer');
  for (const z of geo.powerZones) polys.push({ pts: z.polygon, closed: true, stroke: PAL.over, fill: PAL.overLight, width: 0.6, dash: [4, 3], opacity: 0.7 });
  for (const o of obstacles) {
    if (o.shape.kind === 'line') continue;
    polys.push({ pts: obstacleFootprints(o)[0], closed: true, stroke: PAL.inkSoft, fill: PAL.obstacle[o.obstacleKind] ?? PAL.muted, width: 0.5, opacity: o.obstacleKind === 'traffic-lane' ? 0.5 : 0.8 });
    labels.push({ site: centroid(obstacleFootprints(o)[0]), text: names[o.id] ?? o.obstacleKind, size: 6.5, colour: PAL.ink });
  }
  for (const t of trailers) {
    polys.push({ pts: trailerFootprints(t)[0], closed: true, stroke: PAL.inkSoft, fill: PAL.trailerFill, width: 0.6 });
    labels.push({ site: centroid(trailerFootprints(t)[0]), text: names[t.id] ?? 'trailer', size: 6.5, colour: PAL.ink });
  }
  polys.push({ pts: geo.band, closed: true, stroke: null, fill: PAL.tealLight, width: 0, opacity: 0.8 });
  for (const part of truckPartFootprints(truck, model)) {
    polys.push({ pts: part.polygon, closed: true, stroke: PAL.ink, fill: part.kind === 'cab' ? PAL.cabFill : PAL.truckFill, width: 0.6 });
  }
  for (const pad of truckPads(truck, model)) {
    polys.push({ pts: [pad.mount, pad.centre], closed: false, stroke: PAL.ink, fill: null, width: 1.2 });
    if (pad.cribbing) polys.push({ pts: pad.cribbing, closed: true, stroke: PAL.ink, fill: PAL.cribFill, width: 0.4 });
    polys.push({ pts: pad.pad, closed: true, stroke: PAL.ink, fill: PAL.padFill, width: 0.4 });
    labels.push({ site: pad.centre, text: pad.leg.id, size: 6.5, colour: PAL.ink, bold: true });
  }
  const worst = result.worstCase;
  for (const l of geo.lines) {
    const gov = l.id === worst.line;
    polys.push({ pts: [l.a, l.b], closed: false, stroke: gov ? GOVERNING : PAL.muted, fill: null, width: gov ? 1.6 : 0.6, dash: gov ? undefined : [3, 2] });
  }
  const govLine = geo.lines.find((l) => l.id === worst.line);
  polys.push({ pts: geo.arc, closed: false, stroke: PAL.teal, fill: null, width: 1.2 });
  polys.push({ pts: arrowHead(geo.arc), closed: true, stroke: null, fill: PAL.teal, width: 0 });
  polys.push({ pts: geo.loadAt(worst.slew), closed: true, stroke: GOVERNING, fill: null, width: 0.9, dash: [3, 2] });
  if (geo.worst) polys.push({ pts: [geo.worst.from, geo.worst.to], closed: false, stroke: GOVERNING, fill: null, width: 0.6, dash: [5, 3] });
  polys.push({ pts: geo.loadAt(to), closed: true, stroke: PAL.amberDark, fill: null, width: 1, dash: [4, 2] });
  polys.push({ pts: geo.loadAt(from), closed: true, stroke: PAL.ink, fill: PAL.loadFill, width: 0.6 });
  for (const o of obstacles) {
    const ends = wireEnds(o);
    if (ends) polys.push({ pts: ends, closed: false, stroke: PAL.over, fill: null, width: 1.4 });
  }

  labels.push({ site: geo.pick, text: `Pick (slew ${from.toFixed(0)}°)`, size: 7, colour: PAL.ink, bold: true });
  labels.push({ site: geo.set, text: `Set (slew ${to.toFixed(0)}°)`, size: 7, colour: PAL.amberDark, bold: true });
  if (geo.worst) labels.push({ site: geo.worst.to, text: `Worst case: ${worst.percentOfTipping.toFixed(1)} % at slew ${worst.slew.toFixed(0)}°`, size: 7, colour: GOVERNING, bold: true });
  if (govLine) labels.push({ site: mid(govLine.a, govLine.b), text: `Governing tipping line: ${tippingLineShort({ side: govLine.side, code: govLine.id })}`, size: 6.5, colour: GOVERNING, bold: true });
  for (const z of geo.powerZones) {
    const req = z.required === null ? 'required distance set by the utility' : `keep ${dualLength(z.required, units)} away`;
    labels.push({ site: z.at, text: `${z.name}: ${req}`, size: 6.5, colour: PAL.over, bold: true });
  }

  // Frame the lift itself (truck, pads, swing band, load positions); obstacles beyond it are clipped.
  // Each power line's nearest stretch to the slew axis is framed with its approach zone, so its distance shows.
  const wireFrames = geo.powerZones.flatMap((z) => {
    const o = obstacles.find((x) => x.id === z.id);
    const ends = o ? wireEnds(o) : null;
    if (!ends) return [];
    const near = nearestOnSegment(geo.axis, ends[0], ends[1]);
    const r = z.required ?? 0;
    return [{ x: near.x - r, y: near.y - r }, { x: near.x + r, y: near.y + r }];
  });
  const framed = [...wireFrames, ...geo.band, ...polys.filter((p) => p.fill === PAL.padFill || p.fill === PAL.cribFill || p.fill === PAL.truckFill).flatMap((p) => p.pts), ...geo.loadAt(from), ...geo.loadAt(to)];
  const b = boundsOf(framed)!;
  const spanW = b.maxX - b.minX + 2 * FRAME_MARGIN;
  const spanH = b.maxY - b.minY + 2 * FRAME_MARGIN;
  const scale = chooseScale(spanW, spanH, width, height, units);
  const paper = toPaper(scale, { x: (b.minX + b.maxX) / 2, y: (b.minY + b.maxY) / 2 }, width, height);

  const e = 0.5;
  const items: DrawItem[] = [{ t: 'poly', pts: [{ x: e, y: e }, { x: width - e, y: e }, { x: width - e, y: height - e }, { x: e, y: height - e }], closed: true, stroke: PAL.muted, fill: '#FFFFFF', width: 0.5 }];
  for (const p of polys) {
    const pts = p.pts.map(paper);
    const runs = p.closed ? [clipPolygon(pts, width, height)] : clipPolyline(pts, width, height);
    for (const run of runs) if (run.length >= 2) items.push({ t: 'poly', ...p, pts: run });
  }
  const axis = paper(geo.axis);
  items.push({ t: 'circle', x: axis.x, y: axis.y, r: 2.2, stroke: PAL.ink, fill: '#FFFFFF', width: 0.8 });
  const furniture = [...scaleBar(units, scale.ptPerM, { x: 14, y: height - 18 }, width / 4), ...northArrow({ x: width - 22, y: 30 })];
  furniture.push({ t: 'text', x: 8, y: 13, text: `Scale ${scale.label}`, size: 7.5, colour: PAL.ink, anchor: 'start', bold: true });
  // Labels keep off the loads and the pads, which the reader most needs to see.
  const keep = [geo.loadAt(from), geo.loadAt(to), geo.loadAt(worst.slew), ...truckPads(truck, model).map((p) => p.pad)].map((poly) => boxOf(poly.map(paper)));
  const blocked = [...keep, { x: 8, y: height - 40, w: width / 4 + 60, h: 36 }, { x: width - 40, y: 6, w: 36, h: 44 }, { x: 4, y: 2, w: 150, h: 16 }];
  items.push(...placeLabels(labels.map((l) => ({ ...l, at: paper(l.site) })), width, height, blocked));
  items.push(...furniture);
  // The pads are labelled by their short codes on the drawing; the key says what each code is.
  const padKey = `Pads: ${model.legs.map((l) => `${l.id} ${padName(l.id, l.mount.x, l.mount.y)}`).join(' · ')}`;
  return { width, height, scaleLabel: scale.label, ratio: scale.ratio, items, legend: LEGEND, padKey };
}

const LEGEND: LegendEntry[] = [
  { label: 'Truck', stroke: PAL.ink, fill: PAL.truckFill },
  { label: 'Pad / cribbing', stroke: PAL.ink, fill: PAL.cribFill },
  { label: 'Load at pick', stroke: PAL.ink, fill: PAL.loadFill },
  { label: 'Load at set', stroke: PAL.amberDark, fill: null, dash: [4, 2] },
  { label: 'Swing path', stroke: PAL.teal, fill: PAL.tealLight },
  { label: 'Tipping line', stroke: PAL.muted, fill: null, dash: [3, 2] },
  { label: 'Governing line, worst case', stroke: GOVERNING, fill: null },
  { label: 'Power-line approach zone', stroke: PAL.over, fill: PAL.overLight, dash: [4, 3] },
];

function nearestOnSegment(p: Pt, a: Pt, b: Pt): Pt {
  const dx = b.x - a.x;
  const dy = b.y - a.y;
  const t = Math.max(0, Math.min(1, ((p.x - a.x) * dx + (p.y - a.y) * dy) / (dx * dx + dy * dy || 1)));
  return { x: a.x + t * dx, y: a.y + t * dy };
}

function boxOf(pts: Pt[]) {
  const b = boundsOf(pts)!;
  return { x: b.minX, y: b.minY, w: b.maxX - b.minX, h: b.maxY - b.minY };
}

function centroid(poly: Polygon): Pt {
  const n = poly.length;
  return { x: poly.reduce((a, p) => a + p.x, 0) / n, y: poly.reduce((a, p) => a + p.y, 0) / n };
}
const mid = (a: Pt, b: Pt): Pt => ({ x: (a.x + b.x) / 2, y: (a.y + b.y) / 2 });

/** A small head at the set end of the hook path, pointing along the swing. */
function arrowHead(arc: Pt[]): Pt[] {
  const tip = arc[arc.length - 1];
  const prev = arc[Math.max(0, arc.length - 2)];
  const len = Math.hypot(tip.x - prev.x, tip.y - prev.y) || 1;
  const ux = (tip.x - prev.x) / len;
  const uy = (tip.y - prev.y) / len;
  const s = 0.9;
  return [tip, { x: tip.x - s * ux + 0.45 * s * -uy, y: tip.y - s * uy + 0.45 * s * ux }, { x: tip.x - s * ux - 0.45 * s * -uy, y: tip.y - s * uy - 0.45 * s * ux }];
}
