// The editor opens fitted to the bay and stays fitted while the plan's box settles (panels load,
// a drawer closes, a tablet turns) — until the person zooms or pans, after which resizing keeps their view.
import { describe, expect, it } from 'vitest';
import { harness } from './harness';

describe('editor store: the view fitted to the bay', () => {
  it('refits on every resize until the first zoom or pan', () => {
    const h = harness();
    const { length, width } = h.get().doc.bay;
    h.get().resizeViewport(300, 200);
    h.get().resizeViewport(1200, 800);
    const v = h.get().viewport;
    // Fitted: the bay's extent fills the box less the fit margin on its tighter side, centred.
    const drawnL = length * v.scale, drawnW = width * v.scale;
    expect(Math.max(drawnL / (1200 - 2 * 72), drawnW / (800 - 2 * 72))).toBeCloseTo(1, 5);
    expect(v.originX + drawnL / 2).toBeCloseTo(600, 5);
    expect(v.originY + drawnW / 2).toBeCloseTo(400, 5);

    h.get().zoomBy(2);
    const zoomed = h.get().viewport.scale;
    h.get().resizeViewport(900, 700);
    expect(h.get().viewport.scale).toBe(zoomed);

    h.get().fit();
    h.get().resizeViewport(1000, 760);
    const again = h.get().viewport;
    expect(Math.max((length * again.scale) / (1000 - 144), (width * again.scale) / (760 - 144))).toBeCloseTo(1, 5);
  });
});
