/**
 * The demo workshop's price list: invented round figures in pounds (net of VAT) and workshop
 * hours, for the demo and tests only — not market prices. Every key a parts list can ask for
 * is priced, so the demo layouts quote without gaps.
 */
import type { PriceList } from '../../lib/planning/parts-list';
import { PRICE_KEYS } from '../../lib/planning/price-keys';

const gbp = (pounds: number) => Math.round(pounds * 100);

/** Module kinds: bought-in price and fitting hours each (invented). */
const MODULES: Record<string, [number, number]> = {
  'bed-platform': [180, 6], 'bed-infill': [45, 1], 'bench-seat': [160, 5], seat: [420, 4], table: [90, 2],
  'kitchen-counter': [240, 8], 'sink-unit': [150, 3], hob: [140, 2], fridge: [520, 2], wardrobe: [200, 6],
  'drawer-unit': [160, 5], 'overhead-locker': [110, 3], 'fresh-water-tank': [120, 3], 'grey-water-tank': [95, 3],
  'gas-locker': [210, 4], 'electrics-bay': [350, 10], heater: [780, 6], 'toilet-cabinet': [260, 3], 'shower-tray': [180, 4], step: [60, 1],
  'spare-wheel': [140, 2], 'roof-box': [380, 2], 'solar-panel': [190, 2], 'roof-rail': [60, 1], 'rear-carrier': [420, 3],
};
const SHEETS: Record<string, number> = { 'ply-18': 72, 'ply-15': 62, 'ply-6': 34 };

export function demoPriceList(): PriceList {
  const items: PriceList['items'] = {};
  for (const p of PRICE_KEYS) {
    const [kind, rest] = p.key.split(':');
    if (kind === 'module') items[p.key] = { unit: 'each', priceMinor: gbp(MODULES[rest][0]), labourHours: MODULES[rest][1] };
    else if (kind === 'sheet') items[p.key] = { unit: 'sheet', priceMinor: gbp(SHEETS[rest]), labourHours: 1.5 };
    else if (kind === 'cable') items[p.key] = { unit: 'm', priceMinor: Math.max(45, Math.round(Number(rest) * 28)), labourHours: 0.1 };
    else if (kind === 'battery') items[p.key] = { unit: 'Ah', priceMinor: rest === 'lifepo4' ? gbp(4.2) : gbp(1.6), labourHours: 0.01 };
    else if (p.key === 'solar') items[p.key] = { unit: 'W', priceMinor: gbp(1.1), labourHours: 0.01 };
    else items[p.key] = { unit: 'each', priceMinor: gbp(rest === 'co' ? 25 : 35), labourHours: 0.25 };
  }
  return { currency: 'GBP', labourRateMinor: gbp(48), vatPct: 20, items };
}
