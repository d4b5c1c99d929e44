'use client';
/**
 * The editor toolbar's "Sheets & files" menu, named after what the user gets: the plan sheet, a
 * picture of this view (with its title strip), the layout file, and opening a layout file as a
 * new layout (owners and designers). Import validates the file
 * with the layout schema first and lists each problem with its field path; the server checks it
 * again. Reads the editor's store; never changes the open document.
 */
import { useRef, useState } from 'react';
import Link from 'next/link';
import { useRouter } from 'next/navigation';
import { toast } from '@/components/ui/toast';
import { ChevronDown, FileDown, FileImage, FileText, FolderOpen, Printer } from 'lucide-react';
import { apiFetch, ApiError } from '@/lib/api/client-fetch';
import { Dialog } from '@/components/editor/panels/Dialog';
import { useEditorApi } from '@/components/editor/store/EditorStoreContext';
import { PRELIMINARY_WORD } from '@/lib/layout/drawing-issue';
import { formatDate } from '@/lib/format';
import { downloadBlob, planToPng } from './exportPlan';

// The file helpers validate imports with the full layout schema: fetched when a File action runs,
// so the schema library stays out of the editor's first load.
const layoutFile = () => import('./layoutFile');

export function LayoutFileMenu({ layoutId, canEdit }: { layoutId: string; canEdit: boolean }) {
  const api = useEditorApi();
  const router = useRouter();
  const [open, setOpen] = useState(false);
  const [problems, setProblems] = useState<{ file: string; lines: string[] } | null>(null);
  const [busy, setBusy] = useState(false);
  const root = useRef<HTMLDivElement>(null);
  const input = useRef<HTMLInputElement>(null);

  async function savePicture() {
    setOpen(false);
    const plan = root.current?.closest('[data-testid="editor"]')?.querySelector<HTMLElement>('[data-testid="plan"]');
    try {
      if (!plan) throw new Error('The plan is not on screen.');
      const s = api.getState();
      const title = {
        layout: s.doc.name,
        arrangement: `${s.arrangement[0].toUpperCase()}${s.arrangement.slice(1)} arrangement`,
        revision: `${PRELIMINARY_WORD} (version ${s.version})`,
        date: formatDate(new Date()),
        pxPerMm: s.viewport.scale,
      };
      const { layoutFileName } = await layoutFile();
      downloadBlob(await planToPng(plan, title), layoutFileName(s.doc.name, `${s.arrangement}.png`));
    } catch (err) {
      toast.error(err instanceof Error ? err.message : 'The picture could not be made.');
    }
  }

  async function saveLayoutFile() {
    setOpen(false);
    const { doc } = api.getState();
    const { layoutFileName, layoutFileText } = await layoutFile();
    downloadBlob(new Blob([layoutFileText(doc)], { type: 'application/json' }), layoutFileName(doc.name));
  }

  async function importFile(file: File) {
    const { issueLines, readLayoutFile } = await layoutFile();
    setBusy(true);
    try {
      const result = readLayoutFile(await file.text(), file.size);
      if (!result.ok) return setProblems({ file: file.name, lines: issueLines(result.issues) });
      const name = `${result.name} (imported)`.slice(0, 120);
      const created = await apiFetch<{ id: string }>('/api/layouts', { method: 'POST', json: { name, doc: result.doc } });
      toast.success(`Opened as a new layout: “${name}”.`);
      router.push(`/layouts/${created.id}`);
    } catch (err) {
      if (err instanceof ApiError && err.issues.length) setProblems({ file: file.name, lines: issueLines(err.issues) });
      else toast.error(err instanceof Error ? err.message : 'The layout file could not be opened.');
    } finally {
      setBusy(false);
      if (input.current) input.current.value = '';
    }
  }

  const item = 'flex w-full items-center gap-2 px-3 py-1.5 text-left text-sm hover:bg-paper-deep focus-visible:bg-paper-deep focus-visible:outline-none';
  return (
    <div ref={root} className="relative" onKeyDown={(e) => e.key === 'Escape' && setOpen(false)}>
      <button type="button" className="btn-quiet px-2 py-1" aria-haspopup="menu" aria-expanded={open} onClick={() => setOpen((o) => !o)} disabled={busy}>
        <FileDown size={14} aria-hidden="true" /> Sheets &amp; files <ChevronDown size={12} aria-hidden="true" />
      </button>
      {open && (
        <div role="menu" aria-label="Sheets & files" className="absolute right-0 z-30 mt-1 w-72 rounded-sm border border-paper-edge bg-paper py-1 shadow-lg">
          <Link role="menuitem" href={`/layouts/${layoutId}/sheet`} className={item} onClick={() => setOpen(false)}>
            <Printer size={14} aria-hidden="true" /> Plan sheet (to print, or as PDF)
          </Link>
          <button role="menuitem" type="button" className={item} onClick={savePicture}>
            <FileImage size={14} aria-hidden="true" /> Picture of this view
          </button>
          <button role="menuitem" type="button" className={item} onClick={saveLayoutFile}>
            <FileText size={14} aria-hidden="true" /> Layout file (to keep or send)
          </button>
          {canEdit && (
            <button role="menuitem" type="button" className={item} onClick={() => { setOpen(false); input.current?.click(); }}>
              <FolderOpen size={14} aria-hidden="true" /> Open a layout file as a new layout…
            </button>
          )}
        </div>
      )}
      <input ref={input} type="file" accept="application/json,.json" className="sr-only" tabIndex={-1} aria-label="Choose a layout file to open as a new layout"
        onChange={(e) => e.target.files?.[0] && importFile(e.target.files[0])} />
      <Dialog open={problems !== null} title="This file is not a layout Baywright can read" onClose={() => setProblems(null)} testId="import-problems">
        <p className="mb-2 text-sm">{problems?.file} has these problems (field: what is wrong):</p>
        <ul className="mb-4 max-h-64 list-disc overflow-auto pl-5 text-xs">
          {problems?.lines.map((l, i) => <li key={i}>{l}</li>)}
        </ul>
        <button type="button" className="btn-primary" onClick={() => setProblems(null)}>Close</button>
      </Dialog>
    </div>
  );
}
