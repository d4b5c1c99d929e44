'use client';
/**
 * The Details panel: the selected module's form (loaded on first selection), a summary with the
 * shared commands for a multi-selection, or a hint when nothing is selected; a caution above the
 * form for kinds whose fitting can hurt someone (gas, 230 V, heating, travel seats). View-only viewers
 * see the same values, disabled. Never writes the document except through store actions.
 */
import { memo, lazy, Suspense, useDeferredValue, useMemo } from 'react';
import { useShallow } from 'zustand/react/shallow';
import { KINDS } from '@/lib/layout/kinds';
import { formatLength } from '@/lib/layout/units';
import { kindCaution } from '@/lib/layout/cautions';
import { CautionNote } from '@/components/ui/CautionNote';
import { useEditor } from '../store/EditorStoreContext';
import { CommandButton } from './CommandButton';
import { OpeningForm } from './OpeningForm';
import { loadModuleForm } from './loadModuleForm';

const ModuleForm = lazy(loadModuleForm);

export const DetailsPanel = memo(function DetailsPanel() {
  const live = useEditor(useShallow((s) => ({ selection: s.selection, modules: s.doc.modules })));
  const { units, readOnly } = useEditor(useShallow((s) => ({ units: s.units, readOnly: s.readOnly })));
  // The form follows the selection at low priority, so selecting and starting a drag stays smooth.
  // Until it has caught up, the form still on screen is the last selection's: it takes no input,
  // so nothing typed in that moment lands on a module that is no longer selected.
  const { selection, modules } = useDeferredValue(live);
  const behind = selection !== live.selection;
  const selected = useMemo(() => modules.filter((m) => selection.includes(m.id)), [modules, selection]);
  const opening = useEditor((s) => (s.openingSelection ? s.doc.bay.openings.find((o) => o.id === s.openingSelection) : undefined));
  if (selected.length === 0 && opening) return <OpeningForm key={opening.id} opening={opening} />;
  if (selected.length === 0) {
    return (
      <div className="p-4 text-sm text-ink-soft">
        <p>Nothing selected.</p>
        <p className="mt-2">Click a module or an opening on the plan, or press <kbd className="font-mono">]</kbd> to select a module with the keyboard.</p>
      </div>
    );
  }
  if (selected.length > 1) {
    const mass = selected.reduce((s, m) => s + (m.massKg ?? 0), 0);
    return (
      <div className="space-y-3 p-4 text-sm">
        <p className="font-medium">{selected.length} modules selected</p>
        <p className="text-ink-soft">Total mass <span className="font-mono">{Math.round(mass * 10) / 10} kg</span></p>
        {!readOnly && (
          <div className="flex flex-wrap gap-2">
            <CommandButton id="edit.rotate" withLabel />
            <CommandButton id="edit.duplicate" withLabel />
            <CommandButton id="edit.delete" withLabel />
          </div>
        )}
        <ul className="divide-y divide-paper-edge">
          {selected.map((m) => (
            <li key={m.id} className="py-1">{m.label || KINDS[m.kind].title} <span className="font-mono text-xs text-ink-soft">{formatLength(m.length, units)} × {formatLength(m.width, units)}</span></li>
          ))}
        </ul>
      </div>
    );
  }
  const caution = kindCaution(selected[0].kind);
  return (
    <>
      {caution && (
        <div className="px-4 pt-3"><CautionNote title={caution.title} compact testId="details-caution">{caution.text}</CautionNote></div>
      )}
      <Suspense fallback={<p className="p-4 text-sm text-ink-soft">Opening the details…</p>}>
        <div inert={behind} aria-busy={behind}>
          <ModuleForm key={selected[0].id} module={selected[0]} />
        </div>
      </Suspense>
    </>
  );
});

