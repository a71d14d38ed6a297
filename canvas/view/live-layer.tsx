'use client';
import { Circle, Line, Rect, Group } from 'react-konva';
import { useEditorContext, useEditorState } from '../editor-context';
import { BoomShape } from '../shapes/truck/boom-shape';
import { LoadHangingShape } from '../shapes/load/load-shape';
import { hookSitePoint } from '@/lib/scene/geometry/truck';
import { footprintsOf } from '@/lib/scene/geometry/footprints';
import { PAL } from './palette';
import { useDisplaySlew } from './use-display-slew';
import { AnalysisOverlays } from '../overlays/analysis-overlays';
import { ReachEnvelopeOverlay } from '../overlays/reach-envelope-overlay';
import { MovingObjects } from './scene-layer';
import type { LoadObject, TruckObject } from '@/lib/scene/objects';

const flat = (poly: { x: number; y: number }[]) => poly.flatMap((p) => [p.x, p.y]);

/** What moves: objects being dragged, the analysis overlays, the boom and the hanging load, the selection and its handles. */
export function LiveLayer() {
  const { editor } = useEditorContext();
  const doc = useEditorState((s) => s.document);
  const model = useEditorState((s) => s.truck);
  const selection = useEditorState((s) => s.selection);
  const pxPerM = useEditorState((s) => s.camera.pxPerM);
  const marquee = useEditorState((s) => s.marquee);
  const draft = useEditorState((s) => s.draft);
  useEditorState((s) => s.readOnly);
  const slew = useDisplaySlew();
  const truck = doc.objects.find((o): o is TruckObject => o.kind === 'truck');
  const load = doc.objects.find((o): o is LoadObject => o.kind === 'load');
  const ctx = { truck: model, pxPerM };
  const hook = truck && model && slew !== null ? hookSitePoint(truck, model, slew) : null;
  const handles = editor.handles();
  return (
    <>
      <MovingObjects />
      <ReachEnvelopeOverlay />
      <AnalysisOverlays />
      {doc.objects
        .filter((o) => selection.includes(o.id))
        .flatMap((o) =>
          footprintsOf(o, ctx).map((poly, i) => (
            <Line key={`${o.id}-${i}`} points={flat(poly)} closed stroke={o.locked ? PAL.muted : PAL.select} strokeWidth={2.5} dash={o.locked ? [4, 4] : undefined} strokeScaleEnabled={false} />
          )),
        )}
      {truck && model && slew !== null && <BoomShape truck={truck} model={model} slew={slew} pxPerM={pxPerM} />}
      {load && hook && slew !== null && <LoadHangingShape load={load} at={hook} rotation={load.rotation + (slew - doc.swing.from)} />}
      {handles.map((h, i) => (
        <Group key={i}>
          <Circle
            x={h.at.x}
            y={h.at.y}
            radius={(h.kind === 'boom-tip' ? 13 : 10) / pxPerM}
            fill={h.kind === 'boom-tip' ? PAL.amber : PAL.paper}
            stroke={h.kind === 'boom-tip' ? PAL.ink : PAL.teal}
            strokeWidth={2.5}
            strokeScaleEnabled={false}
            perfectDrawEnabled={false} opacity={h.kind === 'boom-tip' ? 0.95 : 1}
          />
          {h.kind === 'rotate' && <Circle x={h.at.x} y={h.at.y} radius={4 / pxPerM} fill={PAL.teal} />}
        </Group>
      ))}
      {draft.length > 0 && <Line points={flat(draft)} stroke={PAL.teal} strokeWidth={2} dash={[6, 4]} strokeScaleEnabled={false} />}
      {draft.map((p, i) => (
        <Circle key={`d${i}`} x={p.x} y={p.y} radius={5 / pxPerM} fill={PAL.teal} />
      ))}
      {marquee && (
        <Rect
          x={Math.min(marquee.x0, marquee.x1)}
          y={Math.min(marquee.y0, marquee.y1)}
          width={Math.abs(marquee.x1 - marquee.x0)}
          height={Math.abs(marquee.y1 - marquee.y0)}
          stroke={PAL.teal}
          strokeWidth={1.5}
          dash={[5, 4]}
          fill={PAL.tealLight}
          perfectDrawEnabled={false} opacity={0.5}
          strokeScaleEnabled={false}
        />
      )}
    </>
  );
}
