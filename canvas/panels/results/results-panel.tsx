'use client';
import { useEditorState } from '../../editor-context';
import { CautionNote } from '@/components/caution-note';
import { TippingChart } from './tipping-chart';
import { ChecksList } from './checks-list';
import { PadTable } from './pad-table';
import { WeightSensitivityPanel } from './weight-sensitivity';
import { checksHeadline, tippingLineWords } from '@/lib/format/checks';
import { formatAngle, formatLength, formatMass, formatPercent } from '@/lib/format/quantity';
import type { LiftResult } from '@/lib/lift';

/** The worst case's tipping line by its pads' names, with its short code second. */
function lineWords(r: LiftResult, code: string): string {
  const l = r.tippingLines.find((x) => x.id === code);
  return l ? tippingLineWords({ names: l.names, side: l.side, code }) : code;
}

/** Every check with value, limit, unit and a sentence; the chart; pads; and the standing caution. */
export function ResultsPanel() {
  const a = useEditorState((s) => s.analysis);
  const doc = useEditorState((s) => s.document);
  const units = useEditorState((s) => s.units);
  const gesture = useEditorState((s) => s.gestureBase !== null);
  const body = (() => {
    if (!a) return <p className="text-sm text-ink-muted">Working…</p>;
    if (!a.lift.ok) return <p className="rounded-md border border-paper-line bg-paper p-3 text-sm" data-testid="results-problem">{a.lift.problem.message}</p>;
    if (a.error) {
      return (
        <p className="rounded-md border-2 border-over bg-over-light p-3 text-sm" data-testid="results-error">
          <strong>OVER LIMIT — cannot be computed as planned:</strong> {a.error.message}
        </p>
      );
    }
    const r = a.result;
    if (!r) return <p className="text-sm text-ink-muted">{gesture ? 'Results follow when you let go.' : 'Computing the swing…'}</p>;
    const over = r.checks.some((c) => c.status === 'beyond');
    const limit = doc.limits.percentOfTipping;
    return (
      <>
        <div className={`mb-3 rounded-md border-2 p-3 ${over ? 'border-over bg-over-light' : 'border-within bg-within-light'}`} data-testid="results-summary">
          <p className="text-sm font-semibold" data-testid="results-headline">{checksHeadline(r.checks)}</p>
          <p className="mt-1 text-sm" data-testid="worst-case">
            Worst case: <strong data-testid="worst-percent">{formatPercent(r.worstCase.percentOfTipping)}</strong> of tipping about the <strong data-testid="worst-line">{lineWords(r, r.worstCase.line)}</strong> at slew{' '}
            <strong data-testid="worst-slew">{formatAngle(r.worstCase.slew)}</strong> (limit {formatPercent(limit, 0)}).
          </p>
          <p className="mt-1 text-xs text-ink-soft">
            Hook load {formatMass(r.hook.hookLoad, units)} at {formatLength(r.hook.radius, units)} radius; boom tip {formatLength(r.hook.tipHeight, units)} up.
          </p>
          {r.upperWeight && (
            <p className="mt-1 text-xs text-ink-soft">
              At the upper weight ({formatMass(r.upperWeight.loadMass, units)}): {formatPercent(r.upperWeight.worstCase.percentOfTipping)} about the {lineWords(r, r.upperWeight.worstCase.line)}.
            </p>
          )}
        </div>
        <WeightSensitivityPanel r={r} units={units} tippingLimit={limit} chartLimit={doc.limits.percentOfRated} allowable={doc.soil.allowable} />
        <TippingChart result={r} limit={limit} slewNow={a.slew} from={doc.swing.from} direction={doc.swing.direction} />
        <PadTable result={r} snapshot={a.snapshot} units={units} allowable={doc.soil.allowable} />
        <ChecksList checks={r.checks} units={units} />
      </>
    );
  })();
  return (
    <div data-testid="results-panel">
      {body}
      <CautionNote compact className="mt-4" />
    </div>
  );
}
