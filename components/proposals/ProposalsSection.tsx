'use client';
// "Proposals" on New layout: a button that opens the brief form. The panel (its form, plans and
// the brief's schema) loads only when opened, so the page's first load stays as it was.
import { useState } from 'react';
import dynamic from 'next/dynamic';
import type { BayTemplateChoice } from '@/components/layouts/NewLayoutForm';
import type { ProposalsFor } from './ProposalsPanel';

const ProposalsPanel = dynamic(() => import('./ProposalsPanel').then((m) => m.ProposalsPanel), {
  ssr: false,
  loading: () => <p role="status" className="text-sm text-ink-soft">Opening the brief…</p>,
});

/** The brief form on an existing layout's Proposals page, open at once and filled in from the layout. */
export function LayoutProposals({ templates, forLayout }: { templates: BayTemplateChoice[]; forLayout: ProposalsFor }) {
  return <ProposalsPanel templates={templates} forLayout={forLayout} />;
}

export function ProposalsSection({ templates }: { templates: BayTemplateChoice[] }) {
  const [open, setOpen] = useState(false);
  return (
    <section aria-labelledby="proposals-heading" className="mt-10 border-t border-paper-edge pt-6">
      <h2 id="proposals-heading" className="text-lg font-semibold">Proposals</h2>
      <p className="mb-3 text-sm text-ink-soft">Start from a client’s brief: checked arrangements of the bay to choose from, or the reasons none fits.</p>
      {open ? <ProposalsPanel templates={templates} /> : (
        <button type="button" className="btn-quiet" onClick={() => setOpen(true)} aria-expanded={false}>Start from a brief</button>
      )}
    </section>
  );
}
