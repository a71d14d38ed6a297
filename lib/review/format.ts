import { formatAngle, formatLength, formatPercent as percent, formatPressure } from '@/lib/format/quantity';
import type { UnitSystem } from '@/lib/units';
import type { LimitBreach, PlanFigures } from './figures';
import { padLabel, tippingLineLabel } from '@/lib/lift/names';

/**
 * Words for the review desk's headline figures and hard-limit breaches (queue, review page, e-mail), in the
 * viewer's units, through the app's one quantity formatter (lib/format). Checks themselves are written by
 * lib/format/checks.
 */
export const formatPercent = (n: number) => percent(n, 1);

export function formatBreach(b: LimitBreach, units: UnitSystem): string {
  const v = (x: number | null) => (x === null ? 'no rating' : b.unit === '%' ? formatPercent(x) : b.unit === 'm' ? formatLength(x, units) : formatPressure(x, units));
  switch (b.kind) {
    case 'tipping':
      return `${b.id.endsWith(':upper-weight') ? 'At the upper end of the estimated weight, ' : ''}${v(b.value)} of tipping about ${b.subject} (hard limit 100 %)`;
    case 'ground':
      return `${b.subject} presses ${v(b.value)} on ground allowing ${v(b.limit)}${b.id.endsWith(':upper-weight') ? ' (upper end of the estimated weight)' : ''}`;
    case 'load-chart':
      return b.value === null ? 'The lift is outside the load chart (no rated capacity there)' : `${v(b.value)} of the load chart's rated capacity (hard limit 100 %)`;
    case 'rigging':
      return `${b.subject} at ${v(b.value)} of its working load limit`;
    case 'power-line':
      return b.limit === null
        ? `${b.subject}: ${v(b.value)} away, and no Table A distance applies (the utility or an engineer sets it)`
        : `${b.subject}: ${v(b.value)} away, inside the ${v(b.limit)} of 29 CFR 1926.1408 Table A`;
  }
}

/** The headline figures as short lines (queue cells, e-mail bodies). */
export function figureLines(f: PlanFigures, units: UnitSystem): string[] {
  const lines = [`Worst case ${formatPercent(f.percentOfTipping)} of tipping about ${tippingLineLabel(f.tippingLine)} at slew ${formatAngle(f.tippingSlew)} (plan limit ${f.tippingLimit} %)`];
  if (f.ground) lines.push(`Highest ground pressure ${formatPercent(f.ground.percent)} of allowable (${padLabel(f.ground.support)}: ${formatPressure(f.ground.pressure, units)} of ${formatPressure(f.ground.allowable, units)})`);
  if (f.leastClearance) lines.push(`Least clearance ${formatLength(f.leastClearance.distance, units)} to ${f.leastClearance.name} (plan limit ${formatLength(f.leastClearance.limit, units)})`);
  if (f.powerLine) lines.push(`Nearest power line ${formatLength(f.powerLine.distance, units)} from ${f.powerLine.name}${f.powerLine.required !== null ? ` (Table A: ${formatLength(f.powerLine.required, units)})` : ''}`);
  if (f.loadChartPercent !== null) lines.push(`Load chart ${formatPercent(f.loadChartPercent)} of rated capacity`);
  if (f.riggingPercent !== null) lines.push(`Most-used rigging item at ${formatPercent(f.riggingPercent)} of its working load limit`);
  return lines;
}
