'use client';
import { useEffect, useRef } from 'react';
import { Group, Layer, Stage } from 'react-konva';
import { EditorContext, useEditorContext, useEditorState } from '../editor-context';
import { GridLayer } from '../view/grid-layer';
import { SceneLayer } from '../view/scene-layer';
import { LiveLayer } from '../view/live-layer';
import { LabelLayer } from '../view/label-layer';
import { WorldGroup } from '../view/plan-view';
import { BoomShape } from '../shapes/truck/boom-shape';
import { zoomAround } from '../editor/camera';
import { useFontGeneration } from '../view/use-font-generation';
import type { Editor } from '../editor/editor';
import type { EditorStore } from '../store/editor-store';
import type { LoadObject, TruckObject } from '@/lib/scene/objects';
import { LoadHangingShape } from '../shapes/load/load-shape';
import { hookSitePoint } from '@/lib/scene/geometry/truck';

/**
 * The replay's plan, drawn with the editor's own shapes. Layers by how often they change: the grid and
 * the site (obstacles, trailers, truck body, the load at rest) are their own canvases and redraw only when
 * the view moves; each frame redraws only the live layer (boom, hanging load, overlays, labels). A
 * compared revision is drawn faint under the shown one, in its own layer.
 */
export function ReplayPlan({ ghost, hideResults = false }: { ghost: { store: EditorStore; editor: Editor } | null; hideResults?: boolean }) {
  const { store } = useEditorContext();
  const ref = useRef<HTMLDivElement>(null);
  const camera = useEditorState((s) => s.camera);
  const viewport = useEditorState((s) => s.viewport);
  const grid = useEditorState((s) => s.document.grid);
  const units = useEditorState((s) => s.units);
  const fonts = useFontGeneration();

  useEffect(() => {
    const el = ref.current;
    if (!el) return;
    const size = () => store.getState().set({ viewport: { width: el.clientWidth, height: el.clientHeight } });
    const ro = new ResizeObserver(size);
    ro.observe(el);
    size();
    const onWheel = (e: WheelEvent) => {
      e.preventDefault();
      const r = el.getBoundingClientRect();
      const s = store.getState();
      s.set({ camera: zoomAround(s.camera, s.viewport, { x: e.clientX - r.left, y: e.clientY - r.top }, Math.exp(-e.deltaY * 0.0015)) });
    };
    el.addEventListener('wheel', onWheel, { passive: false });
    return () => {
      ro.disconnect();
      el.removeEventListener('wheel', onWheel);
    };
  }, [store]);

  // The ghost follows the shown revision's camera and slew.
  useEffect(() => {
    if (!ghost) return;
    const sync = () => {
      const s = store.getState();
      ghost.store.setState({ camera: s.camera, viewport: s.viewport, scrubSlew: s.scrubSlew, units: s.units });
    };
    sync();
    return store.subscribe(sync);
  }, [ghost, store]);

  return (
    <div ref={ref} data-testid="replay-plan" className="relative h-full w-full touch-none select-none overflow-hidden [font-feature-settings:normal]">
      <Stage width={viewport.width} height={viewport.height} listening={false}>
        <GridLayer key={`grid-${fonts}`} camera={camera} viewport={viewport} grid={grid} units={units} />
        {ghost && (
          <EditorContext.Provider value={ghost}>
            <Layer listening={false} opacity={0.32}>
              <WorldGroup>
                <SceneLayer />
                <GhostBoom />
              </WorldGroup>
            </Layer>
          </EditorContext.Provider>
        )}
        <Layer listening={false}>
          <WorldGroup>
            <SceneLayer />
          </WorldGroup>
        </Layer>
        {hideResults ? (
          // While a class predicts, only the boom and the load move: no tipping lines, worst-case ray or labels.
          <Layer listening={false}>
            <WorldGroup>
              <MovingOnly />
            </WorldGroup>
          </Layer>
        ) : (
          <Layer key={`live-${fonts}`} listening={false}>
            <WorldGroup>
              <LiveLayer />
            </WorldGroup>
            <LabelLayer />
          </Layer>
        )}
      </Stage>
    </div>
  );
}

function MovingOnly() {
  const doc = useEditorState((s) => s.document);
  const model = useEditorState((s) => s.truck);
  const slew = useEditorState((s) => s.scrubSlew);
  const pxPerM = useEditorState((s) => s.camera.pxPerM);
  const truck = doc.objects.find((o): o is TruckObject => o.kind === 'truck');
  const load = doc.objects.find((o): o is LoadObject => o.kind === 'load');
  if (!truck || !model || slew === null) return null;
  return (
    <>
      <BoomShape truck={truck} model={model} slew={slew} pxPerM={pxPerM} />
      {load && <LoadHangingShape load={load} at={hookSitePoint(truck, model, slew)} rotation={load.rotation + (slew - doc.swing.from)} />}
    </>
  );
}

function GhostBoom() {
  const truck = useEditorState((s) => s.document.objects.find((o): o is TruckObject => o.kind === 'truck'));
  const model = useEditorState((s) => s.truck);
  const slew = useEditorState((s) => s.scrubSlew);
  const pxPerM = useEditorState((s) => s.camera.pxPerM);
  if (!truck || !model) return null;
  return (
    <Group listening={false}>
      <BoomShape truck={truck} model={model} slew={slew ?? truck.boom.slew} pxPerM={pxPerM} />
    </Group>
  );
}
