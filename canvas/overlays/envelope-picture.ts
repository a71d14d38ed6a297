import type { EnvelopeShapes } from '@/lib/envelope';
import { PAL } from '../view/palette';

/**
 * The reach envelope drawn once into a bitmap (a "picture"), in the worker, for the overlay to place on
 * the plan each frame with one drawImage. Thousands of cell polygons filled per frame cost the main
 * thread tens of milliseconds during a truck drag (npm run bench:editor); a bitmap costs well under one.
 * Worker-safe: no DOM, no React, no Konva.
 */

/** Fills and lines of the envelope (truck frame, metres). Margin bands: teal deep to light, amber where near the limit. */
export const ENVELOPE_STYLE = {
  ample: { fill: PAL.teal, alpha: 0.26 },
  fair: { fill: PAL.teal, alpha: 0.13 },
  near: { fill: PAL.amber, alpha: 0.34 },
  cut: { fill: PAL.over, alpha: 0.3 },
  tipping: { stroke: PAL.teal, dash: [] as number[], width: 2.5 },
  chart: { stroke: '#6B4FA0', dash: [9, 5], width: 2.5 },
  reach: { stroke: PAL.inkSoft, dash: [2, 4], width: 2 },
} as const;

type Ctx2D = CanvasRenderingContext2D | OffscreenCanvasRenderingContext2D;

/** A rectangle in the truck frame, metres. */
export interface Box {
  x0: number;
  y0: number;
  x1: number;
  y1: number;
}

/**
 * The envelope as a bitmap: `image` covers `box` (truck frame) at `scale` device pixels per metre; both
 * null when none of the envelope is in the part of the plan asked for.
 */
export interface EnvelopePicture {
  image: ImageBitmap | HTMLCanvasElement | null;
  box: Box | null;
  scale: number;
  /** The part of the truck frame the bitmap was asked to cover (the view with a margin). */
  covers: Box;
  /** The whole envelope's extent, truck frame. */
  bounds: Box;
  /** The resolution asked for (the bitmap's may be lower, see PICTURE_MAX_PIXELS). */
  asked: number;
}

/** What the overlay needs drawn: the view in the truck frame with a margin, and the resolution. */
export interface PictureRequest {
  view: Box;
  scale: number;
  /** Camera scale, CSS px per metre: line widths and hatch spacing are set in screen pixels. */
  pxPerM: number;
}

/**
 * One path of many cell polygons, for fill and clip only: both close every subpath themselves, and an
 * explicit closePath per cell (thousands of them) cost about 40 ms a frame in Chromium's canvas.
 */
function polys(c: Ctx2D, list: number[][]) {
  c.beginPath();
  for (const p of list) {
    c.moveTo(p[0], p[1]);
    for (let i = 2; i < p.length; i += 2) c.lineTo(p[i], p[i + 1]);
  }
}

/** Draws the envelope's shapes, truck frame, into a context already transformed to metres. */
export function drawEnvelope(c: Ctx2D, s: EnvelopeShapes, pxPerM: number, bounds: Box) {
  for (const band of ['ample', 'fair', 'near'] as const) {
    polys(c, s.bands[band]);
    c.globalAlpha = ENVELOPE_STYLE[band].alpha;
    c.fillStyle = ENVELOPE_STYLE[band].fill;
    c.fill();
  }
  if (s.cut.length) {
    polys(c, s.cut);
    c.globalAlpha = ENVELOPE_STYLE.cut.alpha;
    c.fillStyle = ENVELOPE_STYLE.cut.fill;
    c.fill();
    // Hatched as well as red, so the mark does not rest on colour alone.
    c.save();
    c.clip();
    c.globalAlpha = 0.7;
    c.strokeStyle = PAL.over;
    c.lineWidth = 1.5 / pxPerM;
    c.beginPath();
    const R = Math.max(Math.abs(bounds.x0), Math.abs(bounds.x1), Math.abs(bounds.y0), Math.abs(bounds.y1));
    for (let d = -R; d <= R; d += 8 / pxPerM) {
      c.moveTo(d - R, -R);
      c.lineTo(d + R, R);
    }
    c.stroke();
    c.restore();
  }
  c.globalAlpha = 1;
  for (const kind of ['reach', 'chart', 'tipping'] as const) {
    const e = s.edges[kind];
    if (!e.length) continue;
    const st = ENVELOPE_STYLE[kind];
    c.beginPath();
    for (let i = 0; i < e.length; i += 4) {
      c.moveTo(e[i], e[i + 1]);
      c.lineTo(e[i + 2], e[i + 3]);
    }
    c.strokeStyle = st.stroke;
    c.lineWidth = st.width / pxPerM;
    c.setLineDash(st.dash.map((d) => d / pxPerM));
    c.stroke();
  }
  c.setLineDash([]);
}

/** Extent of the envelope's shapes, truck frame, with room for the outlines' width. */
export function shapesBounds(s: EnvelopeShapes, pad: number): Box | null {
  let x0 = Infinity, y0 = Infinity, x1 = -Infinity, y1 = -Infinity;
  const take = (xs: ArrayLike<number>) => {
    for (let i = 0; i + 1 < xs.length; i += 2) {
      if (xs[i] < x0) x0 = xs[i];
      if (xs[i] > x1) x1 = xs[i];
      if (xs[i + 1] < y0) y0 = xs[i + 1];
      if (xs[i + 1] > y1) y1 = xs[i + 1];
    }
  };
  for (const band of ['ample', 'fair', 'near'] as const) s.bands[band].forEach(take);
  for (const kind of ['reach', 'chart', 'tipping'] as const) take(s.edges[kind]);
  if (!(x1 >= x0 && y1 >= y0)) return null;
  return { x0: x0 - pad, y0: y0 - pad, x1: x1 + pad, y1: y1 + pad };
}

/** The extent of an envelope with nothing inside the limits. */
export const NOTHING: Box = { x0: 0, y0: 0, x1: 0, y1: 0 };

export const intersect = (a: Box, b: Box): Box | null => {
  const r = { x0: Math.max(a.x0, b.x0), y0: Math.max(a.y0, b.y0), x1: Math.min(a.x1, b.x1), y1: Math.min(a.y1, b.y1) };
  return r.x1 > r.x0 && r.y1 > r.y0 ? r : null;
};

const inside = (a: Box, b: Box) => a.x0 >= b.x0 && a.y0 >= b.y0 && a.x1 <= b.x1 && a.y1 <= b.y1;

/** Largest bitmap, in device pixels: about 32 MB of RGBA. Past it the picture is drawn coarser and scaled up. */
export const PICTURE_MAX_PIXELS = 8_000_000;
const PICTURE_MAX_SIDE = 8192;

/** Where the bitmap goes and at what resolution, for a request and the envelope's extent (null: nothing to draw). */
export function pictureFrame(bounds: Box, req: PictureRequest): { box: Box; scale: number; width: number; height: number } | null {
  const box = intersect(bounds, req.view);
  if (!box) return null;
  const w = box.x1 - box.x0, h = box.y1 - box.y0;
  const scale = Math.min(req.scale, Math.sqrt(PICTURE_MAX_PIXELS / (w * h)), PICTURE_MAX_SIDE / w, PICTURE_MAX_SIDE / h);
  return { box, scale, width: Math.max(1, Math.ceil(w * scale)), height: Math.max(1, Math.ceil(h * scale)) };
}

/** Draws the shapes into a fresh canvas (OffscreenCanvas in the worker) framed by pictureFrame. */
export function paintPicture<C extends { getContext(id: '2d'): unknown }>(
  s: EnvelopeShapes,
  bounds: Box,
  req: PictureRequest,
  makeCanvas: (w: number, h: number) => C,
): { canvas: C; box: Box; scale: number; covers: Box } | null {
  const f = pictureFrame(bounds, req);
  if (!f) return null;
  const canvas = makeCanvas(f.width, f.height);
  const c = canvas.getContext('2d') as Ctx2D | null;
  if (!c) return null;
  c.setTransform(f.scale, 0, 0, f.scale, -f.box.x0 * f.scale, -f.box.y0 * f.scale);
  drawEnvelope(c, s, req.pxPerM, bounds);
  // The box actually painted, rounded out to whole pixels.
  const box = { x0: f.box.x0, y0: f.box.y0, x1: f.box.x0 + f.width / f.scale, y1: f.box.y0 + f.height / f.scale };
  return { canvas, box, scale: f.scale, covers: f.box };
}

/**
 * Whether a picture still serves a view: it covers the part of the envelope in view, and its resolution is
 * within a quarter of the screen's (a zoom past that asks for a new one; meanwhile the old one is scaled).
 */
export function pictureServes(p: Pick<EnvelopePicture, 'covers' | 'bounds' | 'asked'>, view: Box, scale: number): boolean {
  const needed = intersect(p.bounds, view);
  if (needed && !inside(needed, p.covers)) return false;
  return Math.abs(Math.log(p.asked / scale)) < Math.log(1.25);
}

/**
 * The view rectangle in the truck frame (metres), widened by `margin` of its size on each side, so a drag
 * or pan of that much needs no new picture.
 */
export function viewInTruckFrame(
  camera: { x: number; y: number; pxPerM: number },
  viewport: { width: number; height: number },
  truck: { x: number; y: number; rotation: number },
  margin: number,
): Box {
  const hw = viewport.width / 2 / camera.pxPerM, hh = viewport.height / 2 / camera.pxPerM;
  const mx = hw * 2 * margin, my = hh * 2 * margin;
  const a = (-truck.rotation * Math.PI) / 180;
  const cos = Math.cos(a), sin = Math.sin(a);
  let x0 = Infinity, y0 = Infinity, x1 = -Infinity, y1 = -Infinity;
  for (const [sx, sy] of [[-1, -1], [1, -1], [1, 1], [-1, 1]]) {
    const dx = camera.x + sx * (hw + mx) - truck.x, dy = camera.y + sy * (hh + my) - truck.y;
    const x = cos * dx - sin * dy, y = sin * dx + cos * dy;
    x0 = Math.min(x0, x); x1 = Math.max(x1, x);
    y0 = Math.min(y0, y); y1 = Math.max(y1, y);
  }
  return { x0, y0, x1, y1 };
}
