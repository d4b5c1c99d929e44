/**
 * The bay's openings on the sheet's plans (every arrangement alike: openings are part of the bay):
 * a window as the usual plan symbol on its wall line — the wall's two faces and the glass between,
 * closed by the jambs, over the bare-metal line (a window in a door sits in the door's gap the same
 * way); a roof opening dashed overhead with crossed diagonals; a body point as a small mark — a
 * diamond just outside its wall, a ringed cross where it lies under the floor.
 * Pure: a document in, sheet items in paper mm out; must never render.
 */
import type { LayoutDoc } from '../layout';
import { buildUpThickness } from '../layout/bay';
import { bodyPoints, roofOpenings, wallRectInPlan, windowOnWall, windows } from '../layout/openings';
import { LINE } from './drafting';
import type { SheetItem } from './primitives';

/** Least depth a window symbol is drawn across its wall, paper mm: with no wall build-up it still reads as a window. */
const WINDOW_MIN_DEPTH = 1.2;

export function planOpeningItems(doc: LayoutDoc, bx: number, by: number, s: (mm: number) => number): SheetItem[] {
  const { bay } = doc;
  const { floorT, wallT } = buildUpThickness(doc);
  const items: SheetItem[] = [];
  const P = (x: number, y: number): [number, number] => [bx + s(x), by + s(y)];

  for (const o of windows(bay)) {
    const r = windowOnWall(bay, floorT, o);
    if (!r) continue;
    // The strip of the wall the window takes, at least WINDOW_MIN_DEPTH on paper.
    const depthMm = Math.max(wallT, WINDOW_MIN_DEPTH / s(1));
    const rect = wallRectInPlan(bay, r, depthMm);
    const [x0, y0] = P(rect.x0, rect.y0);
    const [x1, y1] = P(rect.x1, rect.y1);
    const alongX = r.wall !== 'rear';
    // Over the heavy bare-metal line: a white ground a little wider than the strip.
    const pad = LINE.heavy;
    items.push(alongX
      ? { type: 'rect', x: x0, y: y0 - pad, w: x1 - x0, h: y1 - y0 + 2 * pad, fill: 'white', tag: `plan:window:${o.id}` }
      : { type: 'rect', x: x0 - pad, y: y0, w: x1 - x0 + 2 * pad, h: y1 - y0, fill: 'white', tag: `plan:window:${o.id}` });
    const line = (ax: number, ay: number, cx: number, cy: number, width: number = LINE.thin) => items.push({ type: 'line', x1: ax, y1: ay, x2: cx, y2: cy, width, ink: 'ink' });
    if (alongX) {
      line(x0, y0, x1, y0);
      line(x0, y1, x1, y1);
      line(x0, (y0 + y1) / 2, x1, (y0 + y1) / 2, LINE.hair);
      line(x0, y0, x0, y1, LINE.medium);
      line(x1, y0, x1, y1, LINE.medium);
    } else {
      line(x0, y0, x0, y1);
      line(x1, y0, x1, y1);
      line((x0 + x1) / 2, y0, (x0 + x1) / 2, y1, LINE.hair);
      line(x0, y0, x1, y0, LINE.medium);
      line(x0, y1, x1, y1, LINE.medium);
    }
  }

  for (const o of roofOpenings(bay)) {
    const [x, y] = P(o.x, o.y);
    const w = s(o.length), h = s(o.width);
    items.push(
      { type: 'rect', x, y, w, h, stroke: 'ink', width: LINE.thin, dash: [1.2, 0.8], tag: `plan:roof-opening:${o.id}` },
      { type: 'line', x1: x, y1: y, x2: x + w, y2: y + h, width: LINE.hair, ink: 'soft', dash: [1.2, 0.8] },
      { type: 'line', x1: x + w, y1: y, x2: x, y2: y + h, width: LINE.hair, ink: 'soft', dash: [1.2, 0.8] },
    );
  }

  const r = 0.8;
  for (const p of bodyPoints(bay)) {
    if (p.wall === 'underside') {
      const [cx, cy] = P(p.position, p.across ?? 0);
      const ring: [number, number][] = Array.from({ length: 12 }, (_, i) => [cx + r * Math.cos((i / 12) * 2 * Math.PI), cy + r * Math.sin((i / 12) * 2 * Math.PI)]);
      items.push(
        { type: 'polygon', points: ring, stroke: 'copper', width: LINE.thin },
        { type: 'line', x1: cx - r, y1: cy, x2: cx + r, y2: cy, width: LINE.hair, ink: 'copper', tag: `plan:point:${p.id}` },
        { type: 'line', x1: cx, y1: cy - r, x2: cx, y2: cy + r, width: LINE.hair, ink: 'copper' },
      );
      continue;
    }
    // Just outside the wall line, so the wall stays readable.
    const [cx, cy] = p.wall === 'left' ? P(p.position, 0) : p.wall === 'right' ? P(p.position, bay.width) : P(bay.length, p.position);
    const out = 1.4;
    const [dx, dy] = p.wall === 'left' ? [0, -out] : p.wall === 'right' ? [0, out] : [out, 0];
    const mx = cx + dx, my = cy + dy;
    items.push({ type: 'polygon', points: [[mx - r, my], [mx, my - r], [mx + r, my], [mx, my + r]], fill: 'copper' });
    items.push({ type: 'line', x1: cx, y1: cy, x2: mx, y2: my, width: LINE.hair, ink: 'copper', tag: `plan:point:${p.id}` });
  }
  return items;
}
