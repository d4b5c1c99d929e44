import Link from 'next/link';
import type { Metadata } from 'next';
import { AuthCard } from '@/components/auth/AuthCard';
import { SignInForm } from '@/components/auth/SignInForm';

export const metadata: Metadata = { title: 'Sign in' };

export default async function SignInPage({ searchParams }: { searchParams: Promise<Record<string, string | undefined>> }) {
  const { email, callbackUrl } = await searchParams;
  return (
    <AuthCard title="Sign in" footer={<>New here? <Link className="text-copper underline" href="/sign-up">Start a studio</Link></>}>
      <SignInForm email={email} callbackUrl={callbackUrl} />
    </AuthCard>
  );
}
