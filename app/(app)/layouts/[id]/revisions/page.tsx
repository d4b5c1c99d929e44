import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound, redirect } from 'next/navigation';
import { ArrowLeft } from 'lucide-react';
import { currentActor } from '@/server/auth/session';
import { loadLayoutFor } from '@/db/access';
import { layoutStates, listRevisions } from '@/db/sharing/revisions';
import { NotFoundError } from '@/db/errors';
import { RevisionsScreen } from '@/components/sharing/RevisionsScreen';
import { LayoutStateBadge } from '@/components/sharing/LayoutStateBadge';

export const metadata: Metadata = { title: 'Revisions' };

/** The layout's revisions: issued by the workshop, approved or questioned by the client. */
export default async function RevisionsPage({ params }: { params: Promise<{ id: string }> }) {
  const actor = await currentActor();
  if (!actor) redirect('/sign-in');
  const { id } = await params;
  const layout = await loadLayoutFor(actor, id).catch((err) => {
    if (err instanceof NotFoundError) notFound();
    throw err;
  });
  const [revisions, states] = await Promise.all([listRevisions(actor, id), layoutStates([id])]);
  const state = states.get(id)!;
  return (
    <main className="mx-auto max-w-4xl px-6 py-8">
      <Link href={`/layouts/${id}`} className="inline-flex items-center gap-1 text-sm text-ink-soft hover:text-ink"><ArrowLeft size={14} aria-hidden="true" /> Back to the plan</Link>
      <h1 className="mt-2 flex flex-wrap items-center gap-3 text-2xl font-semibold">
        Revisions of {layout.name} <LayoutStateBadge state={state.state} letter={state.latest} />
      </h1>
      <div className="mt-6">
        <RevisionsScreen layoutId={id} canEdit={layout.canEdit} isClient={layout.isClient} initial={revisions} />
      </div>
    </main>
  );
}
