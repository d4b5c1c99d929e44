// The revision comparison understands openings like modules: matched by id, added, removed,
// moved (along the wall, up, across) or resized, in words with lengths. Invented openings on the
// starter rear-bed layout (3800 × 1800 bay; sliding door right, rear door 150–1650).
import { describe, expect, it } from 'vitest';
import { diffRevisions } from '@/lib/layout/revision-diff';
import { openingChangeWords, openingWords } from '@/lib/layout/revision-words';
import { layoutDocSchema, starterLayout, type LayoutDoc } from '@/lib/layout';

const before = starterLayout('starter-rear-bed')!;

function edit(change: (openings: LayoutDoc['bay']['openings']) => LayoutDoc['bay']['openings']): LayoutDoc {
  const doc = structuredClone(before);
  return layoutDocSchema.parse({ ...doc, bay: { ...doc.bay, openings: change(doc.bay.openings) } });
}

describe('openings in the revision diff', () => {
  it('an unchanged document has no opening changes', () => {
    expect(diffRevisions(before, structuredClone(before)).openings).toEqual({ added: [], removed: [], changed: [] });
  });

  it('lists an added and a removed opening, in words with its size', () => {
    const after = edit((os) => [...os.filter((o) => o.id !== 'bed-vent'), { id: 'sky', type: 'roof-opening', kind: 'skylight', x: 2500, y: 600, length: 700, width: 500, frameHeight: 60 }]);
    const d = diffRevisions(before, after).openings;
    expect(d.added.map((o) => o.id)).toEqual(['sky']);
    expect(d.removed.map((o) => o.id)).toEqual(['bed-vent']);
    expect(openingWords(after.bay, d.added[0])).toBe('Skylight, 700 mm × 500 mm');
    expect(openingWords(before.bay, d.removed[0])).toBe('Roof vent, 400 mm × 400 mm');
  });

  it('a window moved 200 mm rearwards and 50 mm up, and made 100 mm wider', () => {
    // Kitchen window: position 500 → 700, sill 1000 → 1050, width 600 → 700.
    const after = edit((os) => os.map((o) => (o.id === 'kitchen-window' && o.type === 'window' ? { ...o, position: 700, sillHeight: 1050, width: 700 } : o)));
    const [c] = diffRevisions(before, after).openings.changed;
    expect(c.moved).toEqual({ dAlong: 200, dAcross: 0, dUp: 50 });
    expect(c.resized).toEqual({ dA: 100, dB: 0 });
    expect(openingChangeWords(after.bay, c)).toEqual({ name: 'Kitchen window', verb: 'Moved and resized', lines: ['200 mm rearwards, 50 mm up', '600 mm × 400 mm → 700 mm × 400 mm'] });
  });

  it('a window in the rear door moves towards the right wall; a roof opening rearwards and across', () => {
    const after = edit((os) => os.map((o) => {
      if (o.id === 'rear-window-left' && o.type === 'window') return { ...o, position: 150 };
      if (o.id === 'roof-fan' && o.type === 'roof-opening') return { ...o, x: 350, y: 500 };
      return o;
    }));
    const changed = diffRevisions(before, after).openings.changed;
    const rear = changed.find((c) => c.id === 'rear-window-left')!;
    expect(openingChangeWords(after.bay, rear)).toMatchObject({ name: 'Window in the rear door', verb: 'Moved', lines: ['50 mm towards the right wall'] });
    const fan = changed.find((c) => c.id === 'roof-fan')!;
    // x 450 → 350 is 100 mm forwards; y 450 → 500 is 50 mm towards the right wall.
    expect(openingChangeWords(after.bay, fan).lines).toEqual(['100 mm forwards, 50 mm towards the right wall']);
  });

  it('other edits: an opening window made fixed, a frame added, a gas vent moved under the floor', () => {
    const after = edit((os) => os.map((o) => {
      if (o.id === 'slide-window' && o.type === 'window') return { ...o, opens: false, frameDepth: 40 };
      if (o.id === 'gas-vent' && o.type === 'body-point') return { ...o, across: 1100 };
      return o;
    }));
    const changed = diffRevisions(before, after).openings.changed;
    expect(openingChangeWords(after.bay, changed.find((c) => c.id === 'slide-window')!)).toEqual({ name: 'Window in the right-hand door', verb: 'Changed', lines: ['Opens: yes → no', 'Frame: none → 40 mm'] });
    expect(openingChangeWords(after.bay, changed.find((c) => c.id === 'gas-vent')!)).toMatchObject({ name: 'Gas locker drop-out vent', verb: 'Moved', lines: ['100 mm towards the left wall'] });
  });
});

describe('findings about openings in the comparison', () => {
  it('pairs the same outlet finding by its openings, whatever the order of the reports', async () => {
    const { diffFindings } = await import('@/lib/layout/revision-diff');
    const f = (to: string, status: 'pass' | 'fail') => ({ id: 'clearance.exhaust', status, openingIds: ['ex', to], message: `to ${to}` });
    // Before: both pairs meet. After, listed the other way round: only the pair with the filler fails.
    const changes = diffFindings([f('win', 'pass'), f('fill', 'pass')], [f('fill', 'fail'), f('win', 'pass')]);
    expect(changes).toEqual([expect.objectContaining({ id: 'clearance.exhaust', before: 'pass', after: 'fail', direction: 'worse', message: 'to fill' })]);
  });
});
