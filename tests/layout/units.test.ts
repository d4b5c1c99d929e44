// Display units: 25.4 mm to the inch exactly (international yard and pound agreement, 1959).
import { describe, expect, it } from 'vitest';
import convert from 'convert-units';
import { formatLength, parseLength, toUnit } from '@/lib/layout/units';

describe('lengths', () => {
  it('reads what people type', () => {
    expect(parseLength('2400')).toBe(2400);
    expect(parseLength('240 cm')).toBe(2400);
    expect(parseLength('1.2 m')).toBe(1200);
    expect(parseLength('94.5in')).toBe(2400);
    expect(parseLength('94,5"')).toBe(2400);
    expect(parseLength('12', 'in')).toBe(305);
    expect(parseLength('twelve')).toBeNull();
    expect(parseLength('')).toBeNull();
  });

  it('agrees with a general-purpose unit library (convert-units) on inches', () => {
    for (const inches of [1, 12, 39.37, 75, 80]) {
      expect(parseLength(`${inches} in`)).toBe(Math.round(convert(inches).from('in').to('mm')));
    }
  });

  it('formats in the chosen unit with the unit named', () => {
    expect(formatLength(1905, 'mm')).toBe('1905 mm');
    expect(formatLength(1905, 'cm')).toBe('190.5 cm');
    expect(formatLength(1905, 'in')).toBe('75 in');
    expect(toUnit(1000, 'in')).toBe(39.37);
  });
});
