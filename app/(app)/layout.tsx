import type { ReactNode } from 'react';
import { redirect } from 'next/navigation';
import { currentActor } from '@/server/auth/session';
import { AppHeader } from '@/components/ui/AppHeader';
import { outboxEnabled } from '@/server/mail/outbox-mode';

export const dynamic = 'force-dynamic';

/** Every page in here needs a signed-in member; the check runs on the server for each request. */
export default async function AppLayout({ children }: { children: ReactNode }) {
  const actor = await currentActor();
  if (!actor) redirect('/sign-in');
  return (
    <div className="flex min-h-screen flex-col">
      <AppHeader name={actor.name} role={actor.role} showOutbox={actor.role === 'owner' && outboxEnabled()} />
      <div className="flex-1">{children}</div>
    </div>
  );
}
