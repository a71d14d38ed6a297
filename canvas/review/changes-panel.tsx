'use client';
import { formatLength } from '@/lib/format/quantity';
import { formatPercent } from '@/lib/review/format';
import type { FigureChange, SceneChanges } from '@/lib/review/changes';
import type { UnitSystem } from '@/lib/units';
import { cx } from '@/components/ui/cx';

const FIGURE_WORDS: Record<FigureChange['key'], string> = {
  tipping: 'Worst % of tipping',
  ground: 'Highest ground pressure, % of allowable',
  clearance: 'Least clearance',
  'power-line': 'Nearest power line',
  'load-chart': 'Load chart, % of rated',
  rigging: 'Most-used rigging, % of WLL',
};
const KIND_WORDS: Record<string, string> = { truck: 'Truck', load: 'Load', trailer: 'Trailer', obstacle: 'Obstacle', note: 'Note', tape: 'Tape' };

/**
 * "What changed since the last review": objects added, moved or removed, other edits, and the headline
 * figures of the two submissions side by side (both the server's).
 */
export function ChangesPanel({ changes, figures, since, units, names }: { changes: SceneChanges; figures: FigureChange[]; since: { revision: number; decision: string }; units: UnitSystem; names: Record<string, string> }) {
  const v = (f: FigureChange, x: number | null) => (x === null ? '—' : f.unit === '%' ? formatPercent(x) : formatLength(x, units));
  const name = (c: { id: string; kind: string; label: string }) => c.label || names[c.id] || `${KIND_WORDS[c.kind] ?? 'Object'} (no label)`;
  const nothing = !changes.objects.length && !changes.site.length;
  return (
    <section aria-label="What changed" className="flex flex-col gap-3" data-testid="changes-panel">
      <h2 className="text-heading font-bold">What changed since revision {since.revision}</h2>
      <p className="text-caption text-ink-soft">Revision {since.revision} was {since.decision}. Positions are compared on the site plan.</p>
      {nothing ? (
        <p className="text-body">Nothing on the sketch changed.</p>
      ) : (
        <ul className="flex flex-col gap-1.5 text-body" data-testid="object-changes">
          {changes.objects.map((c) => (
            <li key={c.id + c.change} className="flex flex-wrap gap-x-2">
              <span className={cx('w-20 shrink-0 font-bold', c.change === 'removed' ? 'text-over' : c.change === 'added' ? 'text-within' : 'text-ink')}>{c.change === 'moved' ? 'Moved' : c.change === 'added' ? 'Added' : c.change === 'removed' ? 'Removed' : 'Changed'}</span>
              <span className="min-w-0 flex-1">
                <strong>{name(c)}</strong>
                {c.change === 'moved' && (
                  <>
                    {' '}
                    by {formatLength(c.moved ?? 0, units)}
                    {Math.abs(c.turned ?? 0) > 0.05 ? `, turned ${Math.abs(c.turned!).toFixed(1)}° ${c.turned! > 0 ? 'anticlockwise' : 'clockwise'}` : ''}
                  </>
                )}
                {c.fields.length > 0 && <span className="text-ink-soft"> · {c.fields.join(', ')}</span>}
              </span>
            </li>
          ))}
          {changes.site.map((s) => (
            <li key={s} className="flex gap-x-2">
              <span className="w-20 shrink-0 font-bold">Changed</span>
              <span>{s}</span>
            </li>
          ))}
        </ul>
      )}
      <table className="w-full text-body" data-testid="figure-changes">
        <thead>
          <tr className="text-left text-caption text-ink-muted">
            <th className="py-1 font-semibold">Figure</th>
            <th className="py-1 text-right font-semibold">Rev. {since.revision}</th>
            <th className="py-1 text-right font-semibold">Now</th>
          </tr>
        </thead>
        <tbody>
          {figures.map((f) => {
            const better = f.before !== null && f.after !== null && f.before !== f.after && (f.after > f.before) === f.higherIsBetter;
            const worse = f.before !== null && f.after !== null && f.before !== f.after && !better;
            return (
              <tr key={f.key} className="border-t border-paper-line">
                <td className="py-1 pr-2">{FIGURE_WORDS[f.key]}</td>
                <td className="py-1 text-right tabular-nums text-ink-soft">{v(f, f.before)}</td>
                <td className={cx('py-1 text-right font-semibold tabular-nums', better && 'text-within', worse && 'text-over')}>
                  {v(f, f.after)}
                  {better ? ' ▲' : worse ? ' ▼' : ''}
                  <span className="sr-only">{better ? ' (better)' : worse ? ' (worse)' : ''}</span>
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </section>
  );
}
