'use client';
import { useEditorState } from '../editor-context';
import { M_PER_FT } from '@/lib/units';
import { formatNumber } from '@/lib/format/number';

/** A round length 80–200 px long at the current scale. */
export function niceScale(pxPerM: number, metric: boolean): { metres: number; label: string } {
  const unit = metric ? 1 : M_PER_FT;
  const steps = [1, 2, 5, 10, 20, 25, 50, 100, 200, 250, 500, 1000, 2000, 5000];
  const n = steps.find((s) => s * unit * pxPerM >= 80) ?? steps[steps.length - 1];
  return { metres: n * unit, label: `${formatNumber(n)} ${metric ? 'm' : 'ft'}` };
}

/** Scale bar (bottom left) and north arrow (top right); the site frame has north up. */
export function ScaleBar() {
  const pxPerM = useEditorState((s) => s.camera.pxPerM);
  const metric = useEditorState((s) => s.units === 'metric');
  const grid = useEditorState((s) => s.document.grid);
  const { metres, label } = niceScale(pxPerM, metric);
  const w = metres * pxPerM;
  return (
    <>
      <div className="pointer-events-none absolute bottom-3 left-3 rounded bg-paper-raised/90 px-2 py-1 text-xs text-ink shadow-sm" data-testid="scale-bar">
        <div className="flex items-end gap-2">
          <div style={{ width: w }} className="h-2 border-x-2 border-b-2 border-ink" />
          <span className="font-semibold tabular-nums">{label}</span>
        </div>
        <div className="mt-0.5 text-[11px] text-ink-muted">Grid {metric ? `${formatNumber(grid, 2)} m` : `${formatNumber(grid / M_PER_FT, 1)} ft`}</div>
      </div>
      <div className="pointer-events-none absolute right-3 top-3 flex flex-col items-center rounded-full bg-paper-raised/90 p-1.5 shadow-sm" aria-label="North is up">
        <svg width="28" height="34" viewBox="0 0 28 34" aria-hidden="true">
          <path d="M14 2 L24 30 L14 23 L4 30 Z" fill="#15202B" />
          <path d="M14 2 L14 23 L4 30 Z" fill="#F2A900" />
        </svg>
        <span className="text-xs font-bold">N</span>
      </div>
    </>
  );
}
