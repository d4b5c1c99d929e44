import { describe, expect, it } from 'vitest';
import { ampacity, awgAreaMm2, bundlingFactor, cableSize, checkFittedCable, dropPct, minAreaForDrop, COPPER_RESISTIVITY } from '@/lib/planning';

describe('cable sizing', () => {
  const base = { amps: 20, lengthM: 6, volts: 12, maxDropPct: 3 };

  it('20 A over 6 m one-way at 12 V within 3 % needs ≥ 11.49 mm²', () => {
    expect(minAreaForDrop(base)).toBeCloseTo(11.49, 2);
  });
  it('10 mm² on that circuit drops 3.45 %, so the choice is 16 mm²', () => {
    expect(dropPct(20, 6, 10, 12)).toBeCloseTo(3.45, 2);
    const c = cableSize(base);
    expect(c.metric!.areaMm2).toBe(16);
    expect(c.metric!.dropPct).toBeLessThanOrEqual(3);
    expect(c.governedBy).toBe('drop');
    // AWG: 6 AWG (13.3 mm²) is the smallest gauge over 11.49 mm².
    expect(c.awg!.label).toBe('6 AWG');
  });
  it('copper resistivity is the IEC 60028 value 1/58 Ω·mm²/m (0.0172 rounded)', () => {
    expect(COPPER_RESISTIVITY).toBeCloseTo(0.017241, 6);
  });
  it('AWG areas from the ASTM B258 formula', () => {
    expect(awgAreaMm2(10)).toBeCloseTo(5.26, 2);
    expect(awgAreaMm2(6)).toBeCloseTo(13.3, 1);
    expect(awgAreaMm2(-3)).toBeCloseTo(107.2, 1); // 4/0
  });
  it('a short heavy run is sized by ampacity, not drop', () => {
    // 100 A over 0.5 m at 12 V, 10 % allowed: drop alone needs 1.44 mm², the current much more.
    const c = cableSize({ amps: 100, lengthM: 0.5, volts: 12, maxDropPct: 10 });
    expect(c.minAreaForDropMm2).toBeLessThan(2);
    expect(c.governedBy).toBe('ampacity');
    expect(c.metric!.ampacityA).toBeGreaterThanOrEqual(100);
    expect(c.metric!.areaMm2).toBe(16); // 16 mm² ≥ 6 AWG → 120 A at 105 °C (33 CFR 183.425, from memory)
  });
  it('derates for bundling and engine spaces', () => {
    expect(bundlingFactor(3)).toBe(0.7);
    expect(ampacity(16, 105, { bundled: 4 })).toBeCloseTo(120 * 0.6, 6);
    expect(ampacity(16, 105, { engineSpace: true })).toBeCloseTo(120 * 0.86, 6);
    expect(ampacity(0.5)).toBeNull();
  });
  it('checks a fitted size', () => {
    expect(checkFittedCable(base, 10).ok).toBe(false);
    expect(checkFittedCable(base, 16).ok).toBe(true);
  });
  it('returns no size when nothing in the series carries the load, and rejects nonsense', () => {
    expect(cableSize({ amps: 400, lengthM: 20, volts: 12, maxDropPct: 3 }).metric).toBeNull();
    expect(() => cableSize({ ...base, lengthM: 0 })).toThrow(/length/);
    expect(() => cableSize({ ...base, amps: -1 })).toThrow(/amps/);
  });
});
