'use client';
/**
 * Settings → Your password: the current password, then the new one twice. The server ends
 * every session (other devices included); this form then signs in again with the new password
 * so the person stays where they are.
 */
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import * as z from 'zod/mini';
import { signIn } from 'next-auth/react';
import { useRouter } from 'next/navigation';
import { toast } from '@/components/ui/toast';
import { apiFetch, ApiError } from '@/lib/api/client-fetch';
import { NewPasswordFields } from '@/components/auth/NewPasswordFields';
import { passwordLengthSchema } from '@/lib/auth/password-rules';

const schema = z
  .object({ currentPassword: z.string().check(z.minLength(1, 'enter your current password')), password: passwordLengthSchema, repeat: z.string() })
  .check(z.refine((v) => v.password === v.repeat, { message: 'the two passwords differ', path: ['repeat'] }));
type Values = z.infer<typeof schema>;

export function ChangePasswordPanel({ email }: { email: string }) {
  const router = useRouter();
  const form = useForm<Values>({ resolver: zodResolver(schema), defaultValues: { currentPassword: '', password: '', repeat: '' } });

  async function onSubmit(v: Values) {
    try {
      await apiFetch('/api/account/password', { method: 'POST', json: { currentPassword: v.currentPassword, newPassword: v.password } });
    } catch (err) {
      if (err instanceof ApiError && err.issues.length) {
        err.issues.forEach((i) => form.setError(i.path === 'newPassword' ? 'password' : i.path === 'currentPassword' ? 'currentPassword' : 'repeat', { message: i.message }));
      } else toast.error(err instanceof Error ? err.message : 'Something went wrong.');
      return;
    }
    const again = await signIn('credentials', { email, password: v.password, redirect: false });
    form.reset();
    if (!again || again.error) {
      toast.success('Password changed. Sign in with the new one.');
      router.push(`/sign-in?email=${encodeURIComponent(email)}`);
      return;
    }
    toast.success('Password changed. You were signed out on every other device.');
    router.refresh();
  }

  return (
    <section className="panel p-5" aria-labelledby="password-heading">
      <h2 id="password-heading" className="text-lg font-semibold">Your password</h2>
      <p className="mt-1 text-sm text-ink-soft">Changing it signs you out on every other device.</p>
      <form className="mt-4 grid max-w-md gap-3" onSubmit={form.handleSubmit(onSubmit)} noValidate data-testid="change-password-form">
        <div>
          <label className="label" htmlFor="pw-current">Current password</label>
          <input id="pw-current" type="password" className="field" autoComplete="current-password" {...form.register('currentPassword')} />
          {form.formState.errors.currentPassword && <p className="field-error">{form.formState.errors.currentPassword.message}</p>}
        </div>
        <NewPasswordFields register={form.register} errors={form.formState.errors} idPrefix="pw-new" />
        <div><button className="btn-primary" type="submit" disabled={form.formState.isSubmitting}>{form.formState.isSubmitting ? 'Changing…' : 'Change password'}</button></div>
      </form>
    </section>
  );
}
