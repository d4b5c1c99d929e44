'use client';
/**
 * The revisions of one layout: the workshop issues the next lettered revision for approval with
 * a note; the client approves the latest one (final, said plainly before they confirm) or returns
 * it for changes with a message; everyone sees who decided what and when, and can compare two revisions.
 * Reads and writes through /api/layouts/[id]/revisions. Must never offer a decision to anyone
 * but the layout's client, nor on a superseded or approved revision.
 */
import Link from 'next/link';
import { useState } from 'react';
import { useRouter } from 'next/navigation';
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { toast } from '@/components/ui/toast';
import { CheckCircle2, Lock, Stamp, Undo2 } from 'lucide-react';
import { decisionWords, ISSUE_STATE_WORD, nextRevisionLetter } from '@/lib/layout/drawing-issue';
import { RevisionMarkIcon } from './RevisionMarkIcon';
import { apiFetch } from '@/lib/api/client-fetch';
import type { RevisionDto } from '@/db/sharing/revisions';
import { Dialog } from '@/components/editor/panels/Dialog';
import { LayoutStateBadge } from './LayoutStateBadge';
import { SIGN_OFF_CAUTION } from '@/lib/layout/cautions';
import { formatDateTime } from '@/lib/format';


interface Props {
  layoutId: string;
  canEdit: boolean;
  isClient: boolean;
  initial: RevisionDto[];
}

export function RevisionsScreen({ layoutId, canEdit, isClient, initial }: Props) {
  const qc = useQueryClient();
  const router = useRouter();
  const key = ['revisions', layoutId];
  /** After a change: our list, the layouts table, and the server-drawn state badge above. */
  const changed = () => {
    qc.invalidateQueries({ queryKey: key });
    qc.invalidateQueries({ queryKey: ['layouts'] });
    router.refresh();
  };
  const q = useQuery({ queryKey: key, queryFn: () => apiFetch<{ revisions: RevisionDto[] }>(`/api/layouts/${layoutId}/revisions`), initialData: { revisions: initial } });
  const revisions = q.data.revisions;
  const [note, setNote] = useState('');
  const issue = useMutation({
    mutationFn: () => apiFetch<{ revision: RevisionDto; mail: string }>(`/api/layouts/${layoutId}/revisions`, { method: 'POST', json: { note } }),
    onSuccess: ({ revision, mail }) => {
      setNote('');
      toast.success(`Revision ${revision.letter} issued${mail === 'sent' ? ' and the client told by mail' : mail === 'no-recipient' ? ' (no client on this layout yet)' : mail === 'not-configured' ? ' — mail is not set up on this server, so tell the client yourself' : ' — the mail could not be sent'}`);
      changed();
    },
    onError: (err) => toast.error(err.message),
  });

  return (
    <div className="space-y-6">
      {canEdit && (
        <form className="panel space-y-2 p-4" onSubmit={(e) => { e.preventDefault(); issue.mutate(); }} data-testid="issue-revision">
          <h2 className="font-semibold">Issue revision {nextLetter(revisions)}</h2>
          <p className="text-sm text-ink-soft">Freezes the layout as last saved and issues it to the client for approval. Until then the layout is preliminary.</p>
          <label className="label" htmlFor="revision-note">Note for the client</label>
          <textarea id="revision-note" className="field min-h-20" maxLength={2000} value={note} onChange={(e) => setNote(e.target.value)} placeholder="What changed, what to look at…" />
          <button type="submit" className="btn-primary" disabled={issue.isPending}><Stamp size={14} aria-hidden="true" /> {issue.isPending ? 'Issuing…' : `Issue revision ${nextLetter(revisions)}`}</button>
        </form>
      )}

      {revisions.length === 0 ? (
        <div className="panel p-8 text-center text-sm">
          <p className="font-medium">Preliminary: no revision issued yet</p>
          <p className="mt-1 text-ink-soft">{canEdit ? 'Issue revision A for approval when the layout is ready for the client.' : 'The workshop has not issued a revision for your approval yet.'}</p>
        </div>
      ) : (
        <ol className="space-y-4" data-testid="revisions-list">
          {revisions.map((r, i) => (
            <RevisionCard key={r.id} layoutId={layoutId} revision={r} isClient={isClient} previous={revisions[i + 1]?.letter ?? null} onChanged={changed} />
          ))}
        </ol>
      )}
    </div>
  );
}

function nextLetter(revs: RevisionDto[]): string {
  return nextRevisionLetter(revs[0]?.letter);
}

function RevisionCard({ layoutId, revision: r, isClient, previous, onChanged }: { layoutId: string; revision: RevisionDto; isClient: boolean; previous: string | null; onChanged: () => void }) {
  const [asking, setAsking] = useState(false);
  const [confirming, setConfirming] = useState(false);
  const [message, setMessage] = useState('');
  const decide = useMutation({
    mutationFn: (body: { decision: 'approve' | 'changes'; message?: string }) =>
      apiFetch<{ revision: RevisionDto }>(`/api/layouts/${layoutId}/revisions/${r.id}/decision`, { method: 'POST', json: body }),
    onSuccess: ({ revision }) => {
      toast.success(revision.state === 'approved' ? `Revision ${revision.letter} approved` : `Revision ${revision.letter} returned to the workshop for changes`);
      setAsking(false);
      setConfirming(false);
      setMessage('');
      onChanged();
    },
    onError: (err) => toast.error(err.message),
  });
  const canDecide = isClient && r.isLatest && r.state !== 'approved';

  return (
    <li className="panel p-4" data-testid="revision" data-letter={r.letter} data-state={r.state}>
      <div className="flex flex-wrap items-start gap-3">
        <span className="font-mono text-3xl leading-none" aria-hidden="true">{r.letter}</span>
        <div className="min-w-0 flex-1">
          <h3 className="flex flex-wrap items-center gap-2 font-semibold">
            Revision {r.letter} <LayoutStateBadge state={r.state} />
            {!r.isLatest && <span className="text-xs font-normal text-ink-soft">superseded</span>}
          </h3>
          <p className="text-xs text-ink-soft">Issued {formatDateTime(r.issuedAt)}{r.issuedBy ? ` by ${r.issuedBy}` : ''} · layout version <span className="font-mono">{r.layoutVersion}</span></p>
          {r.note && <p className="mt-2 whitespace-pre-wrap text-sm">{r.note}</p>}
        </div>
        <div className="flex flex-wrap gap-2">
          {previous && (
            <Link className="btn-quiet px-2 py-1" href={`/layouts/${layoutId}/revisions/compare?from=${previous}&to=${r.letter}`}><RevisionMarkIcon letter={r.letter} /> Compare with {previous}</Link>
          )}
          {r.isLatest && (
            <Link className="btn-quiet px-2 py-1" href={`/layouts/${layoutId}/revisions/compare?from=${r.letter}&to=current`}><RevisionMarkIcon letter="?" /> Changes since issue</Link>
          )}
        </div>
      </div>

      {r.decisions.length > 0 && (
        <ul className="mt-3 space-y-2 border-t border-paper-edge pt-3 text-sm" aria-label={`Decisions on revision ${r.letter}`}>
          {r.decisions.map((d, i) => (
            <li key={i} className="flex gap-2">
              {d.decision === 'approved' ? <CheckCircle2 size={16} className="mt-0.5 shrink-0 text-moss" aria-hidden="true" /> : <Undo2 size={16} className="mt-0.5 shrink-0 text-ochre" aria-hidden="true" />}
              <span>
                <strong>{ISSUE_STATE_WORD[d.decision]}</strong> by {d.by}, {formatDateTime(d.at)}
                {d.message && <span className="block whitespace-pre-wrap text-ink-soft">“{d.message}”</span>}
              </span>
            </li>
          ))}
        </ul>
      )}
      {r.approval && (
        <p className="mt-3 inline-flex items-center gap-1 text-xs text-ink-soft"><Lock size={12} aria-hidden="true" /> The approval is recorded and cannot be changed.</p>
      )}

      {canDecide && (
        <div className="mt-3 border-t border-paper-edge pt-3">
          {asking ? (
            <form className="space-y-2" onSubmit={(e) => { e.preventDefault(); decide.mutate({ decision: 'changes', message }); }}>
              <label className="label" htmlFor={`changes-${r.id}`}>What should the workshop change?</label>
              <textarea id={`changes-${r.id}`} className="field min-h-20" value={message} maxLength={4000} onChange={(e) => setMessage(e.target.value)} required />
              <div className="flex gap-2">
                <button type="submit" className="btn-primary" disabled={decide.isPending || !message.trim()}>{decisionWords(r.letter).returnConfirm}</button>
                <button type="button" className="btn-quiet" onClick={() => setAsking(false)}>Cancel</button>
              </div>
            </form>
          ) : (
            <div className="flex flex-wrap gap-2">
              <button type="button" className="btn-primary" onClick={() => setConfirming(true)}><CheckCircle2 size={14} aria-hidden="true" /> {decisionWords(r.letter).approve}</button>
              <button type="button" className="btn-quiet" onClick={() => setAsking(true)}><Undo2 size={14} aria-hidden="true" /> {decisionWords(r.letter).return}</button>
            </div>
          )}
        </div>
      )}

      <Dialog open={confirming} title={`Approve revision ${r.letter}?`} onClose={() => setConfirming(false)} testId="approve-dialog">
        <p className="text-sm">Your approval is recorded with your name and the time, and cannot be changed afterwards. The workshop builds from this revision.</p>
        <p className="mt-2 text-xs text-ink-soft">{SIGN_OFF_CAUTION}</p>
        <label className="label mt-3" htmlFor={`approve-note-${r.id}`}>Message (optional)</label>
        <textarea id={`approve-note-${r.id}`} className="field min-h-14" value={message} maxLength={4000} onChange={(e) => setMessage(e.target.value)} />
        <div className="mt-4 flex justify-end gap-2">
          <button type="button" className="btn-quiet" onClick={() => setConfirming(false)}>Not yet</button>
          <button type="button" className="btn-primary" disabled={decide.isPending} onClick={() => decide.mutate({ decision: 'approve', message: message || undefined })}>
            {decide.isPending ? 'Approving…' : `Approve revision ${r.letter}`}
          </button>
        </div>
      </Dialog>
    </li>
  );
}
