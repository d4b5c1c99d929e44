/**
 * The solar array the power budget counts: the panels drawn on the roof (modules mounted on the
 * roof whose kind gives a rated power, lib/layout/kinds.ts), their rated watts summed — or, where
 * none is drawn, the figure typed on the Power tab (`systems.power.solar.watts`). Peak sun hours
 * and losses are always the typed ones: a drawing says nothing of where the van goes.
 *
 * Pure: reads a LayoutDoc, never throws on a valid one. Must never import UI, framework or database code.
 */
import type { LayoutDoc } from '../layout';
import { moduleFacts } from './module-facts';

export interface SolarArray {
  /** Where the rated power comes from: the panels drawn on the roof, or the typed figure. */
  basis: 'drawn' | 'typed';
  /** Rated (nameplate) power of the whole array, W. */
  watts: number;
  /** Panels drawn on the roof (0 for a typed figure), and their ids. */
  panels: number;
  moduleIds: string[];
}

/** The drawn panels' rated watts summed, else the typed figure; null when there is neither. */
export function solarArray(doc: LayoutDoc): SolarArray | null {
  let watts = 0;
  const moduleIds: string[] = [];
  for (const m of doc.modules) {
    if (m.mount !== 'roof') continue;
    const panel = moduleFacts(m).solarPanel;
    if (!panel) continue;
    watts += panel.ratedWatts;
    moduleIds.push(m.id);
  }
  if (moduleIds.length) return { basis: 'drawn', watts, panels: moduleIds.length, moduleIds };
  const typed = doc.systems?.power?.solar?.watts;
  return typed === undefined ? null : { basis: 'typed', watts: typed, panels: 0, moduleIds: [] };
}
