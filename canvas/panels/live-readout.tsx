'use client';
import { lineSubject } from '@/lib/lift';
import { tippingLineWords, tippingMargin } from '@/lib/format/checks';
import { formatPercent } from '@/lib/format/quantity';
import { useEditorState } from '../editor-context';
import { overAtSlew, overWords } from '../analysis/over-at-slew';

/**
 * Percent of tipping and the governing line at the slew on screen; follows the scrubber every frame. It
 * turns red when anything is over the plan's limits at that slew, inside the planned swing or not.
 */
export function LiveReadout() {
  const snap = useEditorState((s) => s.analysis?.snapshot ?? null);
  const prepared = useEditorState((s) => s.analysis?.prepared ?? null);
  const limit = useEditorState((s) => s.document.limits.percentOfTipping);
  if (!snap || !prepared) return null;
  const line = (code: string) => {
    const s = lineSubject(prepared, code);
    return s.line ? tippingLineWords({ names: s.names, side: s.line.side, code }) : code;
  };
  const over = overAtSlew(prepared, snap);
  const others = overWords(over);
  const red = over.tipping || others.length > 0;
  const rest = others.length ? ` — OVER LIMIT: ${others.join(', ')}` : '';
  const text = !snap.governing
    ? `OVER LIMIT: tips about the ${line(snap.tipsUnloadedAbout ?? '')} with nothing on the hook${rest}`
    : `${formatPercent(snap.governing.percentOfTipping)} of tipping about the ${line(snap.governing.line)}${over.tipping ? ` — OVER LIMIT, ${tippingMargin(snap.governing.percentOfTipping, limit)}` : ` · ${tippingMargin(snap.governing.percentOfTipping, limit)}`}${rest}`;
  return (
    <span className={`rounded px-2 py-1 text-sm font-semibold tabular-nums ${red ? 'bg-over text-white' : 'bg-teal-light text-ink'}`} data-testid="live-readout" data-over={red}>
      {text}
    </span>
  );
}
