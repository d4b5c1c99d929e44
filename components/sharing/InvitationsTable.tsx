'use client';
/**
 * The studio's invitations and where each stands (pending, accepted, expired, withdrawn), with
 * "Send again" (a fresh link and a fresh week) and "Withdraw". Reads /api/invitations.
 * Never shows a token: the server does not have one to show.
 */
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { toast } from '@/components/ui/toast';
import { Ban, RefreshCw } from 'lucide-react';
import { apiFetch } from '@/lib/api/client-fetch';
import type { InvitationDto } from '@/db/sharing/invitations';
import { formatDateTime } from '@/lib/format';

const STATUS_WORD: Record<InvitationDto['status'], string> = { pending: 'Waiting', accepted: 'Joined', expired: 'Expired', revoked: 'Withdrawn' };

export function InvitationsTable() {
  const qc = useQueryClient();
  const q = useQuery({ queryKey: ['invitations'], queryFn: () => apiFetch<{ invitations: InvitationDto[] }>('/api/invitations') });
  const done = () => qc.invalidateQueries({ queryKey: ['invitations'] });
  const resend = useMutation({
    mutationFn: (id: string) => apiFetch<{ mail: string }>(`/api/invitations/${id}/resend`, { method: 'POST' }),
    onSuccess: ({ mail }) => { if (mail === 'sent') toast.success('Sent again with a new link'); else toast.warning('A new link was made, but the mail could not be sent'); done(); },
    onError: (err) => toast.error(err.message),
  });
  const withdraw = useMutation({
    mutationFn: (id: string) => apiFetch(`/api/invitations/${id}`, { method: 'DELETE' }),
    onSuccess: () => { toast.success('Invitation withdrawn'); done(); },
    onError: (err) => toast.error(err.message),
  });
  return (
    <section className="panel p-4 text-sm">
      <h2 className="mb-2 font-semibold">Invitations</h2>
      {q.isPending ? <p className="text-ink-soft" role="status">Loading invitations…</p>
        : q.isError ? <p className="text-brick" role="alert">Could not load invitations: {q.error.message}</p>
        : q.data.invitations.length === 0 ? <p className="text-ink-soft">No invitations yet.</p>
        : (
          <table className="w-full text-left" data-testid="invitations-table">
            <thead className="text-xs text-ink-soft"><tr><th className="py-1 font-medium">Client</th><th className="font-medium">Layout</th><th className="font-medium">Sent</th><th className="font-medium">State</th><th /></tr></thead>
            <tbody>
              {q.data.invitations.map((i) => (
                <tr key={i.id} className="border-t border-paper-edge align-top" data-status={i.status}>
                  <td className="py-1.5">{i.name}{i.role === 'designer' ? <span className="ml-1 text-xs text-ink-soft">(designer)</span> : null}<span className="block text-xs text-ink-soft">{i.email}</span></td>
                  <td className="text-xs">{i.layout?.name ?? <span className="text-ink-faint">—</span>}</td>
                  <td className="text-xs">{i.lastSentAt ? formatDateTime(i.lastSentAt) : <span className="text-brick">not sent</span>}{i.invitedBy ? <span className="block text-ink-soft">by {i.invitedBy}</span> : null}</td>
                  <td className="text-xs">{STATUS_WORD[i.status]}{i.status === 'pending' ? <span className="block text-ink-soft">until {formatDateTime(i.expiresAt)}</span> : null}</td>
                  <td className="whitespace-nowrap text-right">
                    {(i.status === 'pending' || i.status === 'expired') && (
                      <button type="button" className="btn-quiet px-2 py-0.5 text-xs" onClick={() => resend.mutate(i.id)} disabled={resend.isPending}><RefreshCw size={12} aria-hidden="true" /> Send again</button>
                    )}
                    {i.status === 'pending' && (
                      <button type="button" className="btn-quiet ml-1 px-2 py-0.5 text-xs" onClick={() => withdraw.mutate(i.id)} disabled={withdraw.isPending}><Ban size={12} aria-hidden="true" /> Withdraw</button>
                    )}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
    </section>
  );
}
