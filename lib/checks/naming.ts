/**
 * How findings name things in words: modules by their label or kind name (never an id; a finding
 * carries `moduleIds` for the drawing to highlight),
 * lists joined in plain English, lengths with units. Pure text; must never import UI,
 * framework or database code.
 */
import { kindSpec } from '../layout/kinds';
import type { Module } from '../layout/schema';

export function moduleName(m: Pick<Module, 'kind' | 'label'>): string {
  return m.label?.trim() || kindSpec(m.kind)?.title || 'Module';
}

export function listNames(names: string[], max = 6): string {
  if (names.length <= max) {
    if (names.length <= 1) return names.join('');
    return `${names.slice(0, -1).join(', ')} and ${names[names.length - 1]}`;
  }
  return `${names.slice(0, max).join(', ')} and ${names.length - max} more`;
}

export function mm(n: number): string {
  return `${Math.round(n)} mm`;
}

export function plural(n: number, one: string, many = `${one}s`): string {
  return `${n} ${n === 1 ? one : many}`;
}
