import { describe, expect, it } from 'vitest';
import { en1646UserPayload, minimumPayload1230, personalEffectsAllowance, reg1230UserPayload } from '@/lib/planning';

describe('payload allowances', () => {
  it('EN 1646-2 example: 3 seats and 6 m → 120 kg of personal effects', () => {
    expect(personalEffectsAllowance(3, 6)).toBe(120);
  });
  it('EN 1646-2 user payload adds 75 kg per passenger (driver excluded)', () => {
    expect(en1646UserPayload(3, 6)).toBe(120 + 150);
    expect(en1646UserPayload(1, 5)).toBe(10 + 50 + 30);
  });
  it('Reg. (EU) 1230/2012 minimum for motor caravans: 10 × (persons + length)', () => {
    expect(minimumPayload1230(4, 6)).toBe(100);
    expect(reg1230UserPayload(4, 6)).toBe(100 + 225);
  });
  it('rejects nonsense with a clear error', () => {
    expect(() => personalEffectsAllowance(0, 6)).toThrow(/seats/);
    expect(() => personalEffectsAllowance(2.5, 6)).toThrow(/seats/);
    expect(() => minimumPayload1230(2, -1)).toThrow(/length/);
  });
});
