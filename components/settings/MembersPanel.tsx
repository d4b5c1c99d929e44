'use client';
// The studio's members and roles. The owner invites designers and clients by mail (they set
// their own password, or join with the account they have) and changes roles. Never asks for or
// shows anyone's password.
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import * as z from 'zod/mini';
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { toast } from '@/components/ui/toast';
import { apiFetch, ApiError } from '@/lib/api/client-fetch';
import type { MemberDto } from '@/db/studios';
import type { InvitationDto } from '@/db/sharing/invitations';

const ROLE_WORD = { owner: 'Owner', designer: 'Designer', client: 'Client' } as const;

const addSchema = z.object({
  name: z.string().check(z.trim(), z.minLength(1, 'give their name'), z.maxLength(80)),
  email: z.email('enter a valid e-mail address'),
  role: z.enum(['designer', 'client']),
});
type AddValues = z.infer<typeof addSchema>;

export function MembersPanel({ isOwner, selfId }: { isOwner: boolean; selfId: string }) {
  const qc = useQueryClient();
  const members = useQuery({ queryKey: ['members'], queryFn: () => apiFetch<{ members: MemberDto[] }>('/api/studio/members') });
  const form = useForm<AddValues>({ resolver: zodResolver(addSchema), defaultValues: { name: '', email: '', role: 'client' } });

  const add = useMutation({
    mutationFn: (v: AddValues) => apiFetch<{ invitation: InvitationDto; mail: string }>('/api/studio/members', { method: 'POST', json: v }),
    onSuccess: ({ invitation, mail }) => {
      if (mail === 'sent') toast.success(`Invitation sent to ${invitation.email}. They appear here once they accept.`);
      else toast.warning(`Invitation saved, but the mail to ${invitation.email} could not be sent; send it again from Clients.`);
      form.reset();
      qc.invalidateQueries({ queryKey: ['invitations'] });
    },
    onError: (err) => {
      if (err instanceof ApiError && err.issues.length) err.issues.forEach((i) => form.setError(i.path as keyof AddValues, { message: i.message }));
      else toast.error(err.message);
    },
  });
  const setRole = useMutation({
    mutationFn: ({ userId, role }: { userId: string; role: string }) => apiFetch(`/api/studio/members/${userId}`, { method: 'PATCH', json: { role } }),
    onSuccess: () => qc.invalidateQueries({ queryKey: ['members'] }),
    onError: (err) => toast.error(err.message),
  });

  return (
    <section className="panel p-5">
      <h2 className="text-lg font-semibold">Members</h2>
      {members.isPending ? <p className="mt-3 text-sm text-ink-soft">Loading members…</p>
        : members.isError ? <p className="mt-3 text-sm text-brick" role="alert">Could not load members: {members.error.message}</p>
        : (
          <table className="mt-3 w-full text-sm">
            <thead className="text-left text-xs uppercase tracking-wide text-ink-soft"><tr><th className="py-1">Name</th><th>E-mail</th><th>Role</th></tr></thead>
            <tbody>
              {members.data.members.map((m) => (
                <tr key={m.userId} className="border-t border-paper-edge">
                  <td className="py-2">{m.name}</td>
                  <td className="break-all text-ink-soft">{m.email ?? '—'}</td>
                  <td>
                    {isOwner && m.userId !== selfId ? (
                      <select aria-label={`Role of ${m.name}`} className="field w-auto py-0.5" value={m.role}
                        onChange={(e) => setRole.mutate({ userId: m.userId, role: e.target.value })}>
                        {Object.entries(ROLE_WORD).map(([v, w]) => <option key={v} value={v}>{w}</option>)}
                      </select>
                    ) : ROLE_WORD[m.role]}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
      {isOwner && (
        <form className="mt-5 grid gap-3 border-t border-paper-edge pt-4 sm:grid-cols-2" onSubmit={form.handleSubmit((v) => add.mutate(v))} noValidate>
          <h3 className="font-medium sm:col-span-2">Invite someone</h3>
          <p className="text-sm text-ink-soft sm:col-span-2">They get a mail with a link. New to Baywright, they choose their own password; with an account already, they join with it.</p>
          {([['name', 'Name', 'text'], ['email', 'E-mail', 'email']] as const).map(([k, label, type]) => (
            <div key={k}>
              <label className="label" htmlFor={`m-${k}`}>{label}</label>
              <input id={`m-${k}`} type={type} className="field" autoComplete="off" {...form.register(k)} />
              {form.formState.errors[k] && <p className="field-error">{form.formState.errors[k]?.message}</p>}
            </div>
          ))}
          <div>
            <label className="label" htmlFor="m-role">Role</label>
            <select id="m-role" className="field" {...form.register('role')}>
              <option value="client">Client — sees only layouts shared with them</option>
              <option value="designer">Designer — creates and edits layouts</option>
            </select>
          </div>
          <div className="sm:col-span-2"><button className="btn-primary" type="submit" disabled={add.isPending}>{add.isPending ? 'Sending…' : 'Send invitation'}</button></div>
        </form>
      )}
    </section>
  );
}
