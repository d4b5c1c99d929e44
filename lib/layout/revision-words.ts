/**
 * A revision comparison in words, for the compare screen and the plan sheet's revision notes:
 * each module named by its label (or its kind's name), each field by its on-screen name
 * (lib/layout/field-words), each length in the studio's units. "Mass: 60 kg → 72 kg", never
 * "massKg". Pure: a diff in, sentences out; must never import React, Next or the database.
 */
import { KINDS, moduleLabel } from './kinds';
import { BAY_FIELD_WORDS, FACING_WORDS, MODULE_FIELD_WORDS, MOUNT_WORDS, propWord, surfacesWords } from './field-words';
import type { BayChange, ModuleChange } from './revision-diff';
import type { Module } from './schema';
import { formatLength, type LengthUnit } from './units';

/** A module's name in a change list: the one naming rule of lib/layout/kinds (`moduleLabel`). */
export function moduleName(m: Pick<Module, 'label' | 'kind'>): string {
  return moduleLabel(m);
}

const ARR_WORD = { travel: 'travel', lounge: 'lounge', sleep: 'sleep' } as const;

function value(v: unknown): string {
  if (v === undefined || v === null || v === '') return 'none';
  if (typeof v === 'boolean') return v ? 'yes' : 'no';
  return String(v);
}

function along(d: number, plus: string, minus: string, units: LengthUnit): string | null {
  if (!d) return null;
  return `${formatLength(Math.abs(d), units)} ${d > 0 ? plus : minus}`;
}

function size(m: Module, units: LengthUnit): string {
  return `${formatLength(m.length, units)} × ${formatLength(m.width, units)} × ${formatLength(m.height, units)}`;
}

/** What happened to one module, as a verb ("Moved", "Moved and resized"…) and short lines. */
export function moduleChangeWords(c: ModuleChange, units: LengthUnit = 'mm'): { verb: string; lines: string[] } {
  const lines: string[] = [];
  const verbs: string[] = [];
  if (c.moved) {
    verbs.push('moved');
    const parts = [
      along(c.moved.dx, 'rearwards', 'forwards', units),
      along(c.moved.dy, 'towards the right wall', 'towards the left wall', units),
      along(c.moved.dz, 'up', 'down', units),
    ].filter(Boolean);
    lines.push(parts.join(', '));
  }
  if (c.resized) {
    verbs.push(c.resized.rotated ? 'turned' : 'resized');
    lines.push(`${size(c.before, units)} → ${size(c.after, units)}`);
  }
  const b = c.before;
  const a = c.after;
  for (const field of c.other) {
    if (field === 'kind') lines.push(`${MODULE_FIELD_WORDS.kind}: ${KINDS[b.kind].title} → ${KINDS[a.kind].title}`);
    else if (field === 'label') lines.push(`${MODULE_FIELD_WORDS.label}: ${value(b.label)} → ${value(a.label)}`);
    else if (field === 'facing') lines.push(`${MODULE_FIELD_WORDS.facing}: ${FACING_WORDS[b.facing]} → ${FACING_WORDS[a.facing]}`);
    else if (field === 'arrangements') lines.push(`${MODULE_FIELD_WORDS.arrangements}: ${b.arrangements.map((x) => ARR_WORD[x]).join(', ')} → ${a.arrangements.map((x) => ARR_WORD[x]).join(', ')}`);
    else if (field === 'surfaces') lines.push(`${MODULE_FIELD_WORDS.surfaces}: ${surfacesWords(b)} → ${surfacesWords(a)}`);
    else if (field === 'mount') lines.push(`${MODULE_FIELD_WORDS.mount}: ${MOUNT_WORDS[b.mount ?? 'inside']} → ${MOUNT_WORDS[a.mount ?? 'inside']}`);
    else if (field === 'massKg') lines.push(`${MODULE_FIELD_WORDS.massKg}: ${b.massKg === undefined ? 'none' : `${b.massKg} kg`} → ${a.massKg === undefined ? 'none' : `${a.massKg} kg`}`);
    else if (field === 'props') {
      const bp: Record<string, unknown> = b.props ?? {};
      const ap: Record<string, unknown> = a.props ?? {};
      const keys = [...new Set([...Object.keys(bp), ...Object.keys(ap)])].sort();
      for (const k of keys) {
        const before = bp[k];
        const after = ap[k];
        if (JSON.stringify(before ?? null) !== JSON.stringify(after ?? null)) lines.push(`${propWord(k)}: ${value(before)} → ${value(after)}`);
      }
    }
  }
  if (!verbs.length) verbs.push('changed');
  const verb = verbs.join(' and ');
  return { verb: verb.charAt(0).toUpperCase() + verb.slice(1), lines: lines.filter(Boolean) };
}

/** One line per change to the bay itself: "Seats in the cab: 2 → 3", "Bay height: 1800 mm → 1900 mm". */
export function bayChangeWords(b: BayChange, units: LengthUnit = 'mm'): string {
  const name = BAY_FIELD_WORDS[b.field];
  if (b.field === 'length' || b.field === 'width' || b.field === 'height') {
    return `${name}: ${formatLength(Number(b.before), units)} → ${formatLength(Number(b.after), units)}`;
  }
  if (b.field === 'wheelArches' || b.field === 'doors') {
    const n = (s: string) => `${s} ${b.field === 'doors' ? (s === '1' ? 'door' : 'doors') : s === '1' ? 'arch' : 'arches'}`;
    return b.before === b.after ? `${name}: changed (${n(b.after)})` : `${name}: ${n(b.before)} → ${n(b.after)}`;
  }
  return `${name}: ${b.before} → ${b.after}`;
}
