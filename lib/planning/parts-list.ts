/**
 * The parts list: what the build needs, priced from the studio's price list, with labour hours
 * and VAT, and the quote's deposit. Lines come from the modules (grouped by kind), the sheet goods
 * of the nested cut list, the cable of each circuit at the size `cableSize` chooses, the battery,
 * the solar array and the alarms.
 *
 * Money is integer minor units (pence, cents) throughout; each line's net is rounded to the
 * minor unit once, VAT once on the total. A line whose key is not in the price list is listed
 * unpriced (`unitPriceMinor: null`) and named in `unpriced` — never priced at zero silently.
 *
 * `computePartsList(doc, priceList, cutOptions?)` → `PartsList`; `quoteDeposit(gross, pct)`.
 * Pure; never throws on a valid LayoutDoc. Must never import UI, framework or database code.
 */
import { kindSpec } from '../layout/kinds';
import type { LayoutDoc, ModuleKind } from '../layout';
import { CHEMISTRIES } from './battery-sizing';
import { cableSize, DROP_CRITICAL_PCT, DROP_NON_CRITICAL_PCT, nominalSystemVolts } from './cable-size';
import { planCutList, type CutListOptions } from './cut-list';
import { solarArray } from './solar-array';
import type { InsulationRating } from './conductors';

export type PriceUnit = 'each' | 'm' | 'sheet' | 'Ah' | 'W';

export interface PriceEntry {
  label?: string;
  unit: PriceUnit;
  /** Net price per unit, minor units. */
  priceMinor: number;
  /** Workshop hours per unit. */
  labourHours?: number;
}

/** The studio's price list (kept in settings). Keys: `module:<kind>`, `sheet:<material>`, `cable:<mm²>`, `battery:<chemistry>`, `solar`, `alarm:co`, `alarm:lpg`. */
export interface PriceList {
  currency: string;
  items: Record<string, PriceEntry>;
  labourRateMinor: number;
  vatPct: number;
}

export type PartsCategory = 'module' | 'sheet' | 'cable' | 'electrics' | 'safety';

export interface PartsLine {
  key: string;
  category: PartsCategory;
  description: string;
  qty: number;
  unit: PriceUnit;
  unitPriceMinor: number | null;
  netMinor: number | null;
  labourHours: number;
}

export interface PartsList {
  currency: string;
  lines: PartsLine[];
  /** What is not in the price list yet, by its description (never its price-list key). */
  unpriced: string[];
  /** The same lines' price-list keys, for the price-list editor. */
  unpricedKeys: string[];
  materialsMinor: number;
  labourHours: number;
  labourMinor: number;
  netMinor: number;
  vatPct: number;
  vatMinor: number;
  grossMinor: number;
}

function validatePriceList(p: PriceList): void {
  if (!/^[A-Z]{3}$/.test(p.currency)) throw new RangeError('currency must be a three-letter ISO 4217 code, e.g. GBP');
  if (!Number.isInteger(p.labourRateMinor) || p.labourRateMinor < 0) throw new RangeError('labour rate must be a whole number of minor units, zero or more');
  if (!Number.isFinite(p.vatPct) || p.vatPct < 0 || p.vatPct > 100) throw new RangeError('VAT must be between 0 and 100 %');
  for (const [key, e] of Object.entries(p.items)) {
    if (!Number.isInteger(e.priceMinor) || e.priceMinor < 0) throw new RangeError(`price of ${key} must be a whole number of minor units, zero or more`);
    if (e.labourHours !== undefined && !(e.labourHours >= 0)) throw new RangeError(`labour hours of ${key} must be zero or more`);
  }
}

export function computePartsList(doc: LayoutDoc, priceList: PriceList, cutOptions: CutListOptions = {}): PartsList {
  validatePriceList(priceList);
  const lines: PartsLine[] = [];
  const push = (key: string, category: PartsCategory, description: string, qty: number, unit: PriceUnit) => {
    if (!(qty > 0)) return;
    const entry = priceList.items[key];
    const unitPriceMinor = entry ? entry.priceMinor : null;
    lines.push({
      key,
      category,
      description: entry?.label ?? description,
      qty,
      unit: entry?.unit ?? unit,
      unitPriceMinor,
      netMinor: unitPriceMinor === null ? null : Math.round(unitPriceMinor * qty),
      labourHours: (entry?.labourHours ?? 0) * qty,
    });
  };

  const byKind = new Map<ModuleKind, number>();
  for (const m of doc.modules) byKind.set(m.kind, (byKind.get(m.kind) ?? 0) + 1);
  for (const [kind, n] of byKind) push(`module:${kind}`, 'module', kindSpec(kind).title, n, 'each');

  const cut = planCutList(doc, { ...cutOptions, lining: false });
  // Lining boards have no price key yet: left out of the parts list (and so not nested here).
  for (const g of cut.byMaterial) push(`sheet:${g.material.id}`, 'sheet', `${g.material.title}, 2440 × 1220 mm sheet`, g.nest.sheetsNeeded, 'sheet');

  const power = doc.systems?.power;
  const volts = nominalSystemVolts(power?.battery?.volts ?? 12);
  const cableMetres = new Map<number, number>();
  for (const c of power?.circuits ?? []) {
    const choice = cableSize({
      amps: c.amps,
      lengthM: c.lengthM,
      volts: c.volts ?? volts,
      maxDropPct: c.maxDropPct ?? (c.critical ? DROP_CRITICAL_PCT : DROP_NON_CRITICAL_PCT),
      insulationC: c.insulationC as InsulationRating | undefined,
      bundled: c.bundled,
      engineSpace: c.engineSpace,
    });
    const size = c.fittedMm2 ?? choice.metric?.areaMm2;
    if (size === undefined) continue; // no size in the series carries it: the power.cable finding says so
    cableMetres.set(size, (cableMetres.get(size) ?? 0) + 2 * c.lengthM);
  }
  for (const [size, metres] of [...cableMetres].sort((a, b) => a[0] - b[0])) {
    push(`cable:${size}`, 'cable', `Tinned copper cable ${size} mm² (out and return)`, Math.ceil(metres * 10) / 10, 'm');
  }
  if (power?.battery) push(`battery:${power.battery.chemistry}`, 'electrics', `${CHEMISTRIES[power.battery.chemistry].title} battery, ${power.battery.volts} V`, power.battery.capacityAh, 'Ah');
  // Panels drawn on the roof are priced as modules (above); the typed array only where none is drawn.
  const array = solarArray(doc);
  if (array?.basis === 'typed') push('solar', 'electrics', 'Solar panels', array.watts, 'W');
  if (doc.systems?.alarms?.co) push('alarm:co', 'safety', 'Carbon-monoxide alarm', 1, 'each');
  if (doc.systems?.alarms?.lpg) push('alarm:lpg', 'safety', 'LPG alarm', 1, 'each');

  const materialsMinor = lines.reduce((a, l) => a + (l.netMinor ?? 0), 0);
  const labourHours = lines.reduce((a, l) => a + l.labourHours, 0);
  const labourMinor = Math.round(labourHours * priceList.labourRateMinor);
  const netMinor = materialsMinor + labourMinor;
  const vatMinor = Math.round((netMinor * priceList.vatPct) / 100);
  return {
    currency: priceList.currency,
    lines,
    unpriced: lines.filter((l) => l.unitPriceMinor === null).map((l) => l.description),
    unpricedKeys: lines.filter((l) => l.unitPriceMinor === null).map((l) => l.key),
    materialsMinor,
    labourHours,
    labourMinor,
    netMinor,
    vatPct: priceList.vatPct,
    vatMinor,
    grossMinor: netMinor + vatMinor,
  };
}

/** The deposit on a quote, minor units, rounded to the minor unit. */
export function quoteDeposit(grossMinor: number, depositPct: number): number {
  if (!Number.isInteger(grossMinor) || grossMinor < 0) throw new RangeError('quote total must be a whole number of minor units, zero or more');
  if (!Number.isFinite(depositPct) || depositPct <= 0 || depositPct > 100) throw new RangeError('deposit must be above 0 and at most 100 %');
  return Math.round((grossMinor * depositPct) / 100);
}
