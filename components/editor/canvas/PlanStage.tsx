'use client';
/**
 * The plan: composes the layers (drawing: sheet and modules; overlay: selection, mark-ups and
 * rulers; drag) in one Konva stage sized
 * to its box, and wires pointer input. It only composes; drawing lives in the layers and input in
 * usePlanPointer. Must never draw anything itself.
 */
import { useCallback, useEffect, useLayoutEffect, useMemo, useRef, useState } from 'react';
import { Layer, Stage } from './konva';
import { worldLayerProps } from './worldTransform';
import { useShallow } from 'zustand/react/shallow';
import { useEditor, useEditorApi } from '../store/EditorStoreContext';
import { SheetLayer } from './SheetLayer';
import { ModulesLayer } from './ModulesLayer';
import { OverlayLayer } from './OverlayLayer';
import { DragLayer } from './DragLayer';
import { Rulers } from './Rulers';
import { OpeningsShape } from './OpeningsShape';
import { openingMarks } from '../geometry/openingMarks';
import { OpeningsList } from './OpeningsList';
import { usePlanPointer } from './usePlanPointer';
import { useCanvasFonts } from './useCanvasFonts';
import type { EditorExtensions } from '../types';
import type Konva from 'konva';

const WILL_MOVE = { willChange: 'transform' } as const;

export function PlanStage({ failing, onContextMenu, describedBy, overlay, underlay }: { failing: string[]; onContextMenu: (x: number, y: number) => void; describedBy?: string; overlay?: EditorExtensions['planOverlay']; underlay?: EditorExtensions['planUnderlay'] }) {
  const api = useEditorApi();
  const box = useRef<HTMLDivElement>(null);
  const stage = useRef<Konva.Stage>(null);
  const [size, setSize] = useState<{ w: number; h: number } | null>(null);
  const { fonts, ready } = useCanvasFonts();
  const s = useEditor(
    useShallow((st) => ({
      doc: st.doc,
      arrangement: st.arrangement,
      phantom: st.phantom,
      selection: st.selection,
      highlight: st.highlight,
      viewport: st.viewport,
      units: st.units,
      readOnly: st.readOnly,
      gestureKind: st.gesture?.kind ?? null,
      openingSelection: st.openingSelection,
      openingHighlight: st.openingHighlight,
      openingPreview: st.gesture?.kind === 'opening' ? st.gesture.preview : null,
    })),
  );

  const measured = useCallback((width: number, height: number) => {
    const w = Math.max(50, Math.floor(width));
    const h = Math.max(50, Math.floor(height));
    setSize((was) => (was && was.w === w && was.h === h ? was : { w, h }));
    api.getState().resizeViewport(w, h);
  }, [api]);
  // The first size is read before the first paint, so the plan is drawn in the editor's first
  // frame rather than one frame (and one more render) later, when the observer first reports.
  useLayoutEffect(() => {
    const el = box.current;
    if (!el) return;
    const r = el.getBoundingClientRect();
    measured(r.width, r.height);
  }, [measured]);
  useEffect(() => {
    const el = box.current;
    if (!el) return;
    const ro = new ResizeObserver(([entry]) => measured(entry.contentRect.width, entry.contentRect.height));
    ro.observe(el);
    return () => ro.disconnect();
  }, [measured]);

  const menu = useCallback((x: number, y: number) => onContextMenu(x, y), [onContextMenu]);
  usePlanPointer(box, api, menu, stage);

  const moving = s.gestureKind === 'move' || s.gestureKind === 'resize';
  // The openings at this zoom: drawn by OpeningsShape, kept clear of by the module labels.
  const { bay, buildUp } = s.doc;
  const scale = s.viewport.scale;
  const marks = useMemo(() => openingMarks({ bay, buildUp }, 1 / scale), [bay, buildUp, scale]);
  // What the overlay's layer draws over its own shape, made again only when it changes (the layer is redrawn when its children are).
  const { viewport, arrangement, units } = s;
  const overOverlay = useMemo(
    () => (
      <>
        {overlay?.({ viewport, arrangement })}
        <Rulers viewport={viewport} units={units} fonts={fonts} />
      </>
    ),
    [overlay, viewport, arrangement, units, fonts],
  );
  return (
    <div
      ref={box}
      tabIndex={0}
      role="application"
      aria-label="Plan of the bay, cab on the left. Press ] or [ to select a module, arrow keys to move it (Shift for 10 mm), R to rotate, ? for all shortcuts. Tab reaches the list of openings; a selected window or body point moves along its wall."
      aria-describedby={describedBy}
      data-testid="plan"
      data-scale={s.viewport.scale}
      data-origin={`${Math.round(s.viewport.originX)},${Math.round(s.viewport.originY)}`}
      className="relative h-full w-full overflow-hidden bg-paper outline-none focus-visible:ring-2 focus-visible:ring-copper focus-visible:ring-inset touch-none select-none"
    >
      {size && (
        // Its own compositing layer from the start, so the first pan or zoom step (a CSS transform,
        // viewPreview.ts) moves a picture the browser already holds.
        <Stage ref={stage} width={size.w} height={size.h} style={WILL_MOVE}>
          {underlay?.({ viewport: s.viewport, arrangement: s.arrangement })}
          {/* The sheet and the modules share one layer: Konva advises at most 3–5 layers per stage. */}
          <Layer {...worldLayerProps(s.viewport)} listening={false} name="drawing">
            <SheetLayer bay={s.doc.bay} buildUp={s.doc.buildUp} viewport={s.viewport} units={s.units} fonts={fonts} />
            <ModulesLayer modules={s.doc.modules} arrangement={s.arrangement} phantom={s.phantom} viewport={s.viewport} fonts={fonts} fontsReady={ready} units={s.units} bay={bay} openings={marks} />
            <OpeningsShape marks={marks} scale={s.viewport.scale} fonts={fonts} dragging={s.openingPreview?.opening.id ?? null} />
          </Layer>
          {/* Three canvases in all, four while a photo is traced (Chromium copies every canvas of the plan at each compositor commit):
              the overlay's layer also holds the mark-ups and the rulers, over everything but a drag. */}
          <OverlayLayer doc={s.doc} arrangement={s.arrangement} selection={s.selection} highlight={s.highlight} failing={failing} viewport={s.viewport} units={s.units} fonts={fonts} showHandles={!s.readOnly} hidden={moving} openingSelection={s.openingSelection} openingHighlight={s.openingHighlight} openingPreview={s.openingPreview}>
            {overOverlay}
          </OverlayLayer>
          <DragLayer viewport={s.viewport} units={s.units} fonts={fonts} />
        </Stage>
      )}
      <OpeningsList doc={s.doc} viewport={s.viewport} selected={s.openingSelection} />
    </div>
  );
}
