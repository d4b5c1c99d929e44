import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound, redirect } from 'next/navigation';
import { ArrowLeft, Download } from 'lucide-react';
import { currentActor } from '@/server/auth/session';
import { getOutboxMail } from '@/db/sharing/outbox';
import { outboxEnabled } from '@/server/mail/outbox-mode';
import { NotFoundError } from '@/db/errors';
import { formatDateTime } from '@/lib/format';

export const dynamic = 'force-dynamic';
export const metadata: Metadata = { title: 'Message' };

const URL_PATTERN = /(https?:\/\/[^\s<>"]+)/g;

/** One received message: its plain-text body (never its HTML), links clickable. */
export default async function OutboxMessagePage({ params }: { params: Promise<{ id: string }> }) {
  if (!outboxEnabled()) notFound();
  const actor = await currentActor();
  if (!actor) redirect('/sign-in');
  if (actor.role !== 'owner') notFound();
  const { id } = await params;
  const mail = await getOutboxMail(actor, id).catch((err) => {
    if (err instanceof NotFoundError) notFound();
    throw err;
  });
  const parts = mail.text.split(URL_PATTERN);
  return (
    <main className="mx-auto max-w-3xl px-6 py-8">
      <Link href="/outbox" className="inline-flex items-center gap-1 text-sm text-ink-soft hover:text-ink"><ArrowLeft size={14} aria-hidden="true" /> Outbox</Link>
      <h1 className="mt-2 text-xl font-semibold">{mail.subject || '(no subject)'}</h1>
      <dl className="mt-2 grid grid-cols-[6rem_1fr] gap-y-1 text-sm">
        <dt className="text-ink-soft">From</dt><dd>{mail.from}</dd>
        <dt className="text-ink-soft">To</dt><dd>{mail.to.join(', ')}</dd>
        <dt className="text-ink-soft">Received</dt><dd>{formatDateTime(mail.receivedAt)}</dd>
      </dl>
      <pre className="panel mt-4 whitespace-pre-wrap break-words p-4 font-sans text-sm" data-testid="mail-text">
        {parts.map((p, i) => (i % 2 === 1 ? <a key={i} href={p} className="text-copper underline" rel="noreferrer">{p}</a> : p))}
      </pre>
      <a href={`/outbox/${mail.id}/raw`} className="btn-quiet mt-4"><Download size={14} aria-hidden="true" /> Download as .eml</a>
    </main>
  );
}
