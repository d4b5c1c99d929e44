'use client';
/**
 * The Details panel's form for one opening: a window (wall or door, position along it, sill height,
 * width, height, whether it opens, blind frame depth), a roof opening (kind, place in plan, size,
 * frame depth below the lining) or a body point (kind, wall or underside, position, height, across).
 * Each field applies when left or on Enter as one undo step; the bay schema decides what is
 * allowed, and a refusal is shown beside the field with the last valid value kept (LengthField).
 * Never writes the document except through store actions.
 */
import { useId } from 'react';
import { toast } from '@/components/ui/toast';
import { useShallow } from 'zustand/react/shallow';
import { Trash2 } from 'lucide-react';
import type { BodyPoint, Opening, RoofOpening, WindowOpening } from '@/lib/layout/schema';
import { BODY_POINT_KINDS, BODY_POINT_WALLS, OPENING_LIMITS, ROOF_OPENING_KINDS } from '@/lib/layout/vocabulary';
import { useEditor, useEditorApi } from '../store/EditorStoreContext';
import { LengthField } from './LengthField';
import { OPENING_PRESET_WORDS } from '../store/openingEdits';

const WALL_WORDS: Record<'left' | 'right' | 'rear', string> = { left: 'Left wall', right: 'Right wall', rear: 'Rear wall' };
const UNDERSIDE = 'Under the floor';

function doorWords(d: { wall: 'left' | 'right' | 'rear'; offset: number }): string {
  return d.wall === 'rear' ? `In the rear door (at ${d.offset} mm)` : `In the ${d.wall}-hand door (at ${d.offset} mm)`;
}

function Choice({ label, value, options, onChange, disabled, testId }: { label: string; value: string; options: { value: string; label: string }[]; onChange: (v: string) => void; disabled?: boolean; testId?: string }) {
  const id = useId();
  return (
    <div>
      <label htmlFor={id} className="text-xs text-ink-soft">{label}</label>
      <select id={id} value={value} disabled={disabled} data-testid={testId} onChange={(e) => onChange(e.target.value)} className="mt-0.5 block w-full rounded border border-paper-edge bg-paper px-2 py-1 text-sm focus:outline-none focus:ring-2 focus:ring-copper">
        {options.map((o) => <option key={o.value} value={o.value}>{o.label}</option>)}
      </select>
    </div>
  );
}

export function OpeningForm({ opening }: { opening: Opening }) {
  const api = useEditorApi();
  const { units, readOnly, bay } = useEditor(useShallow((s) => ({ units: s.units, readOnly: s.readOnly, bay: s.doc.bay })));
  /** Apply a change as one undo step; a refusal is said in a toast, or beside a length field (`quiet`). */
  const update = (patch: Record<string, unknown>, what: string, quiet = false) => {
    const r = api.getState().updateOpening(opening.id, patch, `Edit ${what}`);
    if (!r.ok && !quiet) toast.error(`Not applied: ${r.error}`);
    return r;
  };
  const length = (label: string, key: string, value: number, opts: { min?: number; max?: number; hint?: string } = {}) => (
    <LengthField
      label={label}
      hint={opts.hint}
      valueMm={value}
      unit={units}
      disabled={readOnly}
      min={opts.min ?? 0}
      max={opts.max}
      testId={`opening-${key}`}
      onCommit={(mm) => update({ [key]: key === 'frameDepth' && mm === 0 ? undefined : mm }, label.toLowerCase(), true)}
    />
  );
  const title = opening.type === 'window' ? 'Window' : OPENING_PRESET_WORDS[opening.kind];

  return (
    <form className="space-y-3 p-4 text-sm" aria-label={`${title} details`} data-testid="opening-form" data-opening-id={opening.id} onSubmit={(e) => e.preventDefault()}>
      <div className="flex items-center justify-between gap-2">
        <h3 className="font-medium text-ink">{title}</h3>
        {!readOnly && (
          <button type="button" onClick={() => { const r = api.getState().deleteOpening(opening.id); if (!r.ok) toast.error(r.error); }} className="flex items-center gap-1 rounded border border-paper-edge px-2 py-1 text-xs hover:bg-paper-deep focus-visible:outline-2 focus-visible:outline-copper">
            <Trash2 size={13} aria-hidden /> Delete {title.toLowerCase()}
          </button>
        )}
      </div>
      {opening.type === 'window' && windowFields(opening)}
      {opening.type === 'roof-opening' && roofFields(opening)}
      {opening.type === 'body-point' && pointFields(opening)}
      <p className="text-[11px] text-ink-soft">Openings belong to the bay: they are the same in every arrangement.</p>
    </form>
  );

  function windowFields(w: WindowOpening) {
    const wallValue = w.wall === 'door' ? `door:${w.door}` : w.wall;
    const options = [
      ...(['left', 'right', 'rear'] as const).map((v) => ({ value: v, label: WALL_WORDS[v] })),
      ...bay.doors.map((d) => ({ value: `door:${d.id}`, label: doorWords(d) })),
    ];
    return (
      <>
        <Choice label="Wall" value={wallValue} options={options} disabled={readOnly} testId="opening-wall" onChange={(v) => {
          const patch = v.startsWith('door:') ? { wall: 'door', door: v.slice(5), position: 0 } : { wall: v, door: undefined, position: 0 };
          update(patch, 'wall');
        }} />
        {length('Position', 'position', w.position, { hint: w.wall === 'door' ? 'from the door’s start edge' : w.wall === 'rear' ? 'from the left end' : 'from the front end' })}
        {length('Sill height', 'sillHeight', w.sillHeight, { hint: 'above the finished floor' })}
        {length('Width', 'width', w.width, { min: 1 })}
        {length('Height', 'height', w.height, { min: 1 })}
        <label className="flex items-center gap-2">
          <input type="checkbox" className="accent-copper" checked={w.opens} disabled={readOnly} onChange={(e) => update({ opens: e.target.checked }, 'opens')} data-testid="opening-opens" />
          Opens
        </label>
        {length('Blind frame depth', 'frameDepth', w.frameDepth ?? 0, { max: OPENING_LIMITS.frame, hint: '0 for none' })}
      </>
    );
  }

  function roofFields(o: RoofOpening) {
    return (
      <>
        <Choice label="Kind" value={o.kind} disabled={readOnly} testId="opening-kind" options={ROOF_OPENING_KINDS.map((k) => ({ value: k, label: OPENING_PRESET_WORDS[k] }))} onChange={(v) => update({ kind: v }, 'kind')} />
        {length('Position from front', 'x', o.x)}
        {length('From left wall', 'y', o.y)}
        {length('Length', 'length', o.length, { min: 1 })}
        {length('Width', 'width', o.width, { min: 1 })}
        {length('Frame depth below lining', 'frameHeight', o.frameHeight, { max: OPENING_LIMITS.frame })}
      </>
    );
  }

  function pointFields(p: BodyPoint) {
    const under = p.wall === 'underside';
    return (
      <>
        <Choice label="Kind" value={p.kind} disabled={readOnly} testId="opening-kind" options={BODY_POINT_KINDS.map((k) => ({ value: k, label: OPENING_PRESET_WORDS[k] }))} onChange={(v) => update({ kind: v }, 'kind')} />
        <Choice label="Wall or underside" value={p.wall} disabled={readOnly} testId="opening-wall" options={BODY_POINT_WALLS.map((v) => ({ value: v, label: v === 'underside' ? UNDERSIDE : WALL_WORDS[v] }))} onChange={(v) => {
          const toUnder = v === 'underside';
          update({ wall: v, position: 0, height: toUnder ? 0 : Math.max(0, p.height), across: toUnder ? Math.round(bay.width / 2) : undefined }, 'wall');
        }} />
        {length('Position', 'position', p.position, { hint: under ? 'from the front' : p.wall === 'rear' ? 'from the left end' : 'from the front end' })}
        {length('Height', 'height', p.height, { min: -OPENING_LIMITS.belowFloor, hint: under ? 'below the floor, 0 or less' : 'above the bare floor' })}
        {under && length('Across', 'across', p.across ?? 0, { hint: 'from the left side' })}
      </>
    );
  }
}
