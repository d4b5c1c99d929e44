'use client';
// The studio's layouts: sortable, filterable, drawn with the page from the rows the server read
// (later refreshed through the query cache; the archived ones fetched in the browser), each with a small plan and a
// link to the original it is a variant of; a switch shows the archived ones.
import Link from 'next/link';
import { useMemo, useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import { createColumnHelper } from '@tanstack/react-table';
import { Hexagon, Plus, Search } from 'lucide-react';
import { DataTable } from '@/components/ui/DataTable';
import { apiFetch } from '@/lib/api/client-fetch';
import type { LayoutSummaryDto } from '@/db/layouts';
import { LayoutStateBadge, stateWord } from '@/components/sharing/LayoutStateBadge';
import { formatDateTime } from '@/lib/format';
import { LayoutRowActions } from './LayoutRowActions';
import { LayoutThumbnail, VariantLink } from './LayoutThumbnail';

const col = createColumnHelper<LayoutSummaryDto>();

export interface LayoutsTableProps {
  canCreate: boolean;
  /** The layouts in use as the server read them for the page, and when (ms since the epoch). */
  initial?: { layouts: LayoutSummaryDto[]; at: number };
}

export function LayoutsTable({ canCreate, initial }: LayoutsTableProps) {
  const [showArchived, setShowArchived] = useState(false);
  const query = useQuery({
    queryKey: ['layouts', { archived: showArchived }],
    queryFn: () => apiFetch<{ layouts: LayoutSummaryDto[] }>(showArchived ? '/api/layouts?archived=1' : '/api/layouts'),
    ...(initial && !showArchived ? { initialData: { layouts: initial.layouts }, initialDataUpdatedAt: initial.at } : {}),
  });
  const [filter, setFilter] = useState('');

  const columns = useMemo(
    () => [
      col.display({
        id: 'plan',
        // On a phone the plan is the layout's own page.
        meta: { phone: 'hide' },
        header: () => <span className="sr-only">Plan</span>,
        cell: (c) => <LayoutThumbnail layout={c.row.original} />,
      }),
      col.accessor('name', {
        header: 'Name',
        cell: (c) => (
          <>
            <Link className="font-medium text-ink underline-offset-2 hover:text-copper hover:underline" href={`/layouts/${c.row.original.id}`}>{c.getValue()}</Link>
            <VariantLink layout={c.row.original} />
          </>
        ),
      }),
      col.accessor((r) => r.client?.name ?? '', { id: 'client', header: 'Client', meta: { phone: 'fold' }, cell: (c) => c.getValue() || <span className="text-ink-faint">—</span> }),
      col.accessor('sizeClass', {
        header: 'Bay',
        meta: { phone: 'fold' },
        cell: (c) => (
          <span className="font-mono text-xs">
            {c.getValue()} <span className="text-ink-soft">{c.row.original.bay.length} × {c.row.original.bay.width} × {c.row.original.bay.height} mm</span>
          </span>
        ),
      }),
      // Working with the client (components/sharing): state from the latest revision, open mark-ups.
      col.accessor((r) => stateWord(r.sharing?.state ?? 'draft'), {
        id: 'state',
        header: 'State',
        cell: (c) => {
          const s = c.row.original.sharing;
          return <LayoutStateBadge state={s?.state ?? 'draft'} letter={s?.latestRevision} changedSince={s?.changedSince ? { layoutId: c.row.original.id } : null} />;
        },
      }),
      col.accessor((r) => r.sharing?.openComments ?? 0, {
        id: 'markups',
        header: 'Open mark-ups',
        // On a phone: counted on the layout's own page (Mark-ups).
        meta: { phone: 'hide' },
        cell: (c) => c.getValue() ? (
          <Link href={`/layouts/${c.row.original.id}`} className="inline-flex items-center gap-1 font-mono" aria-label={`${c.getValue()} open mark-ups`}>
            <Hexagon size={12} aria-hidden="true" />{c.getValue()}
          </Link>
        ) : <span className="font-mono text-ink-faint">0</span>,
      }),
      col.accessor('moduleCount', { header: 'Modules', meta: { phone: 'hide' }, cell: (c) => <span className="font-mono">{c.getValue()}</span> }),
      col.accessor('updatedAt', {
        header: 'Last change',
        // On a phone: the build plan's header and Saved versions say when it was last saved.
        meta: { phone: 'hide' },
        cell: (c) => (
          <span className="text-ink-soft">{formatDateTime(c.getValue())}{c.row.original.updatedBy ? ` · ${c.row.original.updatedBy}` : ''}</span>
        ),
      }),
      col.display({
        id: 'actions',
        header: () => <span className="sr-only">Actions</span>,
        enableSorting: false,
        cell: (c) => <LayoutRowActions layout={c.row.original} canEdit={canCreate} />,
      }),
    ],
    [canCreate],
  );

  return (
    <div>
      <div className="mb-4 flex flex-wrap items-center gap-3">
        <label className="relative min-w-48 flex-1 sm:max-w-xs">
          <span className="sr-only">Filter layouts</span>
          <Search size={14} className="absolute left-2 top-2.5 text-ink-faint" aria-hidden="true" />
          <input className="field pl-7" placeholder="Filter by name, client or bay…" value={filter} onChange={(e) => setFilter(e.target.value)} />
        </label>
        <label className="inline-flex items-center gap-2 text-sm text-ink-soft">
          <input type="checkbox" role="switch" aria-checked={showArchived} checked={showArchived} onChange={(e) => setShowArchived(e.target.checked)} />
          Show archived
        </label>
        {canCreate && (
          <Link href="/layouts/new" className="btn-primary ml-auto"><Plus size={14} aria-hidden="true" /> New layout</Link>
        )}
      </div>
      {query.isPending ? (
        <p className="panel p-6 text-sm text-ink-soft" role="status">Loading layouts…</p>
      ) : query.isError ? (
        <div className="panel border-brick p-6 text-sm" role="alert">
          Could not load the layouts: {query.error.message}{' '}
          <button className="text-copper underline" onClick={() => query.refetch()}>Try again</button>
        </div>
      ) : query.data.layouts.length === 0 && showArchived ? (
        <div className="panel p-10 text-center">
          <p className="font-medium">No archived layouts</p>
          <p className="mt-1 text-sm text-ink-soft">Archived layouts leave the list but keep their revisions, quotes and payments; they show here.</p>
        </div>
      ) : query.data.layouts.length === 0 ? (
        <div className="panel p-10 text-center">
          <p className="font-medium">No layouts yet</p>
          <p className="mt-1 text-sm text-ink-soft">
            {canCreate ? 'Start from a bay template or a starter layout.' : 'Your workshop has not shared a layout with you yet.'}
          </p>
          {canCreate && <Link href="/layouts/new" className="btn-primary mt-4">Create the first layout</Link>}
        </div>
      ) : (
        <DataTable
          data={query.data.layouts}
          columns={columns}
          initialSorting={[{ id: 'updatedAt', desc: true }]}
          filter={filter}
          noMatch={`No layout matches “${filter}”.`}
        />
      )}
    </div>
  );
}
