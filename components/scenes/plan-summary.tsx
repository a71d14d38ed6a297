import type { Check, LiftResult } from '@/lib/lift';
import type { UnitSystem } from '@/lib/units';
import type { PlanDrawing } from '@/canvas/export/drawing-types';
import { planSvg } from '@/canvas/export/plan-svg';
import { checksHeadline, describeCheck } from '@/lib/format/checks';
import { formatLength, formatPercent } from '@/lib/format/quantity';
import { planFigures } from '@/lib/scene/plan-figures';
import { CautionNote } from '@/components/caution-note';
import { Notice } from '@/components/ui/notice';
import { cx } from '@/components/ui/cx';

interface Props {
  revision: number;
  title: string;
  units: UnitSystem;
  result: LiftResult | null;
  /** Why there are no figures (an unfinished sketch), when `result` is null. */
  problem: string | null;
  drawing: PlanDrawing | null;
}

/** The nominal-weight check of a kind that governs: the largest ratio (the smallest figure for clearances). */
function governing(checks: readonly Check[], code: Check['code']): Check | null {
  let best: Check | null = null;
  for (const c of checks) {
    if (c.code !== code || c.upperWeight || c.value === null) continue;
    const worse = code === 'clearance' ? (best?.value ?? Infinity) > c.value : (best?.ratio ?? -Infinity) < (c.ratio ?? -Infinity);
    if (!best || worse) best = c;
  }
  return best;
}

/**
 * The details page's plan summary: a thumbnail of the plan drawing (the PDF's own drawing, as SVG), the
 * three headline figures with the sentence of the check that governs each, and the caution beside them.
 */
export function PlanSummary({ revision, title, units, result, problem, drawing }: Props) {
  const svg = drawing ? planSvg(drawing, title) : null;
  const thumb = svg && (
    // eslint-disable-next-line @next/next/no-img-element -- an inline SVG document, not an optimisable photo
    <img
      src={`data:image/svg+xml;charset=utf-8,${encodeURIComponent(svg)}`}
      alt={`Plan drawing of revision ${revision}: truck, pads, load, swing and tipping lines`}
      className="aspect-square w-full max-w-[22rem] rounded-plate border border-paper-line bg-white"
      data-testid="plan-thumbnail"
    />
  );
  if (!result) {
    return (
      <div className="flex flex-col gap-4">
        {thumb}
        <Notice tone="info" title="No figures yet">
          {problem ?? 'This revision has nothing to compute yet.'} Open the scene in the editor to finish the sketch.
        </Notice>
      </div>
    );
  }
  const f = planFigures(result);
  const rows = [
    { label: 'Worst % of tipping', value: f.percentOfTipping === null ? '—' : formatPercent(f.percentOfTipping, 1), check: governing(result.checks, 'stability') },
    { label: 'Highest ground pressure', value: f.percentOfBearing === null ? '—' : `${formatPercent(f.percentOfBearing, 0)} of allowable`, check: governing(result.checks, 'bearing') },
    { label: 'Least clearance', value: f.leastClearance === null ? '—' : formatLength(f.leastClearance, units), check: governing(result.checks, 'clearance') },
  ];
  return (
    <div className="grid gap-5 md:grid-cols-[minmax(0,22rem)_minmax(0,1fr)]">
      {thumb}
      <div className="flex min-w-0 flex-col gap-4">
        <p className={cx('text-lead font-bold', f.beyond > 0 ? 'text-over' : 'text-ink')} data-testid="plan-headline">
          {checksHeadline(result.checks.filter((c) => !c.upperWeight))}
        </p>
        <dl className="flex flex-col gap-3" data-testid="plan-figures">
          {rows.map((r) => (
            <div key={r.label}>
              <dt className="text-label text-ink-muted">{r.label}</dt>
              <dd className={cx('text-heading tabular-nums', r.check?.status === 'beyond' && 'text-over')}>{r.value}</dd>
              {r.check && <dd className="text-caption text-ink-soft">{describeCheck(r.check, units).sentence}</dd>}
            </div>
          ))}
        </dl>
        <CautionNote compact />
      </div>
    </div>
  );
}
