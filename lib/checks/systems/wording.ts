/**
 * How build-planning findings write their numbers: rounded for reading, always with a unit, and
 * the precaution/input counters that caution and missing-data findings report as measured and
 * required. Pure text; must never import UI, framework or database code.
 */
import { needsInWords, type InputNeed } from '../../planning/inputs';
import type { Finding } from '../types';
import { formatFixed } from '../../format';

export function num(n: number, digits = 0): string {
  if (!Number.isFinite(n)) return n > 0 ? 'unlimited' : 'n/a';
  return formatFixed(n, digits);
}

export function round(n: number, digits = 2): number {
  const f = 10 ** digits;
  return Math.round(n * f) / f;
}

/**
 * A finding that cannot be checked yet because inputs are missing: `warn`, naming each missing
 * input by its on-screen label in `needs` (with the build-plan tab that holds it) and in the
 * message. Measured/required count the inputs given and needed, so the contract's numbers stay
 * meaningful.
 */
export function missingInputs(id: string, what: string, needs: InputNeed[], needed: number, source: string): Finding {
  return {
    id,
    status: 'warn',
    measured: Math.max(0, needed - needs.length),
    required: needed,
    unit: 'inputs',
    message: `${what} cannot be checked yet: it needs ${needsInWords(needs)}.`,
    source,
    needs: needs.map((n) => ({ label: n.label, where: n.where })),
  };
}

/** One precaution of a caution: what must be done, and the on-screen box that confirms it. */
export interface Precaution {
  done: boolean | undefined;
  text: string;
  /** The confirming field's on-screen label and tab. */
  field: InputNeed;
  /** Decided by a measurement on the drawing, not by a tick (its text says where to look). */
  measured?: boolean;
}

/**
 * A safety caution. It stays `warn` until the document confirms every precaution, then `pass`,
 * keeping its text either way (the caution never disappears while the hazard is there).
 * Measured/required count the precautions confirmed and needed.
 */
export function caution(id: string, precautions: Precaution[], message: string, source: string, moduleIds?: string[]): Finding {
  const done = precautions.filter((p) => p.done === true).length;
  const open = precautions.filter((p) => p.done !== true);
  const tail = open.length
    ? ` Not yet confirmed: ${open.map((p) => (p.measured ? p.text : `${p.text} (tick “${p.field.label}” on the ${p.field.where === 'editor' ? 'module' : `${p.field.where} tab`})`)).join('; ')}.`
    : ' Every precaution is confirmed.';
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
