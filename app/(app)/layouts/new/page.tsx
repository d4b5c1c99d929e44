import type { Metadata } from 'next';
import { redirect } from 'next/navigation';
import { currentActor } from '@/server/auth/session';
import { isWorkshop } from '@/db/access';
import { NewLayoutForm } from '@/components/layouts/NewLayoutForm';
import { ProposalsSection } from '@/components/proposals/ProposalsSection';
import { BAY_TEMPLATES } from '@/lib/layout/templates';

export const metadata: Metadata = { title: 'New layout' };

export default async function NewLayoutPage() {
  const actor = await currentActor();
  if (!actor) redirect('/sign-in');
  if (!isWorkshop(actor)) redirect('/layouts');
  const templates = BAY_TEMPLATES.map((t) => ({ id: t.id, name: t.name, bay: { length: t.bay.length, width: t.bay.width, height: t.bay.height } }));
  return (
    <main className="mx-auto max-w-2xl px-6 py-8">
      <h1 className="mb-6 text-2xl font-semibold">New layout</h1>
      <NewLayoutForm templates={templates} />
      <ProposalsSection templates={templates} />
    </main>
  );
}
