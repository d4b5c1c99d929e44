/**
 * How Baywright writes dates, money, plain numbers and lengths for people: one home, used by
 * every screen, the sheet and the mail. Dates are always shown in the studio's time zone (the
 * same on the server and in the browser, so a page never changes its dates as it hydrates) with
 * the zone named; money in integer minor units is shown with its currency sign. Pure; must never
 * read the browser's locale or zone.
 */
import { formatLength } from './layout/units';

export { formatLength };

/**
 * The studio's time zone. Studios work in one place; set `NEXT_PUBLIC_BAYWRIGHT_TIME_ZONE` (an IANA
 * name) where the workshop is not on UK time.
 */
export const STUDIO_TIME_ZONE = validZone(process.env.NEXT_PUBLIC_BAYWRIGHT_TIME_ZONE) ?? 'Europe/London';

function validZone(zone: string | undefined): string | undefined {
  if (!zone) return undefined;
  try {
    new Intl.DateTimeFormat('en-GB', { timeZone: zone });
    return zone;
  } catch {
    throw new Error(`NEXT_PUBLIC_BAYWRIGHT_TIME_ZONE is not a time zone: ${zone}`);
  }
}

const LOCALE = 'en-GB';

/**
 * A date format made on its first use, not as the module loads: the first format with a time zone
 * loads the zone data, about 100 ms in a fresh browser tab, and most pages that load this module
 * (the editor among them) write no date while they start.
 */
function lazyFormat(options: Intl.DateTimeFormatOptions): () => Intl.DateTimeFormat {
  let made: Intl.DateTimeFormat | undefined;
  return () => (made ??= new Intl.DateTimeFormat(LOCALE, { ...options, timeZone: STUDIO_TIME_ZONE }));
}
const dateTime = lazyFormat({ day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit', timeZoneName: 'short' });
const dateOnly = lazyFormat({ day: 'numeric', month: 'short', year: 'numeric' });
const longDate = lazyFormat({ day: 'numeric', month: 'long', year: 'numeric' });

type When = Date | string | number;
const asDate = (d: When) => (d instanceof Date ? d : new Date(d));

/** "3 Dec 2026, 16:32 GMT". */
export function formatDateTime(d: When): string {
  return dateTime().format(asDate(d));
}

/** "3 Dec 2026". */
export function formatDate(d: When): string {
  return dateOnly().format(asDate(d));
}

/** "3 December 2026", for letters and mail. */
export function formatLongDate(d: When): string {
  return longDate().format(asDate(d));
}

const numberFormats = new Map<string, Intl.NumberFormat>();

function numberFormat(min: number, max: number): Intl.NumberFormat {
  const key = `${min}:${max}`;
  let f = numberFormats.get(key);
  if (!f) numberFormats.set(key, (f = new Intl.NumberFormat(LOCALE, { minimumFractionDigits: min, maximumFractionDigits: max })));
  return f;
}

/** A number with thousands separators and at most `digits` decimals: `1,234`, `12.5`. */
export function formatNumber(n: number, digits = 0): string {
  return numberFormat(0, digits).format(n);
}

/** A number with thousands separators and exactly `digits` decimals: `1,234.50`, `0.33`. */
export function formatFixed(n: number, digits: number): string {
  return numberFormat(digits, digits).format(n);
}

/** Whole units with thousands separators, rounded half up: `1,235` (masses in kg, energy in Wh). */
export function formatWhole(n: number): string {
  return numberFormat(0, 0).format(Math.round(n));
}

const moneyFormats = new Map<string, Intl.NumberFormat | null>();

/** "£1,240.00" from minor units; an unknown currency code is written after the amount. */
export function formatMoney(minor: number | null | undefined, currency: string): string {
  if (minor === null || minor === undefined) return '—';
  const code = currency.toUpperCase();
  let f = moneyFormats.get(code);
  if (f === undefined) {
    try {
      f = new Intl.NumberFormat(LOCALE, { style: 'currency', currency: code });
    } catch {
      f = null;
    }
    moneyFormats.set(code, f);
  }
  return f ? f.format(minor / 100) : `${formatAmount(minor)} ${code}`;
}

/** Minor units as a plain amount in major units with two decimals, no sign or separators: `1240.00` (a CSV cell, a money field). */
export function formatAmount(minor: number): string {
  return (minor / 100).toFixed(2);
}

/** A quantity with its unit as a reader says it: `1 sheet`, `3 sheets`, `12 m`, `190 Ah`; bare for `each`. */
export function quantityText(qty: number, unit: string): string {
  if (unit === 'each') return String(qty);
  return `${qty} ${unit === 'sheet' && qty !== 1 ? 'sheets' : unit}`;
}
