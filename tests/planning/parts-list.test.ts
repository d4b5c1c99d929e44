import { describe, expect, it } from 'vitest';
import { computePartsList, partsListCsv, quoteDeposit, type PriceList } from '@/lib/planning';
import { baseDoc, withModules, withSystems } from './fixtures';

const prices: PriceList = {
  currency: 'GBP',
  labourRateMinor: 4500,
  vatPct: 20,
  items: {
    'module:kitchen-counter': { unit: 'each', priceMinor: 25000, labourHours: 6 },
    'sheet:ply-15': { unit: 'sheet', priceMinor: 6500 },
    'sheet:ply-18': { unit: 'sheet', priceMinor: 7800 },
    'cable:16': { unit: 'm', priceMinor: 650 },
    'battery:lifepo4': { unit: 'Ah', priceMinor: 400 },
  },
};

describe('parts list', () => {
  const doc = withSystems(withModules(baseDoc(), [{ id: 'k', kind: 'kitchen-counter', length: 1200, width: 500, height: 900, facing: 'right' }]), {
    power: { battery: { chemistry: 'lifepo4', capacityAh: 100, volts: 12.8 }, circuits: [{ id: 'inv', label: 'Inverter feed', amps: 20, lengthM: 6, volts: 12, critical: true }] },
  });

  it('prices modules, sheets, cable and battery, with labour and VAT in minor units', () => {
    const list = computePartsList(doc, prices);
    const line = (k: string) => list.lines.find((l) => l.key === k)!;
    expect(line('module:kitchen-counter')).toMatchObject({ qty: 1, netMinor: 25000, labourHours: 6 });
    expect(line('sheet:ply-15').qty).toBe(1);
    expect(line('cable:16')).toMatchObject({ qty: 12, netMinor: 7800 }); // 6 m out and back at 16 mm²
    expect(line('battery:lifepo4').netMinor).toBe(40000);
    expect(list.unpriced).toEqual(['Plywood 6 mm (backs), 2440 × 1220 mm sheet']);
    expect(list.unpricedKeys).toEqual(['sheet:ply-6']);
    expect(list.labourMinor).toBe(6 * 4500);
    const materials = 25000 + 6500 + 7800 + 7800 + 40000;
    expect(list.materialsMinor).toBe(materials);
    expect(list.netMinor).toBe(materials + 27000);
    expect(list.vatMinor).toBe(Math.round((materials + 27000) * 0.2));
    expect(list.grossMinor).toBe(list.netMinor + list.vatMinor);
  });

  it('deposit on a quote, rounded to the minor unit', () => {
    expect(quoteDeposit(123457, 25)).toBe(30864);
    expect(() => quoteDeposit(1000, 0)).toThrow(/deposit/);
    expect(() => quoteDeposit(10.5, 20)).toThrow(/whole number/);
  });

  it('rejects a malformed price list with a clear error', () => {
    expect(() => computePartsList(doc, { ...prices, currency: 'pounds' })).toThrow(/ISO 4217/);
    expect(() => computePartsList(doc, { ...prices, items: { x: { unit: 'each', priceMinor: 1.5 } } })).toThrow(/x/);
  });

  it('CSV: RFC 4180 quoting, CRLF, and no spreadsheet formulas', () => {
    const list = computePartsList(doc, { ...prices, items: { ...prices.items, 'module:kitchen-counter': { label: '=HYPERLINK("x"), counter', unit: 'each', priceMinor: 25000 } } });
    const csv = partsListCsv(list);
    const lines = csv.split('\r\n');
    expect(lines[0]).toBe('Item,Category,Quantity,Unit,"Unit price (GBP, net)",Net (GBP),Labour hours');
    expect(lines[1]).toBe(`"'=HYPERLINK(""x""), counter",module,1,each,250.00,250.00,0`);
    expect(csv.endsWith('\r\n')).toBe(true);
    expect(lines.some((l) => l.startsWith('Total,'))).toBe(true);
  });
});
