// The kind registry (lib/layout/kinds.ts): every kind has a shelf entry, round-trips through the
// document schema, draws a symbol inside its outline, and gives planning its facts; its typed
// values refuse names it does not declare. The expected facts below are written out by hand from
// what each kind is in the trade (a fridge draws power part of the day, a heater gives heat, a tank
// holds water, a gas locker holds cylinders, a travel seat is belted, a counter is a carcass with a
// worktop); the sizes, defaults and carcass panels are the registry's own starting points (common
// practice, no source).
import { describe, expect, it } from 'vitest';
import { KINDS, MODULE_KINDS, kindFacts, kindSpec, kindValuesSchema, shownFields, type KindFacts, type ModuleKind } from '@/lib/layout/kinds';
import { moduleSchema, type Module } from '@/lib/layout/schema';
import { parseLayoutDoc } from '@/lib/layout/parse';
import { starterLayout } from '@/lib/layout/templates';
import { moduleSymbol } from '@/lib/symbols/module-symbols';
import { moduleFromKind } from '@/components/editor/store/moduleEdits';
import { matchKinds } from '@/components/editor/panels/partsSearch';

/** What planning should read from a module placed with its kind's defaults. */
const FACTS_OF_DEFAULTS: Record<ModuleKind, KindFacts> = {
  'bed-platform': { carcass: { pieces: ['worktop', 'front'], shelves: 0, topName: 'bed top' } },
  'bed-infill': { carcass: { pieces: ['top'], shelves: 0 } },
  'bench-seat': { carcass: { pieces: ['sides', 'top', 'front'], shelves: 0 } },
  seat: { seat: { belted: true, approvedType: false, anchorageTested: false } },
  table: { carcass: { pieces: ['worktop'], shelves: 0, topName: 'table top' } },
  'kitchen-counter': { carcass: { pieces: ['sides', 'bottom', 'back', 'shelves', 'worktop'], shelves: 1 } },
  'sink-unit': { carcass: { pieces: ['sides', 'bottom', 'back', 'worktop'], shelves: 0 } },
  hob: { gasAppliance: { flueless: true, untypedFuel: 'gas' } },
  fridge: { load: { watts: 45, dutyCycle: 0.33 } },
  wardrobe: { carcass: { pieces: ['sides', 'top', 'bottom', 'back', 'shelves'], shelves: 1 } },
  'drawer-unit': { carcass: { pieces: ['sides', 'top', 'bottom', 'back', 'shelves'], shelves: 2 } },
  'overhead-locker': { carcass: { pieces: ['sides', 'top', 'bottom', 'back'], shelves: 0 } },
  // Capacity from the default drawn size less a 5 mm wall on every face (common practice, no source):
  // fresh 700 × 350 × 300 → 690 × 340 × 290 mm = 68.034 L; grey 600 × 350 × 250 → 590 × 340 × 240 mm = 48.144 L.
  'fresh-water-tank': { water: { use: 'fresh', litres: expect.closeTo(68.034, 3), basis: 'drawn', drawnLitres: expect.closeTo(68.034, 3) } },
  'grey-water-tank': { water: { use: 'grey', litres: expect.closeTo(48.144, 3), basis: 'drawn', drawnLitres: expect.closeTo(48.144, 3) } },
  'gas-locker': { gasCylinders: { count: 1, kgEach: 6 }, notCut: expect.stringMatching(/sealed, purpose-made box/) },
  'electrics-bay': { carcass: { pieces: ['sides', 'top', 'bottom', 'back'], shelves: 0 } },
  heater: { heatOutputW: 2000, gasAppliance: { flueless: false, untypedFuel: 'heating' } },
  'toilet-cabinet': { carcass: { pieces: ['sides', 'top', 'back'], shelves: 0 } },
  'shower-tray': {},
  step: { carcass: { pieces: ['sides', 'top', 'front'], shelves: 0 } },
  // Mounted outside the body: bought, not built, so nothing to cut and no load.
  'spare-wheel': {},
  'roof-box': {},
  'rear-carrier': {},
  // A solar panel gives the power budget its rated power (175 W, the kind's invented default).
  'solar-panel': { solarPanel: { ratedWatts: 175 } },
  'roof-rail': {},
};

const placed = (kind: ModuleKind): Module => moduleFromKind(kind, `m-${kind}`);

describe.each(MODULE_KINDS)('kind %s', (kind) => {
  it('has a shelf entry found by its own title and search words', () => {
    const spec = kindSpec(kind);
    expect(spec.kind).toBe(kind);
    expect(spec.title).toMatch(/^[A-Z0-9][^A-Z]*( V [^A-Z]*)?$/); // sentence case ("12 V fridge" keeps its unit)
    expect(spec.keywords.length).toBeGreaterThan(0);
    expect(matchKinds(spec.title).map((k) => k.kind)).toContain(kind);
    for (const word of spec.keywords) expect(matchKinds(word).map((k) => k.kind)).toContain(kind);
  });

  it('round-trips through the document schema, as a module and inside a document', () => {
    const m = placed(kind);
    expect(moduleSchema.parse(JSON.parse(JSON.stringify(m)))).toEqual(m);
    const doc = { ...starterLayout('starter-rear-bed')!, modules: [m] };
    const back = parseLayoutDoc(JSON.parse(JSON.stringify(doc)));
    expect(back.ok && back.value.modules).toEqual([m]);
  });

  it('draws a symbol that lies inside the module, whatever its size and facing', () => {
    for (const facing of ['front', 'rear', 'left', 'right'] as const) {
      for (const [length, width] of [[600, 400], [300, 900]]) {
        const shapes = moduleSymbol({ kind, length, width, facing, props: kindSpec(kind).props });
        expect(shapes.length).toBeGreaterThan(0);
        const xs = shapes.flatMap((s) => (s.type === 'circle' ? [s.cx - s.r, s.cx + s.r] : s.points.map((p) => p[0])));
        const ys = shapes.flatMap((s) => (s.type === 'circle' ? [s.cy - s.r, s.cy + s.r] : s.points.map((p) => p[1])));
        expect(Math.min(...xs)).toBeGreaterThanOrEqual(-1e-9);
        expect(Math.max(...xs)).toBeLessThanOrEqual(length + 1e-9);
        expect(Math.min(...ys)).toBeGreaterThanOrEqual(-1e-9);
        expect(Math.max(...ys)).toBeLessThanOrEqual(width + 1e-9);
      }
    }
  });

  it('gives planning its facts', () => {
    expect(kindFacts(placed(kind))).toEqual(FACTS_OF_DEFAULTS[kind]);
  });

  it('types its values: labelled fields that take their defaults, and no other names', () => {
    const spec = kindSpec(kind);
    const schema = kindValuesSchema(kind);
    for (const [key, field] of Object.entries(spec.values)) {
      expect(field.label.length).toBeGreaterThan(0);
      const wrong = field.input === 'boolean' ? 1 : field.input === 'number' ? 'many' : true;
      expect(schema.safeParse({ [key]: wrong }).success).toBe(false);
    }
    expect(schema.safeParse(spec.props ?? {}).success).toBe(true);
    expect(schema.safeParse({ paintColour: 'red' }).success).toBe(false);
    // The Details panel shows the values the kind gives a default, and those it works out (a tank's capacity).
    const expected = Object.keys(spec.values).filter((k) => Object.hasOwn(spec.props ?? {}, k) || (spec.shown ?? []).includes(k));
    expect(shownFields(placed(kind)).map((f) => f.key)).toEqual(expected);
  });
});

describe('kind-specific values', () => {
  it('a module of one kind may not carry another kind’s values', () => {
    const wardrobe = placed('wardrobe');
    expect(moduleSchema.safeParse({ ...wardrobe, props: { litres: 70 } }).success).toBe(false);
    expect(moduleSchema.safeParse({ ...wardrobe, props: { shelves: 3 } }).success).toBe(true);
  });

  it('a module’s own values override the defaults in its facts', () => {
    const heater = { ...placed('heater'), props: { watts: 4000, fuel: 'diesel' } } as Module;
    expect(kindFacts(heater)).toEqual({ heatOutputW: 4000, fuel: 'diesel', gasAppliance: { flueless: false, untypedFuel: 'heating' } });
    const seat = { ...placed('seat'), props: { belted: false } } as Module;
    expect(kindFacts(seat).seat).toEqual({ belted: false, approvedType: false, anchorageTested: false });
  });

  it('a solar panel round-trips with its rated power, mounted on the roof; its rating is bounded 5–1000 W (the kind’s own limits)', () => {
    const p = placed('solar-panel');
    expect(p).toMatchObject({ mount: 'roof', length: 1480, width: 670, height: 35, massKg: 9, props: { ratedWatts: 175 } });
    const doc = { ...starterLayout('starter-rear-bed')!, modules: [{ ...p, props: { ratedWatts: 410 } }] };
    const back = parseLayoutDoc(JSON.parse(JSON.stringify(doc)));
    expect(back.ok && back.value.modules[0]).toMatchObject({ kind: 'solar-panel', mount: 'roof', props: { ratedWatts: 410 } });
    for (const bad of [4, 1001, Number.NaN]) expect(moduleSchema.safeParse({ ...p, props: { ratedWatts: bad } }).success, String(bad)).toBe(false);
    for (const ok of [5, 1000]) expect(moduleSchema.safeParse({ ...p, props: { ratedWatts: ok } }).success, String(ok)).toBe(true);
    expect(shownFields(p).map((f) => f.field.label)).toEqual(['Rated power (W)']);
  });

  it('the registry lists every kind once, in shelf order', () => {
    expect(MODULE_KINDS).toEqual(Object.keys(KINDS));
    expect(new Set(MODULE_KINDS).size).toBe(25);
  });
});

describe('migration of version-1 props', () => {
  it('keeps what the kind declares, reads numbers and yes/no typed as text, and drops the rest', () => {
    const doc = structuredClone(starterLayout('starter-rear-bed')!) as unknown as Record<string, any>;
    doc.schemaVersion = 1;
    const fridge = doc.modules.find((m: { kind: string }) => m.kind === 'fridge');
    fridge.props = { litres: '38,5', watts: 'lots', dutyCycle: 0.5, brand: 'Frost' };
    const tank = doc.modules.find((m: { kind: string }) => m.kind === 'fresh-water-tank');
    tank.props = { capacity: 90 };
    const r = parseLayoutDoc(doc);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.value.schemaVersion).toBe(4);
    expect(r.value.modules.find((m) => m.kind === 'fridge')!.props).toEqual({ litres: 38.5, dutyCycle: 0.5 });
    expect(r.value.modules.find((m) => m.kind === 'fresh-water-tank')!.props).toBeUndefined();
  });

  it('a version-2 document with an undeclared value is refused, naming the field', () => {
    const doc = structuredClone(starterLayout('starter-rear-bed')!) as unknown as Record<string, any>;
    const i = doc.modules.findIndex((m: { kind: string }) => m.kind === 'fridge');
    doc.modules[i].props = { ...doc.modules[i].props, brand: 'Frost' };
    const r = parseLayoutDoc(doc);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.issues[0].path).toBe(`modules.${i}.props`);
  });
});
