'use client';

import { LocalDay } from '@/components/local-time';
import { useQuery, useQueryClient } from '@tanstack/react-query';
import { createColumnHelper, getCoreRowModel, getSortedRowModel, useReactTable, type SortingState } from '@tanstack/react-table';
import Link from 'next/link';
import { useMemo, useState } from 'react';
import type { RiggingItem } from '@/db/repositories/rigging';
import { RIGGING_KINDS, RIGGING_STATUSES } from '@/lib/domain';
import { Badge } from '@/components/ui/badge';
import { ButtonLink, buttonClasses } from '@/components/ui/button';
import { DataTable } from '@/components/ui/data-table';
import { EmptyState } from '@/components/ui/empty-state';
import { SelectField } from '@/components/ui/select';
import { Notice } from '@/components/ui/notice';
import { fetchJson } from '@/lib/client/fetch-json';
import { type UnitSystem } from '@/lib/units';
import { formatLength, formatMass } from '@/lib/format/quantity';
import { KIND_LABEL, STATUS_LABEL, dueState } from './labels';
import { RiggingImport } from './rigging-import';

const col = createColumnHelper<RiggingItem>();

function StatusBadge({ status }: { status: RiggingItem['status'] }) {
  if (status === 'in_service') return <Badge tone="within" glyph="check">In service</Badge>;
  if (status === 'tagged_out') return <Badge tone="over" glyph="cross">Tagged out</Badge>;
  return <Badge tone="neutral" glyph="box">Retired</Badge>;
}

function DueBadge({ next, today }: { next: string | null; today: string }) {
  const s = dueState(next, today);
  if (s === 'overdue') return <Badge tone="over" glyph="alert">Overdue <LocalDay ymd={next!} /></Badge>;
  if (s === 'due-soon') return <Badge tone="signal" glyph="clock">Due <LocalDay ymd={next!} /></Badge>;
  if (s === 'none') return <span className="text-ink-muted">No date</span>;
  return <LocalDay ymd={next!} />;
}

/** Rows that cannot be used as lifting rigging, each with its reason: the editor will not add them to a plan. */
function NotLiftingNotice({ items }: { items: RiggingItem[] }) {
  const flagged = items.filter((i) => i.notForLifting);
  if (flagged.length === 0) return null;
  return (
    <Notice tone="warning" title={`${flagged.length} item${flagged.length === 1 ? ' is' : 's are'} not lifting rigging`}>
      <ul className="mt-1 space-y-1" data-testid="not-lifting-list">
        {flagged.map((i) => (
          <li key={i.id}>
            <Link href={`/rigging/${i.id}`} className="font-semibold underline">
              {i.tag}
            </Link>
            : {i.notForLifting} Its stored figures are kept as they were; the editor will not add it to a lift plan.
          </li>
        ))}
      </ul>
    </Notice>
  );
}

export function RiggingTable({ units, canEdit }: { units: UnitSystem; canEdit: boolean }) {
  const [kind, setKind] = useState('');
  const [status, setStatus] = useState('');
  const [due, setDue] = useState('');
  const [sorting, setSorting] = useState<SortingState>([]);
  const qs = new URLSearchParams(Object.entries({ kind, status, due }).filter(([, v]) => v)).toString();
  const qc = useQueryClient();
  const q = useQuery({ queryKey: ['rigging', qs], queryFn: () => fetchJson<{ items: RiggingItem[]; today: string }>(`/api/rigging${qs ? `?${qs}` : ''}`) });
  const today = q.data?.today ?? '';

  const columns = useMemo(
    () => [
      col.accessor('tag', {
        header: 'Tag',
        cell: (c) => (
          <Link href={`/rigging/${c.row.original.id}`} className="whitespace-nowrap font-semibold text-ink underline decoration-teal decoration-2 underline-offset-4">
            {c.getValue()}
          </Link>
        ),
      }),
      col.accessor('kind', { header: 'Kind', cell: (c) => KIND_LABEL[c.getValue()] }),
      col.accessor('size', { header: 'Size', cell: (c) => <span>{c.getValue() || '—'}</span> }),
      col.accessor('length', { header: 'Length', cell: (c) => (c.getValue() === null ? '—' : formatLength(c.getValue()!, units)), meta: { className: 'hidden lg:table-cell' } }),
      col.accessor((r) => r.ratings.vertical, { id: 'vertical', header: 'Vertical rating', cell: (c) => (c.getValue() === null ? '—' : <span className="tabular-nums">{formatMass(c.getValue()!, units)}</span>) }),
      col.accessor('status', {
        header: 'Status',
        cell: (c) => (
          <div className="flex flex-wrap gap-1">
            <StatusBadge status={c.getValue()} />
            {c.row.original.notForLifting && (
              <span title={c.row.original.notForLifting} data-testid={`not-lifting-${c.row.original.tag}`}>
                <Badge tone="over" glyph="alert">
                  Not for lifting
                </Badge>
              </span>
            )}
          </div>
        ),
      }),
      col.accessor('nextInspectionDue', { header: 'Next inspection', cell: (c) => <DueBadge next={c.getValue()} today={today} /> }),
    ],
    [units, today],
  );
  // eslint-disable-next-line react-hooks/incompatible-library -- TanStack Table returns fresh functions by design; we do not run the React Compiler
  const table = useReactTable({ data: q.data?.items ?? [], columns, state: { sorting }, onSortingChange: setSorting, getCoreRowModel: getCoreRowModel(), getSortedRowModel: getSortedRowModel() });

  return (
    <div className="space-y-4">
      <div className="grid grid-cols-1 gap-3 sm:grid-cols-3" role="group" aria-label="Filters">
        <SelectField label="Kind" value={kind} onChange={(e) => setKind(e.target.value)}>
          <option value="">All kinds</option>
          {RIGGING_KINDS.map((k) => (
            <option key={k} value={k}>
              {KIND_LABEL[k]}
            </option>
          ))}
        </SelectField>
        <SelectField label="Status" value={status} onChange={(e) => setStatus(e.target.value)}>
          <option value="">Any status</option>
          {RIGGING_STATUSES.map((s) => (
            <option key={s} value={s}>
              {STATUS_LABEL[s]}
            </option>
          ))}
        </SelectField>
        <SelectField label="Inspection due" value={due} onChange={(e) => setDue(e.target.value)}>
          <option value="">Any date</option>
          <option value="overdue">Overdue</option>
          <option value="due-30">Due within 30 days</option>
          <option value="ok">Not due for 30+ days</option>
          <option value="none">No date set</option>
        </SelectField>
      </div>
      <div className="flex flex-wrap items-center gap-2">
        {canEdit && (
          <ButtonLink href="/rigging/new" variant="signal">
            + New item
          </ButtonLink>
        )}
        <a href={`/api/rigging/export${qs ? `?${qs}` : ''}`} className={buttonClasses('secondary')} download>
          Export CSV
        </a>
        <span className="text-caption text-ink-muted" aria-live="polite" data-testid="rigging-count">
          {q.data ? `${q.data.items.length} item${q.data.items.length === 1 ? '' : 's'}` : 'Loading…'}
        </span>
      </div>
      {q.error && <Notice tone="error">{q.error.message}</Notice>}
      <NotLiftingNotice items={q.data?.items ?? []} />
      <DataTable table={table} caption="Rigging inventory" loading={q.isLoading} empty={<EmptyState title="No items match these filters" />} />
      {canEdit && <RiggingImport onImported={() => qc.invalidateQueries({ queryKey: ['rigging'] })} />}
    </div>
  );
}
