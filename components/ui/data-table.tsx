'use client';

import { flexRender, type RowData, type Table } from '@tanstack/react-table';
import type { ReactNode } from 'react';
import { cx } from './cx';

declare module '@tanstack/react-table' {
  // eslint-disable-next-line @typescript-eslint/no-unused-vars
  interface ColumnMeta<TData extends RowData, TValue> {
    /** Classes for the column's th and td, e.g. 'hidden lg:table-cell' to drop it on a portrait tablet. */
    className?: string;
  }
}

interface DataTableProps<T> {
  table: Table<T>;
  /** Accessible name, e.g. "Scenes". */
  caption: string;
  /** Shown in place of the body when there are no rows. */
  empty?: ReactNode;
  loading?: boolean;
}

const sortGlyph = { asc: '▲', desc: '▼' } as const;

/**
 * Renders a TanStack Table instance with Arcline styling: sticky header, 52 px rows (touch), sort buttons
 * in headers that announce their direction in words as well as an arrow.
 */
// `relative` on the scroller: screen-reader-only (absolute) labels inside the table must stay inside it, or
// they stretch the page sideways past a narrow viewport.
export function DataTable<T>({ table, caption, empty, loading }: DataTableProps<T>) {
  const rows = table.getRowModel().rows;
  const columns = table.getVisibleLeafColumns().length;
  return (
    <div className="relative overflow-x-auto rounded-plate border border-paper-line bg-paper-raised shadow-plate" aria-busy={loading || undefined}>
      <table className="w-full border-collapse text-left">
        <caption className="sr-only">{caption}</caption>
        <thead className="bg-paper-sunk">
          {table.getHeaderGroups().map((hg) => (
            <tr key={hg.id}>
              {hg.headers.map((h) => {
                const dir = h.column.getIsSorted();
                const label = h.isPlaceholder ? null : flexRender(h.column.columnDef.header, h.getContext());
                return (
                  <th
                    key={h.id}
                    scope="col"
                    aria-sort={dir === 'asc' ? 'ascending' : dir === 'desc' ? 'descending' : h.column.getCanSort() ? 'none' : undefined}
                    className={cx('border-b-2 border-ink px-4 py-0 text-label text-ink-soft', h.column.columnDef.meta?.className)}
                    style={h.column.columnDef.size ? { width: h.column.columnDef.size } : undefined}
                  >
                    {h.column.getCanSort() ? (
                      <button
                        type="button"
                        onClick={h.column.getToggleSortingHandler()}
                        className="-mx-2 inline-flex min-h-touch items-center gap-1.5 rounded px-2 hover:bg-paper-line"
                      >
                        {label}
                        <span aria-hidden className={cx('text-[0.7rem]', dir ? 'text-ink' : 'text-ink-muted/60')}>
                          {dir ? sortGlyph[dir] : '▲▼'}
                        </span>
                        <span className="sr-only">{dir ? (dir === 'asc' ? ', sorted ascending' : ', sorted descending') : ', sortable'}</span>
                      </button>
                    ) : (
                      <span className="inline-flex min-h-touch items-center">{label}</span>
                    )}
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody>
          {rows.length === 0 ? (
            <tr>
              <td colSpan={columns} className="p-4">
                {loading ? <p className="py-8 text-center text-body text-ink-muted">Loading…</p> : empty}
              </td>
            </tr>
          ) : (
            rows.map((row) => (
              <tr key={row.id} className="border-b border-paper-line last:border-b-0 hover:bg-paper">
                {row.getVisibleCells().map((cell) => (
                  <td key={cell.id} className={cx('h-[3.25rem] px-4 py-2 align-middle text-body', cell.column.columnDef.meta?.className)}>
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                  </td>
                ))}
              </tr>
            ))
          )}
        </tbody>
      </table>
    </div>
  );
}
