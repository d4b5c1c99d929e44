/**
 * How build-planning findings write their numbers: rounded for reading, always with a unit, and
 * the precaution/input counters that caution and missing-data findings report as measured and
 * required. Pure text; must never import UI, framework or database code.
 */
import type { Finding } from '../types';

const formats = new Map<number, Intl.NumberFormat>();

export function num(n: number, digits = 0): string {
  if (!Number.isFinite(n)) return n > 0 ? 'unlimited' : 'n/a';
  let f = formats.get(digits);
  if (!f) formats.set(digits, (f = new Intl.NumberFormat('en-GB', { minimumFractionDigits: digits, maximumFractionDigits: digits })));
  return f.format(n);
}

export function round(n: number, digits = 2): number {
  const f = 10 ** digits;
  return Math.round(n * f) / f;
}

/**
 * A finding that asks for data a rule needs. Measured/required count the inputs given and needed,
 * so the contract's numbers stay meaningful.
 */
export function missingInputs(id: string, what: string, paths: string[], needed: number, source: string): Finding {
  return {
    id,
    status: 'warn',
    measured: Math.max(0, needed - paths.length),
    required: needed,
    unit: 'inputs',
    message: `${what} cannot be checked yet: enter ${paths.join(', ')}.`,
    source,
  };
}

/**
 * A safety caution. It stays `warn` until the document confirms every precaution, then `pass`,
 * keeping its text either way (the caution never disappears while the hazard is there).
 * Measured/required count the precautions confirmed and needed.
 */
export function caution(id: string, precautions: { done: boolean | undefined; text: string; field: string }[], message: string, source: string, moduleIds?: string[]): Finding {
  const done = precautions.filter((p) => p.done === true).length;
  const open = precautions.filter((p) => p.done !== true);
  const tail = open.length
    ? ` Not yet confirmed: ${open.map((p) => `${p.text} (${p.field})`).join('; ')}.`
    : ' All precautions confirmed in the document.';
  return {
    id,
    status: open.length ? 'warn' : 'pass',
    measured: done,
    required: precautions.length,
    unit: 'precautions confirmed',
    message: message + tail,
    source,
    ...(moduleIds?.length ? { moduleIds } : {}),
  };
}
