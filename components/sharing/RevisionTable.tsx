/**
 * The revision table of a drawing, as a title block's revision block: letter, date, description
 * (the note it was issued with) and who issued it, oldest first, up to the revision on show; the
 * revision on show is marked with its delta triangle. Presentation only.
 */
import type { RevisionDto } from '@/db/sharing/revisions';
import { formatDate } from '@/lib/format';
import { RevisionMarkIcon } from './RevisionMarkIcon';

export function RevisionTable({ revisions, upTo, current }: { revisions: RevisionDto[]; upTo: string | null; current: string | null }) {
  const oldestFirst = [...revisions].sort((a, b) => a.issuedAt.localeCompare(b.issuedAt));
  const cut = upTo ? oldestFirst.findIndex((r) => r.letter === upTo) : oldestFirst.length - 1;
  const rows = cut >= 0 ? oldestFirst.slice(0, cut + 1) : oldestFirst;
  return (
    <section className="panel p-4 text-sm" data-testid="revision-table">
      <h2 className="mb-2 font-semibold">Revision table</h2>
      {rows.length === 0 ? <p className="text-ink-soft">No revision issued yet: the layout is preliminary.</p> : (
        <table className="w-full text-left">
          <thead className="text-xs text-ink-soft">
            <tr className="border-b border-ink"><th className="w-12 py-1 font-medium">Rev</th><th className="w-28 font-medium">Date</th><th className="font-medium">Description</th><th className="w-36 font-medium">By</th></tr>
          </thead>
          <tbody>
            {rows.map((r) => (
              <tr key={r.id} className="border-b border-paper-edge align-top" data-letter={r.letter}>
                <td className="py-1.5 font-mono">
                  {r.letter === current ? <span className="inline-flex items-center gap-1 text-copper"><RevisionMarkIcon letter={r.letter} size={18} /><span className="sr-only">{r.letter} (on show)</span></span> : r.letter}
                </td>
                <td className="py-1.5">{formatDate(r.issuedAt)}</td>
                <td className="whitespace-pre-wrap py-1.5">{r.note || <span className="text-ink-soft">Issued for approval</span>}</td>
                <td className="py-1.5">{r.issuedBy ?? '—'}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </section>
  );
}
