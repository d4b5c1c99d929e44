'use client';
/**
 * The editor's "Tracing" control: the layout's photos, each placeable under the plan after a
 * two-point calibration, with its opacity; add a photo from here too. Placements are stored with
 * the upload (studio data), never in the layout document, so viewer links never show them.
 * Owners and designers place; the layout's client sees what is placed.
 */
import { useEffect, useRef, useState } from 'react';
import dynamic from 'next/dynamic';
import { toast } from '@/components/ui/toast';
import { Camera, ChevronDown, ImagePlus } from 'lucide-react';
import { Dialog } from '@/components/editor/panels/Dialog';
import type { LengthUnit } from '@/lib/layout';
import type { TracingPlacement } from '@/lib/tracing/calibration';
import type { UploadDto } from '@/lib/uploads/dto';

// The calibration dialog (and the tracing maths it runs) loads when a photo is first calibrated.
const CalibrateDialog = dynamic(() => import('./CalibrateDialog').then((m) => m.CalibrateDialog), { ssr: false });
import { sendFile } from './sendFile';
import { precheck } from './UploadsPanel';
import { useUploadActions, useUploads } from './useUploads';

export function TracingPanel({ layoutId, canEdit, units }: { layoutId: string; canEdit: boolean; units: LengthUnit }) {
  const list = useUploads(layoutId);
  const { place, refresh } = useUploadActions(layoutId);
  const [open, setOpen] = useState(false);
  const [calibrating, setCalibrating] = useState<UploadDto | null>(null);
  const [sending, setSending] = useState<number | null>(null);
  const input = useRef<HTMLInputElement>(null);
  const photos = (list.data ?? []).filter((u) => u.kind === 'photo');
  const placed = photos.filter((u) => u.tracing).length;

  async function save(u: UploadDto, placement: TracingPlacement | null) {
    try {
      await place.mutateAsync({ id: u.id, placement });
      if (placement === null) toast.success(`${u.fileName} taken off the plan.`);
    } catch (err) {
      toast.error(err instanceof Error ? err.message : 'Could not place the photo.');
    }
  }

  async function add(file: File) {
    const problem = precheck(file);
    if (problem) return toast.error(problem);
    setSending(0);
    try {
      const dto = await sendFile(layoutId, file, setSending).done;
      await refresh();
      if (dto.kind === 'photo') setCalibrating(dto);
    } catch (err) {
      toast.error(err instanceof Error ? err.message : 'The upload failed.');
    } finally {
      setSending(null);
      if (input.current) input.current.value = '';
    }
  }

  // Escape or a tap outside closes the list, wherever the focus is (not while calibrating: that dialog is its own).
  const root = useRef<HTMLDivElement>(null);
  useEffect(() => {
    if (!open || calibrating) return;
    const away = (e: PointerEvent) => {
      if (!root.current?.contains(e.target as Node)) setOpen(false);
    };
    const key = (e: KeyboardEvent) => {
      if (e.key === 'Escape') setOpen(false);
    };
    window.addEventListener('pointerdown', away, true);
    window.addEventListener('keydown', key);
    return () => {
      window.removeEventListener('pointerdown', away, true);
      window.removeEventListener('keydown', key);
    };
  }, [open, calibrating]);

  return (
    <div ref={root} className="relative" data-testid="tracing-control">
      <button type="button" className="btn-quiet px-2 py-1" aria-haspopup="dialog" aria-expanded={open} onClick={() => setOpen((o) => !o)}>
        <Camera size={14} aria-hidden="true" /> Survey photos{placed ? <span className="font-mono text-xs">{placed}</span> : null} <ChevronDown size={12} aria-hidden="true" />
      </button>
      {open && (
        <div role="dialog" aria-label="Survey photos" className="absolute right-0 z-30 mt-1 w-80 rounded-sm border border-paper-edge bg-paper p-3 text-sm shadow-lg">
          <p className="mb-2 text-xs text-ink-soft">Photos or drawings of the van placed under the plan, scaled from two points whose distance you know. Kept in the studio: never shown through viewer links.</p>
          {list.isPending && <p className="text-ink-soft">Loading photos…</p>}
          {list.isError && <p role="alert" className="text-brick">Could not load the photos: {list.error.message}</p>}
          {list.data && photos.length === 0 && <p className="text-ink-soft">No photos yet.</p>}
          <ul className="space-y-2" aria-label="Survey photos of this layout">
            {photos.map((u) => (
              <li key={u.id} className="rounded-sm border border-paper-edge p-2">
                <div className="mb-1 flex items-center gap-2">
                  {/* eslint-disable-next-line @next/next/no-img-element -- a rights-checked route */}
                  <img src={u.url} alt="" className="h-8 w-10 rounded-sm object-cover" />
                  <span className="min-w-0 flex-1 truncate" title={u.fileName}>{u.fileName}</span>
                </div>
                {u.tracing ? (
                  <>
                    <p className="font-mono text-xs text-ink-soft">{u.tracing.mmPerPx.toFixed(2)} mm/px · turned {u.tracing.rotation}°</p>
                    {canEdit && (
                      <>
                        <label className="mt-1 flex items-center gap-2 text-xs">
                          Opacity
                          <input type="range" min={5} max={100} step={5} defaultValue={Math.round(u.tracing.opacity * 100)} className="flex-1 accent-copper"
                            aria-label={`Opacity of ${u.fileName}`}
                            onPointerUp={(e) => save(u, { ...u.tracing!, opacity: Number(e.currentTarget.value) / 100 })}
                            onKeyUp={(e) => save(u, { ...u.tracing!, opacity: Number(e.currentTarget.value) / 100 })} />
                        </label>
                        <div className="mt-1 flex gap-2">
                          <button type="button" className="btn-quiet px-2 py-0.5 text-xs" onClick={() => setCalibrating(u)}>Scale again</button>
                          <button type="button" className="btn-quiet px-2 py-0.5 text-xs" onClick={() => save(u, null)}>Take off the plan</button>
                        </div>
                      </>
                    )}
                  </>
                ) : canEdit ? (
                  <button type="button" className="btn-quiet px-2 py-0.5 text-xs" onClick={() => setCalibrating(u)}>Scale from two points and place…</button>
                ) : (
                  <p className="text-xs text-ink-soft">Not placed.</p>
                )}
              </li>
            ))}
          </ul>
          {canEdit && (
            <div className="mt-3">
              <input ref={input} type="file" accept="image/jpeg,image/png,image/webp" className="sr-only" id={`tracing-add-${layoutId}`} aria-label="Add a survey photo"
                onChange={(e) => e.target.files?.[0] && add(e.target.files[0])} disabled={sending !== null} />
              <label htmlFor={`tracing-add-${layoutId}`} className="btn-quiet cursor-pointer px-2 py-1 text-xs">
                <ImagePlus size={14} aria-hidden="true" /> {sending === null ? 'Add a photo' : `Sending… ${Math.round(sending * 100)} %`}
              </label>
              {sending !== null && (
                <div role="progressbar" aria-label="Uploading the photo" aria-valuemin={0} aria-valuemax={100} aria-valuenow={Math.round(sending * 100)} className="mt-1 h-1.5 overflow-hidden rounded-sm bg-paper-deep">
                  <div className="h-full bg-copper" style={{ width: `${Math.round(sending * 100)}%` }} />
                </div>
              )}
            </div>
          )}
        </div>
      )}
      <Dialog open={calibrating !== null} title={`Scale ${calibrating?.fileName ?? ''} from two points`} onClose={() => setCalibrating(null)} testId="scale-photo-dialog">
        {calibrating && (
          <CalibrateDialog upload={calibrating} units={units} saving={place.isPending}
            onCancel={() => setCalibrating(null)}
            onSave={async (placement) => {
              await save(calibrating, placement);
              setCalibrating(null);
              toast.success(`${calibrating.fileName} placed under the plan.`);
            }} />
        )}
      </Dialog>
    </div>
  );
}
