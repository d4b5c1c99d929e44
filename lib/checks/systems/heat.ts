/**
 * Heating and insulation rules (`heat.*`): the U-value of each build-up (EN ISO 6946 with λ from
 * EN ISO 10456 / declared values), the bay's heat loss at the design temperature difference
 * against the heater's output, and the heater caution (exhaust and intake placement, CO alarm).
 * Numbers from lib/planning `heatLoss`, which names its sources.
 *
 * Must never import React, Konva, Next or the database; never throws on a valid LayoutDoc.
 */
import type { LayoutDoc } from '../../layout';
import { AIR_HEAT_CAPACITY, DRAWN_OPENING_U_SOURCE, heatLoss, INPUTS, layerResistance, U_VALUE_SOURCE } from '../../planning';
import { measuredOutlets } from '../clearance';
import type { Finding } from '../types';
import { caution, num, round } from './wording';

const U_SOURCE = U_VALUE_SOURCE;
const FACE_NAMES = { floor: 'Floor', walls: 'Walls', roof: 'Roof' } as const;

/** A face whose insulation gives less than this R is treated as uninsulated (common practice, no source). */
const MIN_USEFUL_R = 0.25;

/** Which windows the heat loss counted, in words. */
function windowsWords(h: ReturnType<typeof heatLoss>): string {
  const area = h.windows.reduce((a, w) => a + w.areaM2, 0);
  if (h.windowsFrom === 'none') return 'No windows drawn or typed.';
  if (h.windowsFrom === 'typed') return `Windows from the list on the heat tab (${num(area, 2)} m²); none drawn.`;
  const walls = h.windows.filter((w) => w.face === 'walls').length;
  const roof = h.windows.length - walls;
  const uWords = [...new Set(h.windows.map((w) => `${num(w.uValue, 2)}`))].join(' and ');
  return `Windows as drawn: ${walls} in the walls and doors, ${roof} roof ${roof === 1 ? 'opening' : 'openings'}, ${num(area, 2)} m² at U ${uWords} W/m²K (the list on the heat tab is used only when none is drawn).`;
}

export function heatChecks(doc: LayoutDoc): Finding[] {
  const h = heatLoss(doc);
  const out: Finding[] = [];
  for (const u of h.uValues) {
    const layers = u.layers.map((l) => `${l.material} ${l.thicknessMm} mm (λ ${l.lambda ?? '?'})`).join(' + ') || 'no layers';
    const layerR = layerResistance(u);
    const status = u.unknown.length || layerR < MIN_USEFUL_R ? 'warn' : 'pass';
    out.push({
      id: 'heat.u-value',
      status,
      measured: round(u.u, 3),
      unit: 'W/m²K',
      message: `${FACE_NAMES[u.face]} build-up: U = ${num(u.u, 2)} W/m²K (R ${num(u.rTotal, 2)} m²K/W with surface resistances) from ${layers}.${u.unknown.length ? ` No λ known for ${u.unknown.join(', ')}: enter its declared λ on the heat tab (left out meanwhile, so U errs high).` : ''}${layerR < MIN_USEFUL_R ? ` Little or no insulation on this face (the layers give R ${num(layerR, 2)} m²K/W, under ${num(MIN_USEFUL_R, 2)}).` : ''} Steel ribs bridging the insulation are not counted.`,
      source: U_SOURCE,
      ...(u.unknown.length ? { needs: [INPUTS.conductivity] } : {}),
    });
  }
  out.push({
    id: 'heat.loss',
    status: 'pass',
    measured: round(h.totalWPerK, 1),
    unit: 'W/K',
    message: `Heat loss ${num(h.totalWPerK, 1)} W/K (${h.faces.map((f) => `${f.face} ${num(f.wPerK, 1)}`).join(', ')}, windows ${num(h.windowsWPerK, 1)}, air change ${num(h.ventilationWPerK, 1)} W/K): ${num(h.requiredW)} W at a ${num(h.deltaK)} K difference inside to outside (Inside minus outside, on the heat tab). ${windowsWords(h)}`,
    source: `${U_SOURCE}; drawn windows without a typed U: ${DRAWN_OPENING_U_SOURCE}; air ${AIR_HEAT_CAPACITY} W/(m³K) per air change an hour (EN 12831, from memory); design difference 20 K and 1 air change an hour when none is entered (common practice, no source)`,
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
    // Drawn outlets are measured (clearance.exhaust, clearance.intake); the declared ticks stand in only where none is drawn.
    const drawn = measuredOutlets(doc);
    const exhaustText = 'exhaust outlet away from doors, opening windows and the fuel filler, as the maker specifies';
    const intakeText = 'combustion intake apart from the exhaust and out of spray';
    const onDrawing = (text: string, ok: boolean) => (ok ? `${text} (measured on the drawing)` : `${text} (measured on the drawing: see the heater exhaust and intake clearances)`);
    if (heating.fuel !== 'electric') out.push(caution(
      'heat.heater-caution',
      [
        drawn.exhaust
          ? { done: drawn.exhaust.ok, text: onDrawing(exhaustText, drawn.exhaust.ok), field: { label: 'Heater exhaust drawn on the body', where: 'editor' }, measured: true }
          : { done: heating.exhaustClearOfOpenings, text: exhaustText, field: { label: 'Exhaust away from doors, opening windows and the fuel filler, as the maker specifies', where: 'heat' } },
        drawn.intake
          ? { done: drawn.intake.ok, text: onDrawing(intakeText, drawn.intake.ok), field: { label: 'Heater intake drawn on the body', where: 'editor' }, measured: true }
          : { done: heating.intakeClearOfExhaust, text: intakeText, field: { label: 'Combustion intake apart from the exhaust and out of spray', where: 'heat' } },
        { done: doc.systems?.alarms?.co, text: 'carbon-monoxide alarm in the living space', field: { label: 'Carbon-monoxide alarm fitted', where: 'gas' } },
      ],
      'A fuel-burning heater makes carbon monoxide: follow the maker\'s installation manual and local codes for the exhaust and combustion intake (away from doors, opening windows and the fuel filler), use the maker\'s seals and exhaust parts, and fit a CO alarm.',
      'Heater maker\'s installation manual; UN ECE Regulation No. 122 (heating systems; from memory)',
      h.heaterIds,
    ));
    const measuredIds = [...new Set([...(drawn.exhaust?.openingIds ?? []), ...(drawn.intake?.openingIds ?? [])])];
    const last = out[out.length - 1];
    if (last?.id === 'heat.heater-caution' && measuredIds.length) last.openingIds = measuredIds;
  }
  return out;
}
