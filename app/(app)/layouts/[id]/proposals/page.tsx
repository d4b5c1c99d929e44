import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound, redirect } from 'next/navigation';
import { ArrowLeft } from 'lucide-react';
import { currentActor } from '@/server/auth/session';
import { loadLayoutFor } from '@/db/access';
import { NotFoundError } from '@/db/errors';
import { LayoutProposals } from '@/components/proposals/ProposalsSection';
import { BAY_TEMPLATES } from '@/lib/layout/templates';
import { briefFromLayout } from '@/lib/proposals/brief-from-layout';

export const metadata: Metadata = { title: 'Proposals' };

/**
 * Proposals for an existing layout: the brief read from it (its bay, beds, kitchen, water, wet room
 * and fuel), and each proposal opens as a new variant of it. The workshop's work: a client (who may
 * not change the layout) gets 404 here, as for any layout they may not edit.
 */
export default async function LayoutProposalsPage({ params }: { params: Promise<{ id: string }> }) {
  const actor = await currentActor();
  if (!actor) redirect('/sign-in');
  const { id } = await params;
  const layout = await loadLayoutFor(actor, id, { withDoc: true, forEdit: 'make proposals' }).catch((err) => {
    if (err instanceof NotFoundError || (err as { status?: number }).status === 403) notFound();
    throw err;
  });
  const templates = BAY_TEMPLATES.map((t) => ({ id: t.id, name: t.name, bay: { length: t.bay.length, width: t.bay.width, height: t.bay.height } }));
  return (
    <main className="mx-auto max-w-4xl px-6 py-8">
      <Link href={`/layouts/${id}`} className="inline-flex items-center gap-1 text-sm text-ink-soft hover:text-ink"><ArrowLeft size={14} aria-hidden="true" /> Back to {layout.name}</Link>
      <h1 className="mb-2 mt-2 text-2xl font-semibold">Proposals for {layout.name}</h1>
      <p className="mb-5 text-sm text-ink-soft">The brief is read from this layout; change it as the client asks. A proposal opens as a new variant of this layout, for the same client.</p>
      <LayoutProposals templates={templates} forLayout={{ id, name: layout.name, bay: layout.doc.bay, brief: briefFromLayout(layout.doc) }} />
    </main>
  );
}
