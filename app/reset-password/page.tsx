import Link from 'next/link';
import type { Metadata } from 'next';
import { AuthCard } from '@/components/auth/AuthCard';
import { ResetRequestForm } from '@/components/auth/ResetRequestForm';

export const metadata: Metadata = { title: 'Set a new password' };

/** "Forgot your password?": mails a one-time link to the address given. */
export default async function ResetRequestPage({ searchParams }: { searchParams: Promise<Record<string, string | undefined>> }) {
  const { email } = await searchParams;
  return (
    <AuthCard title="Set a new password" footer={<>Remembered it? <Link className="text-copper underline" href="/sign-in">Sign in</Link></>}>
      <ResetRequestForm email={email} />
    </AuthCard>
  );
}
