import type { Metadata } from 'next';
import type { ReactNode } from 'react';

/**
 * Everything under /v is a viewer link: never indexed, never followed, and no referrer leaves
 * the page (the token is in the address). next.config.ts sends the same as HTTP headers.
 */
export const metadata: Metadata = {
  robots: { index: false, follow: false, nocache: true, googleBot: { index: false, follow: false } },
  referrer: 'no-referrer',
};

export default function ViewerLayout({ children }: { children: ReactNode }) {
  return children;
}
