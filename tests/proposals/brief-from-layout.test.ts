/**
 * The brief read back from an existing layout: every figure worked out here by hand from the
 * modules this test draws, and the brief always passes the brief's own schema.
 */
import { describe, expect, it } from 'vitest';
import { briefFromLayout, briefSchema } from '@/lib/proposals';
import { l2h2Doc, L2H2, mod } from '../checks/helpers';

describe('briefFromLayout', () => {
  it('reads the bay, sleepers, bed, kitchen, water, wet room and fuel from the layout', () => {
    const doc = l2h2Doc({
      occupants: { standingHeight: 1750, sleepers: [1800, 1600] },
      modules: [
        mod({ id: 'bed', kind: 'bed-platform', x: 1200, y: 36, length: 1900, width: 1300, elevation: 400, height: 200, surfaces: { travel: 'sleep', lounge: 'sleep', sleep: 'sleep' } }),
        mod({ id: 'sink', kind: 'sink-unit', x: 200, y: 36, length: 450, width: 500 }),
        mod({ id: 'counter', kind: 'kitchen-counter', x: 650, y: 36, length: 520, width: 500 }),
        mod({ id: 'hob', kind: 'hob', x: 700, y: 111, length: 500, width: 350, elevation: 900, height: 60, props: { burners: 2, fuel: 'LPG' } }),
        mod({ id: 'fridge', kind: 'fridge', x: 1500, y: 1264, length: 450, width: 480, height: 560, props: { litres: 40, watts: 45, dutyCycle: 0.33 } }),
        mod({ id: 'fresh', kind: 'fresh-water-tank', x: 1300, y: 500, length: 600, width: 350, height: 300, props: { litres: 60 } }),
        mod({ id: 'toilet', kind: 'toilet-cabinet', x: 1000, y: 1264, length: 450, width: 500, height: 500 }),
      ],
    });
    const b = briefFromLayout(doc);
    expect(briefSchema.safeParse(b).success).toBe(true);
    expect(b.bay).toEqual({ source: 'measured', bay: L2H2 });
    expect(b.sleepers).toEqual([1800, 1600]);
    expect(b.standing).toBe(1750);
    // The bed is 1900 mm along the van and 1300 mm across: lengthways.
    expect(b.bed).toBe('lengthways');
    // Sink 450 mm + counter 520 mm = 970 mm of counter.
    expect(b.kitchen).toEqual({ counterMin: 970, sink: true, hob: true, fridge: 'medium' }); // 40 L: over small's 30 L, within medium's 50 L
    // 60 L of fresh water ÷ (2 people × 10 L a day, the water plan's default) = 3 days.
    expect(b.water).toEqual({ days: 3, people: 2 });
    expect(b.toilet).toBe(true);
    expect(b.shower).toBe(false);
    expect(b.fuel).toBe('gas'); // the hob burns LPG
  });

  it('an empty layout: sleepers and water as typical, no kitchen, no preference for the bed, all-electric', () => {
    const b = briefFromLayout(l2h2Doc({ occupants: { standingHeight: 0, sleepers: [] } }));
    expect(briefSchema.safeParse(b).success).toBe(true);
    // No sleepers listed and no bed drawn: the typical two sleepers (1800 and 1650 mm).
    expect(b.sleepers).toEqual([1800, 1650]);
    expect(b.standing).toBeNull();
    expect(b.bed).toBe('any');
    expect(b.kitchen).toEqual({ counterMin: 0, sink: false, hob: false, fridge: 'none' });
    expect(b.fuel).toBe('electric');
    expect(b.toilet || b.shower).toBe(false);
  });

  it('reads gas as the gas checks do: a hob with no fuel given burns gas, an induction hob does not', () => {
    const hob = (props: Record<string, unknown>) => l2h2Doc({ modules: [mod({ id: 'hob', kind: 'hob', x: 700, y: 111, length: 500, width: 350, elevation: 900, height: 60, props })] });
    expect(briefFromLayout(hob({ burners: 2 })).fuel).toBe('gas');
    expect(briefFromLayout(hob({ burners: 2, fuel: 'electric' })).fuel).toBe('electric');
  });
});
