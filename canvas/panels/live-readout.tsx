'use client';
import { lineSubject } from '@/lib/lift';
import { tippingLineWords, tippingMargin } from '@/lib/format/checks';
import { formatPercent } from '@/lib/format/quantity';
import { useEditorState } from '../editor-context';

/** Percent of tipping and the governing line at the slew on screen; follows the scrubber every frame. */
export function LiveReadout() {
  const snap = useEditorState((s) => s.analysis?.snapshot ?? null);
  const prepared = useEditorState((s) => s.analysis?.prepared ?? null);
  const limit = useEditorState((s) => s.document.limits.percentOfTipping);
  if (!snap || !prepared) return null;
  const line = (code: string) => {
    const s = lineSubject(prepared, code);
    return s.line ? tippingLineWords({ names: s.names, side: s.line.side, code }) : code;
  };
  if (!snap.governing) {
    return (
      <span className="rounded bg-over px-2 py-1 text-sm font-semibold text-white" data-testid="live-readout">
        OVER LIMIT: tips about the {line(snap.tipsUnloadedAbout ?? '')} with nothing on the hook
      </span>
    );
  }
  const pct = snap.governing.percentOfTipping;
  const over = pct > limit;
  return (
    <span className={`rounded px-2 py-1 text-sm font-semibold tabular-nums ${over ? 'bg-over text-white' : 'bg-teal-light text-ink'}`} data-testid="live-readout">
      {formatPercent(pct)} of tipping about the {line(snap.governing.line)}
      {over ? ` — OVER LIMIT, ${tippingMargin(pct, limit)}` : ` · ${tippingMargin(pct, limit)}`}
    </span>
  );
}
