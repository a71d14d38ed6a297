import type { Camera } from '../store/types';
import type { Bounds, Pt } from '@/lib/scene/geometry/vec';
import { BASE_PX_PER_M, MAX_ZOOM, MIN_ZOOM } from '../store/editor-store';

/** Site (m, y north) ↔ screen (px, y down) for a camera centred on (camera.x, camera.y). */
export function worldToScreen(c: Camera, vp: { width: number; height: number }, p: Pt): Pt {
  return { x: vp.width / 2 + (p.x - c.x) * c.pxPerM, y: vp.height / 2 - (p.y - c.y) * c.pxPerM };
}

export function screenToWorld(c: Camera, vp: { width: number; height: number }, s: Pt): Pt {
  return { x: c.x + (s.x - vp.width / 2) / c.pxPerM, y: c.y - (s.y - vp.height / 2) / c.pxPerM };
}

export const clampScale = (pxPerM: number) => Math.min(MAX_ZOOM * BASE_PX_PER_M, Math.max(MIN_ZOOM * BASE_PX_PER_M, pxPerM));

/** Zooms by `factor` keeping the world point under `screen` fixed. */
export function zoomAround(c: Camera, vp: { width: number; height: number }, screen: Pt, factor: number): Camera {
  const before = screenToWorld(c, vp, screen);
  const pxPerM = clampScale(c.pxPerM * factor);
  const after = screenToWorld({ ...c, pxPerM }, vp, screen);
  return { x: c.x + before.x - after.x, y: c.y + before.y - after.y, pxPerM };
}

export function panBy(c: Camera, dxPx: number, dyPx: number): Camera {
  return { ...c, x: c.x - dxPx / c.pxPerM, y: c.y + dyPx / c.pxPerM };
}

export function fitBounds(b: Bounds | null, vp: { width: number; height: number }, marginPx = 60): Camera {
  if (!b) return { x: 0, y: 0, pxPerM: BASE_PX_PER_M };
  const w = Math.max(b.maxX - b.minX, 4);
  const h = Math.max(b.maxY - b.minY, 4);
  const pxPerM = clampScale(Math.min((vp.width - 2 * marginPx) / w, (vp.height - 2 * marginPx) / h));
  return { x: (b.minX + b.maxX) / 2, y: (b.minY + b.maxY) / 2, pxPerM };
}

export const zoomPercent = (c: Camera) => Math.round((c.pxPerM / BASE_PX_PER_M) * 100);
