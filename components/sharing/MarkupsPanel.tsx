'use client';
/**
 * The Mark-ups list beside the plan: every mark-up thread of the layout, numbered as its keyed
 * note on the plan, with replies, settling (and opening again), changing or removing one's own
 * notes, and the form for a new mark-up (its point placed by clicking the plan, typed as x and
 * y in millimetres, or chosen as one of the bay's openings — both for keyboard use). Each thread
 * names the module or opening its point is near. Talks to /api/layouts/[id]/comments through TanStack Query.
 * Must never draw on the canvas (MarkupLayer does) nor hold the document.
 */
import { useState } from 'react';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { toast } from '@/components/ui/toast';
import { CheckCircle2, Hexagon, Pencil, RotateCcw, Trash2, X } from 'lucide-react';
import { apiFetch } from '@/lib/api/client-fetch';
import type { Arrangement } from '@/lib/layout/schema';
import type { CommentDto, ThreadDto } from '@/db/sharing/comments';
import { formatDateTime } from '@/lib/format';

const ARRANGEMENT_WORD: Record<Arrangement, string> = { travel: 'travel', lounge: 'lounge', sleep: 'sleep' };
const ROLE_WORD = { owner: 'workshop', designer: 'workshop', client: 'client' } as const;

export interface PendingMarkup {
  arrangement: Arrangement;
  x: number;
  y: number;
  /** Placed at this opening (the server puts the point at its middle). */
  openingId?: string;
  openingName?: string;
}

/** An opening a mark-up can be placed at: its name and the middle of it in plan. */
export interface OpeningChoice {
  id: string;
  name: string;
  x: number;
  y: number;
}

interface Props {
  layoutId: string;
  threads: ThreadDto[];
  loading: boolean;
  error: string | null;
  activeId: string | null;
  onActivate: (id: string | null) => void;
  placing: boolean;
  onStartPlacing: () => void;
  onCancelPlacing: () => void;
  openings: OpeningChoice[];
  onPlaceAtOpening: (o: OpeningChoice) => void;
  pending: PendingMarkup | null;
  onPendingChange: (p: PendingMarkup | null) => void;
  onClose: () => void;
}

export function MarkupsPanel(p: Props) {
  const qc = useQueryClient();
  const key = ['markups', p.layoutId];
  const refresh = () => qc.invalidateQueries({ queryKey: key });
  const [draft, setDraft] = useState('');
  const [showSettled, setShowSettled] = useState(false);

  const create = useMutation({
    mutationFn: (body: Record<string, unknown>) => apiFetch<{ thread: ThreadDto }>(`/api/layouts/${p.layoutId}/comments`, { method: 'POST', json: body }),
    onSuccess: ({ thread }) => {
      setDraft('');
      p.onPendingChange(null);
      p.onActivate(thread.id);
      refresh();
      toast.success('Mark-up placed');
    },
    onError: (err) => toast.error(err.message),
  });

  const visible = p.threads.filter((t) => showSettled || !t.settled || t.id === p.activeId);
  const settledCount = p.threads.filter((t) => t.settled).length;

  return (
    <aside className="flex h-full min-h-0 w-full flex-col bg-paper" aria-label="Mark-ups" data-testid="markups-panel">
      <div className="flex items-center gap-2 border-b border-paper-edge px-3 py-2">
        <Hexagon size={14} aria-hidden="true" />
        <h2 className="text-sm font-semibold">Mark-ups</h2>
        <span className="font-mono text-xs text-ink-soft">{p.threads.filter((t) => !t.settled).length} open</span>
        <button type="button" className="ml-auto rounded-sm p-1 text-ink-soft hover:text-ink" aria-label="Close mark-ups" onClick={p.onClose}><X size={14} /></button>
      </div>

      <div className="border-b border-paper-edge p-3">
        {p.pending ? (
          <form
            className="space-y-2"
            onSubmit={(e) => {
              e.preventDefault();
              if (!p.pending) return;
              create.mutate(p.pending.openingId
                ? { arrangement: p.pending.arrangement, openingId: p.pending.openingId, body: draft }
                : { arrangement: p.pending.arrangement, x: p.pending.x, y: p.pending.y, body: draft });
            }}
          >
            <p className="text-xs text-ink-soft">
              New mark-up in the <strong>{ARRANGEMENT_WORD[p.pending.arrangement]}</strong> arrangement
            </p>
            {p.pending.openingId ? (
              <p className="text-xs" data-testid="markup-at-opening">At <strong>{p.pending.openingName}</strong></p>
            ) : (
            <div className="grid grid-cols-2 gap-2">
              {(['x', 'y'] as const).map((axis) => (
                <label key={axis} className="text-xs text-ink-soft">
                  {axis === 'x' ? 'x (rearwards)' : 'y (across)'}
                  <span className="flex items-center gap-1">
                    <input
                      type="number" step={1} className="field py-0.5 font-mono" value={p.pending![axis]}
                      onChange={(e) => p.onPendingChange({ ...p.pending!, [axis]: Math.round(Number(e.target.value)) })}
                    />
                    <span className="font-mono">mm</span>
                  </span>
                </label>
              ))}
            </div>
            )}
            <label className="label" htmlFor="new-markup">Note</label>
            <textarea id="new-markup" className="field min-h-20" value={draft} onChange={(e) => setDraft(e.target.value)} maxLength={2000} required autoFocus />
            <div className="flex gap-2">
              <button type="submit" className="btn-primary" disabled={create.isPending || !draft.trim()}>{create.isPending ? 'Placing…' : 'Place mark-up'}</button>
              <button type="button" className="btn-quiet" onClick={() => { p.onPendingChange(null); setDraft(''); }}>Cancel</button>
            </div>
          </form>
        ) : p.placing ? (
          <div className="space-y-2 text-sm" role="status">
            <p>Click the point of the plan the note is about.</p>
            {p.openings.length > 0 && (
              <label className="block text-xs text-ink-soft">
                Or place it at an opening
                <select className="field mt-1" value="" onChange={(e) => { const o = p.openings.find((c) => c.id === e.target.value); if (o) p.onPlaceAtOpening(o); }}>
                  <option value="">Choose an opening…</option>
                  {p.openings.map((o) => <option key={o.id} value={o.id}>{o.name}</option>)}
                </select>
              </label>
            )}
            <button type="button" className="btn-quiet" onClick={p.onCancelPlacing}>Cancel</button>
          </div>
        ) : (
          <button type="button" className="btn-primary w-full" onClick={p.onStartPlacing}>
            <Hexagon size={14} aria-hidden="true" /> Add a mark-up
          </button>
        )}
      </div>

      <div className="min-h-0 flex-1 overflow-y-auto">
        {p.loading ? (
          <p className="p-3 text-sm text-ink-soft" role="status">Loading mark-ups…</p>
        ) : p.error ? (
          <p className="p-3 text-sm text-brick" role="alert">Could not load the mark-ups: {p.error}</p>
        ) : p.threads.length === 0 ? (
          <p className="p-3 text-sm text-ink-soft">No mark-ups yet. Add one and click the point of the plan it is about.</p>
        ) : (
          <ol className="divide-y divide-paper-edge">
            {visible.map((t) => (
              <ThreadItem key={t.id} layoutId={p.layoutId} thread={t} number={p.threads.indexOf(t) + 1} active={t.id === p.activeId} onActivate={p.onActivate} onChanged={refresh} />
            ))}
          </ol>
        )}
        {settledCount > 0 && (
          <label className="flex items-center gap-2 p-3 text-xs text-ink-soft">
            <input type="checkbox" className="accent-copper" checked={showSettled} onChange={(e) => setShowSettled(e.target.checked)} />
            Show {settledCount} settled
          </label>
        )}
      </div>
    </aside>
  );
}

function ThreadItem({ layoutId, thread, number, active, onActivate, onChanged }: { layoutId: string; thread: ThreadDto; number: number; active: boolean; onActivate: (id: string | null) => void; onChanged: () => void }) {
  const [reply, setReply] = useState('');
  const send = useMutation({
    mutationFn: () => apiFetch(`/api/layouts/${layoutId}/comments`, { method: 'POST', json: { parentId: thread.id, body: reply } }),
    onSuccess: () => { setReply(''); onChanged(); },
    onError: (err) => toast.error(err.message),
  });
  const settle = useMutation({
    mutationFn: (settled: boolean) => apiFetch(`/api/layouts/${layoutId}/comments/${thread.id}`, { method: 'PATCH', json: { settled } }),
    onSuccess: onChanged,
    onError: (err) => toast.error(err.message),
  });
  return (
    <li className={`p-3 text-sm ${active ? 'bg-copper-light/40' : ''}`} data-testid="markup-thread" data-thread-id={thread.id} data-settled={thread.settled ? 'yes' : 'no'}>
      <button type="button" className="flex w-full items-start gap-2 text-left" onClick={() => onActivate(active ? null : thread.id)} aria-expanded={active}>
        <KeyedNumber number={number} settled={!!thread.settled} />
        <span className="min-w-0 flex-1">
          <span className="block whitespace-pre-wrap break-words">{thread.body}</span>
          <span className="mt-1 block text-xs text-ink-soft">
            {thread.author.name} ({ROLE_WORD[thread.author.role]}) · {formatDateTime(thread.createdAt)}{thread.editedAt ? ' · edited' : ''} · {ARRANGEMENT_WORD[thread.arrangement]},{' '}
            {thread.near ? <span data-testid="markup-near">near {thread.near}, </span> : null}
            <span className="font-mono">x {thread.x} mm, y {thread.y} mm</span>
          </span>
          {thread.settled ? (
            <span className="mt-1 inline-flex items-center gap-1 text-xs text-moss"><CheckCircle2 size={12} aria-hidden="true" /> Settled</span>
          ) : (
            <span className="mt-1 inline-flex items-center gap-1 text-xs text-copper-dark">Open</span>
          )}
        </span>
      </button>
      {active && (
        <div className="mt-2 space-y-2 pl-7">
          <OwnNoteControls layoutId={layoutId} note={thread} first onChanged={onChanged} onRemoved={() => { onActivate(null); onChanged(); }} />
          {thread.replies.map((r) => (
            <div key={r.id} className="border-l-2 border-paper-edge pl-2" data-testid="markup-reply">
              <p className="whitespace-pre-wrap break-words">{r.body}</p>
              <p className="text-xs text-ink-soft">{r.author.name} ({ROLE_WORD[r.author.role]}) · {formatDateTime(r.createdAt)}{r.editedAt ? ' · edited' : ''}</p>
              <OwnNoteControls layoutId={layoutId} note={r} onChanged={onChanged} onRemoved={onChanged} />
            </div>
          ))}
          <form className="space-y-1" onSubmit={(e) => { e.preventDefault(); send.mutate(); }}>
            <label className="sr-only" htmlFor={`reply-${thread.id}`}>Reply</label>
            <textarea id={`reply-${thread.id}`} className="field min-h-14" placeholder="Reply…" value={reply} onChange={(e) => setReply(e.target.value)} maxLength={2000} />
            <div className="flex flex-wrap gap-2">
              <button type="submit" className="btn-quiet" disabled={send.isPending || !reply.trim()}>Reply</button>
              {thread.settled ? (
                <button type="button" className="btn-quiet" onClick={() => settle.mutate(false)} disabled={settle.isPending}><RotateCcw size={12} aria-hidden="true" /> Mark open again</button>
              ) : (
                <button type="button" className="btn-quiet" onClick={() => settle.mutate(true)} disabled={settle.isPending}><CheckCircle2 size={12} aria-hidden="true" /> Mark settled</button>
              )}
            </div>
          </form>
        </div>
      )}
    </li>
  );
}

/** The mark-up's number in the same hexagon as on the plan: filled while open, hollow once settled. */
function KeyedNumber({ number, settled }: { number: number; settled: boolean }) {
  return (
    <span className="relative mt-0.5 inline-flex h-6 w-6 shrink-0 items-center justify-center" aria-label={`Mark-up ${number}`}>
      <svg viewBox="-12 -12 24 24" className="absolute inset-0 h-6 w-6" aria-hidden="true">
        <polygon points="11,0 5.5,9.5 -5.5,9.5 -11,0 -5.5,-9.5 5.5,-9.5" className={settled ? 'fill-paper stroke-ink-soft' : 'fill-copper stroke-copper-dark'} strokeWidth={1.4} />
      </svg>
      <span className={`relative font-mono text-xs ${settled ? 'text-ink-soft' : 'text-paper'}`}>{number}</span>
    </span>
  );
}

/** Edit and Remove for a note the caller may change; nothing at all for others' notes. */
function OwnNoteControls({ layoutId, note, first = false, onChanged, onRemoved }: { layoutId: string; note: CommentDto; first?: boolean; onChanged: () => void; onRemoved: () => void }) {
  const [editing, setEditing] = useState(false);
  const [confirming, setConfirming] = useState(false);
  const [text, setText] = useState(note.body);
  const url = `/api/layouts/${layoutId}/comments/${note.id}`;
  const save = useMutation({
    mutationFn: () => apiFetch(url, { method: 'PATCH', json: { body: text } }),
    onSuccess: () => { setEditing(false); onChanged(); toast.success('Mark-up changed'); },
    onError: (err) => toast.error(err.message),
  });
  const remove = useMutation({
    mutationFn: () => apiFetch(url, { method: 'DELETE' }),
    onSuccess: () => { setConfirming(false); onRemoved(); toast.success(first ? 'Mark-up removed' : 'Reply removed'); },
    onError: (err) => toast.error(err.message),
  });
  if (!note.canEdit && !note.canDelete) return null;
  const what = first ? 'mark-up' : 'reply';
  if (editing) {
    return (
      <form className="space-y-1" onSubmit={(e) => { e.preventDefault(); save.mutate(); }}>
        <label className="sr-only" htmlFor={`edit-${note.id}`}>Change your {what}</label>
        <textarea id={`edit-${note.id}`} className="field min-h-14" value={text} onChange={(e) => setText(e.target.value)} maxLength={2000} autoFocus
          onKeyDown={(e) => { if (e.key === 'Escape') { setEditing(false); setText(note.body); } }} />
        <div className="flex gap-2">
          <button type="submit" className="btn-quiet" disabled={save.isPending || !text.trim()}>{save.isPending ? 'Saving…' : 'Save'}</button>
          <button type="button" className="btn-quiet" onClick={() => { setEditing(false); setText(note.body); }}>Cancel</button>
        </div>
      </form>
    );
  }
  if (confirming) {
    return (
      <div className="flex flex-wrap items-center gap-2 text-xs" role="group" aria-label={`Remove this ${what}?`}>
        <span>{first ? 'Remove this mark-up and its replies?' : 'Remove this reply?'}</span>
        <button type="button" className="btn-quiet text-brick" onClick={() => remove.mutate()} disabled={remove.isPending} autoFocus>Remove</button>
        <button type="button" className="btn-quiet" onClick={() => setConfirming(false)}>Keep</button>
      </div>
    );
  }
  return (
    <div className="flex gap-2 text-xs">
      {note.canEdit && (
        <button type="button" className="inline-flex items-center gap-1 text-ink-soft hover:text-ink" onClick={() => setEditing(true)} aria-label={`Edit your ${what}`}>
          <Pencil size={12} aria-hidden="true" /> Edit
        </button>
      )}
      {note.canDelete && (
        <button type="button" className="inline-flex items-center gap-1 text-ink-soft hover:text-brick" onClick={() => setConfirming(true)} aria-label={`Remove this ${what}`}>
          <Trash2 size={12} aria-hidden="true" /> Remove
        </button>
      )}
    </div>
  );
}
