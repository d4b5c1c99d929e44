import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound, redirect } from 'next/navigation';
import { Inbox } from 'lucide-react';
import { currentActor } from '@/server/auth/session';
import { listOutbox } from '@/db/sharing/outbox';
import { outboxEnabled } from '@/server/mail/outbox-mode';
import { formatDateTime } from '@/lib/format';

export const dynamic = 'force-dynamic';
export const metadata: Metadata = { title: 'Outbox' };


/**
 * Development outbox: the mail the app sent, as the local mail server received it. Owners only;
 * absent in production unless BAYWRIGHT_DEMO=1 or BAYWRIGHT_OUTBOX=1.
 */
export default async function OutboxPage() {
  if (!outboxEnabled()) notFound();
  const actor = await currentActor();
  if (!actor) redirect('/sign-in');
  if (actor.role !== 'owner') notFound();
  const mail = await listOutbox(actor);
  return (
    <main className="mx-auto max-w-5xl px-6 py-8">
      <h1 className="flex items-center gap-2 text-2xl font-semibold"><Inbox size={20} aria-hidden="true" /> Outbox</h1>
      <p className="mt-1 text-sm text-ink-soft">Mail this studio sent, kept by the development mail server and never delivered. Not available in production.</p>
      {mail.length === 0 ? (
        <p className="panel mt-6 p-6 text-sm text-ink-soft">Nothing sent yet.</p>
      ) : (
        <div className="panel mt-6 overflow-x-auto">
          <table className="w-full text-left text-sm" data-testid="outbox-table">
            <thead className="border-b border-paper-edge bg-paper-deep text-xs uppercase tracking-wide text-ink-soft"><tr><th className="px-3 py-2 font-medium">Received</th><th className="px-3 py-2 font-medium">To</th><th className="px-3 py-2 font-medium">Subject</th></tr></thead>
            <tbody>
              {mail.map((m) => (
                <tr key={m.id} className="border-b border-paper-edge last:border-0" data-mail-id={m.id}>
                  <td className="whitespace-nowrap px-3 py-2 text-ink-soft">{formatDateTime(m.receivedAt)}</td>
                  <td className="px-3 py-2">{m.to.join(', ')}</td>
                  <td className="px-3 py-2"><Link className="underline-offset-2 hover:text-copper hover:underline" href={`/outbox/${m.id}`}>{m.subject || '(no subject)'}</Link></td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </main>
  );
}
