'use client';

import { useQuery } from '@tanstack/react-query';
import { createColumnHelper, getCoreRowModel, getSortedRowModel, useReactTable, type SortingState } from '@tanstack/react-table';
import { useState } from 'react';
import type { Role } from '@/lib/domain';
import { Badge } from '@/components/ui/badge';
import { DataTable } from '@/components/ui/data-table';
import { EmptyState } from '@/components/ui/empty-state';
import { Notice } from '@/components/ui/notice';
import { LocalTime } from '@/components/local-time';
import { fetchJson } from '@/lib/client/fetch-json';

export interface UserListItem {
  id: number;
  name: string;
  email: string;
  role: Role;
  units: 'imperial' | 'metric';
  active: number;
  created_at: string;
}

const ROLE_TONE = { operator: 'neutral', supervisor: 'teal', trainer: 'signal', admin: 'ink' } as const;

const col = createColumnHelper<UserListItem>();
const columns = [
  col.accessor('name', { header: 'Name', cell: (c) => <span className="font-semibold">{c.getValue()}</span> }),
  col.accessor('email', { header: 'E-mail', cell: (c) => <span className="whitespace-nowrap">{c.getValue()}</span> }),
  col.accessor('role', { header: 'Role', cell: (c) => <Badge tone={ROLE_TONE[c.getValue()]}>{c.getValue()}</Badge> }),
  col.accessor('active', {
    header: 'Account',
    cell: (c) => (c.getValue() ? <Badge tone="within" glyph="check">Active</Badge> : <Badge tone="over" glyph="cross">Deactivated</Badge>),
    meta: { className: 'hidden lg:table-cell' },
  }),
  col.accessor('created_at', { header: 'Added', cell: (c) => <LocalTime iso={c.getValue()} />, meta: { className: 'hidden xl:table-cell' } }),
];

/** The organisation's users; a short list, so sorting happens in the browser. */
export function UsersTable() {
  const [sorting, setSorting] = useState<SortingState>([{ id: 'name', desc: false }]);
  const users = useQuery({ queryKey: ['users'], queryFn: () => fetchJson<{ items: UserListItem[] }>('/api/users') });
  const table = useReactTable({
    data: users.data?.items ?? [],
    columns,
    state: { sorting },
    onSortingChange: setSorting,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
  });
  return (
    <div className="flex flex-col gap-3">
      {users.isError && <Notice tone="error" title="Could not load users">{users.error.message}</Notice>}
      <DataTable table={table} caption="Users in your organisation" loading={users.isPending} empty={<EmptyState title="No users yet" />} />
    </div>
  );
}
