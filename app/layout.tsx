import type { Metadata } from 'next';
import type { ReactNode } from 'react';
import { textFace, monoFace } from './fonts';
import './globals.css';

// Every page carries a per-request CSP nonce, so none may be rendered ahead of time.
export const dynamic = 'force-dynamic';

export const metadata: Metadata = {
  title: { default: 'Baywright', template: '%s · Baywright' },
  description: 'Plan camper-van conversions to scale, checked against the rules of the trade, shared with your client.',
};

export default function RootLayout({ children }: { children: ReactNode }) {
  return (
    <html lang="en-GB" className={`${textFace.variable} ${monoFace.variable}`}>
      <body className="min-h-screen bg-paper text-ink">
        {children}
      </body>
    </html>
  );
}
