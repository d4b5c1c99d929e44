/**
 * Why a candidate does not work, in the trade's words, with the rule's plain name and both numbers
 * taken from the check finding (measured and required) or from the layout miss. Bed length,
 * bed width and standing headroom get a sentence of their own ("a bed across needs 1970 mm for
 * the 1870 mm sleeper; the lined width here is 1728 mm"); every other rule is named with its
 * numbers and the check's own message. Pure: must never import React, Next, the database or the services.
 */
import { ruleName } from '../checks/words';
import type { Finding } from '../checks/types';
import { buildUpThickness } from '../layout/bay';
import type { LayoutDoc } from '../layout/schema';
import type { LayoutMiss } from './patterns';

export interface Reason {
  /** The rule's plain name. */
  rule: string;
  measured: number;
  required: number;
  unit: string;
  message: string;
  /** Keeps reasons of one rule about different things apart (a bed across vs lengthways). */
  context?: string;
}

const mm = (n: number) => `${Math.round(n)} mm`;

export function explainFinding(f: Finding, doc: LayoutDoc, bedAcross: boolean): Reason {
  const measured = f.measured ?? 0;
  const required = f.required ?? 0;
  const unit = f.unit ?? '';
  const rule = ruleName(f.id);
  const base = { rule, measured, required, unit };
  const t = buildUpThickness(doc);
  const linedWidth = doc.bay.width - 2 * t.wallT;
  switch (f.id) {
    case 'sleep.length': {
      const tallest = Math.max(...doc.occupants.sleepers);
      const across = bedAcross && measured <= linedWidth;
      const where = across ? (measured === linedWidth ? `the lined width here is ${mm(measured)}` : `the bed across is ${mm(measured)} long`) : `the bed is ${mm(measured)} long`;
      return { ...base, context: across ? 'across' : 'lengthways', message: `A bed ${across ? 'across' : 'lengthways'} needs ${mm(required)} for the ${mm(tallest)} sleeper (stature + ${mm(required - tallest)}); ${where}.` };
    }
    case 'sleep.width': {
      const people = Math.round(required / 600) || 1;
      return { ...base, message: `The bed for ${people === 1 ? 'one sleeper' : `${people} sleepers`} needs ${mm(required)} of width; it is ${mm(measured)} wide here${bedAcross ? '' : ` (the lined width is ${mm(linedWidth)})`}.` };
    }
    case 'headroom.standing':
      return { ...base, message: `Standing upright needs ${mm(required)} (the ${mm(doc.occupants.standingHeight)} stature + ${mm(required - doc.occupants.standingHeight)} margin); the clear height here is ${mm(measured)} after the floor and roof build-up.` };
    default:
      return { ...base, context: f.arrangement, message: `${rule}: ${unit === 'mm' ? `needs ${mm(required)}, has ${mm(measured)}` : `needs ${required} ${unit}, has ${measured}`}. ${f.message}` };
  }
}

export function explainMiss(m: LayoutMiss): Reason {
  return { rule: m.rule, measured: m.measured, required: m.required, unit: m.unit, message: m.message };
}
