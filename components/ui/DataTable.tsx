'use client';
/**
 * The one sortable table (TanStack Table underneath): a header button per sortable column with its
 * arrow and `aria-sort`, optional text filter over every column, right-aligned figures
 * (`meta: { align: 'right' }` on a column), a line for "nothing matches", and an optional footer.
 * On a phone (under 480 px, by CSS alone) a column marked `meta: { phone: 'hide' }` leaves the
 * table (its information must be reachable elsewhere, e.g. on the layout's own page), and one marked
 * `phone: 'fold'` is shown as a "heading: value" line under the row's first cell instead of as a
 * column, so the table fits the width without sideways scrolling.
 * Used by the layouts, the clients, the saved versions and the parts list. Presentation only: never fetches.
 */
import { useState, type HTMLAttributes, type ReactNode } from 'react';
import {
  flexRender, getCoreRowModel, getFilteredRowModel, getSortedRowModel, useReactTable,
  type Cell, type ColumnDef, type Row, type RowData, type SortingState,
} from '@tanstack/react-table';
import { ArrowDown, ArrowUp } from 'lucide-react';

declare module '@tanstack/react-table' {
  // eslint-disable-next-line @typescript-eslint/no-unused-vars -- the parameters must match TanStack's declaration
  interface ColumnMeta<TData extends RowData, TValue> {
    /** Figures line up on the right. */
    align?: 'right';
    /** Under 480 px: `hide` the column, or `fold` it into lines under the row's first cell. */
    phone?: 'hide' | 'fold';
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
  // Literal class names (the stylesheet is built from them): under 480 px, shown only at 480 px and over.
  const place = (meta: { align?: 'right'; phone?: 'hide' | 'fold' } | undefined) =>
    `${meta?.align === 'right' ? 'text-right' : ''} ${meta?.phone ? 'max-[480px]:hidden' : ''}`;
  const heading = (c: Cell<T, unknown>) => (typeof c.column.columnDef.header === 'string' ? c.column.columnDef.header : c.column.id);
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
                  <th key={h.id} className={`px-3 py-2 font-medium ${place(h.column.columnDef.meta)}`} aria-sort={h.column.getCanSort() ? ariaSort(sorted) : undefined}>
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
              {row.getVisibleCells().map((cell, i, cells) => {
                const folded = i === cells.findIndex((c) => !c.column.columnDef.meta?.phone) ? cells.filter((c) => c.column.columnDef.meta?.phone === 'fold') : [];
                return (
                  <td key={cell.id} className={`px-3 ${dense ? 'py-1.5' : 'py-2'} ${place(cell.column.columnDef.meta)}`}>
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                    {folded.length > 0 && (
                      <dl className="mt-1 space-y-0.5 text-xs min-[480px]:hidden" data-testid="phone-folded">
                        {folded.map((f) => (
                          <div key={f.id} className="flex flex-wrap gap-x-1">
                            <dt className="text-ink-soft">{heading(f)}:</dt>
                            <dd>{flexRender(f.column.columnDef.cell, f.getContext())}</dd>
                          </div>
                        ))}
                      </dl>
                    )}
                  </td>
                );
              })}
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
