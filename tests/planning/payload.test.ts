// Payload allowances, worked by hand from their sources:
// - EN 1646-2:2008 cl. 5.3.2, personal effects = 10 kg × N + 10 kg × L (N persons including the
//   driver, L overall length in m). Strength: secondary (makers' published EN 1646-2 glossaries).
//   The "+ 30 kg" belongs to EN 1645-2 (touring caravans) and must not appear here.
// - Reg. (EU) No 1230/2012 Annex I Part A 2.6.2.1: 75 kg a passenger (from memory); 2.6.4.1.2
//   minimum pay-mass of a motor caravan 10 × (n + L) kg (from memory).
import { describe, expect, it } from 'vitest';
import { minimumPayload1230, personalEffectsAllowance, userPayloadRequired } from '@/lib/planning';

describe('payload allowances (EN 1646-2 secondary; Reg. (EU) No 1230/2012 from memory)', () => {
  it('EN 1646-2 worked case: 4 persons, 5.0 m → 10 × 4 + 10 × 5 = 90 kg of personal effects (not the caravan’s 120 kg)', () => {
    expect(personalEffectsAllowance(4, 5)).toBe(90);
  });
  it('worked case: 3 passengers at 75 kg + 90 kg of effects = 315 kg of user payload, not 345 kg', () => {
    expect(userPayloadRequired(4, 5)).toBe(315);
  });
  it('a driver alone in a 6.0 m van: no passengers, 10 + 60 = 70 kg of effects', () => {
    expect(userPayloadRequired(1, 6)).toBe(70);
  });
  it('Reg. (EU) No 1230/2012 minimum pay-mass: 4 persons, 6.0 m → 10 × (4 + 6) = 100 kg, the EN 1646-2 effects figure', () => {
    expect(minimumPayload1230(4, 6)).toBe(100);
    expect(personalEffectsAllowance(4, 6)).toBe(100);
  });
  it('rejects nonsense with a clear error', () => {
    expect(() => personalEffectsAllowance(0, 6)).toThrow(/persons/);
    expect(() => personalEffectsAllowance(2.5, 6)).toThrow(/persons/);
    expect(() => minimumPayload1230(2, -1)).toThrow(/length/);
  });
});
