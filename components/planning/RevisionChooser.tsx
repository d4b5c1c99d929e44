'use client';
/**
 * Which copy of the layout the parts list, the cut list and the quote are made from: an issued
 * revision (by default the latest approved, else the latest issued) or, only when chosen, the
 * preliminary layout as last saved. Choosing reloads the page with `?revision=`; it computes nothing.
 */
import { useRouter } from 'next/navigation';
import { AS_LAST_SAVED, ISSUE_STATE_WORD, PRELIMINARY_CHOICE, type RevisionState } from '@/lib/layout/drawing-issue';

export interface DocumentsFrom {
  /** The revision the documents are made from; null: the preliminary layout as last saved. */
  revision: { letter: string; state: RevisionState; layoutVersion: number } | null;
  revisions: { letter: string; state: RevisionState }[];
  defaultRevision: string | null;
}

export function RevisionChooser({ from, href }: { from: DocumentsFrom; href: (choice: string) => string }) {
  const router = useRouter();
  if (!from.revisions.length) {
    return <p className="text-xs text-ink-soft" data-testid="documents-from">Made from the preliminary layout: no revision has been issued yet.</p>;
  }
  const value = from.revision?.letter ?? PRELIMINARY_CHOICE;
  return (
    <div className="flex flex-wrap items-center gap-2 text-sm" data-testid="documents-from" data-revision={value}>
      <label htmlFor="documents-revision" className="text-ink-soft">Made from</label>
      <select id="documents-revision" className="field w-auto" value={value} onChange={(e) => router.push(href(e.target.value))}>
        {from.revisions.map((r) => (
          <option key={r.letter} value={r.letter}>Revision {r.letter} · {ISSUE_STATE_WORD[r.state]}{r.letter === from.defaultRevision ? ' (default)' : ''}</option>
        ))}
        <option value={PRELIMINARY_CHOICE}>{AS_LAST_SAVED}</option>
      </select>
      {!from.revision && <span className="text-xs text-ochre">Preliminary: not issued, and not what the client approved.</span>}
      {from.revision && from.revision.state !== 'approved' && <span className="text-xs text-ochre">Revision {from.revision.letter} is not approved yet.</span>}
    </div>
  );
}
