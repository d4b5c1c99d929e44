'use client';
/**
 * The studio's clients: name, address, when they joined, and each layout shared with them with
 * where it stands (draft, sent, changes asked, approved). Sortable by column.
 * Presentation of data the page loaded; never fetches on its own.
 */
import Link from 'next/link';
import { useMemo } from 'react';
import { createColumnHelper } from '@tanstack/react-table';
import { DataTable } from '@/components/ui/DataTable';
import type { ClientDto } from '@/db/sharing/clients';
import { LayoutStateBadge } from './LayoutStateBadge';
import { formatDate } from '@/lib/format';

const col = createColumnHelper<ClientDto>();

export function ClientsTable({ clients }: { clients: ClientDto[] }) {
  const columns = useMemo(() => [
    col.accessor('name', { header: 'Client', cell: (c) => <span className="font-medium">{c.getValue()}</span> }),
    col.accessor('email', { header: 'E-mail', meta: { phone: 'fold' }, cell: (c) => <span className="text-ink-soft">{c.getValue()}</span> }),
    col.accessor('joinedAt', { header: 'Joined', meta: { phone: 'fold' }, cell: (c) => <span className="text-ink-soft">{formatDate(c.getValue())}</span> }),
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

  if (clients.length === 0) {
    return <div className="panel p-8 text-center text-sm"><p className="font-medium">No clients yet</p><p className="mt-1 text-ink-soft">Invite one below: they set their own password and see only their van.</p></div>;
  }
  return <DataTable data={clients} columns={columns} initialSorting={[{ id: 'name', desc: false }]} testId="clients-table" />;
}
