'use client';
import { useEditorState } from '../editor-context';
import { screenToWorld, worldToScreen } from '../editor/camera';
import { objectAt } from '@/lib/scene/geometry/footprints';
import { cx } from '@/components/ui/cx';
import type { Anchor, ThreadView } from './use-comments';

/** Where a thread's pin sits on the site: its point, or its object's reference point; null when unpinned or the object is gone. */
export function anchorPoint(anchor: ThreadView['anchor'], objects: readonly { id: string; x: number; y: number }[]): { x: number; y: number } | null {
  if (!anchor) return null;
  if ('x' in anchor) return anchor;
  const o = objects.find((p) => p.id === anchor.objectId);
  return o ? { x: o.x, y: o.y } : null;
}

export interface PinPick {
  point: { x: number; y: number };
  /** The object under the tap, if any: the comment may be attached to it instead of the point. */
  objectId: string | null;
}

/**
 * Comment pins over the plan, as HTML on top of the canvas so they stay tappable and readable at any zoom.
 * Numbered like the thread list. While `placing`, a tap anywhere on the plan picks the point for a new pin.
 */
export function PinLayer({ threads, selected, onSelect, placing, onPick, draft, showResolved }: {
  threads: ThreadView[];
  selected: number | null;
  onSelect: (id: number) => void;
  placing: boolean;
  onPick: (p: PinPick) => void;
  /** The pin being written, drawn where it will go. */
  draft: Anchor | null;
  showResolved: boolean;
}) {
  const camera = useEditorState((s) => s.camera);
  const viewport = useEditorState((s) => s.viewport);
  const objects = useEditorState((s) => s.document.objects);
  const truck = useEditorState((s) => s.truck);
  const at = (p: { x: number; y: number }) => worldToScreen(camera, viewport, p);
  const draftPoint = draft ? anchorPoint(draft, objects) : null;
  return (
    <div className="pointer-events-none absolute inset-0 z-10 overflow-hidden" data-testid="pin-layer">
      {placing && (
        <div
          className="pointer-events-auto absolute inset-0 cursor-crosshair bg-ink/5"
          data-testid="pin-target"
          onClick={(e) => {
            const r = e.currentTarget.getBoundingClientRect();
            const point = screenToWorld(camera, viewport, { x: e.clientX - r.left, y: e.clientY - r.top });
            const hit = objectAt(objects, point, { truck, pxPerM: camera.pxPerM }, 6 / camera.pxPerM);
            onPick({ point: { x: Math.round(point.x * 1000) / 1000, y: Math.round(point.y * 1000) / 1000 }, objectId: hit?.id ?? null });
          }}
        />
      )}
      {threads.map((t, i) => {
        const p = anchorPoint(t.anchor, objects);
        if (!p || (t.resolved && !showResolved)) return null;
        const s = at(p);
        return (
          <button
            key={t.id}
            type="button"
            data-testid="comment-pin"
            data-thread={t.id}
            aria-label={`Comment ${i + 1} by ${t.authorName}${t.resolved ? ' (resolved)' : ''}`}
            onClick={() => onSelect(t.id)}
            style={{ left: s.x, top: s.y }}
            className={cx(
              'pointer-events-auto absolute flex h-8 min-w-8 -translate-y-full items-center justify-center rounded-t-full rounded-br-full border-2 px-1 text-sm font-bold shadow',
              'rotate-0 [border-bottom-left-radius:0]',
              t.resolved ? 'border-ink-muted bg-paper-sunk text-ink-muted' : 'border-ink bg-signal text-ink',
              selected === t.id && 'outline outline-4 outline-teal',
            )}
          >
            {i + 1}
          </button>
        );
      })}
      {draftPoint && (
        <span
          aria-hidden
          style={{ left: at(draftPoint).x, top: at(draftPoint).y }}
          className="absolute flex h-8 min-w-8 -translate-y-full items-center justify-center rounded-t-full rounded-br-full border-2 border-dashed border-ink bg-paper-raised px-1 text-sm font-bold [border-bottom-left-radius:0]"
        >
          +
        </span>
      )}
    </div>
  );
}
