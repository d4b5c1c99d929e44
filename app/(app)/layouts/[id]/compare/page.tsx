import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound, redirect } from 'next/navigation';
import { ArrowLeft } from 'lucide-react';
import { currentActor } from '@/server/auth/session';
import { loadLayoutFor } from '@/db/access';
import { variantFamily } from '@/db/layouts';
import { NotFoundError } from '@/db/errors';
import { getStudio } from '@/db/studios';
import { VariantCompare } from '@/components/layouts/VariantCompare';

export const metadata: Metadata = { title: 'Compare variants' };

/** A layout and one of its variants (or its original) side by side: `?with=<layout id>`. */
export default async function CompareVariantsPage({ params, searchParams }: { params: Promise<{ id: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const actor = await currentActor();
  if (!actor) redirect('/sign-in');
  const { id } = await params;
  const layout = await loadLayoutFor(actor, id).catch((err) => {
    if (err instanceof NotFoundError) notFound();
    throw err;
  });
  const [family, studio] = await Promise.all([variantFamily(actor, id), getStudio(actor)]);
  const others = family.filter((f) => f.id !== id);
  const sp = await searchParams;
  const other = typeof sp.with === 'string' && others.some((f) => f.id === sp.with) ? sp.with : others[0]?.id;
  return (
    <main className="mx-auto max-w-7xl px-6 py-8">
      <Link href="/layouts" className="inline-flex items-center gap-1 text-sm text-ink-soft hover:text-ink"><ArrowLeft size={14} aria-hidden="true" /> All layouts</Link>
      <h1 className="mb-5 mt-2 text-2xl font-semibold">Compare variants of {layout.name}</h1>
      {other ? (
        <VariantCompare layoutId={id} family={family} other={other} units={studio.units} />
      ) : (
        <div className="panel p-6 text-sm">
          <p className="font-medium">This layout has no variants yet</p>
          <p className="mt-1 text-ink-soft">Duplicate it as a variant from the layouts table (the row’s actions), change the variant, then compare the two here.</p>
        </div>
      )}
    </main>
  );
}
