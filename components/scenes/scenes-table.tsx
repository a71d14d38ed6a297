'use client';

import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { createColumnHelper, getCoreRowModel, useReactTable, type SortingState } from '@tanstack/react-table';
import Link from 'next/link';
import { usePathname, useRouter, useSearchParams } from 'next/navigation';
import { useEffect, useMemo, useRef, useState } from 'react';
import type { ScenePage, SceneSummary } from '@/db/repositories/scene-list';
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
import { SceneActions } from './scene-actions';
import { FigureValue, FiguresLine, bearingText, clearanceText, tippingText } from './plan-figure-text';
import type { ListFigures } from '@/lib/scene/plan-figures';
import type { UnitSystem } from '@/lib/units';
import { Badge } from '@/components/ui/badge';
import { CautionNote } from '@/components/caution-note';
import type { Who } from '@/lib/auth/permissions';

/** A list row as GET /api/scenes answers it: the summary and the server's figures for its current revision. */
export type ListedScene = SceneSummary & { figures: ListFigures };
type ListPage = Omit<ScenePage, 'items'> & { items: ListedScene[] };

const col = createColumnHelper<ListedScene>();

const columnsFor = (user: Who, units: UnitSystem) => [
  col.accessor('title', {
    header: 'Title',
    meta: { className: 'lg:w-[36%]' },
    cell: (c) => (
      <div className="min-w-[12rem] py-1">
        <Link href={`/scenes/${c.row.original.id}`} className="font-semibold text-ink underline decoration-teal decoration-2 underline-offset-4 hover:text-teal">
          {c.getValue()}
        </Link>
        {/* owner and revision columns drop out on a portrait tablet; keep the facts under the title */}
        <p className="mt-0.5 text-caption text-ink-muted 2xl:hidden">
          {c.row.original.ownerName} · rev. {c.row.original.revision}
        </p>
        {c.row.original.location && <p className="mt-0.5 text-caption text-ink-muted">{c.row.original.location}</p>}
        <p className="mt-0.5 text-caption text-ink-muted xl:hidden">
          <FiguresLine figures={c.row.original.figures} units={units} />
        </p>
        {c.row.original.inTrainingSet && (
          <p className="mt-1 lg:hidden">
            <Badge tone="teal" glyph="check">Training set</Badge>
          </p>
        )}
      </div>
    ),
  }),
  col.accessor('status', { header: 'Status', cell: (c) => <StatusPill status={c.getValue()} /> }),
  col.accessor('ownerName', { header: 'Owner', cell: (c) => <span className="whitespace-nowrap">{c.getValue()}</span>, meta: { className: 'hidden 2xl:table-cell' } }),
  col.accessor('revision', { header: 'Rev.', cell: (c) => <span className="tabular-nums">{c.getValue()}</span>, meta: { className: 'hidden 2xl:table-cell' } }),
  col.display({
    id: 'tipping',
    header: () => <span title="Worst % of tipping over the planned swing">Tipping</span>,
    meta: { className: 'hidden xl:table-cell' },
    cell: (c) => <FigureValue label="Tipping" value={tippingText(c.row.original.figures)} over={(c.row.original.figures.percentOfTipping ?? 0) > 100} />,
  }),
  col.display({
    id: 'ground',
    header: () => <span title="Highest pad ground pressure as % of the allowable">Ground</span>,
    meta: { className: 'hidden xl:table-cell' },
    cell: (c) => <FigureValue label="Ground pressure" value={bearingText(c.row.original.figures)} over={(c.row.original.figures.percentOfBearing ?? 0) > 100} />,
  }),
  col.display({
    id: 'clearance',
    header: () => <span title="Least clearance to a truck part or obstacle">Clearance</span>,
    meta: { className: 'hidden xl:table-cell' },
    cell: (c) => <FigureValue label="Clearance" value={clearanceText(c.row.original.figures, units)} over={(c.row.original.figures.leastClearance ?? 0) < 0} />,
  }),
  col.accessor('inTrainingSet', {
    header: 'Training',
    enableSorting: false,
    meta: { className: 'hidden lg:table-cell' },
    cell: (c) => (c.getValue() ? <Badge tone="teal" glyph="check">Training set</Badge> : <span className="sr-only">Not in the training set</span>),
  }),
  col.accessor('updatedAt', { header: 'Last saved', cell: (c) => <span className="whitespace-nowrap text-ink-soft">{formatWhen(c.getValue())}</span> }),
  col.display({
    id: 'details',
    header: () => <span className="sr-only">Details and actions</span>,
    cell: (c) => (
      // Stacked below laptop width, so the actions menu is not cut off at the table's edge on a portrait tablet.
      <div className="flex flex-col items-end gap-1 xl:flex-row xl:items-center xl:justify-end">
        <Link
          href={`/scenes/${c.row.original.id}/details`}
          aria-label={`Details of ${c.row.original.title}`}
          className="inline-flex min-h-touch items-center rounded-plate px-2 font-semibold text-teal-dark underline-offset-4 hover:bg-teal-light hover:underline"
        >
          Details
        </Link>
        <SceneActions user={user} scene={c.row.original} layout="row" />
      </div>
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

const SORTS = ['updatedAt', 'title', 'status', 'ownerName', 'revision'];

/**
 * The list's state lives in the URL (search, status, sort and the keyset cursor), so a link to page 3 of a
 * filtered list opens that same page for a colleague.
 */
export function ScenesTable({ canCreate, user, units }: { canCreate: boolean; user: Who; units: UnitSystem }) {
  const columns = useMemo(() => columnsFor(user, units), [user, units]);
  const router = useRouter();
  const pathname = usePathname();
  const search = useSearchParams();
  const [qInput, setQInput] = useState(search.get('q') ?? '');
  const q = useDebounced(qInput.trim(), 250);
  const status = (search.get('status') ?? '') as SceneStatus | '';
  const training = search.get('training') === '1' || search.get('training') === '0' ? search.get('training')! : '';
  const sortId = SORTS.includes(search.get('sort') ?? '') ? search.get('sort')! : 'updatedAt';
  const desc = search.get('dir') !== 'asc';
  const sorting: SortingState = [{ id: sortId, desc }];
  const after = search.get('after');
  const before = search.get('before');

  /**
   * The URL last asked for. A router.replace commits later, so two changes close together (the debounced
   * search clearing just after a status is picked) must build on each other, not both on the older URL.
   */
  const wanted = useRef(search.toString());
  useEffect(() => {
    wanted.current = search.toString();
  }, [search]);

  /** A new URL from the current one; changing a filter or the order goes back to the first page. */
  const navigate = (changes: Record<string, string | null>, keepCursor = false) => {
    const p = new URLSearchParams(wanted.current);
    if (!keepCursor) {
      p.delete('after');
      p.delete('before');
    }
    for (const [k, v] of Object.entries(changes)) {
      if (v === null || v === '') p.delete(k);
      else p.set(k, v);
    }
    const qs = p.toString();
    wanted.current = qs;
    router.replace(qs ? `${pathname}?${qs}` : pathname, { scroll: false });
  };

  useEffect(() => {
    if ((new URLSearchParams(wanted.current).get('q') ?? '') !== q) navigate({ q });
    // eslint-disable-next-line react-hooks/exhaustive-deps -- only the debounced text drives this
  }, [q]);

  const setStatus = (s: SceneStatus | '') => navigate({ status: s });
  const setSorting = (updater: SortingState | ((old: SortingState) => SortingState)) => {
    const next = typeof updater === 'function' ? updater(sorting) : updater;
    navigate({ sort: next[0]?.id ?? null, dir: next[0] ? (next[0].desc ? 'desc' : 'asc') : null });
  };

  const params = useMemo(() => {
    const p = new URLSearchParams({ pageSize: String(PAGE_SIZE), sort: sortId, dir: desc ? 'desc' : 'asc' });
    const sq = search.get('q');
    if (sq) p.set('q', sq);
    if (status) p.set('status', status);
    if (training) p.set('training', training);
    if (after) p.set('after', after);
    else if (before) p.set('before', before);
    return p.toString();
  }, [search, sortId, desc, status, training, after, before]);

  const query = useQuery({
    queryKey: ['scenes', params],
    queryFn: () => fetchJson<ListPage>(`/api/scenes?${params}`),
    placeholderData: keepPreviousData,
  });

  const data = query.data;
  // eslint-disable-next-line react-hooks/incompatible-library -- TanStack Table returns fresh functions by design; we do not run the React Compiler
  const table = useReactTable({
    data: data?.items ?? [],
    columns,
    // Rows keyed by scene, not by position: after an action re-sorts the list, an open row menu stays with its scene.
    getRowId: (row) => String(row.id),
    getCoreRowModel: getCoreRowModel(),
    manualSorting: true,
    manualPagination: true,
    manualFiltering: true,
    enableSortingRemoval: false,
    state: { sorting },
    onSortingChange: setSorting,
    rowCount: data?.total ?? 0,
  });

  const filtered = Boolean(search.get('q') || status || training);
  const empty = filtered ? (
    <EmptyState
      title="No scenes match these filters"
      action={
        <Button
          variant="secondary"
          onClick={() => {
            setQInput('');
            navigate({ q: null, status: null, training: null });
          }}
        >
          Clear filters
        </Button>
      }
    >
      Clear the search or pick another status.
    </EmptyState>
  ) : (
    <EmptyState title="No scenes yet" action={canCreate ? <ButtonLink href="/scenes/new" variant="signal">New scene</ButtonLink> : undefined}>
      {canCreate ? 'Start a plan for your next lift.' : 'Scenes your organisation shares with you will show up here.'}
    </EmptyState>
  );

  return (
    <div className="flex flex-col gap-4">
      <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-[1fr_13rem_13rem]" role="search" aria-label="Filter scenes">
        <TextField label="Search title, location and notes" type="search" placeholder="e.g. coil, Route 9" value={qInput} onChange={(e) => setQInput(e.target.value)} />
        <SelectField label="Status" value={status} onChange={(e) => setStatus(e.target.value as SceneStatus | '')}>
          <option value="">Any status</option>
          {SCENE_STATUSES.map((s) => (
            <option key={s} value={s}>
              {statusLabel(s)}
            </option>
          ))}
        </SelectField>
        <SelectField label="Training set" value={training} onChange={(e) => navigate({ training: e.target.value })}>
          <option value="">All scenes</option>
          <option value="1">In the training set</option>
          <option value="0">Not in the training set</option>
        </SelectField>
      </div>
      {query.isError && <Notice tone="error" title="Could not load scenes">{query.error.message}</Notice>}
      <DataTable table={table} caption="Scenes" empty={empty} loading={query.isPending} />
      {data && data.total > 0 && (
        <Pager
          shown={data.items.length}
          total={data.total}
          totalCapped={data.totalCapped}
          onPrev={data.prevCursor ? () => navigate({ before: data.prevCursor, after: null }, true) : undefined}
          onNext={data.nextCursor ? () => navigate({ after: data.nextCursor, before: null }, true) : undefined}
          onFirst={after || before ? () => navigate({}) : undefined}
          busy={query.isFetching}
        />
      )}
      {data && data.total > 0 && (
        <>
          <p className="text-caption text-ink-muted">
            Figures are the server’s analysis of each scene’s latest saved revision: the worst % of tipping over the swing, the highest pad ground pressure as % of the allowable, and the least clearance to a truck part or obstacle.
          </p>
          <CautionNote compact />
        </>
      )}
    </div>
  );
}
