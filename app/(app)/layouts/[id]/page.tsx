import type { Metadata } from 'next';
import { notFound, redirect } from 'next/navigation';
import { currentActor } from '@/server/auth/session';
import { getLayout } from '@/db/layouts';
import { getStudio } from '@/db/studios';
import { checksForOpening } from '@/server/api/checks-on-open';
import { NotFoundError } from '@/db/errors';
import { LayoutWorkspace } from '@/components/sharing/LayoutWorkspace';
import { documentSource } from '@/db/sharing/issued';
import { revisionChoiceSchema } from '@/lib/api/planning-bodies';
import { editorPreviewSvg } from '@/lib/sheet/thumbnail';

export const metadata: Metadata = { title: 'Layout' };

export default async function LayoutPage({ params, searchParams }: { params: Promise<{ id: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const actor = await currentActor();
  if (!actor) redirect('/sign-in');
  const { id } = await params;
  const layout = await getLayout(actor, id).catch((err) => {
    if (err instanceof NotFoundError) notFound();
    throw err;
  });
  const studio = await getStudio(actor);
  // `?markup=` from a mail's link; `?comment=` is what mail sent before the rename said.
  const { markup, comment, revision } = await searchParams;
  const focus = typeof markup === 'string' ? markup : typeof comment === 'string' ? comment : null;
  // Issued means frozen: `?revision=B` opens that revision read-only; the client sees the latest
  // issued revision unless they choose the preliminary (`?revision=preliminary`).
  const choice = revisionChoiceSchema.safeParse(revision).data;
  const source = choice !== undefined || !layout.canEdit
    ? await documentSource(actor, layout.id, choice, { for: 'client' }).catch((err) => {
      if (err instanceof NotFoundError) notFound();
      throw err;
    })
    : null;
  const doc = source?.doc ?? layout.doc;
  const onShow = source?.revision ? { letter: source.revision.letter, state: source.revision.state } : null;
  return (
    <div className="h-[calc(100vh-48px)]">
      {/* The editor with its mark-ups, the Mark-ups list and the sharing entry points (components/sharing). */}
      <LayoutWorkspace
        key={onShow?.letter ?? 'preliminary'}
        layoutId={layout.id}
        initialDoc={doc}
        preview={editorPreviewSvg(doc)}
        initialChecks={(await checksForOpening(actor.userId, doc, studio.checkDefaults)).checks}
        initialVersion={source?.layoutVersion ?? layout.version}
        canEdit={layout.canEdit && !onShow}
        units={studio.units}
        focusMarkup={focus}
        onShow={onShow}
      />
    </div>
  );
}
