import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound, redirect } from 'next/navigation';
import { ArrowLeft, Receipt } from 'lucide-react';
import { currentActor } from '@/server/auth/session';
import { getLayout } from '@/db/layouts';
import { getStudio } from '@/db/studios';
import { NotFoundError } from '@/db/errors';
import { BuildPlanner } from '@/components/planning/BuildPlanner';
import { buildTabFrom } from '@/components/planning/buildTabs';
import { documentSource } from '@/db/sharing/issued';
import { revisionChoiceSchema } from '@/lib/api/planning-bodies';

export const metadata: Metadata = { title: 'Build plan' };

/** Build planning for one layout: weight, power, water, gas, heat, parts, cut list and quote. */
export default async function BuildPlanPage({ params, searchParams }: { params: Promise<{ id: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const actor = await currentActor();
  if (!actor) redirect('/sign-in');
  const { id } = await params;
  const layout = await getLayout(actor, id).catch((err) => {
    if (err instanceof NotFoundError) notFound();
    throw err;
  });
  const studio = await getStudio(actor);
  const sp = await searchParams;
  const tab = buildTabFrom(sp.tab);
  // The parts list, the cut list and the quote are made from an issued revision (`?revision=`; default
  // the latest approved, else the latest issued); the preliminary only when chosen.
  const choice = revisionChoiceSchema.safeParse(sp.revision).data;
  const source = await documentSource(actor, layout.id, choice).catch((err) => {
    if (err instanceof NotFoundError) return documentSource(actor, layout.id, undefined);
    throw err;
  });
  return (
    <main className="mx-auto max-w-[1440px] space-y-3 px-4 py-4">
      <nav className="flex flex-wrap items-center gap-4 text-sm" aria-label="Layout">
        <Link href={`/layouts/${layout.id}`} className="inline-flex items-center gap-1 text-ink-soft hover:text-ink"><ArrowLeft size={14} aria-hidden="true" /> Back to the plan</Link>
        <Link href={`/layouts/${layout.id}/quote`} className="inline-flex items-center gap-1 text-ink-soft hover:text-ink"><Receipt size={14} aria-hidden="true" /> Quote</Link>
      </nav>
      <BuildPlanner
        layoutId={layout.id}
        layoutName={layout.name}
        initialDoc={layout.doc}
        initialVersion={layout.version}
        initialSavedAt={layout.updatedAt}
        canEdit={layout.canEdit}
        units={studio.units}
        clientName={layout.client?.name ?? null}
        initialTab={tab}
        documents={{
          revision: source.revision ? { letter: source.revision.letter, state: source.revision.state, layoutVersion: source.revision.layoutVersion } : null,
          revisions: source.revisions.map((r) => ({ letter: r.letter, state: r.state })),
          defaultRevision: source.defaultRevision,
          doc: source.revision ? source.doc : null,
        }}
      />
    </main>
  );
}
