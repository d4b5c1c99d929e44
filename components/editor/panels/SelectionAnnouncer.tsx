'use client';
/** Tells screen readers what is selected and where it is, as it changes (aria-live). */
import { memo } from 'react';
import { useShallow } from 'zustand/react/shallow';
import { KINDS } from '@/lib/layout/kinds';
import { formatLength } from '@/lib/layout/units';
import { useEditor } from '../store/EditorStoreContext';
import { openingTitle } from '@/lib/layout/openings';
import type { Bay, Opening } from '@/lib/layout/schema';
import type { LengthUnit } from '@/lib/layout/units';

/** Where a selected opening is, in words: "Window in the left wall selected: 1200 mm along the wall from its front end, …". */
export function openingAnnouncement(bay: Bay, o: Opening, units: LengthUnit): string {
  const f = (v: number) => formatLength(v, units);
  const title = openingTitle(bay, o);
  if (o.type === 'window') {
    const from = o.wall === 'door' ? 'the door’s start edge' : o.wall === 'rear' ? 'the rear wall’s left end' : `the ${o.wall} wall’s front end`;
    return `${title} selected: ${f(o.position)} from ${from}, sill ${f(o.sillHeight)} above the floor, ${f(o.width)} wide by ${f(o.height)} high, ${o.opens ? 'opens' : 'fixed'}.`;
  }
  if (o.type === 'roof-opening') return `${title} selected: ${f(o.x)} from the bulkhead, ${f(o.y)} from the left wall, ${f(o.length)} by ${f(o.width)}.`;
  if (o.wall === 'underside') return `${title} selected: under the floor, ${f(o.position)} from the front, ${f(o.across ?? 0)} from the left side.`;
  return `${title} selected: on the ${o.wall} wall, ${f(o.position)} from its ${o.wall === 'rear' ? 'left' : 'front'} end, ${f(o.height)} above the bare floor.`;
}

export const SelectionAnnouncer = memo(function SelectionAnnouncer({ id }: { id: string }) {
  const { modules, selection, units, arrangement, bay, openingSelection } = useEditor(useShallow((s) => ({ modules: s.doc.modules, selection: s.selection, units: s.units, arrangement: s.arrangement, bay: s.doc.bay, openingSelection: s.openingSelection })));
  const sel = modules.filter((m) => selection.includes(m.id));
  let text = `Showing ${arrangement}. Nothing selected.`;
  if (sel.length === 1) {
    const m = sel[0];
    text = `${m.label || KINDS[m.kind].title} selected: ${formatLength(m.x, units)} from the bulkhead, ${formatLength(m.y, units)} from the left wall, ${formatLength(m.length, units)} by ${formatLength(m.width, units)}.`;
  } else if (sel.length > 1) text = `${sel.length} modules selected.`;
  const opening = sel.length === 0 && openingSelection ? bay.openings.find((o) => o.id === openingSelection) : undefined;
  if (opening) text = openingAnnouncement(bay, opening, units);
  return (
    <p id={id} aria-live="polite" className="sr-only" data-testid="selection-announcer">{text}</p>
  );
});
