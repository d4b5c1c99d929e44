'use client';
/**
 * "Invite a client": name, address and optionally a layout to share. The server mails them a
 * one-time link to set a password; this form says whether the mail went out. Never sees the
 * invitation's token.
 */
import { useRouter } from 'next/navigation';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import * as z from 'zod/mini';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { toast } from '@/components/ui/toast';
import { Send } from 'lucide-react';
import { apiFetch, ApiError } from '@/lib/api/client-fetch';
import type { InvitationDto } from '@/db/sharing/invitations';

const schema = z.object({
  name: z.string().check(z.trim(), z.minLength(1, 'give the client’s name'), z.maxLength(80)),
  email: z.email('enter a valid e-mail address').check(z.maxLength(254)),
  layoutId: z.string(),
});
type Values = z.infer<typeof schema>;

export function InviteClientForm({ layouts }: { layouts: { id: string; name: string }[] }) {
  const qc = useQueryClient();
  const router = useRouter();
  const form = useForm<Values>({ resolver: zodResolver(schema), defaultValues: { name: '', email: '', layoutId: '' } });
  const invite = useMutation({
    mutationFn: (v: Values) => apiFetch<{ invitation: InvitationDto; mail: string }>('/api/invitations', { method: 'POST', json: { name: v.name, email: v.email, layoutId: v.layoutId || null } }),
    onSuccess: ({ invitation, mail }) => {
      if (mail === 'sent') toast.success(`Invitation sent to ${invitation.email}`);
      else toast.warning(`Invitation saved, but the mail to ${invitation.email} could not be sent; try “Send again”.`);
      form.reset();
      qc.invalidateQueries({ queryKey: ['invitations'] });
      router.refresh();
    },
    onError: (err) => {
      if (err instanceof ApiError && err.issues.length) err.issues.forEach((i) => form.setError(i.path as keyof Values, { message: i.message }));
      else toast.error(err.message);
    },
  });
  return (
    <form className="panel space-y-3 p-4" onSubmit={form.handleSubmit((v) => invite.mutate(v))} noValidate data-testid="invite-form">
      <h2 className="font-semibold">Invite a client</h2>
      <p className="text-sm text-ink-soft">They get a mail with a link to set a password. As a client they see only the layouts shared with them.</p>
      <div>
        <label className="label" htmlFor="invite-client-name">Name</label>
        <input id="invite-client-name" className="field" autoComplete="off" {...form.register('name')} />
        {form.formState.errors.name && <p className="field-error">{form.formState.errors.name.message}</p>}
      </div>
      <div>
        <label className="label" htmlFor="invite-client-email">E-mail</label>
        <input id="invite-client-email" type="email" className="field" autoComplete="off" {...form.register('email')} />
        {form.formState.errors.email && <p className="field-error">{form.formState.errors.email.message}</p>}
      </div>
      <div>
        <label className="label" htmlFor="invite-client-layout">Share a layout</label>
        <select id="invite-client-layout" className="field" {...form.register('layoutId')}>
          <option value="">None for now</option>
          {layouts.map((l) => <option key={l.id} value={l.id}>{l.name}</option>)}
        </select>
        {form.formState.errors.layoutId && <p className="field-error">{form.formState.errors.layoutId.message}</p>}
      </div>
      <button type="submit" className="btn-primary" disabled={invite.isPending}><Send size={14} aria-hidden="true" /> {invite.isPending ? 'Sending…' : 'Send invitation'}</button>
    </form>
  );
}
