import { describe, expect, it } from 'vitest';
// Worked by hand: V = I × ρ × 2L ÷ A with ρ = 1/58 Ω·mm²/m at 20 °C and α = 0.00393 per K (IEC 60028,
// from memory); allowances 3 % / 10 % (ABYC E-11, secondary); ampacity 33 CFR 183.425 Table 5
// (regulation text, read in a published reproduction of the CFR).
import { ampacity, AWG_SIZES, awgAreaMm2, bundlingFactor, cableSize, checkFittedCable, copperResistivity, dropPct, minAreaForDrop, nominalSystemVolts, COPPER_RESISTIVITY } from '@/lib/planning';

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
  it('33 CFR 183.425 Table 5 has 3 AWG (26.67 mm², ASTM B258): 120/145/150/155/180/195/210 A', () => {
    const three = AWG_SIZES.find((a) => a.gauge === '3')!;
    expect(three.areaMm2).toBeCloseTo(26.67, 2);
    expect(Object.values(three.amps)).toEqual([120, 145, 150, 155, 180, 195, 210]);
    // 170 A over 0.5 m at 12 V, 10 %: 4 AWG carries 160 A (too little), 3 AWG 180 A — not 2 AWG.
    expect(cableSize({ amps: 170, lengthM: 0.5, volts: 12, maxDropPct: 10 }).awg!.label).toBe('3 AWG');
  });
  it('drop is a share of the nominal system voltage: a 12.8 V LiFePO4 bank is a 12 V system, 25.6 V a 24 V one', () => {
    expect(nominalSystemVolts(12.8)).toBe(12);
    expect(nominalSystemVolts(25.6)).toBe(24);
    expect(nominalSystemVolts(12)).toBe(12);
    // 20 A, 6 m, 3 % at 12 V needs 11.49 mm²; at 12.8 V it would have been 10.78 mm² (6.7 % more drop allowed).
    expect(minAreaForDrop({ amps: 20, lengthM: 6, volts: nominalSystemVolts(12.8), maxDropPct: 3 })).toBeCloseTo(11.49, 2);
  });
  it('the warm case: 16 mm² on the 20 A, 6 m run drops 2.16 % at 20 °C and 2.88 % at 105 °C', () => {
    // 0.25862 V ÷ 12 V = 2.155 %; × (1 + 0.00393 × 85) = × 1.33405 → 2.875 %.
    expect(copperResistivity(105)).toBeCloseTo(0.0230, 4);
    const fitted = checkFittedCable(base, 16);
    expect(fitted.dropPct).toBeCloseTo(2.155, 3);
    expect(fitted.warmDropPct).toBeCloseTo(2.875, 3);
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
