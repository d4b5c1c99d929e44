// One format for people: dates in the studio's time zone with the zone named, money with its sign,
// numbers with thousands separators, field paths as on-screen names.
import { describe, expect, it } from 'vitest';
import { formatAmount, formatDate, formatDateTime, formatFixed, formatLongDate, formatMoney, formatNumber, formatWhole, STUDIO_TIME_ZONE } from '@/lib/format';
import { fieldName, readableProblem } from '@/lib/layout/field-names';

describe('format', () => {
  it('shows dates in the studio time zone (Europe/London by default), naming the zone', () => {
    expect(STUDIO_TIME_ZONE).toBe('Europe/London');
    // 16:32 UTC on 3 December is 16:32 GMT; on 3 July it is 17:32 BST.
    expect(formatDateTime('2026-12-03T16:32:02Z')).toBe('3 Dec 2026, 16:32 GMT');
    expect(formatDateTime(new Date('2026-07-03T16:32:02Z'))).toBe('3 Jul 2026, 17:32 BST');
    expect(formatDate('2026-12-03T23:59:00Z')).toBe('3 Dec 2026');
    expect(formatLongDate('2026-12-03T10:00:00Z')).toBe('3 December 2026');
  });

  it('shows money from minor units with the currency sign, and unknown codes after the amount', () => {
    expect(formatMoney(24000, 'GBP')).toBe('£240.00');
    expect(formatMoney(316739, 'gbp')).toBe('£3,167.39');
    expect(formatMoney(1250, 'EUR')).toBe('€12.50');
    expect(formatMoney(1250, 'XYZ1')).toBe('12.50 XYZ1');
    expect(formatMoney(null, 'GBP')).toBe('—');
  });

  it('writes numbers with separators and at most the digits asked for', () => {
    expect(formatNumber(12345.6)).toBe('12,346');
    expect(formatNumber(12.345, 1)).toBe('12.3');
    expect(formatNumber(12, 1)).toBe('12');
  });

  it('writes a fixed count of decimals, whole units rounded half up, and plain amounts for files and fields', () => {
    expect(formatFixed(0.333, 2)).toBe('0.33');
    expect(formatFixed(1234.5, 2)).toBe('1,234.50');
    expect(formatWhole(2499.5)).toBe('2,500');
    expect(formatWhole(-2.5)).toBe('-2'); // Math.round: half towards +∞
    expect(formatAmount(123456)).toBe('1234.56');
    expect(formatAmount(5)).toBe('0.05');
  });

  it('puts a date near midnight on the studio’s day, not the server’s (UTC) day', () => {
    // 23:30 UTC on 30 June is 00:30 BST on 1 July in London.
    expect(formatDate('2026-06-30T23:30:00Z')).toBe('1 Jul 2026');
  });
});

describe('field names', () => {
  it('turns a field path into its on-screen name', () => {
    expect(readableProblem('standingHeight: must be between 0 and 2800 mm')).toBe('Standing height: must be between 0 and 2800 mm');
    expect(fieldName('bay.length')).toBe('Bay length');
    expect(fieldName('systems.vehicle.massInRunningOrderKg')).toBe('Mass in running order');
    expect(fieldName(['modules', 3, 'elevation'])).toBe('Height above the floor');
    expect(fieldName('systems.power.someNewFieldKg')).toBe('Some new field');
    expect(readableProblem('no field here')).toBe('no field here');
  });
});
