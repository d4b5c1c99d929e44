'use client';
/**
 * The strip above the plan: layout name, arrangement switch, the edit and view commands (the
 * same command objects as the keyboard), the step size for moving (or free movement), display units, the 1:1 screen scale and the
 * save indicator. On a tablet (`compact`) it is one row — panels, arrangement, undo/redo, save —
 * with everything else behind "More". Never edits the document except through commands and store actions.
 */
import { memo, type ReactNode } from 'react';
import { useShallow } from 'zustand/react/shallow';
import { LENGTH_UNITS, type LengthUnit } from '@/lib/layout/units';
import { useEditor, useEditorApi } from '../store/EditorStoreContext';
import { GRID_STEPS, type GridStep } from '../geometry/snapping';
import { CommandButton } from './CommandButton';
import { ArrangementSwitch, PhantomSelect } from './ArrangementSwitch';
import { SaveIndicator } from './SaveIndicator';
import { ToolbarMore } from './ToolbarMore';
import type { SaveStatus } from '../api/useAutosave';

interface ToolbarProps {
  saveStatus: SaveStatus;
  saveDetail?: string | null;
  /** Where a held link goes once the save lands (see useAutosave). */
  saveLeavingFor?: string | null;
  extra?: ReactNode;
  /** The buttons that open the panels (drawers on a tablet, Mark-ups on a desktop). */
  panels?: ReactNode;
  compact?: boolean;
}

export const Toolbar = memo(function Toolbar({ saveStatus, saveDetail, saveLeavingFor, extra, panels, compact = false }: ToolbarProps) {
  const s = useEditor(useShallow((st) => ({ name: st.doc.name, readOnly: st.readOnly, version: st.version, released: st.gestureReleased })));
  // A drag let go is committed a frame later: until then its change is not saved.
  const status = s.released && saveStatus === 'saved' ? 'unsaved' : saveStatus;
  if (compact) {
    return (
      <div className="flex flex-wrap items-center gap-2 border-b border-paper-edge bg-paper px-2 py-1" data-testid="toolbar" data-compact="">
        <h1 className="sr-only">{s.name}</h1>
        {panels}
        <ArrangementSwitch withPhantom={false} />
        {!s.readOnly && (
          <div className="flex items-center gap-1" role="group" aria-label="Undo and redo">
            <CommandButton id="edit.undo" />
            <CommandButton id="edit.redo" />
          </div>
        )}
        <div className="ml-auto flex items-center gap-2">
          <SaveIndicator status={status} version={s.version} detail={saveDetail} leavingFor={saveLeavingFor} />
          <ToolbarMore>
            <p className="truncate text-sm font-semibold" title={s.name}>{s.name}</p>
            {!s.readOnly && (
              <div className="flex flex-wrap items-center gap-1" role="group" aria-label="Edit">
                <CommandButton id="edit.rotate" />
                <CommandButton id="edit.duplicate" />
                <CommandButton id="edit.delete" />
              </div>
            )}
            <ViewTools />
            <div className="flex flex-wrap items-center gap-3">
              <PhantomSelect />
              {!s.readOnly && <StepsSelect />}
              <UnitsSelect />
            </div>
            {extra && <div className="flex flex-wrap items-center gap-2">{extra}</div>}
            <CommandButton id="help.shortcuts" withLabel />
          </ToolbarMore>
        </div>
      </div>
    );
  }
  return (
    <div className="flex flex-wrap items-center gap-x-4 gap-y-2 border-b border-paper-edge bg-paper px-3 py-2" data-testid="toolbar">
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
      <ViewTools />
      {!s.readOnly && <StepsSelect />}
      <UnitsSelect />
      <div className="ml-auto flex items-center gap-3">
        {extra}
        {panels}
        <SaveIndicator status={status} version={s.version} detail={saveDetail} leavingFor={saveLeavingFor} />
        <CommandButton id="help.shortcuts" />
      </div>
    </div>
  );
});

function ViewTools() {
  const api = useEditorApi();
  const { scale, actual } = useEditor(useShallow((st) => ({ scale: st.viewport.scale, actual: st.actualPxPerMm })));
  return (
    <div className="flex flex-wrap items-center gap-1" role="group" aria-label="View">
      <CommandButton id="view.zoom-out" />
      <span className="w-16 text-center font-mono text-xs text-ink-soft" title="Drawing scale on this screen (1:1 is real size)" data-testid="drawing-scale">{drawingScale(scale, actual)}</span>
      <CommandButton id="view.zoom-in" />
      <CommandButton id="view.fit" />
      <CommandButton id="view.actual" />
      <label className="ml-1 flex items-center gap-1 text-xs text-ink-soft" title="Screen pixels per millimetre at 1:1 — measure a ruler on your screen">
        1:1 at
        <input type="number" inputMode="decimal" step={0.05} min={1} max={20} value={Math.round(actual * 100) / 100} onChange={(e) => api.getState().setActualPxPerMm(Number(e.target.value))} className="w-16 rounded border border-paper-edge bg-paper px-1 py-0.5 font-mono" aria-label="Screen pixels per millimetre for 1:1" />
        px/mm
      </label>
    </div>
  );
}

function StepsSelect() {
  const api = useEditorApi();
  const steps = useEditor((st) => st.steps);
  return (
    <label className="flex items-center gap-1.5 text-sm text-ink-soft" title="Steps: moves land on whole steps and line up with the edges nearby. Free: any whole millimetre.">
      Move
      <select
        value={steps.enabled ? String(steps.step) : 'free'}
        onChange={(e) => api.getState().setSteps(e.target.value === 'free' ? { enabled: false } : { enabled: true, step: Number(e.target.value) as GridStep })}
        className="rounded border border-paper-edge bg-paper px-1 py-0.5 font-mono text-xs" aria-label="Move in steps of"
      >
        {GRID_STEPS.map((g) => <option key={g} value={g}>in {g} mm steps</option>)}
        <option value="free">freely (1 mm)</option>
      </select>
    </label>
  );
}

function UnitsSelect() {
  const api = useEditorApi();
  const units = useEditor((st) => st.units);
  return (
    <label className="flex items-center gap-1.5 text-sm text-ink-soft">
      Units
      <select value={units} onChange={(e) => api.getState().setUnits(e.target.value as LengthUnit)} className="rounded border border-paper-edge bg-paper px-1 py-0.5 font-mono text-xs">
        {LENGTH_UNITS.map((u) => <option key={u} value={u}>{u}</option>)}
      </select>
    </label>
  );
}

/** The drawing scale as a drafter writes it: 1:20 when zoomed out, 2:1 when zoomed in. */
export function drawingScale(scale: number, actual: number): string {
  const r = actual / scale;
  if (r >= 1) return `1:${r >= 10 ? Math.round(r) : Math.round(r * 10) / 10}`;
  const inv = 1 / r;
  return `${inv >= 10 ? Math.round(inv) : Math.round(inv * 10) / 10}:1`;
}
