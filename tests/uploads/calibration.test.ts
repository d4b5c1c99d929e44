// Two-point calibration of a tracing image, against cases worked by hand.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  bayToImage, calibrate, CalibrationError, drawnSize, imageToBay, scaleFromTwoPoints, tracingPlacementSchema, UNCALIBRATED,
} from '@/lib/tracing/calibration';

describe('scaleFromTwoPoints', () => {
  it('gives 5 mm per pixel for a 3-4-5 triangle of 500 px spanning 2500 mm (worked by hand)', () => {
    // dx = 300 px, dy = 400 px → span √(300² + 400²) = 500 px; 2500 mm / 500 px = 5 mm/px.
    expect(scaleFromTwoPoints({ x: 100, y: 200 }, { x: 400, y: 600 }, 2500)).toBe(5);
  });

  it('gives 0.8 mm per pixel for a horizontal 1250 px line that is a 1000 mm rule', () => {
    expect(scaleFromTwoPoints({ x: 0, y: 50 }, { x: 1250, y: 50 }, 1000)).toBeCloseTo(0.8, 12);
  });

  it.each([
    ['points too close together', { x: 10, y: 10 }, { x: 13, y: 14 }, 100, /5\.0 px apart/],
    ['a zero distance', { x: 0, y: 0 }, { x: 100, y: 0 }, 0, /above zero/],
    ['a negative distance', { x: 0, y: 0 }, { x: 100, y: 0 }, -5, /above zero/],
    ['a point off the image', { x: Number.NaN, y: 0 }, { x: 100, y: 0 }, 50, /on the image/],
  ])('refuses %s with a message for the person', (_what, a, b, real, message) => {
    expect(() => scaleFromTwoPoints(a, b, real)).toThrow(CalibrationError);
    expect(() => scaleFromTwoPoints(a, b, real)).toThrow(message);
  });
});

describe('calibrate', () => {
  it('scales an uncalibrated image about the first clicked point (worked by hand)', () => {
    // Uncalibrated: 1 mm per px, image (0,0) at bay (0,0). Clicks at bay (100,200) and (400,600)
    // are image (100,200) and (400,600): 500 px apart, really 2500 mm → 5 mm/px. Image point
    // (100,200) must stay at bay (100,200): origin = (100 − 5·100, 200 − 5·200) = (−400, −800).
    const placed = calibrate(UNCALIBRATED, { x: 100, y: 200 }, { x: 400, y: 600 }, 2500);
    expect(placed.mmPerPx).toBe(5);
    expect(placed.x).toBeCloseTo(-400, 9);
    expect(placed.y).toBeCloseTo(-800, 9);
    // The second point now lies 2500 mm from the first: at (−400 + 5·400, −800 + 5·600).
    const second = imageToBay({ x: 400, y: 600 }, placed);
    expect(second.x).toBeCloseTo(1600, 9);
    expect(second.y).toBeCloseTo(2200, 9);
    expect(placed.opacity).toBe(UNCALIBRATED.opacity);
  });

  it('recalibrates an already-scaled, rotated image without changing its rotation', () => {
    const current = { x: 250, y: -40, mmPerPx: 2, rotation: 90, opacity: 0.3 };
    const first = imageToBay({ x: 10, y: 20 }, current);
    const second = imageToBay({ x: 110, y: 20 }, current); // 100 px apart, drawn 200 mm apart
    const placed = calibrate(current, first, second, 1000);
    expect(placed.mmPerPx).toBeCloseTo(10, 9);
    expect(placed.rotation).toBe(90);
    expect(placed.opacity).toBe(0.3);
    const a = imageToBay({ x: 10, y: 20 }, placed);
    const b = imageToBay({ x: 110, y: 20 }, placed);
    expect(a.x).toBeCloseTo(first.x, 9);
    expect(a.y).toBeCloseTo(first.y, 9);
    expect(Math.hypot(b.x - a.x, b.y - a.y)).toBeCloseTo(1000, 9);
  });

  it('turns clockwise on screen: at 90° the image x axis runs along the bay y axis', () => {
    const p = imageToBay({ x: 10, y: 0 }, { x: 0, y: 0, mmPerPx: 2, rotation: 90, opacity: 1 });
    expect(p.x).toBeCloseTo(0, 9);
    expect(p.y).toBeCloseTo(20, 9);
  });

  it('bayToImage undoes imageToBay for any placement (property)', () => {
    fc.assert(
      fc.property(
        fc.record({
          x: fc.double({ min: -5000, max: 5000, noNaN: true }),
          y: fc.double({ min: -5000, max: 5000, noNaN: true }),
          mmPerPx: fc.double({ min: 0.01, max: 50, noNaN: true }),
          rotation: fc.double({ min: -360, max: 360, noNaN: true }),
          opacity: fc.constant(0.5),
        }),
        fc.double({ min: -4000, max: 4000, noNaN: true }),
        fc.double({ min: -4000, max: 4000, noNaN: true }),
        (placement, px, py) => {
          const back = bayToImage(imageToBay({ x: px, y: py }, placement), placement);
          expect(back.x).toBeCloseTo(px, 6);
          expect(back.y).toBeCloseTo(py, 6);
        },
      ),
    );
  });
});

describe('placement bounds', () => {
  it('accepts a real placement and fills rotation and opacity', () => {
    expect(tracingPlacementSchema.parse({ x: 0, y: 0, mmPerPx: 2.5 })).toEqual({ x: 0, y: 0, mmPerPx: 2.5, rotation: 0, opacity: 0.5 });
  });
  it.each([
    [{ x: 0, y: 0, mmPerPx: 0 }],
    [{ x: 0, y: 0, mmPerPx: -1 }],
    [{ x: 1e9, y: 0, mmPerPx: 1 }],
    [{ x: 0, y: 0, mmPerPx: 1, opacity: 0 }],
    [{ x: 0, y: 0, mmPerPx: 1, colour: 'red' }],
  ])('refuses %o', (input) => {
    expect(tracingPlacementSchema.safeParse(input).success).toBe(false);
  });
  it('gives the drawn size of a 4000 × 3000 px photo at 0.75 mm/px as 3000 × 2250 mm', () => {
    expect(drawnSize(4000, 3000, { ...UNCALIBRATED, mmPerPx: 0.75 })).toEqual({ length: 3000, width: 2250 });
  });
});

describe('calibrating from clicks on the image', () => {
  it('puts the first point on the bay point and scales by the typed distance (worked by hand)', async () => {
    const { calibrateFromImage } = await import('@/lib/tracing/calibration');
    // A photo of the floor: the bulkhead-left-wall corner at image (40, 60), a tape mark 1000 mm
    // along the wall at image (440, 60): 400 px = 1000 mm → 2.5 mm/px. Corner at bay (0, 0):
    // origin = (0 − 2.5·40, 0 − 2.5·60) = (−100, −150).
    const p = calibrateFromImage({ x: 40, y: 60 }, { x: 440, y: 60 }, 1000, { x: 0, y: 0 });
    expect(p).toEqual({ x: -100, y: -150, mmPerPx: 2.5, rotation: 0, opacity: 0.5 });
    const mark = imageToBay({ x: 440, y: 60 }, p);
    expect(mark.x).toBeCloseTo(1000, 9);
    expect(mark.y).toBeCloseTo(0, 9);
  });

  it('turned 90°, the tape along the image x axis runs across the bay', async () => {
    const { calibrateFromImage } = await import('@/lib/tracing/calibration');
    const p = calibrateFromImage({ x: 0, y: 0 }, { x: 200, y: 0 }, 500, { x: 300, y: 40 }, 90);
    const far = imageToBay({ x: 200, y: 0 }, p);
    expect(far.x).toBeCloseTo(300, 9);
    expect(far.y).toBeCloseTo(540, 9);
  });
});
