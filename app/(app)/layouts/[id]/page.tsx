import type { Metadata } from 'next';
import { notFound, redirect } from 'next/navigation';
import { currentActor } from '@/lib/auth/session';
import { getLayout } from '@/db/layouts';
import { getStudio } from '@/db/studios';
import { NotFoundError } from '@/db/errors';
import { EditorLoader } from '@/components/editor/EditorLoader';

export const metadata: Metadata = { title: 'Layout' };

export default async function LayoutPage({ params }: { params: Promise<{ id: string }> }) {
  const actor = await currentActor();
  if (!actor) redirect('/sign-in');
  const { id } = await params;
  const layout = await getLayout(actor, id).catch((err) => {
    if (err instanceof NotFoundError) notFound();
    throw err;
  });
  const studio = await getStudio(actor);
  return (
    <div className="h-[calc(100vh-48px)]">
      <EditorLoader layoutId={layout.id} initialDoc={layout.doc} initialVersion={layout.version} canEdit={layout.canEdit} units={studio.units} />
    </div>
  );
}
