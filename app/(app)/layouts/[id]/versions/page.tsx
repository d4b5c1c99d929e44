import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound, redirect } from 'next/navigation';
import { ArrowLeft } from 'lucide-react';
import { currentActor } from '@/server/auth/session';
import { loadLayoutFor } from '@/db/access';
import { NotFoundError } from '@/db/errors';
import { SavedVersions } from '@/components/layouts/SavedVersions';

export const metadata: Metadata = { title: 'Saved versions' };

/** The layout's saved versions, with a plan of each, and restore as the newest save for the workshop. */
export default async function SavedVersionsPage({ params }: { params: Promise<{ id: string }> }) {
  const actor = await currentActor();
  if (!actor) redirect('/sign-in');
  const { id } = await params;
  const layout = await loadLayoutFor(actor, id).catch((err) => {
    if (err instanceof NotFoundError) notFound();
    throw err;
  });
  return (
    <main className="mx-auto max-w-6xl px-6 py-8">
      <Link href="/layouts" className="inline-flex items-center gap-1 text-sm text-ink-soft hover:text-ink"><ArrowLeft size={14} aria-hidden="true" /> All layouts</Link>
      <h1 className="mb-5 mt-2 text-2xl font-semibold">Saved versions of {layout.name}</h1>
      <SavedVersions layoutId={id} layoutName={layout.name} canEdit={layout.canEdit} />
    </main>
  );
}
