'use client';
/**
 * Shown when a save meets a newer version (412): open the saved version (my unsaved changes are
 * lost) or save my drawing as a copy (a new layout, which then opens); a screen that edits only
 * part of the layout (the build plan) may offer `keepMine` too: put that part on their version.
 * Never merges silently.
 */
import { useState } from 'react';
import { useRouter } from 'next/navigation';
import { toast } from '@/components/ui/toast';
import type { Conflict } from '../api/useAutosave';
import { saveCopy } from '../api/layoutApi';
import { Dialog } from './Dialog';
import { formatDateTime } from '@/lib/format';

export function ConflictDialog({ conflict, onTakeTheirs, onClose, keepMine }: {
  conflict: Conflict | null;
  onTakeTheirs: () => void;
  onClose: () => void;
  keepMine?: { label: string; run: () => void };
}) {
  const [busy, setBusy] = useState(false);
  const router = useRouter();
  const saveMineAsCopy = async () => {
    if (!conflict) return;
    setBusy(true);
    const name = `${conflict.mine.name} (my copy)`.slice(0, 120);
    const r = await saveCopy(fetch, name, conflict.mine);
    setBusy(false);
    if (!r.ok) return void toast.error(r.message);
    toast.success(`Saved your drawing as “${name}”.`);
    router.push(`/layouts/${encodeURIComponent(r.id)}`);
  };
  const when = conflict?.theirs.updatedAt ? formatDateTime(conflict.theirs.updatedAt) : undefined;
  return (
    <Dialog open={!!conflict} title="Someone saved this layout first" onClose={onClose} testId="conflict-dialog">
      <p className="text-sm">
        Version {conflict?.theirs.version}{when ? ` was saved ${when}` : ' was saved'}{conflict?.theirs.updatedBy ? ` by ${conflict.theirs.updatedBy}` : ''} while you were editing. Your changes have not been saved. What would you like to do?
      </p>
      <div className="mt-4 flex flex-wrap justify-end gap-2">
        <button type="button" disabled={busy} onClick={() => onTakeTheirs()} className="rounded border border-ink-faint bg-paper px-3 py-1.5 text-sm">Open the saved version — lose my changes</button>
        {keepMine && <button type="button" disabled={busy} onClick={keepMine.run} className="rounded border border-copper bg-paper px-3 py-1.5 text-sm">{keepMine.label}</button>}
        <button type="button" disabled={busy} onClick={saveMineAsCopy} className="rounded bg-copper px-3 py-1.5 text-sm text-paper hover:bg-copper-dark">{busy ? 'Saving the copy…' : 'Save my drawing as a copy'}</button>
      </div>
    </Dialog>
  );
}
