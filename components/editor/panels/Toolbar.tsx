'use client';
/**
 * The strip above the plan: layout name, arrangement switch, the edit and view commands (the
 * same command objects as the keyboard), the step size for moving (or free movement), display units, the 1:1 screen scale and the
 * save indicator. Never edits the document except through commands and store actions.
 */
import { memo, type ReactNode } from 'react';
import { useShallow } from 'zustand/react/shallow';
import { LENGTH_UNITS, type LengthUnit } from '@/lib/layout/units';
import { useEditor, useEditorApi } from '../store/EditorStoreContext';
import { GRID_STEPS, type GridStep } from '../geometry/snapping';
import { CommandButton } from './CommandButton';
import { ArrangementSwitch } from './ArrangementSwitch';
import { SaveIndicator } from './SaveIndicator';
import type { SaveStatus } from '../api/useAutosave';

export const Toolbar = memo(function Toolbar({ saveStatus, saveDetail, extra }: { saveStatus: SaveStatus; saveDetail?: string | null; extra?: ReactNode }) {
  const api = useEditorApi();
  const s = useEditor(useShallow((st) => ({ name: st.doc.name, readOnly: st.readOnly, steps: st.steps, units: st.units, scale: st.viewport.scale, actual: st.actualPxPerMm, phantom: st.phantom, version: st.version })));
  return (
    <div className="flex flex-wrap items-center gap-x-4 gap-y-2 border-b border-paper-edge bg-paper px-3 py-2">
      <h1 className="max-w-[16rem] truncate text-sm font-semibold" title={s.name}>{s.name}</h1>
      <ArrangementSwitch />
      {!s.readOnly && (
        <div className="flex items-center gap-1" role="group" aria-label="Edit">
          <CommandButton id="edit.undo" />
          <CommandButton id="edit.redo" />
          <CommandButton id="edit.rotate" />
          <CommandButton id="edit.duplicate" />
          <CommandButton id="edit.delete" />
        </div>
      )}
      <div className="flex items-center gap-1" role="group" aria-label="View">
        <CommandButton id="view.zoom-out" />
        <span className="w-16 text-center font-mono text-xs text-ink-soft" title="Drawing scale on this screen (1:1 is real size)">{drawingScale(s.scale, s.actual)}</span>
        <CommandButton id="view.zoom-in" />
        <CommandButton id="view.fit" />
        <CommandButton id="view.actual" />
        <label className="ml-1 flex items-center gap-1 text-xs text-ink-soft" title="Screen pixels per millimetre at 1:1 — measure a ruler on your screen">
          1:1 at
          <input type="number" step={0.05} min={1} max={20} value={Math.round(s.actual * 100) / 100} onChange={(e) => api.getState().setActualPxPerMm(Number(e.target.value))} className="w-16 rounded border border-paper-edge bg-paper px-1 py-0.5 font-mono" aria-label="Screen pixels per millimetre for 1:1" />
          px/mm
        </label>
      </div>
      {!s.readOnly && (
        <label className="flex items-center gap-1.5 text-sm text-ink-soft" title="Steps: moves land on whole steps and line up with the edges nearby. Free: any whole millimetre.">
          Move
          <select
            value={s.steps.enabled ? String(s.steps.step) : 'free'}
            onChange={(e) => api.getState().setSteps(e.target.value === 'free' ? { enabled: false } : { enabled: true, step: Number(e.target.value) as GridStep })}
            className="rounded border border-paper-edge bg-paper px-1 py-0.5 font-mono text-xs" aria-label="Move in steps of"
          >
            {GRID_STEPS.map((g) => <option key={g} value={g}>in {g} mm steps</option>)}
            <option value="free">freely (1 mm)</option>
          </select>
        </label>
      )}
      <label className="flex items-center gap-1.5 text-sm text-ink-soft">
        Units
        <select value={s.units} onChange={(e) => api.getState().setUnits(e.target.value as LengthUnit)} className="rounded border border-paper-edge bg-paper px-1 py-0.5 font-mono text-xs">
          {LENGTH_UNITS.map((u) => <option key={u} value={u}>{u}</option>)}
        </select>
      </label>
      <div className="ml-auto flex items-center gap-3">
        {extra}
        <SaveIndicator status={saveStatus} version={s.version} detail={saveDetail} />
        <CommandButton id="help.shortcuts" />
      </div>
    </div>
  );
});

/** The drawing scale as a drafter writes it: 1:20 when zoomed out, 2:1 when zoomed in. */
export function drawingScale(scale: number, actual: number): string {
  const r = actual / scale;
  if (r >= 1) return `1:${r >= 10 ? Math.round(r) : Math.round(r * 10) / 10}`;
  const inv = 1 / r;
  return `${inv >= 10 ? Math.round(inv) : Math.round(inv * 10) / 10}:1`;
}
