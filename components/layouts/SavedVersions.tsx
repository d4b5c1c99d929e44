'use client';
/**
 * A layout's saved versions: one row per save, newest first, each with a small plan drawn from
 * that save's document, when and by whom it was saved, its module count, the revisions issued
 * from it, and — for the workshop — "Restore as the newest save" (asked first), which puts that
 * save's drawing back as a new version; the versions after it stay in the list. Reads and writes
 * through /api/layouts/[id]/versions; never edits a document itself.
 */
import Link from 'next/link';
import { useMemo, useState } from 'react';
import { useQuery, useQueryClient } from '@tanstack/react-query';
import { createColumnHelper } from '@tanstack/react-table';
import { toast } from '@/components/ui/toast';
import { History } from 'lucide-react';
import { apiFetch } from '@/lib/api/client-fetch';
import { formatDateTime } from '@/lib/format';
import type { SavedVersionDto } from '@/db/saved-versions';
import { DataTable } from '@/components/ui/DataTable';
import { Dialog } from '@/components/editor/panels/Dialog';
import { RevisionMarkIcon } from '@/components/sharing/RevisionMarkIcon';

const col = createColumnHelper<SavedVersionDto>();

export function SavedVersions({ layoutId, layoutName, canEdit }: { layoutId: string; layoutName: string; canEdit: boolean }) {
  const queryClient = useQueryClient();
  const q = useQuery({
    queryKey: ['saved-versions', layoutId],
    queryFn: () => apiFetch<{ versions: SavedVersionDto[]; kept: number }>(`/api/layouts/${layoutId}/versions`),
  });
  const [asked, setAsked] = useState<SavedVersionDto | null>(null);
  const [busy, setBusy] = useState(false);
  const current = q.data?.versions.find((v) => v.current)?.version ?? null;

  async function restore(v: SavedVersionDto) {
    setBusy(true);
    try {
      const res = await apiFetch<{ version: number }>(`/api/layouts/${layoutId}/versions/${v.version}/restore`, {
        method: 'POST',
        headers: current !== null ? { 'If-Match': String(current) } : {},
      });
      toast.success(`Version ${v.version} restored as version ${res.version}.`);
      setAsked(null);
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: ['saved-versions', layoutId] }),
        queryClient.invalidateQueries({ queryKey: ['layouts'] }),
      ]);
    } catch (err) {
      toast.error(err instanceof Error ? err.message : 'The version was not restored.');
    } finally {
      setBusy(false);
    }
  }

  const columns = useMemo(
    () => [
      col.display({
        id: 'plan',
        header: 'Plan',
        meta: { phone: 'fold' },
        cell: (c) => (
          // eslint-disable-next-line @next/next/no-img-element -- a small SVG drawn by the server per save; nothing to optimise
          <img src={`/api/layouts/${layoutId}/thumbnail?version=${c.row.original.version}`} alt={`Plan as saved in version ${c.row.original.version}`}
            width={96} height={48} loading="lazy" className="h-auto w-24 rounded-sm border border-paper-edge" />
        ),
      }),
      col.accessor('version', {
        header: 'Version',
        cell: (c) => (
          <span className="font-mono">
            {c.getValue()}
            {c.row.original.current && <span className="ml-2 rounded-sm bg-paper-deep px-1.5 py-0.5 font-sans text-xs">Latest</span>}
          </span>
        ),
      }),
      col.accessor('savedAt', {
        header: 'Saved',
        meta: { phone: 'fold' },
        cell: (c) => <span className="text-ink-soft">{formatDateTime(c.getValue())}{c.row.original.savedBy ? ` · ${c.row.original.savedBy}` : ''}</span>,
      }),
      col.accessor('name', { header: 'Name' }),
      col.accessor('moduleCount', { header: 'Modules', meta: { align: 'right', phone: 'fold' }, cell: (c) => <span className="font-mono">{c.getValue()}</span> }),
      col.display({
        id: 'notes',
        header: 'Notes',
        meta: { phone: 'fold' },
        cell: (c) => (
          <span className="flex flex-wrap items-center gap-2 text-xs text-ink-soft">
            {c.row.original.revisions.map((l) => (
              <span key={l} className="inline-flex items-center gap-1 text-copper"><RevisionMarkIcon letter={l} /> issued as revision {l}</span>
            ))}
            {c.row.original.restoredFrom !== null && <span>restored from version {c.row.original.restoredFrom}</span>}
          </span>
        ),
      }),
      col.display({
        id: 'actions',
        header: () => <span className="sr-only">Actions</span>,
        cell: (c) => canEdit && !c.row.original.current ? (
          <button type="button" className="btn-quiet whitespace-nowrap text-sm" onClick={() => setAsked(c.row.original)}
            aria-label={`Restore version ${c.row.original.version} as the newest save`}>
            {/* On a phone the icon alone (its name is the aria-label), so the table fits 360 px. */}
            <History size={14} aria-hidden="true" /> <span className="max-[480px]:hidden">Restore…</span>
          </button>
        ) : null,
      }),
    ],
    [layoutId, canEdit],
  );

  if (q.isPending) return <p className="panel p-6 text-sm text-ink-soft" role="status">Loading saved versions…</p>;
  if (q.isError) {
    return (
      <div className="panel border-brick p-6 text-sm" role="alert">
        Could not load the saved versions: {q.error.message}{' '}
        <button className="text-copper underline" onClick={() => q.refetch()}>Try again</button>
      </div>
    );
  }
  return (
    <div className="space-y-3">
      <p className="text-sm text-ink-soft">
        Every save of {layoutName} is kept here: the last {q.data.kept}, and every save a revision was issued from.
        Restoring one makes its drawing the newest save; the versions after it stay in the list.
      </p>
      {q.data.versions.length === 0 ? (
        <p className="panel p-6 text-sm text-ink-soft">No saved versions are kept for this layout yet; the next save starts the list.</p>
      ) : (
        <DataTable data={q.data.versions} columns={columns} initialSorting={[{ id: 'version', desc: true }]} testId="saved-versions" />
      )}
      <Dialog open={asked !== null} title={asked ? `Restore version ${asked.version}?` : 'Restore'} onClose={() => setAsked(null)} testId="restore-version">
        {asked && (
          <>
            <p className="mb-4 text-sm">
              The layout’s drawing goes back to version {asked.version} ({formatDateTime(asked.savedAt)}, {asked.moduleCount} modules) as a new save.
              {current !== null && ` Version ${current} and every version before it stay in this list.`}
            </p>
            <div className="flex gap-2">
              <button type="button" className="btn-primary" disabled={busy} onClick={() => void restore(asked)}>
                <History size={14} aria-hidden="true" /> {busy ? 'Restoring…' : 'Restore as the newest save'}
              </button>
              <button type="button" className="btn-quiet" onClick={() => setAsked(null)}>Cancel</button>
            </div>
          </>
        )}
      </Dialog>
      <p className="text-sm"><Link className="text-copper underline" href={`/layouts/${layoutId}`}>Open the layout</Link></p>
    </div>
  );
}
