import type { Metadata } from 'next';
import { redirect } from 'next/navigation';
import { currentActor } from '@/server/auth/session';
import { isWorkshop } from '@/db/access';
import { LayoutsTable } from '@/components/layouts/LayoutsTable';

export const metadata: Metadata = { title: 'Layouts' };

export default async function LayoutsPage() {
  const actor = await currentActor();
  if (!actor) redirect('/sign-in');
  return (
    <main className="mx-auto max-w-6xl px-6 py-8">
      <h1 className="mb-6 text-2xl font-semibold">Layouts</h1>
      <LayoutsTable canCreate={isWorkshop(actor)} />
    </main>
  );
}
