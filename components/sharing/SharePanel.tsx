'use client';
/**
 * "Share": the workshop makes a viewer link — live (follows every save) or frozen at a revision,
 * with an optional expiry — copies it once (only then is the address shown: the server keeps a
 * hash), and revokes links from a list that says when each was created and last opened.
 * Talks to /api/layouts/[id]/links. Must never store or log a link's address.
 */
import { useState } from 'react';
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { toast } from '@/components/ui/toast';
import { Ban, Copy, Link2 } from 'lucide-react';
import { apiFetch } from '@/lib/api/client-fetch';
import type { ViewerLinkDto } from '@/db/sharing/viewer-links';
import type { RevisionDto } from '@/db/sharing/revisions';
import { PRELIMINARY_WORD } from '@/lib/layout/drawing-issue';
import { formatDateTime } from '@/lib/format';

const EXPIRY_CHOICES = [
  { days: null, word: 'Until withdrawn' },
  { days: 1, word: '1 day' },
  { days: 7, word: '7 days' },
  { days: 30, word: '30 days' },
  { days: 90, word: '90 days' },
] as const;

const STATUS_WORD: Record<ViewerLinkDto['status'], string> = { active: 'Active', expired: 'Expired', revoked: 'Withdrawn' };

export function SharePanel({ layoutId }: { layoutId: string }) {
  const qc = useQueryClient();
  const links = useQuery({ queryKey: ['links', layoutId], queryFn: () => apiFetch<{ links: ViewerLinkDto[] }>(`/api/layouts/${layoutId}/links`) });
  const revisions = useQuery({ queryKey: ['revisions', layoutId], queryFn: () => apiFetch<{ revisions: RevisionDto[] }>(`/api/layouts/${layoutId}/revisions`) });
  const [target, setTarget] = useState('live');
  const [days, setDays] = useState<string>('');
  const [label, setLabel] = useState('');
  const [fresh, setFresh] = useState<string | null>(null);

  const create = useMutation({
    mutationFn: () =>
      apiFetch<{ link: ViewerLinkDto; path: string }>(`/api/layouts/${layoutId}/links`, {
        method: 'POST',
        json: { revisionId: target === 'live' ? null : target, expiresInDays: days ? Number(days) : null, label: label || undefined },
      }),
    onSuccess: ({ path }) => {
      setFresh(`${window.location.origin}${path}`);
      setLabel('');
      qc.invalidateQueries({ queryKey: ['links', layoutId] });
    },
    onError: (err) => toast.error(err.message),
  });
  const withdraw = useMutation({
    mutationFn: (id: string) => apiFetch(`/api/layouts/${layoutId}/links/${id}`, { method: 'DELETE' }),
    onSuccess: () => {
      toast.success('Link withdrawn: it stops working at once');
      qc.invalidateQueries({ queryKey: ['links', layoutId] });
    },
    onError: (err) => toast.error(err.message),
  });

  const copy = async () => {
    if (!fresh) return;
    try {
      await navigator.clipboard.writeText(fresh);
      toast.success('Link copied');
    } catch {
      toast.error('Could not copy; select the address and copy it by hand');
    }
  };

  return (
    <div className="w-[36rem] max-w-full space-y-4 text-sm" data-testid="share-panel">
      <form className="grid gap-3 sm:grid-cols-3" onSubmit={(e) => { e.preventDefault(); create.mutate(); }}>
        <div>
          <label className="label" htmlFor="link-target">Shows</label>
          <select id="link-target" className="field" value={target} onChange={(e) => setTarget(e.target.value)}>
            <option value="live">The layout as saved ({PRELIMINARY_WORD.toLowerCase()}, follows every save)</option>
            {(revisions.data?.revisions ?? []).map((r) => <option key={r.id} value={r.id}>Revision {r.letter} as issued</option>)}
          </select>
        </div>
        <div>
          <label className="label" htmlFor="link-expiry">Works for</label>
          <select id="link-expiry" className="field" value={days} onChange={(e) => setDays(e.target.value)}>
            {EXPIRY_CHOICES.map((c) => <option key={c.word} value={c.days ?? ''}>{c.word}</option>)}
          </select>
        </div>
        <div>
          <label className="label" htmlFor="link-label">Note for yourself</label>
          <input id="link-label" className="field" value={label} maxLength={80} placeholder="e.g. call with Priya" onChange={(e) => setLabel(e.target.value)} />
        </div>
        <div className="sm:col-span-3">
          <button type="submit" className="btn-primary" disabled={create.isPending}><Link2 size={14} aria-hidden="true" /> {create.isPending ? 'Making the link…' : 'Make a viewer link'}</button>
          <p className="mt-1 text-xs text-ink-soft">Anyone with the link sees this plan, view only, without signing in: no other layouts, no addresses.</p>
        </div>
      </form>

      {fresh && (
        <div className="panel space-y-2 border-copper bg-copper-light/40 p-3" role="status">
          <p className="font-medium">Copy the link now: it is shown only once.</p>
          <div className="flex gap-2">
            <input className="field font-mono text-xs" readOnly value={fresh} aria-label="New viewer link" data-testid="new-viewer-link" onFocus={(e) => e.target.select()} />
            <button type="button" className="btn-quiet" onClick={copy}><Copy size={14} aria-hidden="true" /> Copy</button>
          </div>
        </div>
      )}

      <div>
        <h3 className="mb-2 font-medium">Links of this layout</h3>
        {links.isPending ? <p className="text-ink-soft" role="status">Loading links…</p>
          : links.isError ? <p className="text-brick" role="alert">Could not load the links: {links.error.message}</p>
          : links.data.links.length === 0 ? <p className="text-ink-soft">No viewer links yet.</p>
          : (
            <table className="w-full text-left text-xs" data-testid="links-table">
              <thead className="text-ink-soft"><tr><th className="py-1 font-medium">Shows</th><th className="font-medium">Created</th><th className="font-medium">Last opened</th><th className="font-medium">State</th><th /></tr></thead>
              <tbody>
                {links.data.links.map((l) => (
                  <tr key={l.id} className="border-t border-paper-edge align-top">
                    <td className="py-1.5">{l.kind === 'live' ? `${PRELIMINARY_WORD} (live)` : `Revision ${l.revision?.letter ?? '?'}`}{l.label ? <span className="block text-ink-soft">{l.label}</span> : null}</td>
                    <td>{formatDateTime(l.createdAt)}{l.createdBy ? <span className="block text-ink-soft">{l.createdBy}</span> : null}</td>
                    <td>{l.lastOpenedAt ? <>{formatDateTime(l.lastOpenedAt)}<span className="block font-mono text-ink-soft">{l.openCount}×</span></> : <span className="text-ink-soft">never</span>}</td>
                    <td>
                      {STATUS_WORD[l.status]}
                      {l.status === 'active' && l.expiresAt ? <span className="block text-ink-soft">until {formatDateTime(l.expiresAt)}</span> : null}
                    </td>
                    <td className="text-right">
                      {l.status === 'active' && (
                        <button type="button" className="btn-quiet px-2 py-0.5 text-xs" onClick={() => withdraw.mutate(l.id)} disabled={withdraw.isPending} aria-label={`Withdraw the link created ${formatDateTime(l.createdAt)}`}>
                          <Ban size={12} aria-hidden="true" /> Withdraw
                        </button>
                      )}
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          )}
      </div>
    </div>
  );
}
