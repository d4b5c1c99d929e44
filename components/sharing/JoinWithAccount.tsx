'use client';
/**
 * Accepting an invitation with the account one already has: the person is signed in as the
 * invited address and presses "Join". The session then moves to the studio joined. No password
 * is asked or changed.
 */
import { useState } from 'react';
import { useRouter } from 'next/navigation';
import { getCsrfToken } from 'next-auth/react';
import { apiFetch } from '@/lib/api/client-fetch';

export function JoinWithAccount({ token, studioName }: { token: string; studioName: string }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function join() {
    setBusy(true);
    setError(null);
    try {
      const res = await apiFetch<{ studioId: string; layoutId: string | null }>('/api/invitations/accept', { method: 'POST', json: { token } });
      // Auth.js's session update (what `useSession().update` sends): the server checks the membership.
      await fetch('/api/auth/session', {
        method: 'POST',
        headers: { 'Content-Type': 'application/json' },
        body: JSON.stringify({ csrfToken: await getCsrfToken(), data: { studioId: res.studioId } }),
      });
      router.push(res.layoutId ? `/layouts/${res.layoutId}` : '/layouts');
      router.refresh();
    } catch (err) {
      setError(err instanceof Error ? err.message : 'Something went wrong.');
      setBusy(false);
    }
  }

  return (
    <div className="space-y-4">
      {error && <p role="alert" className="rounded-sm border border-brick bg-brick-light px-3 py-2 text-sm text-brick">{error}</p>}
      <button type="button" className="btn-primary w-full" onClick={join} disabled={busy}>{busy ? 'Joining…' : `Join ${studioName}`}</button>
    </div>
  );
}
