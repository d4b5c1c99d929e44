'use client';
// E-mail + password sign-in through Auth.js's credentials endpoint, with the reasons it can fail.
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import * as z from 'zod/mini';
import { signIn } from 'next-auth/react';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import Link from 'next/link';
import { safeCallbackPath } from '@/lib/auth/callback-url';

const schema = z.object({
  email: z.email('enter your e-mail address'),
  password: z.string().check(z.minLength(1, 'enter your password')),
});
type Values = z.infer<typeof schema>;

const MESSAGES: Record<string, string> = {
  rate_limited: 'Too many attempts from here for this account. Wait a few minutes before trying again, or set a new password by e-mail.',
  invalid_credentials: 'That e-mail and password do not match an account.',
};

export function SignInForm({ email, callbackUrl }: { email?: string; callbackUrl?: string }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const { register, handleSubmit, formState } = useForm<Values>({
    resolver: zodResolver(schema),
    defaultValues: { email: email ?? '', password: '' },
  });

  async function onSubmit(values: Values) {
    setError(null);
    const result = await signIn('credentials', { ...values, redirect: false });
    if (!result || result.error) {
      setError(MESSAGES[result?.code ?? ''] ?? MESSAGES.invalid_credentials);
      return;
    }
    router.push(safeCallbackPath(callbackUrl));
    router.refresh();
  }

  return (
    <form onSubmit={handleSubmit(onSubmit)} className="space-y-4" noValidate>
      <div>
        <label className="label" htmlFor="email">E-mail</label>
        <input id="email" type="email" autoComplete="email" className="field" {...register('email')} />
        {formState.errors.email && <p className="field-error">{formState.errors.email.message}</p>}
      </div>
      <div>
        <div className="flex items-baseline justify-between">
          <label className="label" htmlFor="password">Password</label>
          <Link className="text-xs text-copper underline" href="/reset-password">Forgot your password?</Link>
        </div>
        <input id="password" type="password" autoComplete="current-password" className="field" {...register('password')} />
        {formState.errors.password && <p className="field-error">{formState.errors.password.message}</p>}
      </div>
      {error && <p role="alert" className="rounded-sm border border-brick bg-brick-light px-3 py-2 text-sm text-brick">{error}</p>}
      <button type="submit" className="btn-primary w-full" disabled={formState.isSubmitting}>
        {formState.isSubmitting ? 'Signing in…' : 'Sign in'}
      </button>
    </form>
  );
}
