// Paper sizes and scale maths, against ISO 216 and the definition of the PDF point.
import { describe, expect, it } from 'vitest';
import { mmToPt, onPaper, PAPER_MM, PT_PER_MM, sheetFrame } from '@/lib/sheet';

describe('paper', () => {
  it('uses ISO 216 sizes, landscape: A4 297 × 210 mm, A3 420 × 297 mm', () => {
    expect(PAPER_MM.a4).toMatchObject({ width: 297, height: 210 });
    expect(PAPER_MM.a3).toMatchObject({ width: 420, height: 297 });
  });

  it('turns mm into PDF points at 72 per inch of 25.4 mm (ISO 32000-1 §8.3.2.3; 1959 inch)', () => {
    expect(PT_PER_MM).toBeCloseTo(2.834645669, 9);
    expect(mmToPt(25.4)).toBeCloseTo(72, 12);
    expect(mmToPt(297)).toBeCloseTo(841.89, 2);
    expect(mmToPt(210)).toBeCloseTo(595.28, 2);
    expect(mmToPt(420)).toBeCloseTo(1190.55, 2);
  });

  it('draws a 3100 mm bay length at 1:20 as 155 mm, i.e. 439.37 pt (worked by hand)', () => {
    expect(onPaper(3100, 20)).toBe(155);
    expect(mmToPt(onPaper(3100, 20))).toBeCloseTo(439.37, 2);
    expect(onPaper(3100, 25)).toBe(124);
    expect(onPaper(1770, 10)).toBe(177);
  });

  it('keeps the title block inside the frame and below the drawing area', () => {
    for (const paper of ['a4', 'a3'] as const) {
      const f = sheetFrame(paper);
      expect(f.titleBlock.y + f.titleBlock.height).toBeCloseTo(f.frame.y + f.frame.height, 9);
      expect(f.area.y + f.area.height).toBeLessThan(f.titleBlock.y);
      expect(f.area.x + f.area.width).toBeLessThanOrEqual(f.frame.x + f.frame.width);
    }
  });
});
