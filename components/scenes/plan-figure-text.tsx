import type { ListFigures } from '@/lib/scene/plan-figures';
import type { UnitSystem } from '@/lib/units';
import { formatLength, formatPercent } from '@/lib/format/quantity';
import { cx } from '@/components/ui/cx';

/** One list figure: the number, red with "over" when it passes 100 % of its limit (or the load would strike). */
export function FigureValue({ value, over, label }: { value: string | null; over: boolean; label: string }) {
  if (value === null) return <span className="text-ink-muted" aria-label={`${label}: none yet`}>—</span>;
  return (
    <span className={cx('whitespace-nowrap tabular-nums', over && 'font-bold text-over')}>
      {value}
      {over && <span className="ml-1 text-caption">over</span>}
    </span>
  );
}

export const tippingText = (f: ListFigures) => (f.percentOfTipping === null ? null : formatPercent(f.percentOfTipping, 0));
export const bearingText = (f: ListFigures) => (f.percentOfBearing === null ? null : formatPercent(f.percentOfBearing, 0));
export const clearanceText = (f: ListFigures, units: UnitSystem) => (f.leastClearance === null ? null : formatLength(f.leastClearance, units));

/** The three figures in one line, for the narrow layouts where their columns drop out. */
export function FiguresLine({ figures, units }: { figures: ListFigures; units: UnitSystem }) {
  if (figures.problem !== null) return <span>No figures yet: {figures.problem}</span>;
  return (
    <span>
      Tipping {tippingText(figures) ?? '—'} · ground {bearingText(figures) ?? '—'} of allowable · clearance {clearanceText(figures, units) ?? '—'}
      {figures.beyond > 0 && <span className="font-bold text-over"> · {figures.beyond} over limit</span>}
    </span>
  );
}
