'use client';
/**
 * The one sortable table (TanStack Table underneath): a header button per sortable column with its
 * arrow and `aria-sort`, optional text filter over every column, right-aligned figures
 * (`meta: { align: 'right' }` on a column), a line for "nothing matches", and an optional footer.
 * Used by the layouts, the clients and the parts list. Presentation only: never fetches.
 */
import { useState, type HTMLAttributes, type ReactNode } from 'react';
import {
  flexRender, getCoreRowModel, getFilteredRowModel, getSortedRowModel, useReactTable,
  type ColumnDef, type Row, type RowData, type SortingState,
} from '@tanstack/react-table';
import { ArrowDown, ArrowUp } from 'lucide-react';

declare module '@tanstack/react-table' {
  // eslint-disable-next-line @typescript-eslint/no-unused-vars -- the parameters must match TanStack's declaration
  interface ColumnMeta<TData extends RowData, TValue> {
    /** Figures line up on the right. */
    align?: 'right';
  }
}

export interface DataTableProps<T> {
  data: T[];
  // TanStack's own column type: each column's value type differs, so the array is typed loosely.
  // eslint-disable-next-line @typescript-eslint/no-explicit-any
  columns: ColumnDef<T, any>[];
  /** Where sorting starts (none by default). */
  initialSorting?: SortingState;
  /** Text that rows must contain (in any column); the caller owns the filter field. */
  filter?: string;
  /** What to say when the filter leaves no row. */
  noMatch?: ReactNode;
  /** Rows under the body (totals). */
  footer?: ReactNode;
  testId?: string;
  /** Header row look: the parts list keeps its headers in sentence case. */
  headCase?: 'upper' | 'normal';
  /** Padding of body cells. */
  dense?: boolean;
  rowProps?: (row: Row<T>) => HTMLAttributes<HTMLTableRowElement> & Record<`data-${string}`, string>;
}

const ariaSort = (sorted: false | 'asc' | 'desc') => (sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : 'none');

export function DataTable<T>({ data, columns, initialSorting = [], filter, noMatch, footer, testId, headCase = 'upper', dense = false, rowProps }: DataTableProps<T>) {
  const [sorting, setSorting] = useState<SortingState>(initialSorting);
  const table = useReactTable({
    data,
    columns,
    state: { sorting, ...(filter !== undefined ? { globalFilter: filter } : {}) },
    onSortingChange: setSorting,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    ...(filter !== undefined ? { getFilteredRowModel: getFilteredRowModel() } : {}),
  });
  const rows = table.getRowModel().rows;
  const right = (meta: { align?: 'right' } | undefined) => (meta?.align === 'right' ? 'text-right' : '');
  return (
    <div className="panel overflow-x-auto">
      <table className="w-full text-left text-sm" data-testid={testId}>
        <thead className={`border-b border-paper-edge bg-paper-deep text-xs text-ink-soft ${headCase === 'upper' ? 'uppercase tracking-wide' : ''}`}>
          {table.getHeaderGroups().map((hg) => (
            <tr key={hg.id}>
              {hg.headers.map((h) => {
                const sorted = h.column.getIsSorted();
                const label = flexRender(h.column.columnDef.header, h.getContext());
                return (
                  <th key={h.id} className={`px-3 py-2 font-medium ${right(h.column.columnDef.meta)}`} aria-sort={h.column.getCanSort() ? ariaSort(sorted) : undefined}>
                    {h.column.getCanSort() ? (
                      <button type="button" className="inline-flex items-center gap-1" onClick={h.column.getToggleSortingHandler()}>
                        {label}
                        {sorted === 'asc' ? <ArrowUp size={12} aria-hidden="true" /> : sorted === 'desc' ? <ArrowDown size={12} aria-hidden="true" /> : null}
                      </button>
                    ) : label}
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody>
          {rows.map((row) => (
            <tr key={row.id} className="border-b border-paper-edge align-top last:border-0 hover:bg-paper-deep/50" {...rowProps?.(row)}>
              {row.getVisibleCells().map((cell) => (
                <td key={cell.id} className={`px-3 ${dense ? 'py-1.5' : 'py-2'} ${right(cell.column.columnDef.meta)}`}>{flexRender(cell.column.columnDef.cell, cell.getContext())}</td>
              ))}
            </tr>
          ))}
          {rows.length === 0 && data.length > 0 && noMatch && (
            <tr><td colSpan={columns.length} className="px-3 py-6 text-center text-ink-soft">{noMatch}</td></tr>
          )}
        </tbody>
        {footer && <tfoot className="border-t-2 border-ink text-sm">{footer}</tfoot>}
      </table>
    </div>
  );
}
