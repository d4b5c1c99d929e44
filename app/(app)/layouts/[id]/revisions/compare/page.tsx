import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound, redirect } from 'next/navigation';
import { ArrowLeft } from 'lucide-react';
import { currentActor } from '@/server/auth/session';
import { loadLayoutFor } from '@/db/access';
import { listRevisions } from '@/db/sharing/revisions';
import { NotFoundError } from '@/db/errors';
import { getStudio } from '@/db/studios';
import { RevisionCompare } from '@/components/sharing/RevisionCompare';

export const metadata: Metadata = { title: 'Compare revisions' };

/** Two revisions (or a revision and the layout as last saved) side by side. */
export default async function ComparePage({ params, searchParams }: { params: Promise<{ id: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const actor = await currentActor();
  if (!actor) redirect('/sign-in');
  const { id } = await params;
  const layout = await loadLayoutFor(actor, id).catch((err) => {
    if (err instanceof NotFoundError) notFound();
    throw err;
  });
  const [revisions, studio] = await Promise.all([listRevisions(actor, id), getStudio(actor)]);
  const letters = revisions.map((r) => r.letter).reverse();
  const sp = await searchParams;
  const pick = (v: string | string[] | undefined, fallback: string) => (typeof v === 'string' && (v === 'current' || letters.includes(v)) ? v : fallback);
  const to = pick(sp.to, letters[letters.length - 1] ?? 'current');
  const from = pick(sp.from, letters[letters.length - 2] ?? letters[0] ?? 'current');
  return (
    <main className="mx-auto max-w-7xl px-6 py-8">
      <Link href={`/layouts/${id}/revisions`} className="inline-flex items-center gap-1 text-sm text-ink-soft hover:text-ink"><ArrowLeft size={14} aria-hidden="true" /> All revisions</Link>
      <h1 className="mb-5 mt-2 text-2xl font-semibold">Compare revisions of {layout.name}</h1>
      {letters.length === 0 ? (
        <p className="panel p-6 text-sm text-ink-soft">There are no revisions to compare yet.</p>
      ) : (
        <RevisionCompare layoutId={id} revisions={revisions} from={from} to={to} units={studio.units} />
      )}
    </main>
  );
}
