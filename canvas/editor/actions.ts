import { wrap360 } from '@/lib/angles';
import { cloneObjects, deleteObjects, setLocked, addObjects } from '../commands/objects';
import { setSlew } from '../commands/truck';
import type { TruckObject } from '@/lib/scene/objects';
import { boundsOf } from '@/lib/scene/geometry/vec';
import { footprintsOf } from '@/lib/scene/geometry/footprints';
import { hookSitePoint } from '@/lib/scene/geometry/truck';
import { fitBounds, zoomAround } from './camera';
import type { Editor } from './editor';
import { newId } from '@/lib/scene/ids';

/** Editing actions shared by the keyboard, the toolbar and the tests. */
export const PASTE_OFFSET_M = 1;

export function copySelection(ed: Editor) {
  const sel = ed.selected();
  if (sel.length) ed.set({ clipboard: structuredClone(sel) });
}

export function paste(ed: Editor) {
  const clip = ed.state.clipboard;
  if (!clip.length || ed.state.readOnly) return;
  const copies = cloneObjects(ed.state.document, clip, PASTE_OFFSET_M, () => newId('copy'));
  if (!copies.length) return;
  ed.run(addObjects(copies));
  // The next paste lands one step further on, not on top of this one.
  ed.set({ selection: copies.map((c) => c.id), clipboard: copies });
}

export function duplicate(ed: Editor) {
  const sel = ed.selected();
  if (!sel.length || ed.state.readOnly) return;
  const copies = cloneObjects(ed.state.document, sel, PASTE_OFFSET_M, () => newId('copy'));
  if (!copies.length) return;
  ed.run(addObjects(copies));
  ed.set({ selection: copies.map((c) => c.id) });
}

export function deleteSelection(ed: Editor) {
  const ids = ed.state.selection;
  if (!ids.length) return;
  ed.run(deleteObjects(ids));
  const left = new Set(ed.state.document.objects.map((o) => o.id));
  ed.set({ selection: ids.filter((id) => left.has(id)) });
}

export function toggleLock(ed: Editor) {
  const sel = ed.selected();
  if (!sel.length) return;
  ed.run(setLocked(sel.map((o) => o.id), !sel.every((o) => o.locked)));
}

export function selectAll(ed: Editor) {
  ed.set({ selection: ed.state.document.objects.map((o) => o.id) });
}

export function nudgeSlew(ed: Editor, by: number) {
  const truck = ed.state.document.objects.find((o): o is TruckObject => o.kind === 'truck');
  if (!truck) return;
  if (ed.state.readOnly) {
    const cur = ed.state.scrubSlew ?? truck.boom.slew;
    return ed.set({ scrubSlew: wrap360(cur + by) });
  }
  ed.run(setSlew(truck.boom.slew + by, 'commit'));
}

export function fitToScene(ed: Editor) {
  const ctx = ed.geometry();
  // Long lanes and wire spans would shrink the lift to a speck: with a truck, fit what is near the swing.
  const hasTruck = ed.state.document.objects.some((o) => o.kind === 'truck');
  const wide = (o: (typeof ed.state.document.objects)[number]) => o.kind === 'obstacle' && (o.obstacleKind === 'traffic-lane' || o.obstacleKind === 'power-line');
  const pts = ed.state.document.objects.filter((o) => !(hasTruck && wide(o))).flatMap((o) => footprintsOf(o, ctx).flat());
  const truck = ed.state.document.objects.find((o): o is TruckObject => o.kind === 'truck');
  if (truck && ctx.truck) {
    // Keep the whole boom circle in view, so the swing is visible wherever it goes.
    const hook = hookSitePoint(truck, ctx.truck, truck.boom.slew);
    const r = Math.hypot(hook.x - truck.x, hook.y - truck.y) + 1;
    pts.push({ x: truck.x - r, y: truck.y - r }, { x: truck.x + r, y: truck.y + r });
  }
  ed.set({ camera: fitBounds(boundsOf(pts), ed.state.viewport) });
}

export function zoomBy(ed: Editor, factor: number, at?: { x: number; y: number }) {
  const vp = ed.state.viewport;
  ed.set({ camera: zoomAround(ed.state.camera, vp, at ?? { x: vp.width / 2, y: vp.height / 2 }, factor) });
}
