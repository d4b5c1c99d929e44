import Link from 'next/link';
import type { Metadata } from 'next';
import { AuthCard } from '@/components/auth/AuthCard';
import { ResetPasswordForm } from '@/components/auth/ResetPasswordForm';
import { resetLinkUsable } from '@/db/password-resets';

export const dynamic = 'force-dynamic';
export const metadata: Metadata = { title: 'Choose a new password', referrer: 'no-referrer' };

/** The link in a reset mail: choose a new password, or learn that the link is spent. */
export default async function ResetPasswordPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  if (!(await resetLinkUsable(token))) {
    return (
      <AuthCard title="This link no longer works" footer={<Link className="text-copper underline" href="/sign-in">Sign in</Link>}>
        <p className="text-sm text-ink-soft" data-testid="reset-gone">
          Reset links work once, for 30 minutes, and only the newest one you asked for.{' '}
          <Link className="text-copper underline" href="/reset-password">Ask for a new link</Link>.
        </p>
      </AuthCard>
    );
  }
  return (
    <AuthCard title="Choose a new password" footer={<>Setting it signs you out on every other device.</>}>
      <ResetPasswordForm token={token} />
    </AuthCard>
  );
}
