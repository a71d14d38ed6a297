'use client';
import { useEditorState } from '../editor-context';
import { worldToScreen } from '../editor/camera';
import { headingOf } from '../panels/inspector/object-fields';
import { formatLength } from '@/lib/format/quantity';
import { formatNumber } from '@/lib/format/number';
import { footprintsOf } from '@/lib/scene/geometry/footprints';

/** Gap, px, between the object's drawn outline and the readout above (or below) it. */
const GAP = 12;
/** Room the readout needs above an outline, px; with less it goes below. */
const TAG_H = 64;

/**
 * While an object is being turned or moved on the plan, its compass heading (and, moving, its position)
 * in a tag just above it: the figure the inspector would show, without looking away from the plan. Drawn
 * in the page over the canvas, so it reads like any other text and tests can find it.
 */
export function GestureReadout() {
  const toolPath = useEditorState((s) => s.toolPath);
  const selection = useEditorState((s) => s.selection);
  const objects = useEditorState((s) => s.document.objects);
  const camera = useEditorState((s) => s.camera);
  const vp = useEditorState((s) => s.viewport);
  const units = useEditorState((s) => s.units);
  const model = useEditorState((s) => s.truck);
  const turning = toolPath === 'select.rotating';
  if (!turning && toolPath !== 'select.dragging') return null;
  const o = objects.find((q) => selection.includes(q.id) && q.kind !== 'tape' && !q.locked);
  if (!o) return null;
  // Clear of the object's outline (a truck is long: the tag must not hide its cab), centred over it.
  const pts = footprintsOf(o, { truck: model, pxPerM: camera.pxPerM }).flat().map((q) => worldToScreen(camera, vp, q));
  const ref = worldToScreen(camera, vp, o);
  const top = pts.length ? Math.min(...pts.map((q) => q.y)) : ref.y;
  const bottom = pts.length ? Math.max(...pts.map((q) => q.y)) : ref.y;
  const above = top - GAP >= TAG_H;
  const x = Math.min(Math.max(ref.x, 110), Math.max(110, vp.width - 110));
  const y = above ? top - GAP : Math.min(bottom + GAP, vp.height - TAG_H);
  const heading = `${formatNumber(headingOf(o.rotation), 0)}°`;
  const what = o.kind === 'truck' ? 'Cab heading' : 'Turned to';
  return (
    <div
      data-testid="gesture-readout"
      aria-live="off"
      data-side={above ? 'above' : 'below'}
      className={`pointer-events-none absolute z-10 -translate-x-1/2 ${above ? '-translate-y-full' : ''} whitespace-nowrap rounded-plate border-2 border-ink bg-paper-raised px-2.5 py-1 text-center shadow-plate`}
      style={{ left: x, top: y }}
    >
      {turning ? (
        <>
          <p className="text-heading font-bold tabular-nums text-ink" data-testid="gesture-heading">
            {what} {heading}
          </p>
          <p className="text-caption text-ink-muted">from north, clockwise</p>
        </>
      ) : (
        <>
          <p className="text-label font-bold tabular-nums text-ink">
            E {formatLength(o.x, units)} · N {formatLength(o.y, units)}
          </p>
          <p className="text-caption text-ink-muted" data-testid="gesture-heading">
            {what} {heading} from north
          </p>
        </>
      )}
    </div>
  );
}
