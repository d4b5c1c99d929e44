/**
 * Draws the openings' plan marks (geometry/openingMarks.ts) on a context already in mm: windows
 * as the drafting window symbol across the wall (the heavy bare-metal line is cleared under the
 * glass), roof openings as long-dashed rectangles overhead with a cross and their word, body points
 * as small circles outside the wall line. Also the selection and the finding halo of one mark.
 * Colours from the palette only. Never reads the store.
 */
import { withAlpha } from '@/lib/look';
import { theme, canvasFonts } from '../theme';
import { MARK_WORD_PX, markBox, markWord, POINT_RADIUS_PX, ROOF_OPENING_DASH_PX, type OpeningMark, type Segment } from '../geometry/openingMarks';

type Ctx = CanvasRenderingContext2D;

function seg(ctx: Ctx, s: Segment) {
  ctx.moveTo(s.x0, s.y0);
  ctx.lineTo(s.x1, s.y1);
}

export function drawOpeningMarks(ctx: Ctx, marks: OpeningMark[], px: number, fonts = canvasFonts, faint = false): void {
  ctx.save();
  if (faint) ctx.globalAlpha = 0.35;
  ctx.lineCap = 'butt';
  for (const m of marks) {
    if (m.type === 'window') {
      const r = m.rect;
      // Clear the wall under the glass (the bare line is 3 px wide on its face), then the symbol.
      ctx.fillStyle = theme.paper;
      const grow = 2 * px;
      if (m.wall === 'rear') ctx.fillRect(r.x0, r.y0, r.x1 - r.x0 + grow, r.y1 - r.y0);
      else if (m.wall === 'left') ctx.fillRect(r.x0, r.y0 - grow, r.x1 - r.x0, r.y1 - r.y0 + grow);
      else ctx.fillRect(r.x0, r.y0, r.x1 - r.x0, r.y1 - r.y0 + grow);
      ctx.beginPath();
      seg(ctx, m.jambs[0]);
      seg(ctx, m.jambs[1]);
      ctx.strokeStyle = theme.ink;
      ctx.lineWidth = 1.5 * px;
      ctx.stroke();
      ctx.beginPath();
      seg(ctx, m.panes[0]);
      seg(ctx, m.panes[1]);
      ctx.lineWidth = 0.75 * px;
      ctx.stroke();
      if (m.opens) {
        // An opening window: a short tick from the middle of the glass into the room.
        const mx = (r.x0 + r.x1) / 2, my = (r.y0 + r.y1) / 2;
        const d = 5 * px;
        ctx.beginPath();
        if (m.wall === 'rear') { ctx.moveTo(r.x0, my); ctx.lineTo(r.x0 - d, my); }
        else if (m.wall === 'left') { ctx.moveTo(mx, r.y1); ctx.lineTo(mx, r.y1 + d); }
        else { ctx.moveTo(mx, r.y0); ctx.lineTo(mx, r.y0 - d); }
        ctx.lineWidth = 1 * px;
        ctx.stroke();
      }
    } else if (m.type === 'roof-opening') {
      const r = m.rect;
      ctx.beginPath();
      ctx.rect(r.x0, r.y0, r.x1 - r.x0, r.y1 - r.y0);
      seg(ctx, m.cross[0]);
      seg(ctx, m.cross[1]);
      ctx.setLineDash(ROOF_OPENING_DASH_PX.map((v) => v * px));
      ctx.strokeStyle = theme.inkSoft;
      ctx.lineWidth = 1 * px;
      ctx.stroke();
      ctx.setLineDash([]);
      label(ctx, markWord(m, px)!, px, fonts);
    } else {
      const rad = POINT_RADIUS_PX * px;
      ctx.beginPath();
      if (!m.underside) seg(ctx, { x0: m.foot.x, y0: m.foot.y, x1: m.at.x, y1: m.at.y });
      ctx.strokeStyle = theme.ink;
      ctx.lineWidth = 1 * px;
      ctx.stroke();
      ctx.beginPath();
      ctx.arc(m.at.x, m.at.y, rad, 0, Math.PI * 2);
      ctx.fillStyle = theme.paper;
      ctx.fill();
      ctx.stroke();
      if (m.underside) {
        // Under the floor: a circle with a cross, the plan's sign for something below.
        const k = rad * Math.SQRT1_2;
        ctx.beginPath();
        ctx.moveTo(m.at.x - k, m.at.y - k); ctx.lineTo(m.at.x + k, m.at.y + k);
        ctx.moveTo(m.at.x - k, m.at.y + k); ctx.lineTo(m.at.x + k, m.at.y - k);
        ctx.stroke();
      } else {
        ctx.beginPath();
        ctx.arc(m.at.x, m.at.y, rad * 0.35, 0, Math.PI * 2);
        ctx.fillStyle = theme.ink;
        ctx.fill();
      }
      label(ctx, markWord(m, px)!, px, fonts);
    }
  }
  ctx.restore();
}

/** The selected opening: a copper outline round its mark; `halo` for one a clicked finding names. */
export function drawOpeningSelection(ctx: Ctx, m: OpeningMark, px: number, style: 'selected' | 'halo'): void {
  const b = markBox(m, px);
  const pad = (style === 'halo' ? 5 : 3) * px;
  ctx.save();
  ctx.strokeStyle = style === 'halo' ? withAlpha(theme.copper, 0.35) : theme.copper;
  ctx.lineWidth = (style === 'halo' ? 8 : 1.5) * px;
  ctx.strokeRect(b.x0 - pad, b.y0 - pad, b.x1 - b.x0 + 2 * pad, b.y1 - b.y0 + 2 * pad);
  ctx.restore();
}

/** A mark's word where `markWord` puts it (module labels keep clear of that spot: markTextBoxes). */
function label(ctx: Ctx, { text, x, y }: { text: string; x: number; y: number }, px: number, fonts: typeof canvasFonts) {
  ctx.save();
  ctx.font = `${MARK_WORD_PX * px}px ${fonts.text}`;
  ctx.textAlign = 'center';
  ctx.textBaseline = 'middle';
  ctx.fillStyle = theme.inkSoft;
  ctx.fillText(text, x, y);
  ctx.restore();
}
