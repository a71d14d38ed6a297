import Link from 'next/link';
import type { UnitSystem } from '@/lib/units';
import { formatLength } from '@/lib/format/quantity';
import { formatPercent } from '@/lib/review/format';
import { padLabel } from '@/lib/lift/names';
import { FLAG_WORDS, waitedFor, type QueueItem } from '@/lib/review/queue';
import { Badge } from '@/components/ui/badge';
import { LocalTime } from '@/components/local-time';
import { cx } from '@/components/ui/cx';

function Figure({ label, value, over, note }: { label: string; value: string; over: boolean; note?: string }) {
  return (
    <div className="min-w-0">
      <dt className="text-caption text-ink-muted">{label}</dt>
      <dd className={cx('text-heading tabular-nums', over ? 'font-bold text-over' : 'font-semibold text-ink')}>
        {value}
        {over && <span className="sr-only"> (beyond the limit)</span>}
      </dd>
      {note && <dd className="truncate text-caption text-ink-muted">{note}</dd>}
    </div>
  );
}

function Figures({ item, units }: { item: QueueItem; units: UnitSystem }) {
  const f = item.figures;
  const c = f.leastClearance;
  return (
    <dl className="grid grid-cols-3 gap-3">
      <Figure label="Worst % of tipping" value={formatPercent(f.percentOfTipping)} over={f.percentOfTipping > f.tippingLimit} note={`plan limit ${f.tippingLimit} %`} />
      <Figure label="Ground, % of allowable" value={f.ground ? formatPercent(f.ground.percent) : '—'} over={!!f.ground && f.ground.percent > 100} note={f.ground ? padLabel(f.ground.support) : undefined} />
      <Figure label="Least clearance" value={c ? formatLength(c.distance, units) : '—'} over={!!c && c.distance < c.limit} note={c ? c.name : undefined} />
    </dl>
  );
}

function Flags({ item }: { item: QueueItem }) {
  if (!item.flags.length) return <p className="text-body text-ink-muted">No flags</p>;
  return (
    <ul className="flex flex-wrap gap-1.5" aria-label="Flags">
      {item.flags.map((f) => (
        <li key={f}>
          <Badge tone={f === 'beyond-hard-limit' ? 'over' : 'signal'} glyph="alert">
            {FLAG_WORDS[f]}
          </Badge>
        </li>
      ))}
    </ul>
  );
}

/** One card per plan: readable at 390 px wide, and figures beside flags on a laptop. */
export function QueueList({ items, units }: { items: QueueItem[]; units: UnitSystem }) {
  return (
    <ol className="flex flex-col gap-3" data-testid="review-queue">
      {items.map((item) => (
        <li key={item.sceneId} className="rounded-plate border border-paper-line bg-paper-raised p-4 shadow-plate" data-testid="queue-item">
          <div className="flex flex-wrap items-baseline justify-between gap-x-3 gap-y-1">
            <Link href={`/scenes/${item.sceneId}/review`} className="min-w-0 text-heading font-bold text-teal-dark underline underline-offset-4 hover:no-underline">
              {item.title}
            </Link>
            <span className="text-body text-ink-soft">
              waiting <strong className="text-ink">{waitedFor(item.waitingMinutes)}</strong> · <LocalTime iso={item.submittedAt} />
            </span>
          </div>
          <p className="mt-1 text-body text-ink-soft">
            {item.ownerName} · {item.truck ?? 'no truck'} · revision {item.revision}
          </p>
          <div className="mt-3 grid gap-3 md:grid-cols-[minmax(0,1.3fr)_minmax(0,1fr)] md:items-start">
            <Figures item={item} units={units} />
            <Flags item={item} />
          </div>
        </li>
      ))}
    </ol>
  );
}
