/**
 * The keys of a studio price list and what each one prices: every module kind (`module:<kind>`,
 * each), every sheet material (`sheet:<material>`, per sheet), cable by IEC 60228 cross-section
 * (`cable:<mm²>`, per metre), the battery by chemistry (`battery:<chemistry>`, per Ah), solar
 * panels (`solar`, per W) and the two alarms (`alarm:co`, `alarm:lpg`, each). The unit of a key is
 * fixed, so a quantity can never be priced in the wrong unit.
 *
 * Plain data. Must never import UI, framework or database code.
 */
import { KIND_LIST } from '../layout/kinds';
import { BATTERY_CHEMISTRIES } from '../layout/vocabulary';
import { CHEMISTRIES } from './battery-sizing';
import { METRIC_SIZES_MM2 } from './conductors';
import { SHEET_MATERIALS } from './cut-list';
import type { PartsCategory, PriceUnit } from './parts-list';

export interface PriceKeyInfo {
  key: string;
  category: PartsCategory;
  description: string;
  unit: PriceUnit;
}

export const PRICE_KEYS: PriceKeyInfo[] = [
  ...KIND_LIST.map((k): PriceKeyInfo => ({ key: `module:${k.kind}`, category: 'module', description: k.title, unit: 'each' })),
  ...Object.values(SHEET_MATERIALS).map((m): PriceKeyInfo => ({ key: `sheet:${m.id}`, category: 'sheet', description: `${m.title}, 2440 × 1220 mm sheet`, unit: 'sheet' })),
  ...METRIC_SIZES_MM2.map((a): PriceKeyInfo => ({ key: `cable:${a}`, category: 'cable', description: `Tinned copper cable ${a} mm²`, unit: 'm' })),
  ...BATTERY_CHEMISTRIES.map((c): PriceKeyInfo => ({ key: `battery:${c}`, category: 'electrics', description: `${CHEMISTRIES[c].title} battery`, unit: 'Ah' })),
  { key: 'solar', category: 'electrics', description: 'Solar panels', unit: 'W' },
  { key: 'alarm:co', category: 'safety', description: 'Carbon-monoxide alarm', unit: 'each' },
  { key: 'alarm:lpg', category: 'safety', description: 'LPG alarm', unit: 'each' },
];

const BY_KEY = new Map(PRICE_KEYS.map((p) => [p.key, p]));

/** What a key prices, or null for a key no parts list ever asks for. */
export function priceKeyInfo(key: string): PriceKeyInfo | null {
  const known = BY_KEY.get(key);
  if (known) return known;
  // A fitted cable may be any cross-section, not only the IEC series.
  const cable = /^cable:(\d{1,3}(?:\.\d{1,2})?)$/.exec(key);
  if (cable && Number(cable[1]) > 0) return { key, category: 'cable', description: `Tinned copper cable ${Number(cable[1])} mm²`, unit: 'm' };
  return null;
}
