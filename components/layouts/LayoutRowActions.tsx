'use client';
/**
 * The row action menu of the layouts table: open, archive or restore, delete. A layout whose
 * quote has a deposit payment cannot be deleted (the server answers 409); the confirmation then
 * says so and offers to archive it instead. Other row actions join this menu in the same style.
 * Never changes a layout without the server's answer; the table refetches after each action.
 */
import { useRef, useState } from 'react';
import Link from 'next/link';
import { toast } from 'sonner';
import { useQueryClient } from '@tanstack/react-query';
import { Archive, ArchiveRestore, FolderOpen, MoreHorizontal, Trash2 } from 'lucide-react';
import { apiFetch, ApiError } from '@/lib/api/client-fetch';
import { Dialog } from '@/components/editor/panels/Dialog';
import type { LayoutSummaryDto } from '@/db/layouts';

const item = 'flex w-full items-center gap-2 px-3 py-1.5 text-left text-sm hover:bg-paper-deep focus-visible:bg-paper-deep focus-visible:outline-none disabled:opacity-50';

export function LayoutRowActions({ layout, canEdit }: { layout: LayoutSummaryDto; canEdit: boolean }) {
  const queryClient = useQueryClient();
  const [open, setOpen] = useState(false);
  const [confirmDelete, setConfirmDelete] = useState(false);
  const [refusal, setRefusal] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const button = useRef<HTMLButtonElement>(null);
  const archived = layout.archivedAt !== null;

  async function run(what: string, work: () => Promise<unknown>): Promise<boolean> {
    setBusy(true);
    try {
      await work();
      toast.success(what);
      await queryClient.invalidateQueries({ queryKey: ['layouts'] });
      return true;
    } catch (err) {
      if (err instanceof ApiError && err.status === 409) setRefusal(err.message);
      else toast.error(err instanceof Error ? err.message : 'That did not work.');
      return false;
    } finally {
      setBusy(false);
    }
  }

  const archive = () => run(`“${layout.name}” archived.`, () => apiFetch(`/api/layouts/${layout.id}/archive`, { method: 'POST' }));
  const restore = () => run(`“${layout.name}” restored to the list.`, () => apiFetch(`/api/layouts/${layout.id}/archive`, { method: 'DELETE' }));
  const remove = async () => {
    if (await run(`“${layout.name}” deleted.`, () => apiFetch(`/api/layouts/${layout.id}`, { method: 'DELETE' }))) setConfirmDelete(false);
  };

  return (
    <div className="relative" onKeyDown={(e) => { if (e.key === 'Escape') { setOpen(false); button.current?.focus(); } }}>
      <button ref={button} type="button" className="btn-quiet px-1.5 py-1" aria-haspopup="menu" aria-expanded={open}
        aria-label={`Actions for ${layout.name}`} onClick={() => setOpen((o) => !o)} disabled={busy}>
        <MoreHorizontal size={14} aria-hidden="true" />
      </button>
      {open && (
        <div role="menu" aria-label={`Actions for ${layout.name}`} className="absolute right-0 z-30 mt-1 w-52 rounded-sm border border-paper-edge bg-paper py-1 shadow-lg">
          <Link role="menuitem" href={`/layouts/${layout.id}`} className={item} onClick={() => setOpen(false)}>
            <FolderOpen size={14} aria-hidden="true" /> Open
          </Link>
          {canEdit && !archived && (
            <button role="menuitem" type="button" className={item} onClick={() => { setOpen(false); void archive(); }}>
              <Archive size={14} aria-hidden="true" /> Archive
            </button>
          )}
          {canEdit && archived && (
            <button role="menuitem" type="button" className={item} onClick={() => { setOpen(false); void restore(); }}>
              <ArchiveRestore size={14} aria-hidden="true" /> Restore
            </button>
          )}
          {canEdit && (
            <button role="menuitem" type="button" className={`${item} text-brick`} onClick={() => { setOpen(false); setRefusal(null); setConfirmDelete(true); }}>
              <Trash2 size={14} aria-hidden="true" /> Delete…
            </button>
          )}
        </div>
      )}
      <Dialog open={confirmDelete} title={refusal ? 'This layout is kept' : `Delete “${layout.name}”?`} onClose={() => setConfirmDelete(false)} testId="delete-layout">
        {refusal ? (
          <>
            <p className="mb-4 text-sm" role="alert">{refusal}</p>
            <div className="flex gap-2">
              {!archived && (
                <button type="button" className="btn-primary" disabled={busy}
                  onClick={async () => { if (await archive()) setConfirmDelete(false); }}>
                  <Archive size={14} aria-hidden="true" /> Archive instead
                </button>
              )}
              <button type="button" className="btn-quiet" onClick={() => setConfirmDelete(false)}>Close</button>
            </div>
          </>
        ) : (
          <>
            <p className="mb-4 text-sm">
              The layout, its revisions, mark-ups and reference files go for good. To keep it out of the list but readable, archive it instead.
            </p>
            <div className="flex gap-2">
              <button type="button" className="btn-primary bg-brick" disabled={busy} onClick={remove}>
                <Trash2 size={14} aria-hidden="true" /> Delete
              </button>
              <button type="button" className="btn-quiet" onClick={() => setConfirmDelete(false)}>Cancel</button>
            </div>
          </>
        )}
      </Dialog>
    </div>
  );
}
