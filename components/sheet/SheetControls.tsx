'use client';
/**
 * The bar above the HTML plan sheet (hidden in print): which issued revision (or the preliminary
 * layout) to print, paper and scale, print, download the PDF, back to the editor. Changing any of
 * them reloads the sheet with the new query; it never lays anything out itself.
 */
import Link from 'next/link';
import { useRouter } from 'next/navigation';
import { ArrowLeft, Download, Printer } from 'lucide-react';
import { AS_LAST_SAVED, ISSUE_STATE_WORD, PRELIMINARY_CHOICE, type RevisionState } from '@/lib/layout/drawing-issue';

interface Props {
  layoutId: string;
  paper: 'a4' | 'a3';
  scale: 10 | 20 | 25;
  /** The issued revision on show, or null for the layout as it stands (preliminary). */
  revision: string | null;
  /** The layout's issued revisions, newest first. */
  revisions: { letter: string; state: RevisionState }[];
  /** What the sheet shows when nobody chooses (the latest approved, else the latest issued). */
  defaultRevision: string | null;
  /** False when the bay does not fit: the PDF link would only answer 422. */
  canDownload: boolean;
}

export function SheetControls({ layoutId, paper, scale, revision, revisions, defaultRevision, canDownload }: Props) {
  const router = useRouter();
  const choice = revision ?? PRELIMINARY_CHOICE;
  const at = (c: string) => `revision=${c}`;
  const go = (p: string, s: number, c = choice) => router.push(`/layouts/${layoutId}/sheet?paper=${p}&scale=${s}&${at(c)}`);
  const rev = `&${at(choice)}`;
  const pdf = `/api/layouts/${layoutId}/sheet?paper=${paper}&scale=${scale}${rev}`;
  return (
    <div className="no-print flex flex-wrap items-end gap-4 border-b border-paper-edge bg-paper px-4 py-3">
      <Link href={`/layouts/${layoutId}`} className="btn-quiet px-2 py-1 text-sm">
        <ArrowLeft size={14} aria-hidden="true" /> Back to the editor
      </Link>
      <h1 className="mr-auto text-lg font-semibold text-ink">Plan sheet<span className="ml-2 text-sm font-normal text-ink-soft" data-testid="sheet-on-show">{revision ? `revision ${revision}` : AS_LAST_SAVED.toLowerCase()}</span></h1>
      <label className="flex flex-col text-sm">
        <span className="label">Revision</span>
        <select className="field" value={choice} onChange={(e) => go(paper, scale, e.target.value)} aria-label="Revision" data-testid="sheet-revision">
          {revisions.map((r) => (
            <option key={r.letter} value={r.letter}>
              Revision {r.letter} · {ISSUE_STATE_WORD[r.state]}{r.letter === defaultRevision ? ' (default)' : ''}
            </option>
          ))}
          <option value={PRELIMINARY_CHOICE}>{AS_LAST_SAVED}</option>
        </select>
      </label>
      <label className="flex flex-col text-sm">
        <span className="label">Paper</span>
        <select className="field" value={paper} onChange={(e) => go(e.target.value, scale)} aria-label="Paper">
          <option value="a4">A4 landscape</option>
          <option value="a3">A3 landscape</option>
        </select>
      </label>
      <label className="flex flex-col text-sm">
        <span className="label">Scale</span>
        <select className="field font-mono" value={scale} onChange={(e) => go(paper, Number(e.target.value))} aria-label="Scale">
          <option value={10}>1:10</option>
          <option value={20}>1:20</option>
          <option value={25}>1:25</option>
        </select>
      </label>
      <button type="button" className="btn-quiet px-3 py-2" onClick={() => window.print()} disabled={!canDownload}>
        <Printer size={16} aria-hidden="true" /> Print
      </button>
      {canDownload ? (
        <a className="btn-primary px-3 py-2" href={pdf} download data-testid="download-pdf">
          <Download size={16} aria-hidden="true" /> Download PDF
        </a>
      ) : (
        <span className="btn-primary cursor-not-allowed px-3 py-2 opacity-50" aria-disabled="true">
          <Download size={16} aria-hidden="true" /> Download PDF
        </span>
      )}
    </div>
  );
}
