'use client';
/**
 * "Forgot your password?": asks for the address and always shows the same answer, whether or
 * not an account uses it (the server says the same). Never says which addresses exist.
 */
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import * as z from 'zod/mini';
import { apiFetch, ApiError } from '@/lib/api/client-fetch';

const schema = z.object({ email: z.email('enter your e-mail address').check(z.maxLength(254)) });
type Values = z.infer<typeof schema>;

export function ResetRequestForm({ email }: { email?: string }) {
  const [sent, setSent] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  const form = useForm<Values>({ resolver: zodResolver(schema), defaultValues: { email: email ?? '' } });

  async function onSubmit(v: Values) {
    setError(null);
    try {
      const res = await apiFetch<{ message: string }>('/api/password-reset', { method: 'POST', json: v });
      setSent(res.message);
    } catch (err) {
      if (err instanceof ApiError && err.issues.length) err.issues.forEach((i) => form.setError(i.path as keyof Values, { message: i.message }));
      else setError(err instanceof Error ? err.message : 'Something went wrong.');
    }
  }

  if (sent) return <p role="status" className="text-sm" data-testid="reset-requested">{sent}</p>;
  return (
    <form onSubmit={form.handleSubmit(onSubmit)} className="space-y-4" noValidate>
      <p className="text-sm text-ink-soft">Give the address you sign in with. We mail it a link to set a new password.</p>
      <div>
        <label className="label" htmlFor="reset-email">E-mail</label>
        <input id="reset-email" type="email" autoComplete="email" className="field" {...form.register('email')} />
        {form.formState.errors.email && <p className="field-error">{form.formState.errors.email.message}</p>}
      </div>
      {error && <p role="alert" className="rounded-sm border border-brick bg-brick-light px-3 py-2 text-sm text-brick">{error}</p>}
      <button type="submit" className="btn-primary w-full" disabled={form.formState.isSubmitting}>
        {form.formState.isSubmitting ? 'Sending…' : 'Send me a link'}
      </button>
    </form>
  );
}
