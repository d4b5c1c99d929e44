// Heat loss from the drawn openings (lib/planning/heat-loss.ts): the bay's drawn windows and roof
// openings replace the window list typed on the heat tab when any is drawn, and the heat-loss
// finding says which was used. Sources: EN ISO 6946 for the faces (as in water-gas-heat.test.ts);
// a drawn opening without a typed U counts as single glazing, U 5.7 W/m²K — from memory.
// The bay is the L2H2 template's: 3.1 × 1.8 × 2.0 m.
import { describe, expect, it } from 'vitest';
import { heatLoss } from '@/lib/planning';
import { heatChecks } from '@/lib/checks/systems';
import { baseDoc, withModules, withOpenings, withSystems } from './fixtures';

// A 600 × 400 mm window in the left wall (0.24 m²) and a 400 × 400 mm roof vent (0.16 m²).
const drawn = [
  { id: 'win', type: 'window' as const, wall: 'left' as const, position: 500, sillHeight: 1000, width: 600, height: 400, opens: true },
  { id: 'vent', type: 'roof-opening' as const, kind: 'vent' as const, x: 500, y: 700, length: 400, width: 400, frameHeight: 40 },
];
const typed = { insulation: { windows: [{ id: 'typed', face: 'walls' as const, areaM2: 0.5, uValue: 2.8 }] } };

describe('heat loss from drawn openings', () => {
  it('nothing drawn: the typed list counts (0.5 m² × 2.8 = 1.4 W/K) and the finding says so', () => {
    const doc = withSystems(baseDoc(), typed);
    const h = heatLoss(doc);
    expect(h.windowsFrom).toBe('typed');
    expect(h.windowsWPerK).toBeCloseTo(1.4, 9);
    const loss = heatChecks(doc).find((f) => f.id === 'heat.loss')!;
    expect(loss.message).toMatch(/Windows from the list on the heat tab \(0\.50 m²\); none drawn\./);
  });

  it('drawn, nothing typed: 0.24 × 5.7 + 0.16 × 5.7 = 1.368 + 0.912 = 2.28 W/K, taken off the walls and the roof', () => {
    const h = heatLoss(withOpenings(baseDoc(), drawn));
    expect(h.windowsFrom).toBe('drawn');
    expect(h.windowsWPerK).toBeCloseTo(2.28, 9);
    // Walls 2 × 3.1 × 2.0 + 2 × 1.8 × 2.0 = 19.6 m², less 0.24 = 19.36; roof 3.1 × 1.8 = 5.58, less 0.16 = 5.42.
    expect(h.faces.find((f) => f.face === 'walls')!.areaM2).toBeCloseTo(19.36, 9);
    expect(h.faces.find((f) => f.face === 'roof')!.areaM2).toBeCloseTo(5.42, 9);
    expect(h.faces.find((f) => f.face === 'floor')!.areaM2).toBeCloseTo(5.58, 9);
  });

  it('drawn and typed: the drawn areas count, at the typed U of their face (walls 2.8), else 5.7 (roof)', () => {
    const h = heatLoss(withSystems(withOpenings(baseDoc(), drawn), typed));
    // 0.24 × 2.8 = 0.672; 0.16 × 5.7 = 0.912; together 1.584 W/K. The typed 0.5 m² is not counted.
    expect(h.windowsWPerK).toBeCloseTo(1.584, 9);
    expect(h.faces.find((f) => f.face === 'walls')!.areaM2).toBeCloseTo(19.36, 9);
  });

  it('the heat-loss finding names the drawn windows, their area and U, and that the typed list stands aside', () => {
    const doc = withSystems(withModules(withOpenings(baseDoc(), drawn), [{ id: 'h', kind: 'heater', props: { watts: 2000 } }]), typed);
    const loss = heatChecks(doc).find((f) => f.id === 'heat.loss')!;
    // 0.24 + 0.16 = 0.40 m²; U 2.8 on the wall window, 5.7 on the roof vent.
    expect(loss.message).toContain('Windows as drawn: 1 in the walls and doors, 1 roof opening, 0.40 m² at U 2.80 and 5.70 W/m²K (the list on the heat tab is used only when none is drawn).');
    expect(loss.source).toMatch(/single glazing about 5\.7 W\/m²K \(from memory\)/);
  });
});
