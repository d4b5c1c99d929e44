'use client';
/**
 * The row action menu of the layouts table: open, rename, duplicate as a variant, proposals from a brief (as variants), compare
 * variants, saved versions, archive or restore, delete. A menu button with arrow keys, Home/End,
 * Escape (focus goes back to the button) and Tab to leave. A layout whose quote has a deposit
 * payment cannot be deleted (the server answers 409); the confirmation then says so and offers to
 * archive it instead. Never changes a layout without the server's answer; the table refetches
 * after each action.
 */
import { useEffect, useRef, useState, type KeyboardEvent } from 'react';
import Link from 'next/link';
import { toast } from '@/components/ui/toast';
import { useQueryClient } from '@tanstack/react-query';
import { Archive, ArchiveRestore, Columns2, Copy, FolderOpen, History, Lightbulb, MoreHorizontal, PencilLine, Trash2 } from 'lucide-react';
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
  const [renaming, setRenaming] = useState(false);
  const button = useRef<HTMLButtonElement>(null);
  const menu = useRef<HTMLDivElement>(null);
  const archived = layout.archivedAt !== null;

  const items = () => [...(menu.current?.querySelectorAll<HTMLElement>('[role="menuitem"]') ?? [])];
  useEffect(() => {
    if (!open) return;
    items()[0]?.focus();
    const away = (e: PointerEvent) => {
      if (!menu.current?.contains(e.target as Node) && !button.current?.contains(e.target as Node)) setOpen(false);
    };
    document.addEventListener('pointerdown', away);
    return () => document.removeEventListener('pointerdown', away);
  }, [open]);

  function onMenuKey(e: KeyboardEvent<HTMLDivElement>) {
    const list = items();
    const at = list.indexOf(document.activeElement as HTMLElement);
    const go = (i: number) => { e.preventDefault(); list[(i + list.length) % list.length]?.focus(); };
    if (e.key === 'ArrowDown') go(at + 1);
    else if (e.key === 'ArrowUp') go(at - 1);
    else if (e.key === 'Home') go(0);
    else if (e.key === 'End') go(list.length - 1);
    else if (e.key === 'Tab') setOpen(false);
  }

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
  const duplicate = () => run(`Variant of “${layout.name}” made.`, () => apiFetch(`/api/layouts/${layout.id}/variants`, { method: 'POST', json: {} }));
  const remove = async () => {
    if (await run(`“${layout.name}” deleted.`, () => apiFetch(`/api/layouts/${layout.id}`, { method: 'DELETE' }))) setConfirmDelete(false);
  };

  return (
    <div className="relative" onKeyDown={(e) => { if (e.key === 'Escape') { setOpen(false); button.current?.focus(); } }}>
      <button ref={button} type="button" className="btn-quiet px-1.5 py-1" aria-haspopup="menu" aria-expanded={open}
        aria-label={`Actions for ${layout.name}`} onClick={() => setOpen((o) => !o)} disabled={busy}
        onKeyDown={(e) => { if (e.key === 'ArrowDown' && !open) { e.preventDefault(); setOpen(true); } }}>
        <MoreHorizontal size={14} aria-hidden="true" />
      </button>
      {open && (
        <div ref={menu} role="menu" aria-label={`Actions for ${layout.name}`} onKeyDown={onMenuKey}
          className="absolute right-0 z-30 mt-1 w-56 rounded-sm border border-paper-edge bg-paper py-1 shadow-lg">
          <Link role="menuitem" href={`/layouts/${layout.id}`} className={item} onClick={() => setOpen(false)}>
            <FolderOpen size={14} aria-hidden="true" /> Open
          </Link>
          {canEdit && (
            <button role="menuitem" type="button" className={item} onClick={() => { setOpen(false); setRenaming(true); }}>
              <PencilLine size={14} aria-hidden="true" /> Rename…
            </button>
          )}
          {canEdit && (
            <button role="menuitem" type="button" className={item} onClick={() => { setOpen(false); void duplicate(); }}>
              <Copy size={14} aria-hidden="true" /> Duplicate as variant
            </button>
          )}
          {canEdit && !archived && (
            <Link role="menuitem" href={`/layouts/${layout.id}/proposals`} className={item} onClick={() => setOpen(false)}>
              <Lightbulb size={14} aria-hidden="true" /> Proposals from a brief
            </Link>
          )}
          <Link role="menuitem" href={`/layouts/${layout.id}/compare`} className={item} onClick={() => setOpen(false)}>
            <Columns2 size={14} aria-hidden="true" /> Compare variants
          </Link>
          <Link role="menuitem" href={`/layouts/${layout.id}/versions`} className={item} onClick={() => setOpen(false)}>
            <History size={14} aria-hidden="true" /> Saved versions
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
      {renaming && <RenameDialog layout={layout} onClose={() => setRenaming(false)} />}
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

/** Renames a layout: the name is saved as a new version (the editor's title and the sheet follow). */
function RenameDialog({ layout, onClose }: { layout: LayoutSummaryDto; onClose: () => void }) {
  const queryClient = useQueryClient();
  const [name, setName] = useState(layout.name);
  const [problem, setProblem] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  async function submit() {
    setBusy(true);
    setProblem(null);
    try {
      const saved = await apiFetch<{ name: string }>(`/api/layouts/${layout.id}`, { method: 'PATCH', json: { name } });
      toast.success(`Renamed to “${saved.name}”.`);
      await queryClient.invalidateQueries({ queryKey: ['layouts'] });
      onClose();
    } catch (err) {
      setProblem(err instanceof ApiError ? (err.issues[0]?.message ?? err.message) : 'The layout was not renamed.');
    } finally {
      setBusy(false);
    }
  }
  return (
    <Dialog open title={`Rename “${layout.name}”`} onClose={onClose} testId="rename-layout">
      <form onSubmit={(e) => { e.preventDefault(); void submit(); }}>
        <label className="label" htmlFor={`rename-${layout.id}`}>Name</label>
        <input id={`rename-${layout.id}`} className="field mb-1 w-full" value={name} maxLength={120} autoFocus
          aria-invalid={problem !== null} aria-describedby={problem ? `rename-${layout.id}-problem` : undefined}
          onChange={(e) => setName(e.target.value)} />
        {problem && <p id={`rename-${layout.id}-problem`} className="mb-2 text-sm text-brick" role="alert">{problem}</p>}
        <div className="mt-3 flex gap-2">
          <button type="submit" className="btn-primary" disabled={busy}>{busy ? 'Renaming…' : 'Rename'}</button>
          <button type="button" className="btn-quiet" onClick={onClose}>Cancel</button>
        </div>
      </form>
    </Dialog>
  );
}
