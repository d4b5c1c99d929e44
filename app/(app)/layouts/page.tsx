import type { Metadata } from 'next';
import { redirect } from 'next/navigation';
import { currentActor } from '@/server/auth/session';
import { isWorkshop } from '@/db/access';
import { listLayouts } from '@/db/layouts';
import type { Actor } from '@/db/actor';
import { LayoutsTable } from '@/components/layouts/LayoutsTable';

export const metadata: Metadata = { title: 'Layouts' };

/**
 * The rows in use come with the page, so the table is drawn with it instead of after a fetch from
 * the browser (the archived ones are fetched when asked for); `at` lets the query cache age them.
 */
async function rowsInUse(actor: Actor) {
  const at = Date.now();
  return { layouts: await listLayouts(actor, { archived: false }), at };
}

export default async function LayoutsPage() {
  const actor = await currentActor();
  if (!actor) redirect('/sign-in');
  const initial = await rowsInUse(actor);
  return (
    <main className="mx-auto max-w-6xl px-6 py-8">
      <h1 className="mb-6 text-2xl font-semibold">Layouts</h1>
      <LayoutsTable canCreate={isWorkshop(actor)} initial={initial} />
    </main>
  );
}
