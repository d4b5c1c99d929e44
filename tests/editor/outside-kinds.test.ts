// Kinds that live outside the body come off the Parts shelf mounted there: a rear carrier (a bike
// rack, say) behind the rear of the bay, a spare wheel under the floor, a roof box on the roof.
// Placed, they pass their own fit rule and stay out of the interior's overlap rule. Invented demo
// figures: the harness's bay and the kinds' default sizes (600 mm carrier, 1000 mm projection
// allowed behind the rear — UK Construction and Use Regulations 1986, reg. 82, from memory).
import { describe, expect, it } from 'vitest';
import { runChecks } from '@/lib/checks';
import { sectionBand, sectionReach } from '@/lib/layout/bay';
import { harness } from './harness';

describe('outside kinds from the shelf', () => {
  it('a rear carrier goes behind the rear of the bay, wherever it is dropped, and projects within the limit', () => {
    const h = harness();
    const { length, width } = h.get().doc.bay;
    const dropped = h.get().addModule('rear-carrier', { x: length / 2, y: width / 2 });
    const m = h.byId(dropped.id!)!;
    expect(m.mount).toBe('rear');
    expect(m.x).toBe(length);
    const fit = runChecks(h.get().doc).findings.find((f) => f.id === 'fit.outside' && f.moduleIds?.includes(m.id))!;
    expect(fit).toMatchObject({ status: 'pass', measured: 600 });
    const shelved = h.get().addModule('rear-carrier');
    expect(h.byId(shelved.id!)!).toMatchObject({ mount: 'rear', x: length, y: Math.round((width - 1200) / 2) });
  });

  it('a spare wheel hangs under the floor and a roof box sits on the roof, neither clashing with what stands inside', () => {
    const h = harness();
    const counter = h.get().addModule('kitchen-counter').id!;
    const c = h.byId(counter)!;
    const wheel = h.byId(h.get().addModule('spare-wheel', { x: c.x + c.length / 2, y: c.y + c.width / 2 }).id!)!;
    const box = h.byId(h.get().addModule('roof-box', { x: c.x + c.length / 2, y: c.y + c.width / 2 }).id!)!;
    expect(wheel.mount).toBe('under-floor');
    expect(box.mount).toBe('roof');
    const findings = runChecks(h.get().doc).findings;
    const overlaps = findings.filter((f) => f.id === 'fit.overlap' && f.status !== 'pass');
    expect(overlaps.flatMap((f) => f.moduleIds ?? [])).not.toContain(wheel.id);
    expect(overlaps.flatMap((f) => f.moduleIds ?? [])).not.toContain(box.id);
    expect(findings.filter((f) => f.id === 'fit.outside').map((f) => f.moduleIds?.[0]).sort()).toEqual([wheel.id, box.id].sort());
  });
});

describe('the load floor height, set in the Bay panel', () => {
  it('moves the under-floor envelope: a 400 mm deep tank fails at the default and passes with the floor 650 mm above the road; undo puts the default back', () => {
    // Envelope = floor above the road − 200 mm ground clearance kept (both common practice, no source):
    // 550 − 200 = 350 mm by default, 650 − 200 = 450 mm once set.
    const h = harness();
    const id = h.get().addModule('grey-water-tank').id!;
    h.get().updateModule(id, { mount: 'under-floor', height: 400 }, 'Hang it under the floor');
    const fit = () => runChecks(h.get().doc).findings.find((f) => f.id === 'fit.outside' && f.moduleIds?.includes(id))!;
    expect(fit()).toMatchObject({ status: 'fail', measured: 400, required: 350 });
    expect(h.get().updateSettings({ floorAboveRoad: 650 }).ok).toBe(true);
    expect(fit()).toMatchObject({ status: 'pass', measured: 400, required: 450 });
    h.get().undo();
    expect(h.get().doc.settings?.floorAboveRoad).toBeUndefined();
    expect(h.get().updateSettings({ floorAboveRoad: -5 }).ok).toBe(false);
    expect(h.get().doc.settings?.floorAboveRoad).toBeUndefined();
  });
});

describe('the side section draws outside modules where they hang', () => {
  // A 2000 mm high bay with a 30 mm floor build-up (invented): inside, a 400 mm high module at
  // elevation 100 stands from 30 + 100 = 130 to 530 mm; a 200 mm deep tank under the floor spans
  // −200…0; a 400 mm roof box 2000…2400; a 600 mm carrier behind a 3100 mm bay reaches 600 past it.
  const base = { x: 0, length: 500, elevation: 100 };
  it('places each band by its mount and widens the figure by what reaches outside', () => {
    expect(sectionBand({ ...base, height: 400 }, 2000, 30)).toEqual({ z0: 130, z1: 530 });
    expect(sectionBand({ ...base, height: 200, mount: 'under-floor' }, 2000, 30)).toEqual({ z0: -200, z1: 0 });
    expect(sectionBand({ ...base, height: 400, mount: 'roof' }, 2000, 30)).toEqual({ z0: 2000, z1: 2400 });
    const doc = {
      bay: { length: 3100, height: 2000 },
      modules: [
        { ...base, height: 200, mount: 'under-floor' as const },
        { ...base, height: 400, mount: 'roof' as const },
        { ...base, x: 3100, length: 600, height: 1000, mount: 'rear' as const },
      ],
    };
    expect(sectionReach(doc as never, 30)).toEqual({ below: 200, above: 400, behind: 600 });
  });
});
