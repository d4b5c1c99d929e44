// Schema version 3: a module's top is said per arrangement (`surfaces`) and a module may be mounted
// outside the body (`mount`). Documents stored in version 2 (one `surface` for every arrangement)
// and version 1 (also free-bag props) open unchanged in meaning: the old surface becomes the value
// in every arrangement the module was present in, nothing else moves, and the checks measure the
// same bed they measured before. Every expected value below is written out by hand.
import { describe, expect, it } from 'vitest';
import { runChecks } from '@/lib/checks';
import { parseLayoutDoc } from '@/lib/layout/parse';

/** A lounge van as version 2 wrote it (invented figures). */
function versionTwo(): Record<string, any> {
  return {
    schemaVersion: 2,
    name: 'Stored lounge van',
    bay: { length: 3000, width: 1800, height: 1900, wheelArches: [], doors: [{ id: 'rear', wall: 'rear', offset: 0, width: 1800 }], bulkhead: true, cabSeats: 2 },
    buildUp: { floor: [], roof: [], walls: [] },
    occupants: { standingHeight: 1800, sleepers: [1800] },
    modules: [
      // Benches marked "seat": version 2 left them out of the bed.
      { id: 'bench-l', kind: 'bench-seat', label: 'Left bench', x: 1000, y: 0, length: 1900, width: 600, elevation: 0, height: 460, facing: 'right', arrangements: ['lounge', 'sleep'], surface: 'seat', massKg: 22 },
      { id: 'bench-r', kind: 'bench-seat', label: 'Right bench', x: 1000, y: 1200, length: 1900, width: 600, elevation: 0, height: 460, facing: 'left', arrangements: ['lounge', 'sleep'], surface: 'seat' },
      { id: 'infill', kind: 'bed-infill', label: 'Infill', x: 1000, y: 600, length: 1900, width: 600, elevation: 380, height: 80, facing: 'front', arrangements: ['sleep'], surface: 'sleep' },
      { id: 'table', kind: 'table', x: 1200, y: 700, length: 600, width: 400, elevation: 700, height: 30, facing: 'left', arrangements: ['lounge'], surface: 'counter' },
      { id: 'tank', kind: 'fresh-water-tank', x: 100, y: 100, length: 700, width: 350, elevation: 0, height: 300, facing: 'front', arrangements: ['travel', 'lounge', 'sleep'], props: { litres: 70 } },
    ],
  };
}

describe('a version-2 document opens in version 3 unchanged in meaning', () => {
  const parsed = parseLayoutDoc(versionTwo());

  it('reads as version 3, each old surface set in every arrangement the module is in', () => {
    expect(parsed.ok).toBe(true);
    if (!parsed.ok) return;
    const doc = parsed.value;
    expect(doc.schemaVersion).toBe(4);
    const byId = (id: string) => doc.modules.find((m) => m.id === id)!;
    expect(byId('bench-l').surfaces).toEqual({ lounge: 'seat', sleep: 'seat' });
    expect(byId('bench-r').surfaces).toEqual({ lounge: 'seat', sleep: 'seat' });
    expect(byId('infill').surfaces).toEqual({ sleep: 'sleep' });
    expect(byId('table').surfaces).toEqual({ lounge: 'counter' });
    expect(byId('tank').surfaces).toBeUndefined();
    expect(byId('tank').props).toEqual({ litres: 70 }); // a typed capacity stays typed
    for (const m of doc.modules) expect(m).not.toHaveProperty('surface');
    for (const m of doc.modules) expect(m.mount).toBeUndefined(); // inside, as before
  });

  it('keeps everything else as stored', () => {
    if (!parsed.ok) throw new Error('did not parse');
    const stored = versionTwo();
    const strip = (m: Record<string, unknown>) => {
      const { surface: _s, surfaces: _ss, ...rest } = m;
      return rest;
    };
    expect(parsed.value.modules.map((m) => strip(m as never))).toEqual(stored.modules.map(strip));
    expect(parsed.value.bay).toEqual({ ...stored.bay, openings: [] }); // version 4 adds the (empty) openings
    expect(parsed.value.occupants).toEqual(stored.occupants);
  });

  it('the checks still measure the same bed: only the 1900 × 600 infill, as version 2 did', () => {
    if (!parsed.ok) throw new Error('did not parse');
    const length = runChecks(parsed.value).findings.filter((f) => f.id === 'sleep.length');
    expect(length).toHaveLength(1);
    expect(length[0].moduleIds).toEqual(['infill']);
    // 1900 mm long: the 1800 mm sleeper needs 1800 + 100 = 1900 mm, so it passes on length…
    expect(length[0].measured).toBe(1900);
    // …and is 600 mm wide, exactly one sleeper's 600 mm.
    const width = runChecks(parsed.value).findings.find((f) => f.id === 'sleep.width')!;
    expect(width.measured).toBe(600);
  });

  it('a version-3 document carrying the old single surface is refused with the field named', () => {
    const doc = { ...versionTwo(), schemaVersion: 3 };
    const r = parseLayoutDoc(doc);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.issues[0].path).toMatch(/^modules\.0/);
  });
});

describe('a version-1 document steps through both migrations', () => {
  it('types its free-bag props and spreads its surface over its arrangements', () => {
    const v1 = versionTwo();
    v1.schemaVersion = 1;
    v1.modules[4].props = { litres: '45', colour: 'white' }; // version 1 allowed text and unknown names
    const r = parseLayoutDoc(v1);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.value.schemaVersion).toBe(4);
    expect(r.value.modules[4].props).toEqual({ litres: 45 });
    expect(r.value.modules[0].surfaces).toEqual({ lounge: 'seat', sleep: 'seat' });
    expect(r.value.modules[2].surfaces).toEqual({ sleep: 'sleep' });
  });
});
