/**
 * Heating and insulation rules (`heat.*`): the U-value of each build-up (EN ISO 6946 with λ from
 * EN ISO 10456 / declared values), the bay's heat loss at the design temperature difference
 * against the heater's output, and the heater caution (exhaust and intake placement, CO alarm).
 * Numbers from lib/planning `heatLoss`, which names its sources.
 *
 * Must never import React, Konva, Next or the database; never throws on a valid LayoutDoc.
 */
import type { LayoutDoc } from '../../layout';
import { heatLoss } from '../../planning';
import type { Finding } from '../types';
import { caution, num, round } from './wording';

const U_SOURCE = 'EN ISO 6946 (method; Rsi/Rse Table 7, from memory); λ from EN ISO 10456 Table 3 or typical declared values (from memory)';
const FACE_NAMES = { floor: 'Floor', walls: 'Walls', roof: 'Roof' } as const;

/** A face whose insulation gives less than this R is treated as uninsulated (common practice, no source). */
const MIN_USEFUL_R = 0.25;

export function heatChecks(doc: LayoutDoc): Finding[] {
  const h = heatLoss(doc);
  const out: Finding[] = [];
  for (const u of h.uValues) {
    const layers = u.layers.map((l) => `${l.material} ${l.thicknessMm} mm (λ ${l.lambda ?? '?'})`).join(' + ') || 'no layers';
    const layerR = u.rTotal - 0.04 - (u.face === 'roof' ? 0.1 : u.face === 'walls' ? 0.13 : 0.17);
    const status = u.unknown.length || layerR < MIN_USEFUL_R ? 'warn' : 'pass';
    out.push({
      id: 'heat.u-value',
      status,
      measured: round(u.u, 3),
      unit: 'W/m²K',
      message: `${FACE_NAMES[u.face]} build-up: U = ${num(u.u, 2)} W/m²K (R ${num(u.rTotal, 2)} m²K/W with surface resistances) from ${layers}.${u.unknown.length ? ` No λ known for ${u.unknown.join(', ')}: enter its declared value in systems.insulation.conductivities (left out, so U errs high).` : ''}${layerR < MIN_USEFUL_R ? ' Little or no insulation on this face.' : ''} Steel ribs bridging the insulation are not counted.`,
      source: U_SOURCE,
    });
  }
  out.push({
    id: 'heat.loss',
    status: 'pass',
    measured: round(h.totalWPerK, 1),
    unit: 'W/K',
    message: `Heat loss ${num(h.totalWPerK, 1)} W/K (${h.faces.map((f) => `${f.face} ${num(f.wPerK, 1)}`).join(', ')}, windows ${num(h.windowsWPerK, 1)}, air change ${num(h.ventilationWPerK, 1)} W/K): ${num(h.requiredW)} W at a ${num(h.deltaK)} K difference inside to outside (systems.insulation.deltaK).`,
    source: `${U_SOURCE}; air 0.34 W/(m³K) per air change an hour (EN 12831, from memory)`,
  });
  if (h.heaterIds.length) {
    out.push({
      id: 'heat.heater-size',
      status: h.heaterW >= h.requiredW ? 'pass' : 'warn',
      measured: h.heaterW,
      required: round(h.requiredW),
      unit: 'W',
      moduleIds: h.heaterIds,
      message: `Heater output ${num(h.heaterW)} W against ${num(h.requiredW)} W lost at ${num(h.deltaK)} K${h.heaterW >= h.requiredW ? '' : ': it will not hold the temperature; add insulation or a larger heater'}. Thermal bridges are not counted: keep a margin.`,
      source: `Steady-state heat balance (EN 12831 method, simplified); ${U_SOURCE}`,
    });
    const heating = doc.systems?.heating ?? {};
    if (heating.fuel !== 'electric') out.push(caution(
      'heat.heater-caution',
      [
        { done: heating.exhaustClearOfOpenings, text: 'exhaust outlet away from doors, opening windows and the fuel filler, as the maker specifies', field: 'systems.heating.exhaustClearOfOpenings' },
        { done: heating.intakeClearOfExhaust, text: 'combustion intake apart from the exhaust and out of spray', field: 'systems.heating.intakeClearOfExhaust' },
        { done: doc.systems?.alarms?.co, text: 'carbon-monoxide alarm in the living space', field: 'systems.alarms.co' },
      ],
      'A fuel-burning heater makes carbon monoxide: follow the maker\'s installation manual and local codes for the exhaust and combustion intake (away from doors, opening windows and the fuel filler), use the maker\'s seals and exhaust parts, and fit a CO alarm.',
      'Heater maker\'s installation manual; UN ECE Regulation No. 122 (heating systems; from memory)',
      h.heaterIds,
    ));
  }
  return out;
}
