'use client';

import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { createColumnHelper, getCoreRowModel, useReactTable, type SortingState } from '@tanstack/react-table';
import Link from 'next/link';
import { useEffect, useMemo, useState } from 'react';
import type { SceneSummary } from '@/db/repositories/scenes';
import { SCENE_STATUSES, type SceneStatus } from '@/lib/domain';
import { StatusPill, statusLabel } from '@/components/ui/badge';
import { Button, ButtonLink } from '@/components/ui/button';
import { DataTable } from '@/components/ui/data-table';
import { EmptyState } from '@/components/ui/empty-state';
import { TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { SelectField } from '@/components/ui/select';
import { fetchJson } from '@/lib/client/fetch-json';
import { formatWhen } from './format';
import { Pager } from './pager';

interface ScenePage {
  items: SceneSummary[];
  total: number;
  page: number;
  pageSize: number;
}

const col = createColumnHelper<SceneSummary>();

const columns = [
  col.accessor('title', {
    header: 'Title',
    meta: { className: 'lg:w-[36%]' },
    cell: (c) => (
      <div className="min-w-[12rem] py-1">
        <Link href={`/scenes/${c.row.original.id}`} className="font-semibold text-ink underline decoration-teal decoration-2 underline-offset-4 hover:text-teal">
          {c.getValue()}
        </Link>
        {/* owner and revision columns drop out on a portrait tablet; keep the facts under the title */}
        <p className="mt-0.5 text-caption text-ink-muted lg:hidden">
          {c.row.original.ownerName} · rev. {c.row.original.revision}
        </p>
      </div>
    ),
  }),
  col.accessor('status', { header: 'Status', cell: (c) => <StatusPill status={c.getValue()} /> }),
  col.accessor('ownerName', { header: 'Owner', cell: (c) => <span className="whitespace-nowrap">{c.getValue()}</span>, meta: { className: 'hidden lg:table-cell' } }),
  col.accessor('revision', { header: 'Rev.', cell: (c) => <span className="tabular-nums">{c.getValue()}</span>, meta: { className: 'hidden lg:table-cell' } }),
  col.accessor('updatedAt', { header: 'Last saved', cell: (c) => <span className="whitespace-nowrap text-ink-soft">{formatWhen(c.getValue())}</span> }),
  col.display({
    id: 'details',
    header: () => <span className="sr-only">Details</span>,
    cell: (c) => (
      <Link
        href={`/scenes/${c.row.original.id}/details`}
        aria-label={`Details of ${c.row.original.title}`}
        className="inline-flex min-h-touch items-center rounded-plate px-2 font-semibold text-teal-dark underline-offset-4 hover:bg-teal-light hover:underline"
      >
        Details
      </Link>
    ),
  }),
];

const PAGE_SIZE = 10;

/** Debounces the title filter so typing does not send a request per key. */
function useDebounced<T>(value: T, ms: number) {
  const [v, setV] = useState(value);
  useEffect(() => {
    const t = setTimeout(() => setV(value), ms);
    return () => clearTimeout(t);
  }, [value, ms]);
  return v;
}

export function ScenesTable({ canCreate }: { canCreate: boolean }) {
  const [titleInput, setTitleInput] = useState('');
  const title = useDebounced(titleInput.trim(), 250);
  const [status, setStatus] = useState<SceneStatus | ''>('');
  const [sorting, setSorting] = useState<SortingState>([{ id: 'updatedAt', desc: true }]);
  const [page, setPage] = useState(1);

  useEffect(() => setPage(1), [title, status, sorting]);

  const params = useMemo(() => {
    const p = new URLSearchParams({ page: String(page), pageSize: String(PAGE_SIZE) });
    if (title) p.set('title', title);
    if (status) p.set('status', status);
    if (sorting[0]) {
      p.set('sort', sorting[0].id);
      p.set('dir', sorting[0].desc ? 'desc' : 'asc');
    }
    return p.toString();
  }, [page, title, status, sorting]);

  const query = useQuery({
    queryKey: ['scenes', params],
    queryFn: () => fetchJson<ScenePage>(`/api/scenes?${params}`),
    placeholderData: keepPreviousData,
  });

  const data = query.data;
  const table = useReactTable({
    data: data?.items ?? [],
    columns,
    getCoreRowModel: getCoreRowModel(),
    manualSorting: true,
    manualPagination: true,
    manualFiltering: true,
    enableSortingRemoval: false,
    state: { sorting },
    onSortingChange: setSorting,
    rowCount: data?.total ?? 0,
  });

  const filtered = Boolean(title || status);
  const empty = filtered ? (
    <EmptyState
      title="No scenes match these filters"
      action={
        <Button
          variant="secondary"
          onClick={() => {
            setTitleInput('');
            setStatus('');
          }}
        >
          Clear filters
        </Button>
      }
    >
      Clear the title search or pick another status.
    </EmptyState>
  ) : (
    <EmptyState title="No scenes yet" action={canCreate ? <ButtonLink href="/scenes/new" variant="signal">New scene</ButtonLink> : undefined}>
      {canCreate ? 'Start a plan for your next lift.' : 'Scenes your organisation shares with you will show up here.'}
    </EmptyState>
  );

  return (
    <div className="flex flex-col gap-4">
      <div className="grid gap-4 sm:grid-cols-[1fr_15rem]" role="search" aria-label="Filter scenes">
        <TextField label="Search titles" type="search" placeholder="e.g. coil, embankment" value={titleInput} onChange={(e) => setTitleInput(e.target.value)} />
        <SelectField label="Status" value={status} onChange={(e) => setStatus(e.target.value as SceneStatus | '')}>
          <option value="">Any status</option>
          {SCENE_STATUSES.map((s) => (
            <option key={s} value={s}>
              {statusLabel(s)}
            </option>
          ))}
        </SelectField>
      </div>
      {query.isError && <Notice tone="error" title="Could not load scenes">{query.error.message}</Notice>}
      <DataTable table={table} caption="Scenes" empty={empty} loading={query.isPending} />
      {data && data.total > 0 && <Pager page={data.page} pageSize={data.pageSize} total={data.total} onPage={setPage} busy={query.isFetching} />}
    </div>
  );
}
