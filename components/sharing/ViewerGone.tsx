/**
 * The page a viewer link shows when it no longer works: withdrawn by the workshop, past its
 * expiry, or never existed. Says which, plainly, and what to do. Presentation only.
 */
import { Link2Off } from 'lucide-react';
import { Wordmark } from '@/components/ui/Wordmark';
import { formatDateTime } from '@/lib/format';


export function ViewerGone({ status, at }: { status: 'revoked' | 'expired' | 'unknown'; at: string | null }) {
  const title = status === 'revoked' ? 'This link was withdrawn' : status === 'expired' ? 'This link has expired' : 'There is no plan at this address';
  const words =
    status === 'revoked' ? `The workshop withdrew this viewer link${at ? ` on ${formatDateTime(at)}` : ''}. Ask them for a new one if you still need to see the plan.`
      : status === 'expired' ? `This viewer link worked until ${at ? `${formatDateTime(at)}` : 'its expiry date'}. Ask the workshop for a new one.`
        : 'Check that the whole address was copied from the message you were sent.';
  return (
    <main className="sheet flex min-h-screen items-center justify-center px-6" data-testid="viewer-gone" data-status={status}>
      <div className="panel max-w-md bg-paper p-6 text-center">
        <Wordmark className="text-lg" />
        <Link2Off className="mx-auto mt-6 text-ink-soft" size={28} aria-hidden="true" />
        <h1 className="mt-3 text-xl font-semibold">{title}</h1>
        <p className="mt-2 text-sm text-ink-soft">{words}</p>
      </div>
    </main>
  );
}
