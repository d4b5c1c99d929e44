'use client';
/**
 * Reference files of a layout: photos and PDF drawings, with a progress bar while one uploads.
 * Owners and designers add and delete; the layout's client sees the list and opens files. Size
 * and type are checked here first for a quick answer, and again by the server, which decides.
 */
import { useRef, useState } from 'react';
import { toast } from '@/components/ui/toast';
import { FileText, ImageIcon, Trash2, Upload } from 'lucide-react';
import { ACCEPTED_UPLOADS, UPLOAD_LIMIT_BYTES, type UploadDto } from '@/lib/uploads/dto';
import { sendFile, type SendHandle } from './sendFile';
import { useUploadActions, useUploads } from './useUploads';

const TYPES = ['image/jpeg', 'image/png', 'image/webp', 'application/pdf'];

export function sizeWords(bytes: number): string {
  if (bytes < 1024) return `${bytes} B`;
  if (bytes < 1024 * 1024) return `${(bytes / 1024).toFixed(0)} KB`;
  return `${(bytes / (1024 * 1024)).toFixed(1)} MB`;
}

/** A quick answer before sending; the server checks the content itself. */
export function precheck(file: File): string | null {
  if (file.size > UPLOAD_LIMIT_BYTES) return `${file.name} is ${sizeWords(file.size)}; the limit is 15 MB.`;
  if (file.size === 0) return `${file.name} is empty.`;
  if (file.type && !TYPES.includes(file.type)) return `${file.name} is not a JPEG, PNG or WebP photo or a PDF drawing.`;
  return null;
}

export function UploadsPanel({ layoutId, canEdit }: { layoutId: string; canEdit: boolean }) {
  const list = useUploads(layoutId);
  const { remove, refresh } = useUploadActions(layoutId);
  const input = useRef<HTMLInputElement>(null);
  const [progress, setProgress] = useState<{ name: string; fraction: number; handle: SendHandle } | null>(null);
  const [error, setError] = useState<string | null>(null);

  async function start(file: File) {
    setError(null);
    const problem = precheck(file);
    if (problem) return setError(problem);
    const handle = sendFile(layoutId, file, (fraction) => setProgress((p) => (p ? { ...p, fraction } : p)));
    setProgress({ name: file.name, fraction: 0, handle });
    try {
      const dto = await handle.done;
      toast.success(`${dto.fileName} added.`);
      await refresh();
    } catch (err) {
      setError(err instanceof Error ? err.message : 'The upload failed.');
    } finally {
      setProgress(null);
      if (input.current) input.current.value = '';
    }
  }

  async function del(u: UploadDto) {
    if (!window.confirm(`Delete ${u.fileName}? This cannot be undone.`)) return;
    try {
      await remove.mutateAsync(u.id);
      toast.success(`${u.fileName} deleted.`);
    } catch (err) {
      toast.error(err instanceof Error ? err.message : 'Could not delete the file.');
    }
  }

  return (
    <section className="panel p-4" aria-labelledby="uploads-heading">
      <div className="mb-3 flex items-center gap-2">
        <h2 id="uploads-heading" className="mr-auto text-base font-semibold text-ink">Reference files</h2>
        {canEdit && (
          <>
            <input ref={input} type="file" accept={ACCEPTED_UPLOADS} className="sr-only" id={`upload-${layoutId}`} aria-label="Choose a photo or drawing"
              onChange={(e) => e.target.files?.[0] && start(e.target.files[0])} disabled={progress !== null} />
            <label htmlFor={`upload-${layoutId}`} className={`btn-quiet cursor-pointer px-2 py-1 ${progress ? 'pointer-events-none opacity-50' : ''}`}>
              <Upload size={14} aria-hidden="true" /> Add photo or drawing
            </label>
          </>
        )}
      </div>
      <p className="mb-3 text-xs text-ink-soft">Photos (JPEG, PNG, WebP) and drawings (PDF), up to 15 MB each. Kept within the studio.</p>
      {progress && (
        <div className="mb-3" data-testid="upload-progress">
          <div className="mb-1 flex justify-between text-xs text-ink-soft">
            <span className="truncate">Sending {progress.name}</span>
            <span className="font-mono">{Math.round(progress.fraction * 100)} %</span>
          </div>
          <div role="progressbar" aria-label={`Uploading ${progress.name}`} aria-valuemin={0} aria-valuemax={100} aria-valuenow={Math.round(progress.fraction * 100)}
            className="h-2 overflow-hidden rounded-sm bg-paper-deep">
            <div className="h-full bg-copper transition-[width]" style={{ width: `${Math.round(progress.fraction * 100)}%` }} />
          </div>
          <button type="button" className="mt-1 text-xs text-ink-soft underline" onClick={() => progress.handle.abort()}>Cancel</button>
        </div>
      )}
      {error && <p role="alert" className="field-error mb-3">{error}</p>}
      {list.isPending && <p className="text-sm text-ink-soft">Loading files…</p>}
      {list.isError && <p role="alert" className="text-sm text-brick">Could not load the files: {list.error.message}</p>}
      {list.data && list.data.length === 0 && <p className="text-sm text-ink-soft">No reference files yet.</p>}
      {list.data && list.data.length > 0 && (
        <ul className="divide-y divide-paper-edge" aria-label="Reference files">
          {list.data.map((u) => (
            <li key={u.id} className="flex items-center gap-3 py-2">
              {u.kind === 'photo' ? (
                // eslint-disable-next-line @next/next/no-img-element -- a rights-checked route, not a static asset
                <img src={u.url} alt="" className="h-10 w-14 rounded-sm border border-paper-edge object-cover" loading="lazy" />
              ) : (
                <span className="flex h-10 w-14 items-center justify-center rounded-sm border border-paper-edge text-ink-soft"><FileText size={18} aria-hidden="true" /></span>
              )}
              <div className="min-w-0 flex-1">
                <a href={u.kind === 'photo' ? u.url : `${u.url}?download=1`} className="block truncate text-sm text-ink underline-offset-2 hover:underline" target={u.kind === 'photo' ? '_blank' : undefined} rel="noopener">
                  {u.fileName}
                </a>
                <span className="text-xs text-ink-soft">
                  {u.kind === 'photo' ? <ImageIcon size={11} className="mr-1 inline" aria-hidden="true" /> : null}
                  {u.kind === 'photo' ? 'Photo' : 'Drawing'} · <span className="font-mono">{sizeWords(u.sizeBytes)}</span>
                  {u.tracing ? ' · under the plan' : ''}
                </span>
              </div>
              {canEdit && (
                <button type="button" className="btn-quiet px-2 py-1" onClick={() => del(u)} aria-label={`Delete ${u.fileName}`}>
                  <Trash2 size={14} aria-hidden="true" />
                </button>
              )}
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
