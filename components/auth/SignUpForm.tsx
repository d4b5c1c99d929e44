'use client';
// Sign-up: a user and a studio of their own; signs in straight after.
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import * as z from 'zod/mini';
import { signIn } from 'next-auth/react';
import { useRouter } from 'next/navigation';
import { useState } from 'react';

const schema = z.object({
  name: z.string().check(z.trim(), z.minLength(1, 'tell us your name'), z.maxLength(80)),
  email: z.email('enter a valid e-mail address'),
  password: z.string().check(z.minLength(12, 'use at least 12 characters'), z.maxLength(72, 'use at most 72 characters')),
  studioName: z.optional(z.string().check(z.trim(), z.maxLength(80))),
});
type Values = z.infer<typeof schema>;

export function SignUpForm() {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const { register, handleSubmit, formState } = useForm<Values>({ resolver: zodResolver(schema) });

  async function onSubmit(values: Values) {
    setError(null);
    const res = await fetch('/api/sign-up', {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ ...values, studioName: values.studioName || undefined }),
    });
    if (!res.ok) {
      const body = await res.json().catch(() => ({}));
      setError(body.issues?.[0]?.message ?? body.error ?? 'Sign-up failed. Try again.');
      return;
    }
    const result = await signIn('credentials', { email: values.email, password: values.password, redirect: false });
    if (result?.error) {
      router.push('/sign-in');
      return;
    }
    router.push('/layouts');
    router.refresh();
  }

  const field = (name: keyof Values, label: string, type = 'text', autoComplete?: string, hint?: string) => (
    <div>
      <label className="label" htmlFor={name}>{label}</label>
      <input id={name} type={type} autoComplete={autoComplete} className="field" {...register(name)} />
      {hint && !formState.errors[name] && <p className="mt-1 text-xs text-ink-soft">{hint}</p>}
      {formState.errors[name] && <p className="field-error">{formState.errors[name]?.message}</p>}
    </div>
  );

  return (
    <form onSubmit={handleSubmit(onSubmit)} className="space-y-4" noValidate>
      {field('name', 'Your name', 'text', 'name')}
      {field('email', 'E-mail', 'email', 'email')}
      {field('password', 'Password', 'password', 'new-password', 'At least 12 characters.')}
      {field('studioName', 'Studio or workshop name (optional)', 'text', 'organization', 'A self-builder can leave this empty.')}
      {error && <p role="alert" className="rounded-sm border border-brick bg-brick-light px-3 py-2 text-sm text-brick">{error}</p>}
      <button type="submit" className="btn-primary w-full" disabled={formState.isSubmitting}>
        {formState.isSubmitting ? 'Creating your studio…' : 'Create account'}
      </button>
    </form>
  );
}
