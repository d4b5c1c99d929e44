import type { Metadata } from 'next';
import { notFound, redirect } from 'next/navigation';
import { currentActor } from '@/server/auth/session';
import { isWorkshop } from '@/db/access';
import { listClients, unsharedLayouts } from '@/db/sharing/clients';
import { ClientsTable } from '@/components/sharing/ClientsTable';
import { InviteClientForm } from '@/components/sharing/InviteClientForm';
import { InvitationsTable } from '@/components/sharing/InvitationsTable';

export const metadata: Metadata = { title: 'Clients' };

/** The studio's clients with their layouts, and inviting a new one (owners and designers). */
export default async function ClientsPage() {
  const actor = await currentActor();
  if (!actor) redirect('/sign-in');
  if (!isWorkshop(actor)) notFound();
  const [clients, layouts] = await Promise.all([listClients(actor), unsharedLayouts(actor)]);
  return (
    <main className="mx-auto max-w-6xl space-y-8 px-6 py-8">
      <h1 className="text-2xl font-semibold">Clients</h1>
      <ClientsTable clients={clients} />
      <section className="grid gap-6 lg:grid-cols-[22rem_1fr]">
        <InviteClientForm layouts={layouts} />
        <InvitationsTable />
      </section>
    </main>
  );
}
