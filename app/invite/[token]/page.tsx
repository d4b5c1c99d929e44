import type { Metadata } from 'next';
import Link from 'next/link';
import { viewInvitation } from '@/db/sharing/invitations';
import { currentActor } from '@/server/auth/session';
import { AuthCard } from '@/components/auth/AuthCard';
import { AcceptInvitationForm } from '@/components/sharing/AcceptInvitationForm';
import { JoinWithAccount } from '@/components/sharing/JoinWithAccount';

export const dynamic = 'force-dynamic';

export const metadata: Metadata = { title: 'Join your workshop', referrer: 'no-referrer' };

const GONE = {
  accepted: { title: 'Invitation already used', words: 'This invitation has been used. Sign in with your own password.' },
  expired: { title: 'Invitation expired', words: 'Invitations work for a week. Ask the workshop to send you a new one.' },
  revoked: { title: 'Invitation withdrawn', words: 'The workshop withdrew this invitation. Ask them for a new one if you still need it.' },
  unknown: { title: 'Invitation not found', words: 'Check that the whole address was copied from the mail.' },
} as const;

/**
 * The link in an invitation mail. A new address chooses its own password here; an address that
 * already has an account joins while signed in as it (and only then).
 */
export default async function InvitePage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const inv = await viewInvitation(token);
  if (inv.status !== 'pending') {
    const g = GONE[inv.status];
    return (
      <AuthCard title={g.title} footer={<Link className="text-copper underline" href="/sign-in">Sign in</Link>}>
        <p className="text-sm text-ink-soft" data-testid="invitation-gone" data-status={inv.status}>{g.words}</p>
      </AuthCard>
    );
  }
  const what = inv.role === 'designer'
    ? 'to draw and check the studio’s van layouts as a designer.'
    : 'to follow your van’s design, leave mark-ups on the plan and approve revisions.';
  const intro = <p className="mb-4 text-sm text-ink-soft">{inv.inviterName ? `${inv.inviterName} invited you` : 'You were invited'} {what}</p>;
  const here = `/invite/${token}`;

  if (inv.hasAccount) {
    const actor = await currentActor();
    const signedInAsInvitee = actor?.email.toLowerCase() === inv.email.toLowerCase();
    return (
      <AuthCard title={`Join ${inv.studioName}`} footer={<>Forgot your password? <Link className="text-copper underline" href={`/reset-password?email=${encodeURIComponent(inv.email)}`}>Set a new one</Link></>}>
        {intro}
        <p className="mb-4 text-sm" data-testid="invite-existing-account">
          <span className="font-mono">{inv.email}</span> already has a Baywright account, so you join with it: no new password.
        </p>
        {signedInAsInvitee ? (
          <JoinWithAccount token={token} studioName={inv.studioName} />
        ) : actor ? (
          <p role="alert" className="rounded-sm border border-brick bg-brick-light px-3 py-2 text-sm text-brick">
            You are signed in as {actor.email}. This invitation is for {inv.email}: sign out, then sign in as {inv.email} and open the link again.
          </p>
        ) : (
          <Link className="btn-primary block w-full text-center" href={`/sign-in?email=${encodeURIComponent(inv.email)}&callbackUrl=${encodeURIComponent(here)}`}>
            Sign in as {inv.email} to join
          </Link>
        )}
      </AuthCard>
    );
  }
  return (
    <AuthCard title={`Join ${inv.studioName}`} footer={<>Nobody at the workshop sees or sets your password.</>}>
      {intro}
      <AcceptInvitationForm token={token} email={inv.email} name={inv.name} />
    </AuthCard>
  );
}
