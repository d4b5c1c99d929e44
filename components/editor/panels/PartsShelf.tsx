'use client';
/**
 * The Parts shelf: every module kind with its default size, searchable by name and trade words.
 * Drag a part onto the plan to place it there, or press it (mouse or keyboard) to place it in the
 * first free spot. On a tablet (`pickToPlace`) a tap picks the part and the next tap on the plan
 * places it; the keyboard still places at once. Never edits the document except through the store's addModule.
 */
import { memo, useMemo, useState } from 'react';
import { Search, TriangleAlert } from 'lucide-react';
import { toast } from '@/components/ui/toast';
import { formatLength } from '@/lib/layout/units';
import { kindCaution } from '@/lib/layout/cautions';
import type { KindSpec, MaterialFamily } from '@/lib/layout/kinds';
import { matchKinds } from './partsSearch';
import { loadModuleForm } from './loadModuleForm';
import { useEditor, useEditorApi } from '../store/EditorStoreContext';
import { KIND_DRAG_TYPE } from '../canvas/usePlanPointer';
import { setDrawer } from '@/components/ui/drawers';
import { theme } from '../theme';
import { OPENING_PRESETS, OPENING_PRESET_WORDS, type OpeningPreset } from '../store/openingEdits';

const FAMILY_SWATCH: Record<MaterialFamily, string> = {
  timber: `repeating-linear-gradient(135deg, ${theme.inkFaint} 0 1px, transparent 1px 5px)`,
  upholstery: `radial-gradient(${theme.inkSoft} 0.8px, transparent 1px) 0 0 / 5px 5px`,
  water: `linear-gradient(to bottom, transparent 40%, ${theme.inkSoft} 40% 46%, ${theme.paperEdge} 46%)`,
  electrics: 'none',
  gas: 'none',
  appliance: 'none',
  sanitary: 'none',
};

function Swatch({ family }: { family: MaterialFamily }) {
  const border = family === 'electrics' ? 'border-dotted border-2' : family === 'gas' ? 'border-double border-[3px]' : 'border';
  return <span aria-hidden className={`inline-block h-6 w-8 shrink-0 border-ink bg-paper ${border}`} style={{ background: FAMILY_SWATCH[family] }} />;
}

export const PartsShelf = memo(function PartsShelf({ focusPlan, pickToPlace = false }: { focusPlan: () => void; pickToPlace?: boolean }) {
  const api = useEditorApi();
  const units = useEditor((s) => s.units);
  const [query, setQuery] = useState('');
  const kinds = useMemo(() => matchKinds(query), [query]);

  const place = (k: KindSpec) => {
    const r = api.getState().addModule(k.kind);
    if (!r.ok) return void toast.error(r.error);
    toast.success(`${k.title} placed. Arrow keys move it; R rotates.`, { duration: 2500 });
    focusPlan();
  };
  const addOpening = (preset: OpeningPreset) => {
    const r = api.getState().addOpening(preset);
    if (!r.ok) return void toast.error(r.error);
    toast.success(`${OPENING_PRESET_WORDS[preset]} added. Drag it or use the arrow keys to move it; Details has its sizes.`, { duration: 2500 });
    focusPlan();
  };
  /** A tap (not a key press: `detail` 0) on a tablet picks the part; the drawer gets out of the way of the plan. */
  const pick = (k: KindSpec, detail: number) => {
    if (!pickToPlace || detail === 0) return place(k);
    api.getState().setPlacing(k.kind);
    setDrawer(null);
  };

  return (
    <nav aria-label="Parts shelf" className="flex h-full w-full min-w-0 flex-col bg-paper-deep">
      <div className="border-b border-paper-edge p-3">
        <h2 className="mb-2 text-xs font-semibold uppercase tracking-wide text-ink-soft">Parts shelf</h2>
        <label className="flex items-center gap-2 rounded border border-paper-edge bg-paper px-2 py-1.5 focus-within:ring-2 focus-within:ring-copper">
          <Search size={14} aria-hidden className="text-ink-soft" />
          <span className="sr-only">Search parts</span>
          <input
            type="search"
            value={query}
            onChange={(e) => setQuery(e.target.value)}
            placeholder="Search: sink, tank, bed…"
            className="w-full bg-transparent text-sm outline-none placeholder:text-ink-faint"
            data-testid="shelf-search"
          />
        </label>
      </div>
      <ul className="min-h-0 flex-1 overflow-auto p-2" aria-label="Module kinds">
        {kinds.map((k) => (
          <li key={k.kind}>
            <button
              type="button"
              draggable
              onDragStart={(e) => {
                e.dataTransfer.setData(KIND_DRAG_TYPE, k.kind);
                e.dataTransfer.setData('text/plain', k.title);
                e.dataTransfer.effectAllowed = 'copy';
              }}
              onClick={(e) => pick(k, e.detail)}
              onPointerDown={() => void loadModuleForm().catch(() => undefined)} // the Details panel loads it again, and says so, if this fails
              data-kind={k.kind}
              aria-label={`Place ${k.title}, ${formatLength(k.length, units)} by ${formatLength(k.width, units)}`}
              aria-describedby={kindCaution(k.kind) ? `shelf-caution-${k.kind}` : undefined}
              className="flex w-full cursor-grab items-center gap-2 rounded px-2 py-1.5 text-left hover:bg-paper focus-visible:outline-2 focus-visible:outline-copper active:cursor-grabbing"
            >
              <Swatch family={k.family} />
              <span className="min-w-0">
                <span className="block truncate text-sm text-ink">{k.title}</span>
                <span className="block font-mono text-[11px] text-ink-soft">
                  {formatLength(k.length, units)} × {formatLength(k.width, units)}
                </span>
                {kindCaution(k.kind) && (
                  <span id={`shelf-caution-${k.kind}`} className="mt-0.5 flex items-start gap-1 text-[11px] leading-tight text-ochre" data-testid="shelf-caution">
                    <TriangleAlert size={11} className="mt-px shrink-0" aria-hidden="true" />
                    <span className="text-ink-soft">{kindCaution(k.kind)!.brief}</span>
                  </span>
                )}
              </span>
            </button>
          </li>
        ))}
        {kinds.length === 0 && <li className="px-2 py-4 text-sm text-ink-soft">No part matches “{query}”.</li>}
      </ul>
      <section aria-labelledby="shelf-openings" className="border-t border-paper-edge p-2" data-testid="shelf-openings">
        <h3 id="shelf-openings" className="mb-1 px-1 text-xs font-semibold uppercase tracking-wide text-ink-soft">Openings</h3>
        <ul className="grid grid-cols-2 gap-1" aria-labelledby="shelf-openings">
          {OPENING_PRESETS.map((p) => (
            <li key={p}>
              <button
                type="button"
                onClick={() => addOpening(p)}
                data-opening-preset={p}
                aria-label={`Add ${OPENING_PRESET_WORDS[p].toLowerCase()}`}
                className="w-full truncate rounded border border-paper-edge bg-paper px-2 py-1 text-left text-xs text-ink hover:bg-paper-light focus-visible:outline-2 focus-visible:outline-copper"
              >
                {OPENING_PRESET_WORDS[p]}
              </button>
            </li>
          ))}
        </ul>
      </section>
    </nav>
  );
});
