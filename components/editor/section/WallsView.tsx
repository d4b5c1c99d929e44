'use client';
/**
 * The wall elevations (left, right, rear, bulkhead, each seen from the room) or the roof plan, on
 * screen beside the side section: the very drawing model the plan sheet prints
 * (lib/sheet/elevation-figure.ts, roof-figure.ts), written as SVG by the sheet's own SVG writer
 * and scaled to the panel. It follows the editor store live — openings, modules and the
 * arrangement on show (the elevations draw that arrangement's modules). A drawing, not a check;
 * never edits the document.
 */
import { memo, useEffect, useId, useMemo, useRef, useState } from 'react';
import { useShallow } from 'zustand/react/shallow';
import { useEditor } from '../store/EditorStoreContext';
import { drawElevation, ELEVATION_TITLE, ELEVATION_WALLS, elevationSize, type ElevationWall } from '@/lib/sheet/elevation-figure';
import { drawRoof, roofModules, roofSize, ROOF_TITLE } from '@/lib/sheet/roof-figure';
import { sheetPageSvg } from '@/lib/sheet/render-svg';
import { roofOpenings } from '@/lib/layout/openings';
import type { SheetItem } from '@/lib/sheet/primitives';

/**
 * The figures are drawn as at 1:50 in paper mm, then scaled to fit the panel: still true to scale
 * within each drawing and between them, but with the type (set in points for print) large beside
 * the walls, so it reads at the panel's size (at 1:20 a panel 300 px high would set it at ~5 px).
 */
const MODEL_SCALE = 50;
/** Screen px per paper mm: never so small it cannot be read (the row then scrolls), never larger than this. */
const MIN_PX_PER_MM = 3;
const MAX_PX_PER_MM = 8;

interface Figure {
  key: string;
  title: string;
  width: number;
  height: number;
  items: SheetItem[];
}

export const WallsView = memo(function WallsView({ view }: { view: 'walls' | 'roof' }) {
  const { doc, arrangement, units } = useEditor(useShallow((s) => ({ doc: s.doc, arrangement: s.arrangement, units: s.units })));
  const box = useRef<HTMLDivElement>(null);
  const [height, setHeight] = useState(260);
  const prefix = useId().replace(/[^A-Za-z0-9]/g, '');
  useEffect(() => {
    const el = box.current;
    if (!el) return;
    const ro = new ResizeObserver(([e]) => setHeight(Math.max(120, e.contentRect.height)));
    ro.observe(el);
    return () => ro.disconnect();
  }, []);

  const figures = useMemo<Figure[]>(() => {
    if (view === 'roof') return [{ key: 'roof', title: ROOF_TITLE, ...roofSize(doc, MODEL_SCALE), items: drawRoof(doc, 0, 0, MODEL_SCALE, units, true) }];
    return ELEVATION_WALLS.map((wall: ElevationWall) => ({
      key: wall,
      title: ELEVATION_TITLE[wall],
      ...elevationSize(doc, wall, MODEL_SCALE),
      items: drawElevation(doc, wall, 0, 0, MODEL_SCALE, units, { arrangement, noScale: true }),
    }));
  }, [doc, arrangement, units, view]);

  // One scale for every figure in the row, so the walls compare true to each other.
  const tallest = Math.max(...figures.map((f) => f.height));
  const k = Math.min(MAX_PX_PER_MM, Math.max(MIN_PX_PER_MM, (height - 16) / tallest));
  const nothingOnRoof = view === 'roof' && roofOpenings(doc.bay).length === 0 && roofModules(doc).length === 0;

  return (
    <div className="flex h-full flex-col text-sm">
      <div className="flex items-center gap-3 overflow-hidden whitespace-nowrap border-b border-paper-edge px-4 py-1 text-xs text-ink-soft">
        {view === 'walls' ? (
          <span>Each wall seen from inside, with the modules within 100 mm of it ({arrangement}); heights from the finished floor</span>
        ) : (
          <span>From above, front to the left; distances from the front and the left side</span>
        )}
        {nothingOnRoof && <span className="text-ink">Nothing on the roof yet: roof openings and modules mounted on the roof show here.</span>}
      </div>
      <div ref={box} className="min-h-0 flex-1 overflow-auto" data-testid={view === 'walls' ? 'walls-box' : 'roof-box'}>
        <div className="flex items-start gap-4 p-2">
          {figures.map((f, i) => (
            <svg
              key={f.key}
              role="img"
              aria-label={f.title}
              data-testid={view === 'walls' ? `elevation-${f.key}` : 'roof-plan'}
              width={Math.round(f.width * k)}
              height={Math.round(f.height * k)}
              viewBox={`0 0 ${f.width} ${f.height}`}
              className="shrink-0 bg-white"
              strokeLinecap="butt"
              style={{ fontFamily: 'var(--font-text), sans-serif', fontKerning: 'none', fontVariantLigatures: 'none' }}
              dangerouslySetInnerHTML={{ __html: sheetPageSvg({ width: f.width, height: f.height, items: f.items }, `${prefix}f${i}-`) }}
            />
          ))}
        </div>
      </div>
    </div>
  );
});
