'use client';
import Link from 'next/link';
import type { RevisionSummary } from '@/lib/replay/headline-figures';
import type { HeadlineFigures } from '@/lib/replay/headline-figures';
import { formatLength, formatPressure } from '@/lib/format/quantity';
import type { UnitSystem } from '@/lib/units';
import { cx } from '@/components/ui/cx';

import { formatDateTime as when } from '@/lib/format/date';

function figureWords(f: HeadlineFigures | null, units: UnitSystem) {
  if (!f) return { pct: '—', pad: '—', gap: '—' };
  return {
    pct: `${f.worstPercentOfTipping.toFixed(1)} %`,
    pad: f.highestPadPressure === null ? '—' : `${formatPressure(f.highestPadPressure, units)} (${f.highestPadPressureSupportName})`,
    gap: f.leastClearance === null ? '—' : `${formatLength(f.leastClearance, units)} (${f.leastClearanceTargetName})`,
  };
}

/** The scene's saves, newest first, with headline figures; open one, or compare it with the one shown. */
export function RevisionTimeline({ sceneId, revisions, shown, compare, units }: { sceneId: number; revisions: RevisionSummary[]; shown: number; compare: number | null; units: UnitSystem }) {
  return (
    <ol className="grid gap-2" data-testid="revision-timeline">
      {revisions.map((r) => {
        const w = figureWords(r.figures, units);
        const isShown = r.revision === shown;
        return (
          <li key={r.revision} className={cx('rounded-plate border-2 p-2 text-sm', isShown ? 'border-ink bg-paper-raised' : r.revision === compare ? 'border-dashed border-ink-soft' : 'border-paper-line')}>
            <div className="flex flex-wrap items-baseline justify-between gap-x-2">
              <span className="font-semibold">Revision {r.revision}</span>
              <span className="text-xs text-ink-muted">
                {when(r.savedAt)} · {r.author} · {r.status}
              </span>
            </div>
            {r.figures ? (
              <p className="mt-0.5 tabular-nums">
                worst {w.pct} · pad {w.pad} · clearance {w.gap}
              </p>
            ) : (
              <p className="mt-0.5 text-ink-muted">{r.problem?.message ?? 'No figures'}</p>
            )}
            <div className="mt-1 flex gap-3">
              {isShown ? (
                <span className="text-xs font-semibold text-teal-dark">shown</span>
              ) : (
                <>
                  <Link className="text-xs font-semibold text-teal-dark underline" href={`/scenes/${sceneId}/replay?revision=${r.revision}`}>
                    Open
                  </Link>
                  <Link className="text-xs font-semibold text-teal-dark underline" href={`/scenes/${sceneId}/replay?revision=${Math.max(shown, r.revision)}&compare=${Math.min(shown, r.revision)}`}>
                    Compare with {shown}
                  </Link>
                </>
              )}
            </div>
          </li>
        );
      })}
    </ol>
  );
}

/** Before and after: the earlier revision's headline figures beside the later one's, with the change. */
export function CompareTable({ before, after, units }: { before: RevisionSummary; after: RevisionSummary; units: UnitSystem }) {
  const b = before.figures;
  const a = after.figures;
  const rows: [string, number | null | undefined, number | null | undefined, (v: number) => string][] = [
    ['Worst % of tipping', b?.worstPercentOfTipping, a?.worstPercentOfTipping, (v) => `${v.toFixed(1)} %`],
    ['Highest pad pressure', b?.highestPadPressure, a?.highestPadPressure, (v) => formatPressure(v, units)],
    ['Least clearance', b?.leastClearance, a?.leastClearance, (v) => formatLength(v, units)],
  ];
  return (
    <table className="w-full text-sm" data-testid="compare-table">
      <caption className="mb-1 text-left font-semibold">
        Revision {before.revision} (faint on the plan) → revision {after.revision}
      </caption>
      <thead>
        <tr className="text-left text-xs uppercase text-ink-muted">
          <th className="py-1">Figure</th>
          <th>Before</th>
          <th>After</th>
          <th>Change</th>
        </tr>
      </thead>
      <tbody className="tabular-nums">
        {rows.map(([name, x, y, f]) => (
          <tr key={name} className="border-t border-paper-line">
            <th className="py-1 text-left font-normal">{name}</th>
            <td>{x == null ? '—' : f(x)}</td>
            <td>{y == null ? '—' : f(y)}</td>
            <td>{x == null || y == null ? '—' : name === 'Worst % of tipping' ? `${y - x >= 0 ? '+' : '−'}${Math.abs(y - x).toFixed(1)} points` : `${y - x >= 0 ? '+' : '−'}${f(Math.abs(y - x))}`}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
