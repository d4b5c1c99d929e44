// The revision comparison in words: modules by label (or their kind's name), fields by the names
// the Details and Bay panels show, lengths in the studio's units — never a field key such as
// massKg, props or cabSeats, nor a module id.
import { describe, expect, it } from 'vitest';
import { diffRevisions } from '@/lib/layout/revision-diff';
import { bayChangeWords, moduleChangeWords, moduleName } from '@/lib/layout/revision-words';
import type { LayoutDoc, Module } from '@/lib/layout/schema';
import { starterLayout } from '@/lib/layout/templates';
import { KINDS } from '@/lib/layout/kinds';

const base = (): LayoutDoc => structuredClone(starterLayout('starter-l-lounge')!);
const KEYS = /massKg|props|cabSeats|wheelArches|buildUp|arrangements|elevation/;

describe('moduleChangeWords', () => {
  it('says what moved, and by how much, in the trade’s directions', () => {
    const before = base();
    const m = before.modules[0];
    const after = { ...before, modules: [{ ...m, x: m.x + 50, y: m.y - 20 }, ...before.modules.slice(1)] };
    const w = moduleChangeWords(diffRevisions(before, after).changed[0]);
    expect(w.verb).toBe('Moved');
    expect(w.lines).toEqual(['50 mm rearwards, 20 mm towards the left wall']);
  });

  it('names edited fields as the Details panel does, with before and after', () => {
    const before = base();
    const m: Module = { ...before.modules[0], kind: 'fridge', label: 'Rear bed', massKg: 60, props: { litres: 70 } };
    const doc = { ...before, modules: [m] };
    const after = { ...before, modules: [{ ...m, label: undefined, massKg: 72, facing: 'left' as const, props: { litres: 100, watts: 60 } }] };
    const c = diffRevisions(doc, after).changed[0];
    const w = moduleChangeWords(c);
    expect(w.verb).toBe('Changed');
    expect(w.lines).toEqual(expect.arrayContaining([
      'Label: Rear bed → none',
      'Mass: 60 kg → 72 kg',
      'Capacity (litres): 70 → 100',
      'Power (W): none → 60',
    ]));
    expect(w.lines.join(' ')).not.toMatch(KEYS);
    expect(w.lines.join(' ')).not.toContain(m.id);
    expect(moduleName(c.after)).toBe(KINDS[m.kind].title); // no label: the kind's name
  });

  it('shows a resize in the studio’s units and calls a 90° swap a turn', () => {
    const before = base();
    const m = { ...before.modules[0], length: 1900, width: 1400, height: 400 };
    const doc = { ...before, modules: [m] };
    const turned = moduleChangeWords(diffRevisions(doc, { ...doc, modules: [{ ...m, length: 1400, width: 1900 }] }).changed[0], 'cm');
    expect(turned.verb).toBe('Turned');
    expect(turned.lines[0]).toBe('190 cm × 140 cm × 40 cm → 140 cm × 190 cm × 40 cm');
  });
});

describe('bayChangeWords', () => {
  it('uses the Bay panel’s names', () => {
    const before = base();
    const after = { ...before, bay: { ...before.bay, cabSeats: before.bay.cabSeats + 1, height: before.bay.height + 100 } };
    const words = diffRevisions(before, after).bay.map((b) => bayChangeWords(b));
    expect(words).toEqual(expect.arrayContaining([
      `Seats in the cab: ${before.bay.cabSeats} → ${before.bay.cabSeats + 1}`,
      `Bay height: ${before.bay.height} mm → ${before.bay.height + 100} mm`,
    ]));
    expect(words.join(' ')).not.toMatch(KEYS);
  });
});
