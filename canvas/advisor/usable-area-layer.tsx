'use client';
import { useEditorContext, useEditorState } from '../editor-context';
import { screenToWorld, worldToScreen } from '../editor/camera';
import { useUsableAreaDraft } from './usable-area-store';
import { finishUsableArea } from './usable-area-actions';

/**
 * Over the plan: the marked usable area as a dashed outline, and while marking, a layer that takes each
 * tap as a corner (a tap on the first corner, or Done in the panel, closes it).
 */
export function UsableAreaLayer() {
  const { editor } = useEditorContext();
  const area = useEditorState((s) => s.document.usableArea);
  const camera = useEditorState((s) => s.camera);
  const vp = useEditorState((s) => s.viewport);
  const { drawing, points, set } = useUsableAreaDraft();
  const shown = drawing ? points : (area ?? []);
  if (!drawing && shown.length < 3) return null;
  const px = shown.map((p) => worldToScreen(camera, vp, p));
  const path = px.map((p) => `${p.x},${p.y}`).join(' ');
  return (
    <div
      className={`absolute inset-0 ${drawing ? 'z-20 cursor-crosshair' : 'pointer-events-none z-10'}`}
      data-testid="usable-area-layer"
      onPointerDown={(e) => {
        if (!drawing) return;
        const r = e.currentTarget.getBoundingClientRect();
        const s = { x: e.clientX - r.left, y: e.clientY - r.top };
        if (px.length >= 3 && Math.hypot(s.x - px[0].x, s.y - px[0].y) < 16) return finishUsableArea(editor);
        const w = screenToWorld(camera, vp, s);
        set({ points: [...points, { x: Math.round(w.x * 100) / 100, y: Math.round(w.y * 100) / 100 }] });
      }}
    >
      <svg className="pointer-events-none absolute inset-0 h-full w-full" aria-hidden>
        {drawing ? (
          <polyline points={path} fill="rgba(20,120,110,0.10)" stroke="#0f766e" strokeWidth={2} strokeDasharray="6 4" />
        ) : (
          <polygon points={path} fill="rgba(20,120,110,0.06)" stroke="#0f766e" strokeWidth={1.5} strokeDasharray="8 5" />
        )}
        {drawing && px.map((p, i) => <circle key={i} cx={p.x} cy={p.y} r={i === 0 ? 7 : 5} fill={i === 0 ? '#0f766e' : '#fff'} stroke="#0f766e" strokeWidth={2} />)}
      </svg>
      {drawing && (
        <p className="pointer-events-none absolute left-1/2 top-3 -translate-x-1/2 rounded-md bg-ink px-3 py-1.5 text-sm text-white shadow">
          Tap the corners of the ground the truck may use{points.length >= 3 ? '; tap the first corner to finish' : ''}
        </p>
      )}
    </div>
  );
}
