import type { Pt } from '@/lib/scene/geometry/vec';
import type { UnitSystem } from '@/lib/units';

/**
 * Paper space for the exported plan drawing: points (1/72 in), y down. A drawing is laid out at a stated
 * ratio scale, so a printout measures true with a rule.
 */
export const PT_PER_M_AT_1_TO_1 = 72 / 0.0254;

/** Ratios offered, by the viewer's units: engineers' 1 in = N ft scales, or metric 1:N (common drafting scales). */
const IMPERIAL_RATIOS = [60, 120, 240, 360, 480, 600, 1200, 2400, 4800];
const METRIC_RATIOS = [50, 100, 200, 250, 500, 1000, 2000, 2500, 5000];

export interface PaperScale {
  ratio: number;
  /** Paper points per site metre. */
  ptPerM: number;
  /** "1:240 (1 in = 20 ft)" or "1:200 (1 cm = 2 m)". */
  label: string;
}

/** The largest drawing scale at which `span` metres (w × h) fit in `box` points. */
export function chooseScale(spanW: number, spanH: number, boxW: number, boxH: number, units: UnitSystem): PaperScale {
  const ratios = units === 'imperial' ? IMPERIAL_RATIOS : METRIC_RATIOS;
  const need = Math.max((spanW * PT_PER_M_AT_1_TO_1) / boxW, (spanH * PT_PER_M_AT_1_TO_1) / boxH);
  const ratio = ratios.find((r) => r >= need) ?? Math.ceil(need / 1000) * 1000;
  const label = units === 'imperial' ? `1:${ratio} (1 in = ${fmt(ratio / 12)} ft)` : `1:${ratio} (1 cm = ${fmt(ratio / 100)} m)`;
  return { ratio, ptPerM: PT_PER_M_AT_1_TO_1 / ratio, label };
}

const fmt = (n: number) => (Number.isInteger(n) ? String(n) : n.toFixed(1));

/** Site (m, y north) → paper (pt, y down), centred on `centre` in a box of w × h. */
export function toPaper(scale: PaperScale, centre: Pt, w: number, h: number) {
  return (p: Pt): Pt => ({ x: w / 2 + (p.x - centre.x) * scale.ptPerM, y: h / 2 - (p.y - centre.y) * scale.ptPerM });
}

/** Sutherland–Hodgman: a closed polygon clipped to the rectangle [0, w] × [0, h]. */
export function clipPolygon(poly: readonly Pt[], w: number, h: number): Pt[] {
  const edges: [(p: Pt) => boolean, (a: Pt, b: Pt) => Pt][] = [
    [(p) => p.x >= 0, (a, b) => lerp(a, b, (0 - a.x) / (b.x - a.x))],
    [(p) => p.x <= w, (a, b) => lerp(a, b, (w - a.x) / (b.x - a.x))],
    [(p) => p.y >= 0, (a, b) => lerp(a, b, (0 - a.y) / (b.y - a.y))],
    [(p) => p.y <= h, (a, b) => lerp(a, b, (h - a.y) / (b.y - a.y))],
  ];
  let out: Pt[] = [...poly];
  for (const [inside, cut] of edges) {
    const input = out;
    out = [];
    for (let i = 0; i < input.length; i++) {
      const cur = input[i];
      const prev = input[(i + input.length - 1) % input.length];
      if (inside(cur)) {
        if (!inside(prev)) out.push(cut(prev, cur));
        out.push(cur);
      } else if (inside(prev)) out.push(cut(prev, cur));
    }
    if (!out.length) break;
  }
  return out;
}

/** An open polyline clipped to the rectangle: the visible runs (Liang–Barsky per segment). */
export function clipPolyline(line: readonly Pt[], w: number, h: number): Pt[][] {
  const runs: Pt[][] = [];
  let run: Pt[] = [];
  for (let i = 1; i < line.length; i++) {
    const seg = clipSegment(line[i - 1], line[i], w, h);
    if (!seg) {
      if (run.length) runs.push(run);
      run = [];
      continue;
    }
    const last = run[run.length - 1];
    if (!last || Math.hypot(last.x - seg[0].x, last.y - seg[0].y) > 1e-6) {
      if (run.length) runs.push(run);
      run = [seg[0]];
    }
    run.push(seg[1]);
  }
  if (run.length) runs.push(run);
  return runs;
}

function clipSegment(a: Pt, b: Pt, w: number, h: number): [Pt, Pt] | null {
  let t0 = 0;
  let t1 = 1;
  const dx = b.x - a.x;
  const dy = b.y - a.y;
  const checks: [number, number][] = [[-dx, a.x], [dx, w - a.x], [-dy, a.y], [dy, h - a.y]];
  for (const [p, q] of checks) {
    if (p === 0) {
      if (q < 0) return null;
      continue;
    }
    const r = q / p;
    if (p < 0) t0 = Math.max(t0, r);
    else t1 = Math.min(t1, r);
    if (t0 > t1) return null;
  }
  return [lerp(a, b, t0), lerp(a, b, t1)];
}

const lerp = (a: Pt, b: Pt, t: number): Pt => ({ x: a.x + (b.x - a.x) * t, y: a.y + (b.y - a.y) * t });
