import type { Metadata } from 'next';
import type { ReactNode } from 'react';

/** Invitation links carry a one-time token: not indexed, and no referrer leaves the page. */
export const metadata: Metadata = {
  robots: { index: false, follow: false, nocache: true },
  referrer: 'no-referrer',
};

export default function InviteLayout({ children }: { children: ReactNode }) {
  return children;
}
