import type { Metadata } from 'next';
import { redirect } from 'next/navigation';
import { currentActor } from '@/server/auth/session';
import { getStudio } from '@/db/studios';
import { MembersPanel } from '@/components/settings/MembersPanel';
import { StudioPanel } from '@/components/settings/StudioPanel';
import { PriceListPanel } from '@/components/planning/PriceListPanel';
import { ChangePasswordPanel } from '@/components/settings/ChangePasswordPanel';
import { QuoteTermsPanel } from '@/components/settings/QuoteTermsPanel';

export const metadata: Metadata = { title: 'Settings' };

export default async function SettingsPage() {
  const actor = await currentActor();
  if (!actor) redirect('/sign-in');
  const studio = await getStudio(actor);
  return (
    <main className="mx-auto max-w-4xl space-y-6 px-6 py-8">
      <h1 className="text-2xl font-semibold">Settings</h1>
      <StudioPanel studio={studio} />
      <MembersPanel isOwner={actor.role === 'owner'} selfId={actor.userId} />
      {actor.role !== 'client' && <PriceListPanel canEdit={actor.role === 'owner'} />}
      {actor.role !== 'client' && <QuoteTermsPanel terms={studio.quote} canEdit={actor.role === 'owner'} />}
      <ChangePasswordPanel email={actor.email} />
    </main>
  );
}
