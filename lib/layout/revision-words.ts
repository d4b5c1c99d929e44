/**
 * A revision comparison in words, for the compare screen and the plan sheet's revision notes:
 * each module named by its label (or its kind's name), each field by its on-screen name
 * (lib/layout/field-words), each length in the studio's units. "Mass: 60 kg → 72 kg", never
 * "massKg". Pure: a diff in, sentences out; must never import React, Next or the database.
 */
import { KINDS, moduleLabel } from './kinds';
import { BAY_FIELD_WORDS, FACING_WORDS, MODULE_FIELD_WORDS, MOUNT_WORDS, propWord, surfacesWords } from './field-words';
import { openingTitle } from './openings';
import type { BayChange, ModuleChange, OpeningChange } from './revision-diff';
import type { Bay, Module, Opening } from './schema';
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

function openingSize(o: Opening, units: LengthUnit): string {
  if (o.type === 'window') return `${formatLength(o.width, units)} × ${formatLength(o.height, units)}`;
  if (o.type === 'roof-opening') return `${formatLength(o.length, units)} × ${formatLength(o.width, units)}`;
  return '';
}

/** An opening added or removed, in words: "Window in the left wall, 600 mm × 400 mm". */
export function openingWords(bay: Pick<Bay, 'doors'>, o: Opening, units: LengthUnit = 'mm'): string {
  const size = openingSize(o, units);
  return size ? `${openingTitle(bay, o)}, ${size}` : openingTitle(bay, o);
}

/**
 * What happened to one opening, like a module: a verb ("Moved", "Resized"…) and short lines. Along
 * a side wall forwards or rearwards, along the rear wall towards the left or right wall; a roof
 * opening or a point underneath rearwards and across.
 */
export function openingChangeWords(bay: Pick<Bay, 'doors'>, c: OpeningChange, units: LengthUnit = 'mm'): { name: string; verb: string; lines: string[] } {
  const lines: string[] = [];
  const verbs: string[] = [];
  const a = c.after;
  if (c.moved) {
    verbs.push('moved');
    const onRear = (a.type === 'window' && (a.wall === 'rear' || bay.doors.find((d) => d.id === a.door)?.wall === 'rear')) || (a.type === 'body-point' && a.wall === 'rear');
    const parts = [
      onRear ? along(c.moved.dAlong, 'towards the right wall', 'towards the left wall', units) : along(c.moved.dAlong, 'rearwards', 'forwards', units),
      along(c.moved.dAcross, 'towards the right wall', 'towards the left wall', units),
      along(c.moved.dUp, 'up', 'down', units),
    ].filter(Boolean);
    lines.push(parts.join(', '));
  }
  if (c.resized) {
    verbs.push('resized');
    lines.push(`${openingSize(c.before, units)} → ${openingSize(a, units)}`);
  }
  const b = c.before;
  for (const field of c.other) {
    if (field === 'label') lines.push(`Label: ${value(b.label)} → ${value(a.label)}`);
    else if (field === 'opens' && a.type === 'window' && b.type === 'window') lines.push(`Opens: ${value(b.opens)} → ${value(a.opens)}`);
    else if (field === 'frame') lines.push(`Frame: ${frameWords(b, units)} → ${frameWords(a, units)}`);
    else lines.push(`${openingTitle(bay, b)} → ${openingTitle(bay, a)}`);
  }
  if (!verbs.length) verbs.push('changed');
  const verb = verbs.join(' and ');
  return { name: openingTitle(bay, a), verb: verb.charAt(0).toUpperCase() + verb.slice(1), lines: [...new Set(lines.filter(Boolean))] };
}

function frameWords(o: Opening, units: LengthUnit): string {
  if (o.type === 'window') return o.frameDepth === undefined ? 'none' : formatLength(o.frameDepth, units);
  if (o.type === 'roof-opening') return formatLength(o.frameHeight, units);
  return 'none';
}
