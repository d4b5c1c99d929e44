import type { Metadata } from 'next';
import Link from 'next/link';
import { viewInvitation } from '@/db/sharing/invitations';
import { AuthCard } from '@/components/auth/AuthCard';
import { AcceptInvitationForm } from '@/components/sharing/AcceptInvitationForm';

export const dynamic = 'force-dynamic';

export const metadata: Metadata = { title: 'Join your workshop' };

const GONE = {
  accepted: { title: 'Invitation already used', words: 'This invitation has been used to set a password. Sign in with it.' },
  expired: { title: 'Invitation expired', words: 'Invitations work for a week. Ask the workshop to send you a new one.' },
  revoked: { title: 'Invitation withdrawn', words: 'The workshop withdrew this invitation. Ask them for a new one if you still need it.' },
  unknown: { title: 'Invitation not found', words: 'Check that the whole address was copied from the mail.' },
} as const;

/** The link in an invitation mail: set a password and join the studio as its client. */
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
  return (
    <AuthCard title={`Join ${inv.studioName}`} footer={<>Already have a password? <Link className="text-copper underline" href="/sign-in">Sign in</Link></>}>
      <p className="mb-4 text-sm text-ink-soft">
        {inv.inviterName ? `${inv.inviterName} invited you` : 'You were invited'} to follow your van’s design, leave mark-ups on the plan and approve revisions.
      </p>
      <AcceptInvitationForm token={token} email={inv.email} name={inv.name} />
    </AuthCard>
  );
}
