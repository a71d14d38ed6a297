'use client';

import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { createColumnHelper, getCoreRowModel, getSortedRowModel, useReactTable, type SortingState } from '@tanstack/react-table';
import { useState } from 'react';
import { ROLES, type Role } from '@/lib/domain';
import { Button } from '@/components/ui/button';
import { controlClasses } from '@/components/ui/field';
import { cx } from '@/components/ui/cx';
import { Badge } from '@/components/ui/badge';
import { DataTable } from '@/components/ui/data-table';
import { EmptyState } from '@/components/ui/empty-state';
import { Notice } from '@/components/ui/notice';
import { LocalTime } from '@/components/local-time';
import { fetchJson } from '@/lib/client/fetch-json';
import { RESET_LINK_HOURS } from '@/lib/auth/reset-link';

const ROLE_LABEL: Record<Role, string> = { operator: 'Operator', supervisor: 'Supervisor', trainer: 'Trainer', admin: 'Admin' };

type Change = { id: number; role?: Role; active?: boolean };

export interface UserListItem {
  id: number;
  name: string;
  email: string;
  role: Role;
  units: 'imperial' | 'metric';
  active: number;
  created_at: string;
}


const col = createColumnHelper<UserListItem>();

/** The columns, with the row actions bound to the mutation that changes a user. */
function makeColumns(change: (c: Change) => void, sendReset: (u: UserListItem) => void, busyId: number | null) {
  return [
    col.accessor('name', {
      header: 'Name',
      cell: (c) => (
        <div className="min-w-[9rem]">
          <span className="font-semibold">{c.getValue()}</span>
          <p className="break-all text-caption text-ink-muted">{c.row.original.email}</p>
        </div>
      ),
    }),
    col.accessor('role', {
      header: 'Role',
      cell: (c) => (
        <label className="flex items-center gap-2">
          <span className="sr-only">Role of {c.row.original.name}</span>
          <select
            className={cx(controlClasses(false), 'min-h-touch w-[9.5rem] min-w-[8.5rem] shrink-0 pr-8')}
            value={c.getValue()}
            disabled={busyId === c.row.original.id}
            onChange={(e) => change({ id: c.row.original.id, role: e.target.value as Role })}
          >
            {ROLES.map((r) => (
              <option key={r} value={r}>
                {ROLE_LABEL[r]}
              </option>
            ))}
          </select>
        </label>
      ),
    }),
    col.accessor('active', {
      header: 'Account',
      cell: (c) => (
        <div className="flex flex-wrap items-center gap-2">
          {c.getValue() ? <Badge tone="within" glyph="check">Active</Badge> : <Badge tone="over" glyph="cross">Deactivated</Badge>}
          <Button
            variant={c.getValue() ? 'danger' : 'secondary'}
            disabled={busyId === c.row.original.id}
            onClick={() => change({ id: c.row.original.id, active: !c.getValue() })}
            aria-label={`${c.getValue() ? 'Deactivate' : 'Reactivate'} ${c.row.original.name}`}
          >
            {c.getValue() ? 'Deactivate' : 'Reactivate'}
          </Button>
          {c.getValue() ? (
            <Button variant="secondary" disabled={busyId === c.row.original.id} onClick={() => sendReset(c.row.original)} aria-label={`Send ${c.row.original.name} a password reset link`}>
              Reset password…
            </Button>
          ) : null}
        </div>
      ),
    }),
    col.accessor('created_at', { header: 'Added', cell: (c) => <LocalTime iso={c.getValue()} />, meta: { className: 'hidden xl:table-cell' } }),
  ];
}

/** The organisation's users; a short list, so sorting happens in the browser. */
export function UsersTable() {
  const [sorting, setSorting] = useState<SortingState>([{ id: 'name', desc: false }]);
  const users = useQuery({ queryKey: ['users'], queryFn: () => fetchJson<{ items: UserListItem[] }>('/api/users') });
  const client = useQueryClient();
  const mutation = useMutation({
    mutationFn: ({ id, ...body }: Change) => fetchJson<UserListItem>(`/api/users/${id}`, { method: 'PATCH', body: JSON.stringify(body) }),
    onSettled: () => client.invalidateQueries({ queryKey: ['users'] }),
  });
  const change = (c: Change) => {
    if (c.active === false) {
      const name = users.data?.items.find((u) => u.id === c.id)?.name ?? 'this user';
      if (!window.confirm(`Deactivate ${name}? They are signed out at once and cannot sign in until reactivated.`)) return;
    }
    mutation.mutate(c);
  };
  // The admin never sees or sets the password: the user gets a one-time link by e-mail.
  const reset = useMutation({
    mutationFn: (u: UserListItem) => fetchJson<{ sentTo: string; expiresAt: string }>(`/api/users/${u.id}/password-reset`, { method: 'POST' }),
  });
  const sendReset = (u: UserListItem) => {
    if (!window.confirm(`E-mail ${u.name} (${u.email}) a link to set a new password? The link works once, for ${RESET_LINK_HOURS} hours; their current password keeps working until they use it.`)) return;
    reset.mutate(u);
  };
  const busyId = mutation.isPending ? (mutation.variables?.id ?? null) : reset.isPending ? (reset.variables?.id ?? null) : null;
  const columns = makeColumns(change, sendReset, busyId);
  // eslint-disable-next-line react-hooks/incompatible-library -- TanStack Table returns fresh functions by design; we do not run the React Compiler
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
      {mutation.isError && <Notice tone="error" title="That change was not made">{mutation.error.message}</Notice>}
      {reset.isError && <Notice tone="error" title="No reset link was sent">{reset.error.message}</Notice>}
      {reset.isSuccess && (
        <Notice tone="success" title="Reset link sent">
          {reset.variables.name} has been e-mailed a link at <span className="[overflow-wrap:anywhere]">{reset.data.sentTo}</span>. It works once, for {RESET_LINK_HOURS} hours.
        </Notice>
      )}
      <DataTable table={table} caption="Users in your organisation" loading={users.isPending} empty={<EmptyState title="No users yet" />} />
    </div>
  );
}
