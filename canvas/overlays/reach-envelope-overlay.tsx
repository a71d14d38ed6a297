'use client';
import { Shape } from 'react-konva';
import type { Context } from 'konva/lib/Context';
import type { EnvelopeShapes } from '@/lib/envelope';
import type { TruckObject } from '@/lib/scene/objects';
import { useEditorState } from '../editor-context';
import { PAL } from '../view/palette';
import { useEnvelopeState } from './reach-envelope-store';

/** Fills and lines of the envelope (world group, metres). Margin bands: teal deep to light, amber where near the limit. */
export const ENVELOPE_STYLE = {
  ample: { fill: PAL.teal, alpha: 0.26 },
  fair: { fill: PAL.teal, alpha: 0.13 },
  near: { fill: PAL.amber, alpha: 0.34 },
  cut: { fill: PAL.over, alpha: 0.3 },
  tipping: { stroke: PAL.teal, dash: [] as number[], width: 2.5 },
  chart: { stroke: '#6B4FA0', dash: [9, 5], width: 2.5 },
  reach: { stroke: PAL.inkSoft, dash: [2, 4], width: 2 },
} as const;

/**
 * One path of many cell polygons, for fill and clip only: both close every subpath themselves, and an
 * explicit closePath per cell (thousands of them) cost about 40 ms a frame in Chromium's canvas.
 */
function polys(c: CanvasRenderingContext2D, list: number[][]) {
  c.beginPath();
  for (const p of list) {
    c.moveTo(p[0], p[1]);
    for (let i = 2; i < p.length; i += 2) c.lineTo(p[i], p[i + 1]);
  }
}

function draw(c: CanvasRenderingContext2D, s: EnvelopeShapes, pxPerM: number) {
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
    const R = 60;
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

/** The reach envelope on the plan, drawn round the truck where it stands now (the envelope is in its own frame). */
export function ReachEnvelopeOverlay() {
  const on = useEnvelopeState((s) => s.on);
  const shapes = useEnvelopeState((s) => s.shapes);
  const truck = useEditorState((s) => s.document.objects.find((o): o is TruckObject => o.kind === 'truck'));
  const pxPerM = useEditorState((s) => s.camera.pxPerM);
  if (!on || !shapes || !truck) return null;
  const heading = (truck.rotation * Math.PI) / 180;
  return (
    <Shape
      listening={false}
      perfectDrawEnabled={false}
      sceneFunc={(ctx: Context) => {
        const c = ctx._context;
        c.save();
        c.translate(truck.x, truck.y);
        c.rotate(heading);
        draw(c, shapes, pxPerM);
        c.restore();
      }}
    />
  );
}
