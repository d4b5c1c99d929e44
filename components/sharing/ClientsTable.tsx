'use client';
/**
 * The studio's clients: name, address, when they joined, and each layout shared with them with
 * where it stands (draft, sent, changes asked, approved). Sortable by column.
 * Presentation of data the page loaded; never fetches on its own.
 */
import Link from 'next/link';
import { useMemo, useState } from 'react';
import { createColumnHelper, flexRender, getCoreRowModel, getSortedRowModel, useReactTable, type SortingState } from '@tanstack/react-table';
import { ArrowDown, ArrowUp } from 'lucide-react';
import type { ClientDto } from '@/db/sharing/clients';
import { LayoutStateBadge } from './LayoutStateBadge';
import { formatDate } from '@/lib/format';

const col = createColumnHelper<ClientDto>();

export function ClientsTable({ clients }: { clients: ClientDto[] }) {
  const [sorting, setSorting] = useState<SortingState>([{ id: 'name', desc: false }]);
  const columns = useMemo(() => [
    col.accessor('name', { header: 'Client', cell: (c) => <span className="font-medium">{c.getValue()}</span> }),
    col.accessor('email', { header: 'E-mail', cell: (c) => <span className="text-ink-soft">{c.getValue()}</span> }),
    col.accessor('joinedAt', { header: 'Joined', cell: (c) => <span className="text-ink-soft">{formatDate(c.getValue())}</span> }),
    col.accessor((r) => r.layouts.length, {
      id: 'layouts',
      header: 'Layouts',
      cell: (c) => c.row.original.layouts.length === 0 ? <span className="text-ink-faint">none shared yet</span> : (
        <ul className="space-y-1">
          {c.row.original.layouts.map((l) => (
            <li key={l.id} className="flex flex-wrap items-center gap-2">
              <Link href={`/layouts/${l.id}`} className="underline-offset-2 hover:text-copper hover:underline">{l.name}</Link>
              <LayoutStateBadge state={l.state} letter={l.latestRevision} />
            </li>
          ))}
        </ul>
      ),
    }),
  ], []);
  const table = useReactTable({ data: clients, columns, state: { sorting }, onSortingChange: setSorting, getCoreRowModel: getCoreRowModel(), getSortedRowModel: getSortedRowModel() });

  if (clients.length === 0) {
    return <div className="panel p-8 text-center text-sm"><p className="font-medium">No clients yet</p><p className="mt-1 text-ink-soft">Invite one below: they set their own password and see only their van.</p></div>;
  }
  return (
    <div className="panel overflow-x-auto">
      <table className="w-full text-left text-sm" data-testid="clients-table">
        <thead className="border-b border-paper-edge bg-paper-deep text-xs uppercase tracking-wide text-ink-soft">
          {table.getHeaderGroups().map((hg) => (
            <tr key={hg.id}>
              {hg.headers.map((h) => {
                const sorted = h.column.getIsSorted();
                return (
                  <th key={h.id} className="px-3 py-2 font-medium" aria-sort={sorted ? (sorted === 'asc' ? 'ascending' : 'descending') : 'none'}>
                    <button type="button" className="inline-flex items-center gap-1" onClick={h.column.getToggleSortingHandler()}>
                      {flexRender(h.column.columnDef.header, h.getContext())}
                      {sorted === 'asc' ? <ArrowUp size={12} aria-hidden="true" /> : sorted === 'desc' ? <ArrowDown size={12} aria-hidden="true" /> : null}
                    </button>
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) => (
            <tr key={row.id} className="border-b border-paper-edge align-top last:border-0">
              {row.getVisibleCells().map((cell) => <td key={cell.id} className="px-3 py-2">{flexRender(cell.column.columnDef.cell, cell.getContext())}</td>)}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
