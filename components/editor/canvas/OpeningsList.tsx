'use client';
/**
 * The openings drawn on the plan, as a list for the keyboard and screen readers: one button per
 * opening, hidden until it has the focus (then shown over the plan's corner), that selects it, as a
 * click on its mark does. Each carries where its mark is on screen (`data-x`, `data-y`, CSS px from
 * the plan's top-left), so a browser test can click the drawing itself.
 */
import { memo, useMemo } from 'react';
import type { LayoutDoc } from '@/lib/layout';
import { openingName } from '@/lib/layout/openings';
import { useEditorApi } from '../store/EditorStoreContext';
import { openingMarks, markHitPoint } from '../geometry/openingMarks';
import { toScreenX, toScreenY, type Viewport } from '../geometry/viewport';

export const OpeningsList = memo(function OpeningsList({ doc, viewport, selected }: { doc: LayoutDoc; viewport: Viewport; selected: string | null }) {
  const api = useEditorApi();
  const px = 1 / viewport.scale;
  const marks = useMemo(() => openingMarks(doc, px), [doc, px]);
  if (marks.length === 0) return null;
  return (
    <ul aria-label="Openings on the plan" data-testid="plan-openings" className="absolute left-2 top-2 m-0 list-none p-0">
      {marks.map((m) => {
        const o = doc.bay.openings.find((p) => p.id === m.id)!;
        const at = markHitPoint(m);
        return (
          <li key={m.id} data-opening-id={m.id} data-opening-type={m.type} data-opening-kind={o.type === 'window' ? 'window' : o.kind} data-x={Math.round(toScreenX(viewport, at.x))} data-y={Math.round(toScreenY(viewport, at.y))} data-selected={selected === m.id ? 'true' : 'false'}>
            <button
              type="button"
              onClick={() => api.getState().selectOpening(m.id)}
              aria-pressed={selected === m.id}
              className="sr-only rounded bg-paper px-2 py-1 text-xs text-ink shadow focus:not-sr-only focus:outline-2 focus:outline-copper"
            >
              Select {openingName(doc.bay, o)}
            </button>
          </li>
        );
      })}
    </ul>
  );
});
