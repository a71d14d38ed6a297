'use client';
import { useEffect, useRef } from 'react';
import { Stage, Layer, Group } from 'react-konva';
import { useEditorContext, useEditorState } from '../editor-context';
import { GridLayer } from './grid-layer';
import { SceneLayer } from './scene-layer';
import { LiveLayer } from './live-layer';
import { LabelLayer } from './label-layer';
import { PinchTracker } from './gestures';
import { zoomAround } from '../editor/camera';
import type { PointerInfo } from '../tools/tool-state';
import { BackgroundImageNode } from '../background/background-image-node';
import { useFontGeneration } from './use-font-generation';
import { GestureReadout } from './gesture-readout';

/** The plan view: a true-scale Konva stage. All hit-testing is the editor's own (footprint polygons). */
export function PlanView() {
  const { editor, store } = useEditorContext();
  const ref = useRef<HTMLDivElement>(null);
  const pinch = useRef(new PinchTracker());
  const camera = useEditorState((s) => s.camera);
  const viewport = useEditorState((s) => s.viewport);
  const grid = useEditorState((s) => s.document.grid);
  const units = useEditorState((s) => s.units);
  const toolPath = useEditorState((s) => s.toolPath);
  const background = useEditorState((s) => s.document.background);
  const sceneId = useEditorState((s) => s.sceneId);
  const fonts = useFontGeneration();

  useEffect(() => {
    const el = ref.current;
    if (!el) return;
    const ro = new ResizeObserver(() => store.getState().set({ viewport: { width: el.clientWidth, height: el.clientHeight } }));
    ro.observe(el);
    store.getState().set({ viewport: { width: el.clientWidth, height: el.clientHeight } });
    // Wheel zoom around the pointer; a non-passive listener so the page itself does not scroll.
    const onWheel = (e: WheelEvent) => {
      e.preventDefault();
      const r = el.getBoundingClientRect();
      const s = store.getState();
      const factor = Math.exp(-e.deltaY * (e.ctrlKey ? 0.01 : 0.0015));
      s.set({ camera: zoomAround(s.camera, s.viewport, { x: e.clientX - r.left, y: e.clientY - r.top }, factor) });
    };
    el.addEventListener('wheel', onWheel, { passive: false });
    return () => {
      ro.disconnect();
      el.removeEventListener('wheel', onWheel);
    };
  }, [store]);

  const info = (e: React.PointerEvent | React.MouseEvent): PointerInfo => {
    const r = ref.current!.getBoundingClientRect();
    return editor.pointerInfo(
      { x: e.clientX - r.left, y: e.clientY - r.top },
      { shift: e.shiftKey, alt: e.altKey, mod: e.ctrlKey || e.metaKey, button: e.button, pointerType: 'pointerType' in e ? (e.pointerType as PointerInfo['pointerType']) : 'mouse' },
    );
  };

  const cursor = toolPath.startsWith('hand') ? (toolPath === 'hand.panning' ? 'grabbing' : 'grab') : toolPath.startsWith('place') || toolPath.startsWith('tape') ? 'crosshair' : 'default';

  // Canvases in the page take the page's font features (tabular figures); Konva measures text on a canvas
  // outside the page, without them. The plan view turns them off so a label's box fits the text drawn.
  return (
    <div
      ref={ref}
      data-testid="plan-view"
      className="relative h-full w-full touch-none select-none overflow-hidden bg-paper [font-feature-settings:normal]"
      style={{ cursor }}
      onPointerDown={(e) => {
        try {
          ref.current!.setPointerCapture(e.pointerId);
        } catch {
          // A pointer the browser no longer tracks (or a synthetic one) cannot be captured; carry on.
        }
        const i = info(e);
        if (e.pointerType === 'touch' && pinch.current.down(editor, e.pointerId, i.screen)) return;
        editor.pointerDown(i);
      }}
      onPointerMove={(e) => {
        const i = info(e);
        if (e.pointerType === 'touch' && pinch.current.move(editor, e.pointerId, i.screen)) return;
        editor.pointerMove(i);
      }}
      onPointerUp={(e) => {
        const i = info(e);
        if (e.pointerType === 'touch' && pinch.current.up(e.pointerId)) return;
        editor.pointerUp(i);
      }}
      onPointerCancel={(e) => {
        pinch.current.up(e.pointerId);
        editor.cancel();
      }}
      onDoubleClick={(e) => editor.doubleClick(info(e))}
      onContextMenu={(e) => e.preventDefault()}
    >
      <Stage width={viewport.width} height={viewport.height} listening={false}>
        {background && sceneId !== null && (
          <Layer listening={false}>
            <BackgroundImageNode sceneId={sceneId} background={background} camera={camera} viewport={viewport} />
          </Layer>
        )}
        <GridLayer key={`grid-${fonts}`} camera={camera} viewport={viewport} grid={grid} units={units} />
        <Layer listening={false}>
          <WorldGroup>
            <SceneLayer />
          </WorldGroup>
        </Layer>
        {/* What changes with the slew, and the labels, share one canvas: one less full-view composite a frame. */}
        <Layer key={`live-${fonts}`} listening={false}>
          <WorldGroup>
            <LiveLayer />
          </WorldGroup>
          <LabelLayer />
        </Layer>
      </Stage>
      <GestureReadout />
    </div>
  );
}

/** Site metres (y north) inside, screen pixels (y down) outside. */
export function WorldGroup({ children }: { children: React.ReactNode }) {
  const camera = useEditorState((s) => s.camera);
  const vp = useEditorState((s) => s.viewport);
  return (
    <Group x={vp.width / 2 - camera.x * camera.pxPerM} y={vp.height / 2 + camera.y * camera.pxPerM} scaleX={camera.pxPerM} scaleY={-camera.pxPerM} listening={false}>
      {children}
    </Group>
  );
}
