'use client';
/** Tells screen readers what is selected and where it is, as it changes (aria-live). */
import { useShallow } from 'zustand/react/shallow';
import { KINDS } from '@/lib/layout/kinds';
import { formatLength } from '@/lib/layout/units';
import { useEditor } from '../store/EditorStoreContext';

export function SelectionAnnouncer({ id }: { id: string }) {
  const { modules, selection, units, arrangement } = useEditor(useShallow((s) => ({ modules: s.doc.modules, selection: s.selection, units: s.units, arrangement: s.arrangement })));
  const sel = modules.filter((m) => selection.includes(m.id));
  let text = `Showing ${arrangement}. Nothing selected.`;
  if (sel.length === 1) {
    const m = sel[0];
    text = `${m.label || KINDS[m.kind].title} selected: ${formatLength(m.x, units)} from the bulkhead, ${formatLength(m.y, units)} from the left wall, ${formatLength(m.length, units)} by ${formatLength(m.width, units)}.`;
  } else if (sel.length > 1) text = `${sel.length} modules selected.`;
  return (
    <p id={id} aria-live="polite" className="sr-only" data-testid="selection-announcer">{text}</p>
  );
}
