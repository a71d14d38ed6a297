'use client';
import { useEditorState } from '../editor-context';

/** Percent of tipping and the governing line at the slew on screen; follows the scrubber every frame. */
export function LiveReadout() {
  const snap = useEditorState((s) => s.analysis?.snapshot ?? null);
  const limit = useEditorState((s) => s.document.limits.percentOfTipping);
  if (!snap) return null;
  if (!snap.governing) {
    return (
      <span className="rounded bg-over px-2 py-1 text-sm font-semibold text-white" data-testid="live-readout">
        OVER LIMIT: tips about {snap.tipsUnloadedAbout} with nothing on the hook
      </span>
    );
  }
  const over = snap.governing.percentOfTipping > limit;
  return (
    <span className={`rounded px-2 py-1 text-sm font-semibold tabular-nums ${over ? 'bg-over text-white' : 'bg-teal-light text-ink'}`} data-testid="live-readout">
      {snap.governing.percentOfTipping.toFixed(1)} % of tipping about {snap.governing.line}
      {over ? ' — OVER LIMIT' : ` · margin ${(limit - snap.governing.percentOfTipping).toFixed(1)} pts`}
    </span>
  );
}
