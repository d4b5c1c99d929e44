'use client';
/** The unsaved-changes indicator: words and an icon, never colour alone. */
import { CircleCheck, CircleDot, Loader2, TriangleAlert, Eye } from 'lucide-react';
import type { SaveStatus } from '../api/useAutosave';

const LOOK: Record<SaveStatus, { text: string; Icon: typeof CircleCheck; cls: string; spin?: boolean }> = {
  saved: { text: 'Saved', Icon: CircleCheck, cls: 'text-moss' },
  unsaved: { text: 'Unsaved changes', Icon: CircleDot, cls: 'text-ink' },
  saving: { text: 'Saving…', Icon: Loader2, cls: 'text-ink-soft', spin: true },
  conflict: { text: 'Not saved: conflict', Icon: TriangleAlert, cls: 'text-brick' },
  error: { text: 'Not saved', Icon: TriangleAlert, cls: 'text-brick' },
  'read-only': { text: 'View only', Icon: Eye, cls: 'text-ink-soft' },
};

/** `leavingFor`: a link clicked while saving, followed once saved ("Saving, then opening Build plan…"). */
export function SaveIndicator({ status, version, detail, leavingFor }: { status: SaveStatus; version: number; detail?: string | null; leavingFor?: string | null }) {
  const l = leavingFor ? LOOK.saving : LOOK[status];
  return (
    <span role="status" aria-live="polite" data-testid="save-status" data-status={status} data-leaving-for={leavingFor ?? undefined} title={detail ?? undefined} className={`inline-flex ${leavingFor ? 'max-w-xs' : 'w-44'} items-center gap-1.5 truncate text-sm ${l.cls}`}>
      <l.Icon size={15} aria-hidden className={l.spin ? 'animate-spin' : undefined} />
      {leavingFor ? `Saving, then opening ${leavingFor}…` : l.text}
      <span className="font-mono text-xs text-ink-soft">v{version}</span>
    </span>
  );
}
