'use client';
/**
 * A newly invited address chooses its own password (twice), which creates the account in the
 * inviting studio; then they are signed in and taken to the layout shared with them. Errors from the
 * server (expired, withdrawn, already used) are shown as they come. Must never send the password
 * anywhere but the accept route and the sign-in endpoint.
 */
import { useState } from 'react';
import { useRouter } from 'next/navigation';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import * as z from 'zod/mini';
import { signIn } from 'next-auth/react';
import { apiFetch, ApiError } from '@/lib/api/client-fetch';
import { passwordLengthSchema, PASSWORD_MIN } from '@/lib/auth/password-rules';

const schema = z
  .object({
    name: z.string().check(z.trim(), z.minLength(1, 'tell us your name'), z.maxLength(80)),
    password: passwordLengthSchema,
    repeat: z.string(),
  })
  .check(z.refine((v) => v.password === v.repeat, { message: 'the two passwords differ', path: ['repeat'] }));
type Values = z.infer<typeof schema>;

export function AcceptInvitationForm({ token, email, name }: { token: string; email: string; name: string }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const form = useForm<Values>({ resolver: zodResolver(schema), defaultValues: { name, password: '', repeat: '' } });

  async function onSubmit(v: Values) {
    setError(null);
    let layoutId: string | null = null;
    try {
      const res = await apiFetch<{ email: string; layoutId: string | null }>('/api/invitations/accept', { method: 'POST', json: { token, name: v.name, password: v.password } });
      layoutId = res.layoutId;
    } catch (err) {
      if (err instanceof ApiError && err.issues.length) err.issues.forEach((i) => form.setError(i.path as keyof Values, { message: i.message }));
      else setError(err instanceof Error ? err.message : 'Something went wrong.');
      return;
    }
    const signedIn = await signIn('credentials', { email, password: v.password, redirect: false });
    if (!signedIn || signedIn.error) {
      setError('Your password is set, but signing in failed. Sign in with it on the next page.');
      router.push(`/sign-in?email=${encodeURIComponent(email)}`);
      return;
    }
    router.push(layoutId ? `/layouts/${layoutId}` : '/layouts');
    router.refresh();
  }

  return (
    <form onSubmit={form.handleSubmit(onSubmit)} className="space-y-4" noValidate>
      <div>
        <span className="label">E-mail</span>
        <p className="font-mono text-sm" data-testid="invited-email">{email}</p>
      </div>
      <div>
        <label className="label" htmlFor="invite-name">Your name</label>
        <input id="invite-name" className="field" autoComplete="name" {...form.register('name')} />
        {form.formState.errors.name && <p className="field-error">{form.formState.errors.name.message}</p>}
      </div>
      <div>
        <label className="label" htmlFor="invite-password">Choose a password</label>
        <input id="invite-password" type="password" className="field" autoComplete="new-password" aria-describedby="invite-password-hint" {...form.register('password')} />
        <p id="invite-password-hint" className="mt-1 text-xs text-ink-soft">At least {PASSWORD_MIN} characters, and not a common password. A few unrelated words work well.</p>
        {form.formState.errors.password && <p className="field-error">{form.formState.errors.password.message}</p>}
      </div>
      <div>
        <label className="label" htmlFor="invite-repeat">Repeat the password</label>
        <input id="invite-repeat" type="password" className="field" autoComplete="new-password" {...form.register('repeat')} />
        {form.formState.errors.repeat && <p className="field-error">{form.formState.errors.repeat.message}</p>}
      </div>
      {error && <p role="alert" className="rounded-sm border border-brick bg-brick-light px-3 py-2 text-sm text-brick">{error}</p>}
      <button type="submit" className="btn-primary w-full" disabled={form.formState.isSubmitting}>
        {form.formState.isSubmitting ? 'Setting up…' : 'Set password and join'}
      </button>
    </form>
  );
}
