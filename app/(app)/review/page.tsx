import type { Metadata } from 'next';
import Link from 'next/link';
import { forbidden, redirect } from 'next/navigation';
import { getDb } from '@/db';
import { getCurrentUser } from '@/lib/auth/current-user';
import { isReviewer } from '@/lib/review/permissions';
import { reviewQueue } from '@/lib/server/review-queue';
import { filterQueue, FLAG_WORDS, QUEUE_FLAGS, type QueueFilter } from '@/lib/review/queue';
import { PageHeader } from '@/components/ui/page-header';
import { EmptyState } from '@/components/ui/empty-state';
import { CautionNote } from '@/components/caution-note';
import { QueueList } from '@/components/review/queue-list';
import { cx } from '@/components/ui/cx';

export const metadata: Metadata = { title: 'Review queue' };

type Props = { searchParams: Promise<Record<string, string | string[] | undefined>> };

const one = (v: string | string[] | undefined) => (typeof v === 'string' ? v : undefined);

/** Submitted plans of the organisation, oldest first, for supervisors and admins. */
export default async function ReviewQueuePage({ searchParams }: Props) {
  const user = await getCurrentUser();
  if (!user) redirect('/sign-in?callbackUrl=/review');
  if (!isReviewer(user.role)) forbidden();
  const q = await searchParams;
  const all = await reviewQueue(getDb(), user);
  const operators = [...new Set(all.map((i) => i.ownerName))].sort();
  const trucks = [...new Set(all.flatMap((i) => (i.truck ? [i.truck] : [])))].sort();
  const filter: QueueFilter = {
    flag: QUEUE_FLAGS.find((f) => f === one(q.flag)) ?? null,
    operator: operators.find((o) => o === one(q.operator)) ?? null,
    truck: trucks.find((t) => t === one(q.truck)) ?? null,
  };
  const items = filterQueue(all, filter);
  const href = (change: Partial<QueueFilter>) => {
    const next = { ...filter, ...change };
    const p = new URLSearchParams();
    for (const [k, v] of Object.entries(next)) if (v) p.set(k, v);
    const s = p.toString();
    return s ? `/review?${s}` : '/review';
  };
  const chip = (active: boolean) =>
    cx('inline-flex min-h-touch shrink-0 items-center whitespace-nowrap rounded-plate border px-3 text-body font-semibold', active ? 'border-ink bg-ink text-paper-raised' : 'border-paper-line bg-paper-raised text-ink hover:border-ink');
  const row = (label: string, chips: { key: string; text: string; href: string; active: boolean }[]) => (
    // One scrolling row on a phone, so the filters do not push the plans off the first screen.
    <div className="-mx-1 flex items-center gap-2 overflow-x-auto px-1 pb-1 sm:flex-wrap sm:overflow-visible">
      <span className="w-16 shrink-0 text-label text-ink-muted">{label}</span>
      {chips.map((c) => (
        <Link key={c.key} href={c.href} className={chip(c.active)} aria-current={c.active ? 'true' : undefined}>
          {c.text}
        </Link>
      ))}
    </div>
  );
  return (
    <>
      <PageHeader
        eyebrow="Review desk"
        title="Plans awaiting review"
        description={`${all.length} submitted ${all.length === 1 ? 'plan' : 'plans'}, the longest waiting first. The figures are the server’s own computation of each submitted revision.`}
      />
      <nav aria-label="Filters" className="mb-4 flex flex-col gap-2" data-testid="queue-filters">
        {row('Flag', [{ key: 'all', text: 'Any', href: href({ flag: null }), active: !filter.flag }, ...QUEUE_FLAGS.map((f) => ({ key: f, text: FLAG_WORDS[f], href: href({ flag: f }), active: filter.flag === f }))])}
        {operators.length > 1 &&
          row('Operator', [{ key: 'all', text: 'Everyone', href: href({ operator: null }), active: !filter.operator }, ...operators.map((o) => ({ key: o, text: o, href: href({ operator: o }), active: filter.operator === o }))])}
        {trucks.length > 1 && row('Truck', [{ key: 'all', text: 'Any truck', href: href({ truck: null }), active: !filter.truck }, ...trucks.map((t) => ({ key: t, text: t, href: href({ truck: t }), active: filter.truck === t }))])}
      </nav>
      {items.length ? (
        <QueueList items={items} units={user.units} />
      ) : (
        <EmptyState title={all.length ? 'No plan matches these filters' : 'Nothing is waiting for review'}>
          {all.length ? 'Clear a filter to see the other plans.' : 'Submitted plans appear here, the longest waiting first.'}
        </EmptyState>
      )}
      <CautionNote className="mt-6" />
    </>
  );
}
