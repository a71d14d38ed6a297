import type { PlacementFigures, Proposal } from '@/lib/advisor/types';
import { formatLength, formatPercent, formatPressure } from '@/lib/format/quantity';
import type { UnitSystem } from '@/lib/units';

/** A margin in words: how much of the limit is left, and which check leaves the least. */
export function marginWords(m: Proposal['leastMargin']): string {
  const [code, subject, extra] = m.check.split(':');
  const upper = m.check.endsWith(':upper-weight') ? ' at the upper weight' : '';
  const what =
    code === 'stability' ? 'percent of tipping'
      : code === 'bearing' ? `pad pressure under ${subject}`
        : code === 'load-chart' ? 'load chart use'
          : code === 'power-line' ? 'power-line distance'
            : code === 'clearance' ? (extra === 'boom' ? 'boom clearance' : 'load clearance')
              : code;
  if (m.margin === null || !Number.isFinite(m.margin)) return `least margin: ${what} cannot be checked`;
  const pct = Math.round(m.margin * 100);
  return pct >= 0 ? `Least margin ${pct} % of the limit left (${what}${upper})` : `Over the limit by ${-pct} % (${what}${upper})`;
}

/** The headline figures of a proposal against the plan's limits, in the viewer's units. */
export function ProposalFigures({ figures: f, units }: { figures: PlacementFigures; units: UnitSystem }) {
  const rows: [string, string][] = [
    ['Tipping', `${formatPercent(f.percentOfTipping)} of ${formatPercent(f.tippingLimit, 0)}`],
    ['Load chart', f.loadChartPercent === null ? 'no rating' : `${formatPercent(f.loadChartPercent)} of ${formatPercent(f.ratedLimit, 0)}`],
  ];
  if (f.highestPad) rows.push([`Pad ${f.highestPad.name}`, `${formatPressure(f.highestPad.pressure, units)} of ${formatPressure(f.allowable, units)}`]);
  if (f.nearestClearance) rows.push([`Clear of ${f.nearestClearance.name}`, `${formatLength(f.nearestClearance.distance, units)} (min ${formatLength(f.clearanceLimit, units)})`]);
  if (f.nearestPowerLine) {
    const req = f.nearestPowerLine.required;
    rows.push([f.nearestPowerLine.name, `${formatLength(f.nearestPowerLine.distance, units)}${req === null ? ' (clearance set by the utility)' : ` (min ${formatLength(req, units)})`}`]);
  }
  return (
    <dl className="grid grid-cols-[auto_1fr] gap-x-2 gap-y-0.5 text-xs">
      {rows.map(([k, v]) => (
        <div key={k} className="contents">
          <dt className="truncate text-ink-muted">{k}</dt>
          <dd className="tabular-nums">{v}</dd>
        </div>
      ))}
    </dl>
  );
}
