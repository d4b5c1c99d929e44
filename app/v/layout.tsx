import type { Metadata } from 'next';
import type { ReactNode } from 'react';
import { AppProviders } from '@/components/ui/AppProviders';

/**
 * Everything under /v is a viewer link: never indexed, never followed, and no referrer leaves
 * the page (the token is in the address). next.config.ts sends the same as HTTP headers.
 */
export const metadata: Metadata = {
  robots: { index: false, follow: false, nocache: true, googleBot: { index: false, follow: false } },
  referrer: 'no-referrer',
};

export default function ViewerLayout({ children }: { children: ReactNode }) {
  // The viewer reads the layout and its checks through the query cache; the drawing may toast.
  return <AppProviders>{children}</AppProviders>;
}
