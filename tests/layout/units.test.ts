// Display units: 25.4 mm to the inch exactly (international yard and pound agreement, 1959).
import { describe, expect, it } from 'vitest';
import { formatLength, formatSize, parseLength, toUnit } from '@/lib/layout/units';

describe('lengths', () => {
  it('writes a plan size with its unit once: 600 × 300 mm; 60 × 30 cm; 254 × 127 mm is 10 × 5 in', () => {
    expect(formatSize(600, 300)).toBe('600 × 300 mm');
    expect(formatSize(600, 300, 'cm')).toBe('60 × 30 cm');
    expect(formatSize(254, 127, 'in')).toBe('10 × 5 in');
  });

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

  it('inches at 25.4 mm exactly, worked by hand: 1 in → 25 mm, 12 in → 305 mm, 39.37 in → 1000 mm, 75 in → 1905 mm, 80 in → 2032 mm', () => {
    expect([1, 12, 39.37, 75, 80].map((inches) => parseLength(`${inches} in`))).toEqual([25, 305, 1000, 1905, 2032]);
  });

  it('formats in the chosen unit with the unit named', () => {
    expect(formatLength(1905, 'mm')).toBe('1905 mm');
    expect(formatLength(1905, 'cm')).toBe('190.5 cm');
    expect(formatLength(1905, 'in')).toBe('75 in');
    expect(toUnit(1000, 'in')).toBe(39.37);
  });
});
