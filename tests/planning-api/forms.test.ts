// The build-planning forms read back exactly what the document holds: the starter layouts'
// systems survive form → parse → systems unchanged (a "no" that only means "not confirmed" may
// become absent), edits land where they should, and the result always passes the systems schema.
import { describe, expect, it } from 'vitest';
import { starterLayout, systemsSchema, type LayoutDoc } from '@/lib/layout';
import { weightDefaults, weightSchema, weightSystems } from '@/components/planning/weight/weightForm';
import { powerDefaults, powerSchema, powerSystems } from '@/components/planning/power/powerForm';
import { gasDefaults, gasSchema, gasSystems } from '@/components/planning/gas/gasForm';
import { heatDefaults, heatSchema, heatSystems } from '@/components/planning/heat/heatForm';
import { waterDefaults, waterSchema } from '@/components/planning/water/WaterPanel';
import { stableJson, withSystems } from '@/components/editor/store/systemsEdits';

const starters = ['starter-l-lounge', 'starter-rear-bed'].map((id) => [id, starterLayout(id)!] as const);

/** Drops `false` where the form treats "no" and "not answered" alike (precaution confirmations). */
function withoutFalse<T>(v: T): T {
  return JSON.parse(JSON.stringify(v, (_k, x) => (x === false ? undefined : x)));
}

describe.each(starters)('forms round-trip the %s systems', (_id, doc) => {
  it.each(['mm', 'cm', 'in'] as const)('weight (lengths shown in %s)', (units) => {
    const parsed = weightSchema(units).parse(weightDefaults(doc, units));
    const out = weightSystems(parsed, doc.systems);
    expect(stableJson(out.vehicle)).toBe(stableJson(doc.systems!.vehicle));
    expect(stableJson(out.load)).toBe(stableJson(doc.systems!.load));
  });

  it('power', () => {
    const out = powerSystems(powerSchema.parse(powerDefaults(doc)), doc.systems?.power);
    expect(stableJson(withoutFalse(out))).toBe(stableJson(withoutFalse(doc.systems!.power)));
  });

  it('gas and alarms', () => {
    const out = gasSystems(gasSchema.parse(gasDefaults(doc)));
    expect(stableJson(withoutFalse(out.gas))).toBe(stableJson(withoutFalse(doc.systems!.gas)));
    expect(stableJson(out.alarms)).toBe(stableJson(doc.systems!.alarms));
  });

  it('heating and insulation', () => {
    const out = heatSystems(heatSchema.parse(heatDefaults(doc)));
    expect(stableJson(out.heating)).toBe(stableJson(doc.systems!.heating));
    expect(stableJson(out.insulation)).toBe(stableJson(doc.systems!.insulation));
  });

  it('water', () => {
    expect(stableJson(waterSchema.parse(waterDefaults(doc)))).toBe(stableJson(doc.systems!.water));
  });
});

describe('edits through the forms', () => {
  const doc = starterLayout('starter-rear-bed')!;

  it('a mass typed in tonnes and a payload item land in vehicle and load; the rest is kept', () => {
    const input = { ...weightDefaults(doc, 'mm'), maxAuthorisedMassKg: '3.5 t', items: [{ id: 'box', label: 'Roof box', massKg: '18 kg', x: '1.2 m' }] };
    const out = weightSystems(weightSchema('mm').parse(input), doc.systems);
    expect(out.vehicle?.maxAuthorisedMassKg).toBe(3500);
    expect(out.load?.items).toEqual([{ id: 'box', label: 'Roof box', massKg: 18, x: 1200 }]);
    const next = withSystems(doc, out);
    expect(systemsSchema.safeParse(next.systems).success).toBe(true);
    expect(next.systems?.power).toEqual(doc.systems?.power);
  });

  it('refuses a front-axle share above the whole mass, at that field', () => {
    const r = weightSchema('mm').safeParse({ ...weightDefaults(doc, 'mm'), frontAxleRunningOrderKg: '3000' });
    expect(r.success).toBe(false);
    expect(r.error?.issues[0].path).toEqual(['frontAxleRunningOrderKg']);
  });

  it('empties a section to absent, and a whole emptied systems block to none', () => {
    const empty = Object.fromEntries(Object.entries(weightDefaults(doc, 'mm')).map(([k, v]) => [k, Array.isArray(v) ? [] : '']));
    const out = weightSystems(weightSchema('mm').parse(empty), doc.systems);
    expect(out).toEqual({ vehicle: undefined, load: undefined });
    const bare: LayoutDoc = withSystems(withSystems(doc, out), { power: undefined, water: undefined, gas: undefined, heating: undefined, insulation: undefined, alarms: undefined, note: undefined });
    expect(bare.systems).toBeUndefined();
  });

  it('asks for both alternator amps and hours, and for every season’s sun with solar', () => {
    const base = powerDefaults(doc);
    const r1 = powerSchema.safeParse({ ...base, drivingHours: '' });
    expect(r1.error?.issues.map((i) => i.path.join('.'))).toContain('drivingHours');
    const r2 = powerSchema.safeParse({ ...base, pshWinter: '' });
    expect(r2.error?.issues.map((i) => i.path.join('.'))).toContain('pshWinter');
  });

  it('keeps a circuit’s details the form does not show (insulation rating, bundling)', () => {
    const withDetails: LayoutDoc = { ...doc, systems: { ...doc.systems, power: { ...doc.systems!.power, circuits: [{ ...doc.systems!.power!.circuits![0], insulationC: 90, bundled: 4 }] } } };
    const out = powerSystems(powerSchema.parse(powerDefaults(withDetails)), withDetails.systems?.power);
    expect(out?.circuits?.[0]).toMatchObject({ insulationC: 90, bundled: 4 });
  });

  it('a preset load with a duty cycle round-trips through the percentage field', () => {
    const base = powerDefaults(doc);
    const out = powerSystems(powerSchema.parse({ ...base, loads: [{ id: 'fridge', label: 'Compressor fridge', watts: '45', hoursPerDay: '', dutyPct: '33', supply: 'dc' }] }), doc.systems?.power);
    expect(out?.loads).toEqual([{ id: 'fridge', label: 'Compressor fridge', watts: 45, supply: 'dc', dutyCycle: 0.33 }]);
  });

  it('refuses a λ listed twice for one material', () => {
    const r = heatSchema.safeParse({ ...heatDefaults(doc), conductivities: [{ material: 'Cork', lambda: '0.04' }, { material: 'cork', lambda: '0.05' }] });
    expect(r.error?.issues[0].message).toBe('already listed');
  });
});

describe('the power form with solar panels drawn on the roof', () => {
  // The rear-bed starter draws two 175 W panels on the roof (invented), and keeps a typed 350 W.
  const drawn = starterLayout('starter-rear-bed')!;
  const typedOnly: LayoutDoc = { ...drawn, modules: drawn.modules.filter((m) => m.kind !== 'solar-panel') };

  it('knows the panels are drawn, and then asks for the sun hours without the typed watts', () => {
    const base = powerDefaults(drawn);
    expect(base.arrayDrawn).toBe(true);
    const parsed = powerSchema.safeParse({ ...base, solarWatts: '' });
    expect(parsed.success).toBe(true);
    const out = powerSystems(parsed.data!, drawn.systems?.power);
    expect(out?.solar).toEqual({ peakSunHours: { summer: 5.2, shoulder: 3, winter: 1 } });
    expect(systemsSchema.safeParse({ power: out }).success).toBe(true);
  });

  it('with panels drawn, a season’s sun left out is still asked for; with no sun at all the array waits, no error', () => {
    const base = powerDefaults(drawn);
    expect(powerSchema.safeParse({ ...base, pshWinter: '' }).error?.issues.map((i) => i.path.join('.'))).toContain('pshWinter');
    const none = powerSchema.safeParse({ ...base, solarWatts: '', pshSummer: '', pshShoulder: '', pshWinter: '' });
    expect(none.success).toBe(true);
    expect(powerSystems(none.data!, drawn.systems?.power)?.solar).toBeUndefined();
  });

  it('with no panel drawn, sun hours without watts still ask for the watts', () => {
    const base = powerDefaults(typedOnly);
    expect(base.arrayDrawn).toBe(false);
    expect(powerSchema.safeParse({ ...base, solarWatts: '' }).error?.issues.map((i) => i.path.join('.'))).toContain('solarWatts');
  });
});
