// Reading typed quantities and money in the build-planning forms: units, conversions (exact
// definitions cited in components/planning/quantities.ts), and refusals that never become zero.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { field, parseMassKg, parseMetres, parseWithUnit, KG_PER_LB } from '@/components/planning/quantities';
import { parseMoneyMinor, formatMoney, quantityText } from '@/components/planning/money';
import { returnOrigin } from '@/server/payments/return-origin';

describe('parseMassKg', () => {
  it.each([
    ['2100', 2100], ['2100 kg', 2100], ['2.1 t', 2100], ['3,5 t', 3500], ['1 tonne', 1000], ['100 lb', 45.359], [' 75kg ', 75],
  ])('reads %s as %f kg', (text, kg) => {
    expect(parseMassKg(text)).toBeCloseTo(kg, 3);
  });
  it.each(['heavy', '', '2100 kgs extra', '1e3', '12 st'])('refuses %s', (text) => {
    expect(parseMassKg(text)).toBeNull();
  });
  it('uses the exact pound (0.45359237 kg)', () => {
    expect(KG_PER_LB).toBe(0.45359237);
    expect(parseMassKg('1000 lb')).toBeCloseTo(453.592, 3);
  });
});

describe('parseMetres and parseWithUnit', () => {
  it.each([['3', 3], ['3 m', 3], ['300 cm', 3], ['2500 mm', 2.5], ['10 ft', 3.048], ['120 in', 3.048]])('reads %s as %f m', (text, m) => {
    expect(parseMetres(text)).toBeCloseTo(m, 4);
  });
  it('takes a number with the expected unit, or bare, and nothing else', () => {
    expect(parseWithUnit('45 W', ['W'])).toBe(45);
    expect(parseWithUnit('45', ['W'])).toBe(45);
    expect(parseWithUnit('14.08 %', ['%'])).toBe(14.08);
    expect(parseWithUnit('45 A', ['W'])).toBeNull();
    expect(parseWithUnit('lots', ['W'])).toBeNull();
  });
});

describe('field builders', () => {
  it('turns empty into absent, text into numbers, and says what to type otherwise', () => {
    const mass = field.mass({ max: 10_000 })(false);
    expect(mass.parse('')).toBeUndefined();
    expect(mass.parse('3.5 t')).toBe(3500);
    const bad = mass.safeParse('heavy');
    expect(bad.success).toBe(false);
    expect(bad.error?.issues[0].message).toMatch(/type a mass/);
    expect(mass.safeParse('12 t').error?.issues[0].message).toBe('at most 10000 kg');
    expect(field.mass()(true).safeParse('').error?.issues[0].message).toBe('required');
  });
  it('reads lengths in the person’s display unit, as whole millimetres', () => {
    expect(field.length('cm')(false).parse('345')).toBe(3450);
    expect(field.length('in')(false).parse('136')).toBe(3454);
    expect(field.length('mm')(false).parse('3.45 m')).toBe(3450);
    expect(field.length('mm')(false).parse('-820')).toBe(-820);
  });
  it('never turns a refused text into zero (property)', () => {
    fc.assert(fc.property(fc.string().filter((s) => parseMassKg(s) === null && s.trim() !== ''), (s) => {
      expect(field.mass()(false).safeParse(s).success).toBe(false);
    }));
  });
});

describe('money', () => {
  it.each([['12.50', 1250], ['£12.50', 1250], ['12,50', 1250], ['1,250.00', 125000], ['48', 4800], ['0.5', 50], ['€ 3', 300]])('reads %s as %i minor units', (t, minor) => {
    expect(parseMoneyMinor(t)).toBe(minor);
  });
  it.each(['', 'free', '12.345', '-5', '1.2.3'])('refuses %s', (t) => {
    expect(parseMoneyMinor(t)).toBeNull();
  });
  it('round-trips every whole number of minor units through its two-decimal text (property)', () => {
    fc.assert(fc.property(fc.integer({ min: 0, max: 100_000_000 }), (n) => {
      expect(parseMoneyMinor((n / 100).toFixed(2))).toBe(n);
    }));
  });
  it('formats with the currency and says sheets in the plural', () => {
    expect(formatMoney(216122, 'GBP')).toBe('£2,161.22');
    expect(formatMoney(null, 'GBP')).toBe('—');
    expect(quantityText(3, 'sheet')).toBe('3 sheets');
    expect(quantityText(1, 'sheet')).toBe('1 sheet');
    expect(quantityText(2, 'each')).toBe('2');
    expect(quantityText(12, 'm')).toBe('12 m');
  });
});

describe('returnOrigin (where the checkout and the mails link back to)', () => {
  const req = (host: string | null, url = 'http://localhost:3210/api/x') => new Request(url, { headers: host ? { host } : {} });
  it('uses the configured public address when there is one', () => {
    expect(returnOrigin(req('evil.example'), { BAYWRIGHT_PUBLIC_URL: 'https://studio.example/app', NODE_ENV: 'production' })).toBe('https://studio.example');
  });
  it('uses the host the browser used, outside production', () => {
    expect(returnOrigin(req('127.0.0.1:3210'), { NODE_ENV: 'development' })).toBe('http://127.0.0.1:3210');
  });
  it('refuses to build links from a request in production without a public address (unless the demo)', () => {
    expect(() => returnOrigin(req('127.0.0.1:3210'), { NODE_ENV: 'production' })).toThrow(/BAYWRIGHT_PUBLIC_URL/);
    expect(returnOrigin(req('127.0.0.1:3210'), { NODE_ENV: 'production', BAYWRIGHT_DEMO: '1' })).toBe('http://127.0.0.1:3210');
  });
  it('falls back to the request address for a Host header that is not a host', () => {
    expect(returnOrigin(req('a b/c'), { NODE_ENV: 'development' })).toBe('http://localhost:3210');
  });
});
