'use client';
/**
 * The arrangement switch (travel / lounge / sleep) and the phantom option: another arrangement
 * drawn in phantom lines (thin, dashed — the drafting line for an alternate position) over this one. Switching is a view change: instant, never in undo.
 */
import { useShallow } from 'zustand/react/shallow';
import type { Arrangement } from '@/lib/layout/schema';
import { ARRANGEMENTS } from '@/lib/layout/vocabulary';
import { useEditor, useEditorApi } from '../store/EditorStoreContext';

const WORDS: Record<Arrangement, string> = { travel: 'Travel', lounge: 'Lounge', sleep: 'Sleep' };

/** The three arrangements; `withPhantom` adds the phantom choice beside them (the tablet toolbar keeps it in its menu). */
export function ArrangementSwitch({ withPhantom = true }: { withPhantom?: boolean }) {
  const api = useEditorApi();
  const arrangement = useEditor((s) => s.arrangement);
  return (
    <div className="flex items-center gap-3">
      <div role="radiogroup" aria-label="Arrangement" className="flex overflow-hidden rounded border border-ink-faint">
        {ARRANGEMENTS.map((a) => (
          <button
            key={a}
            type="button"
            role="radio"
            aria-checked={arrangement === a}
            data-testid={`arrangement-${a}`}
            onClick={() => api.getState().setArrangement(a)}
            className={`px-3 py-1 text-sm ${arrangement === a ? 'bg-ink text-paper' : 'bg-paper text-ink hover:bg-paper-deep'}`}
          >
            {WORDS[a]}
          </button>
        ))}
      </div>
      {withPhantom && <PhantomSelect />}
    </div>
  );
}

export function PhantomSelect() {
  const api = useEditorApi();
  const { arrangement, phantom } = useEditor(useShallow((s) => ({ arrangement: s.arrangement, phantom: s.phantom })));
  return (
    <label className="flex items-center gap-1.5 text-sm text-ink-soft">
      Phantom
      <select
        value={phantom ?? ''}
        onChange={(e) => api.getState().setPhantom((e.target.value || null) as Arrangement | null)}
        className="rounded border border-paper-edge bg-paper px-1 py-0.5 text-sm"
        aria-label="Show another arrangement in phantom lines"
      >
        <option value="">none</option>
        {ARRANGEMENTS.filter((a) => a !== arrangement).map((a) => <option key={a} value={a}>{a}</option>)}
      </select>
    </label>
  );
}
