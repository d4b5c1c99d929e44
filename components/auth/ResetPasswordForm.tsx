'use client';
/**
 * The page a reset mail links to: choose a new password (twice). On success every session of
 * the account has ended; the person signs in with the new password. Must never send the
 * password anywhere but the confirm route and the sign-in endpoint.
 */
import { useState } from 'react';
import { useRouter } from 'next/navigation';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { signIn } from 'next-auth/react';
import { apiFetch, ApiError } from '@/lib/api/client-fetch';
import { NewPasswordFields, newPasswordPair } from './NewPasswordFields';

type Values = { password: string; repeat: string };

export function ResetPasswordForm({ token }: { token: string }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const form = useForm<Values>({ resolver: zodResolver(newPasswordPair), defaultValues: { password: '', repeat: '' } });

  async function onSubmit(v: Values) {
    setError(null);
    let email: string;
    try {
      ({ email } = await apiFetch<{ email: string }>('/api/password-reset/confirm', { method: 'POST', json: { token, password: v.password } }));
    } catch (err) {
      if (err instanceof ApiError && err.issues.length) err.issues.forEach((i) => form.setError(i.path === 'password' ? 'password' : 'repeat', { message: i.message }));
      else setError(err instanceof Error ? err.message : 'Something went wrong.');
      return;
    }
    const signedIn = await signIn('credentials', { email, password: v.password, redirect: false });
    if (!signedIn || signedIn.error) {
      router.push(`/sign-in?email=${encodeURIComponent(email)}`);
      return;
    }
    router.push('/layouts');
    router.refresh();
  }

  return (
    <form onSubmit={form.handleSubmit(onSubmit)} className="space-y-4" noValidate>
      <NewPasswordFields register={form.register} errors={form.formState.errors} idPrefix="reset" />
      {error && <p role="alert" className="rounded-sm border border-brick bg-brick-light px-3 py-2 text-sm text-brick">{error}</p>}
      <button type="submit" className="btn-primary w-full" disabled={form.formState.isSubmitting}>
        {form.formState.isSubmitting ? 'Saving…' : 'Set the new password'}
      </button>
    </form>
  );
}
