'use client';
/**
 * The comments column beside the plan: every thread of the layout, numbered as its pin, with
 * replies, resolve / reopen, changing or removing one's own comments, and the form for a new pin (placed by clicking the plan, or typed
 * as x and y in millimetres for keyboard use). Talks to /api/layouts/[id]/comments through
 * TanStack Query. Must never draw on the canvas (CommentPinsLayer does) nor hold the document.
 */
import { useState } from 'react';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { toast } from 'sonner';
import { CheckCircle2, MapPin, MessageSquare, Pencil, RotateCcw, Trash2, X } from 'lucide-react';
import { apiFetch } from '@/lib/api/client-fetch';
import type { Arrangement } from '@/lib/layout/schema';
import type { CommentDto, ThreadDto } from '@/db/sharing/comments';
import { formatDateTime } from '@/lib/format';

const ARRANGEMENT_WORD: Record<Arrangement, string> = { travel: 'travel', lounge: 'lounge', sleep: 'sleep' };
const ROLE_WORD = { owner: 'workshop', designer: 'workshop', client: 'client' } as const;

export interface PendingPin {
  arrangement: Arrangement;
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
  pending: PendingPin | null;
  onPendingChange: (p: PendingPin | null) => void;
  onClose: () => void;
}

export function CommentsPanel(p: Props) {
  const qc = useQueryClient();
  const key = ['comments', p.layoutId];
  const refresh = () => qc.invalidateQueries({ queryKey: key });
  const [draft, setDraft] = useState('');
  const [showResolved, setShowResolved] = useState(false);

  const create = useMutation({
    mutationFn: (body: Record<string, unknown>) => apiFetch<{ thread: ThreadDto }>(`/api/layouts/${p.layoutId}/comments`, { method: 'POST', json: body }),
    onSuccess: ({ thread }) => {
      setDraft('');
      p.onPendingChange(null);
      p.onActivate(thread.id);
      refresh();
      toast.success('Comment pinned');
    },
    onError: (err) => toast.error(err.message),
  });

  const visible = p.threads.filter((t) => showResolved || !t.resolved || t.id === p.activeId);
  const resolvedCount = p.threads.filter((t) => t.resolved).length;

  return (
    <aside className="flex w-72 shrink-0 flex-col border-l border-paper-edge bg-paper" aria-label="Comments" data-testid="comments-panel">
      <div className="flex items-center gap-2 border-b border-paper-edge px-3 py-2">
        <MessageSquare size={14} aria-hidden="true" />
        <h2 className="text-sm font-semibold">Comments</h2>
        <span className="font-mono text-xs text-ink-soft">{p.threads.filter((t) => !t.resolved).length} open</span>
        <button type="button" className="ml-auto rounded-sm p-1 text-ink-soft hover:text-ink" aria-label="Close comments" onClick={p.onClose}><X size={14} /></button>
      </div>

      <div className="border-b border-paper-edge p-3">
        {p.pending ? (
          <form
            className="space-y-2"
            onSubmit={(e) => {
              e.preventDefault();
              if (!p.pending) return;
              create.mutate({ arrangement: p.pending.arrangement, x: p.pending.x, y: p.pending.y, body: draft });
            }}
          >
            <p className="text-xs text-ink-soft">
              New pin in the <strong>{ARRANGEMENT_WORD[p.pending.arrangement]}</strong> arrangement
            </p>
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
            <label className="label" htmlFor="new-comment">Comment</label>
            <textarea id="new-comment" className="field min-h-20" value={draft} onChange={(e) => setDraft(e.target.value)} maxLength={2000} required autoFocus />
            <div className="flex gap-2">
              <button type="submit" className="btn-primary" disabled={create.isPending || !draft.trim()}>{create.isPending ? 'Pinning…' : 'Pin comment'}</button>
              <button type="button" className="btn-quiet" onClick={() => { p.onPendingChange(null); setDraft(''); }}>Cancel</button>
            </div>
          </form>
        ) : p.placing ? (
          <div className="space-y-2 text-sm" role="status">
            <p>Click the plan where the comment belongs.</p>
            <button type="button" className="btn-quiet" onClick={p.onCancelPlacing}>Cancel</button>
          </div>
        ) : (
          <button type="button" className="btn-primary w-full" onClick={p.onStartPlacing}>
            <MapPin size={14} aria-hidden="true" /> Add a comment
          </button>
        )}
      </div>

      <div className="min-h-0 flex-1 overflow-y-auto">
        {p.loading ? (
          <p className="p-3 text-sm text-ink-soft" role="status">Loading comments…</p>
        ) : p.error ? (
          <p className="p-3 text-sm text-brick" role="alert">Could not load comments: {p.error}</p>
        ) : p.threads.length === 0 ? (
          <p className="p-3 text-sm text-ink-soft">No comments yet. Pin one to a spot on the plan.</p>
        ) : (
          <ol className="divide-y divide-paper-edge">
            {visible.map((t) => (
              <ThreadItem key={t.id} layoutId={p.layoutId} thread={t} number={p.threads.indexOf(t) + 1} active={t.id === p.activeId} onActivate={p.onActivate} onChanged={refresh} />
            ))}
          </ol>
        )}
        {resolvedCount > 0 && (
          <label className="flex items-center gap-2 p-3 text-xs text-ink-soft">
            <input type="checkbox" className="accent-copper" checked={showResolved} onChange={(e) => setShowResolved(e.target.checked)} />
            Show {resolvedCount} resolved
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
  const resolve = useMutation({
    mutationFn: (resolved: boolean) => apiFetch(`/api/layouts/${layoutId}/comments/${thread.id}`, { method: 'PATCH', json: { resolved } }),
    onSuccess: onChanged,
    onError: (err) => toast.error(err.message),
  });
  return (
    <li className={`p-3 text-sm ${active ? 'bg-copper-light/40' : ''}`} data-testid="comment-thread" data-thread-id={thread.id}>
      <button type="button" className="flex w-full items-start gap-2 text-left" onClick={() => onActivate(active ? null : thread.id)} aria-expanded={active}>
        <span className={`mt-0.5 inline-flex h-5 w-5 shrink-0 items-center justify-center rounded-full font-mono text-xs ${thread.resolved ? 'border border-copper text-copper' : 'bg-copper text-paper'}`}>{number}</span>
        <span className="min-w-0 flex-1">
          <span className="block whitespace-pre-wrap break-words">{thread.body}</span>
          <span className="mt-1 block text-xs text-ink-soft">
            {thread.author.name} ({ROLE_WORD[thread.author.role]}) · {formatDateTime(thread.createdAt)}{thread.editedAt ? ' · edited' : ''} · {ARRANGEMENT_WORD[thread.arrangement]},{' '}
            <span className="font-mono">x {thread.x} mm, y {thread.y} mm</span>
          </span>
          {thread.resolved && <span className="mt-1 inline-flex items-center gap-1 text-xs text-moss"><CheckCircle2 size={12} aria-hidden="true" /> Resolved</span>}
        </span>
      </button>
      {active && (
        <div className="mt-2 space-y-2 pl-7">
          <OwnCommentControls layoutId={layoutId} comment={thread} first onChanged={onChanged} onRemoved={() => { onActivate(null); onChanged(); }} />
          {thread.replies.map((r) => (
            <div key={r.id} className="border-l-2 border-paper-edge pl-2" data-testid="comment-reply">
              <p className="whitespace-pre-wrap break-words">{r.body}</p>
              <p className="text-xs text-ink-soft">{r.author.name} ({ROLE_WORD[r.author.role]}) · {formatDateTime(r.createdAt)}{r.editedAt ? ' · edited' : ''}</p>
              <OwnCommentControls layoutId={layoutId} comment={r} onChanged={onChanged} onRemoved={onChanged} />
            </div>
          ))}
          <form className="space-y-1" onSubmit={(e) => { e.preventDefault(); send.mutate(); }}>
            <label className="sr-only" htmlFor={`reply-${thread.id}`}>Reply</label>
            <textarea id={`reply-${thread.id}`} className="field min-h-14" placeholder="Reply…" value={reply} onChange={(e) => setReply(e.target.value)} maxLength={2000} />
            <div className="flex flex-wrap gap-2">
              <button type="submit" className="btn-quiet" disabled={send.isPending || !reply.trim()}>Reply</button>
              {thread.resolved ? (
                <button type="button" className="btn-quiet" onClick={() => resolve.mutate(false)} disabled={resolve.isPending}><RotateCcw size={12} aria-hidden="true" /> Reopen</button>
              ) : (
                <button type="button" className="btn-quiet" onClick={() => resolve.mutate(true)} disabled={resolve.isPending}><CheckCircle2 size={12} aria-hidden="true" /> Resolve</button>
              )}
            </div>
          </form>
        </div>
      )}
    </li>
  );
}

/** Edit and Remove for a comment the caller may change; nothing at all for others' comments. */
function OwnCommentControls({ layoutId, comment, first = false, onChanged, onRemoved }: { layoutId: string; comment: CommentDto; first?: boolean; onChanged: () => void; onRemoved: () => void }) {
  const [editing, setEditing] = useState(false);
  const [confirming, setConfirming] = useState(false);
  const [text, setText] = useState(comment.body);
  const url = `/api/layouts/${layoutId}/comments/${comment.id}`;
  const save = useMutation({
    mutationFn: () => apiFetch(url, { method: 'PATCH', json: { body: text } }),
    onSuccess: () => { setEditing(false); onChanged(); toast.success('Comment changed'); },
    onError: (err) => toast.error(err.message),
  });
  const remove = useMutation({
    mutationFn: () => apiFetch(url, { method: 'DELETE' }),
    onSuccess: () => { setConfirming(false); onRemoved(); toast.success(first ? 'Thread removed' : 'Reply removed'); },
    onError: (err) => toast.error(err.message),
  });
  if (!comment.canEdit && !comment.canDelete) return null;
  const what = first ? 'comment' : 'reply';
  if (editing) {
    return (
      <form className="space-y-1" onSubmit={(e) => { e.preventDefault(); save.mutate(); }}>
        <label className="sr-only" htmlFor={`edit-${comment.id}`}>Change your {what}</label>
        <textarea id={`edit-${comment.id}`} className="field min-h-14" value={text} onChange={(e) => setText(e.target.value)} maxLength={2000} autoFocus
          onKeyDown={(e) => { if (e.key === 'Escape') { setEditing(false); setText(comment.body); } }} />
        <div className="flex gap-2">
          <button type="submit" className="btn-quiet" disabled={save.isPending || !text.trim()}>{save.isPending ? 'Saving…' : 'Save'}</button>
          <button type="button" className="btn-quiet" onClick={() => { setEditing(false); setText(comment.body); }}>Cancel</button>
        </div>
      </form>
    );
  }
  if (confirming) {
    return (
      <div className="flex flex-wrap items-center gap-2 text-xs" role="group" aria-label={`Remove this ${what}?`}>
        <span>{first ? 'Remove this thread and its replies?' : 'Remove this reply?'}</span>
        <button type="button" className="btn-quiet text-brick" onClick={() => remove.mutate()} disabled={remove.isPending} autoFocus>Remove</button>
        <button type="button" className="btn-quiet" onClick={() => setConfirming(false)}>Keep</button>
      </div>
    );
  }
  return (
    <div className="flex gap-2 text-xs">
      {comment.canEdit && (
        <button type="button" className="inline-flex items-center gap-1 text-ink-soft hover:text-ink" onClick={() => setEditing(true)} aria-label={`Edit your ${what}`}>
          <Pencil size={12} aria-hidden="true" /> Edit
        </button>
      )}
      {comment.canDelete && (
        <button type="button" className="inline-flex items-center gap-1 text-ink-soft hover:text-brick" onClick={() => setConfirming(true)} aria-label={`Remove this ${what}`}>
          <Trash2 size={12} aria-hidden="true" /> Remove
        </button>
      )}
    </div>
  );
}
