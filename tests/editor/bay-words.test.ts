// The bay's own words (door words, the cab word) are written on a paper knockout, as the overall
// dimension values are: the rear doors' dashed swing lines run through the middle of the door
// opening, where "rear doors" is written, and must not cross its letters.
import { describe, expect, it } from 'vitest';
import { drawBay } from '@/components/editor/canvas/bayDrawing';
import { starterLayout } from '@/lib/layout/templates';
import { recordingContext } from './recorder';

describe('the bay’s words on the plan', () => {
  for (const scale of [0.12, 0.27, 0.4]) {
    it(`every door and cab word has paper under it, drawn after the door marks (${scale} px/mm)`, () => {
      const doc = starterLayout('starter-rear-bed')!;
      expect(doc.bay.doors.some((d) => d.wall === 'rear')).toBe(true);
      const { ctx, calls } = recordingContext();
      drawBay(ctx, doc, scale);
      const words = calls.filter((c) => c.op === 'fillText');
      const texts = words.map((c) => c.args[0]);
      expect(texts).toContain('rear doors');
      expect(texts).toContain('door');
      const lastArc = calls.findLastIndex((c) => c.op === 'arc');
      expect(lastArc).toBeGreaterThan(-1);
      for (const word of words) {
        const at = calls.indexOf(word);
        // The knockout is the fill just before the word, in the word's own (translated, turned) frame.
        const rect = calls.slice(0, at).findLast((c) => c.op === 'fillRect');
        expect(rect, String(word.args[0])).toBeDefined();
        const [x, y, w, h] = rect!.args as number[];
        const textW = String(word.args[0]).length * 5;
        const px = 1 / scale;
        // Centred on the word, wider than it by 2 px each side, and taller than the 10 px type.
        expect(x).toBeCloseTo(-textW / 2 - 2 * px, 6);
        expect(w).toBeCloseTo(textW + 4 * px, 6);
        expect(y).toBeLessThan(-5 * px);
        expect(y + h).toBeGreaterThan(5 * px);
        expect(calls.indexOf(rect!)).toBeGreaterThan(lastArc);
        const fill = calls.slice(calls.indexOf(rect!), at).findLast((c) => c.op === 'set fillStyle');
        expect(fill?.args[0]).not.toMatch(/rgba\(245,242,234/); // the word itself is in ink, not paper
      }
    });
  }
});
