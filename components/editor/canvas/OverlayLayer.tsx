'use client';
/**
 * What sits over the modules: outlines of modules that fail a check (brick, with a hatch-free
 * double line so colour is not the only cue), modules a clicked finding names, the selection with
 * its resize handles, and the selected module's size and gaps. Never listens for events; draws
 * nothing while a move or resize is in progress (the drag layer shows the live state). The layer
 * itself stays shown, as every layer of the plan does (see DragLayer.tsx). Its children (the
 * mark-ups and the rulers) share its canvas.
 */
import { memo, type ReactNode } from 'react';
import { Layer, Shape } from './konva';
import type Konva from 'konva';
import type { Arrangement, LayoutDoc, LengthUnit } from '@/lib/layout';
import type { Viewport } from '../geometry/viewport';
import { HANDLES } from '../geometry/snapping';
import { handlePoint } from '../geometry/hitTest';
import { moduleDimensions } from '../geometry/dimensions';
import { drawDimension } from './dimensionDrawing';
import { theme } from '../theme';
import { worldLayerProps } from './worldTransform';
import type { CanvasFonts } from './useCanvasFonts';
import { modulesIn } from '@/lib/layout/bay';
import type { Opening } from '@/lib/layout/schema';
import type { SnapGuide } from '../geometry/snapping';
import { openingMarks } from '../geometry/openingMarks';
import { drawOpeningMarks, drawOpeningSelection } from './openingsDrawing';

export const HANDLE_PX = 8;

interface Props {
  doc: LayoutDoc;
  arrangement: Arrangement;
  selection: string[];
  highlight: string[];
  failing: string[];
  viewport: Viewport;
  units: LengthUnit;
  fonts: CanvasFonts;
  showHandles: boolean;
  hidden: boolean;
  /** The selected opening, the openings a clicked finding names, and an opening being dragged. */
  openingSelection?: string | null;
  openingHighlight?: string[];
  openingPreview?: { opening: Opening; guides: SnapGuide[] } | null;
  /** Drawn over it in the same layer (so the plan keeps to three canvases): mark-ups, then the rulers. */
  children?: ReactNode;
}

export const OverlayLayer = memo(function OverlayLayer(p: Props) {
  const scale = p.viewport.scale;
  const px = 1 / scale;
  const inView = modulesIn(p.doc, p.arrangement);
  const byId = new Map(inView.map((m) => [m.id, m]));
  const failing = p.failing.map((id) => byId.get(id)).filter((m) => m !== undefined);
  const highlighted = p.highlight.map((id) => byId.get(id)).filter((m) => m !== undefined);
  const selected = p.selection.map((id) => byId.get(id)).filter((m) => m !== undefined);
  const single = selected.length === 1 ? selected[0] : undefined;

  const draw = (c: Konva.Context) => {
    const ctx = c._context;
    ctx.save();
    // Failing modules: a brick outline set just outside the module, plus a small cross mark.
    ctx.strokeStyle = theme.brick;
    ctx.lineWidth = 2 * px;
    for (const m of failing) {
      ctx.strokeRect(m.x - 2 * px, m.y - 2 * px, m.length + 4 * px, m.width + 4 * px);
      ctx.beginPath();
      const s = 4 * px;
      ctx.moveTo(m.x + m.length - 3 * s, m.y + s); ctx.lineTo(m.x + m.length - s, m.y + 3 * s);
      ctx.moveTo(m.x + m.length - s, m.y + s); ctx.lineTo(m.x + m.length - 3 * s, m.y + 3 * s);
      ctx.stroke();
    }
    // Modules named by the finding in focus: a wide, soft copper halo.
    ctx.strokeStyle = 'rgba(164,82,42,0.35)';
    ctx.lineWidth = 8 * px;
    for (const m of highlighted) ctx.strokeRect(m.x - 4 * px, m.y - 4 * px, m.length + 8 * px, m.width + 8 * px);
    // Selection.
    ctx.strokeStyle = theme.copper;
    ctx.lineWidth = 1.5 * px;
    for (const m of selected) ctx.strokeRect(m.x, m.y, m.length, m.width);
    if (single && p.showHandles) {
      const h = HANDLE_PX * px;
      ctx.fillStyle = theme.paper;
      ctx.lineWidth = 1.25 * px;
      for (const id of HANDLES) {
        const pt = handlePoint(single, id);
        ctx.fillRect(pt.x - h / 2, pt.y - h / 2, h, h);
        ctx.strokeRect(pt.x - h / 2, pt.y - h / 2, h, h);
      }
    }
    ctx.restore();
    // Openings: the finding halo, the dragged one where it is going (with its snap guide), the selection.
    if (p.openingSelection || p.openingHighlight?.length || p.openingPreview) {
      const preview = p.openingPreview?.opening;
      const doc = preview ? { ...p.doc, bay: { ...p.doc.bay, openings: p.doc.bay.openings.map((o) => (o.id === preview.id ? preview : o)) } } : p.doc;
      const marks = openingMarks(doc, px);
      for (const m of marks) if (p.openingHighlight?.includes(m.id)) drawOpeningSelection(ctx, m, px, 'halo');
      if (preview) {
        drawOpeningMarks(ctx, marks.filter((m) => m.id === preview.id), px, p.fonts);
        ctx.save();
        ctx.strokeStyle = theme.copper;
        ctx.lineWidth = 1 * px;
        ctx.setLineDash([4 * px, 3 * px]);
        ctx.beginPath();
        for (const g of p.openingPreview!.guides) {
          if (g.axis === 'x') { ctx.moveTo(g.at, g.from); ctx.lineTo(g.at, g.to); } else { ctx.moveTo(g.from, g.at); ctx.lineTo(g.to, g.at); }
        }
        ctx.stroke();
        ctx.restore();
      }
      const sel = marks.find((m) => m.id === (preview?.id ?? p.openingSelection));
      if (sel) drawOpeningSelection(ctx, sel, px, 'selected');
    }
    if (single) {
      for (const d of moduleDimensions(p.doc, single, p.arrangement)) {
        const offset = d.role === 'size' ? -14 : 0;
        drawDimension(ctx, d, scale, p.units, d.role === 'size' ? theme.copperDark : theme.inkSoft, p.fonts, offset);
      }
    }
  };

  return (
    <Layer {...worldLayerProps(p.viewport)} listening={false} name="overlay">
      <Shape sceneFunc={draw} listening={false} visible={!p.hidden} />
      {p.children}
    </Layer>
  );
});
