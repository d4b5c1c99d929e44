/**
 * 12 V rules (`power.*`): the daily energy balance by season, days of autonomy without charging,
 * the EN 1648-2 minimum leisure battery, cable cross-section per circuit (voltage drop against
 * the system's nominal voltage, ABYC E-11 allowances; ampacity, 33 CFR 183.425), and the 230 V
 * caution, raised by the "230 V is fitted" box alone. Numbers come from `powerBudget` and
 * `cableSize` in lib/planning; this file judges them and words the findings.
 *
 * Must never import React, Konva, Next or the database; never throws on a valid LayoutDoc.
 */
import type { LayoutDoc } from '../../layout';
import {
  cableSize,
  checkFittedCable,
  DEFAULT_INSULATION_C,
  DROP_CRITICAL_PCT,
  DROP_NON_CRITICAL_PCT,
  EN1648_MIN_AUX_AH,
  nominalSystemVolts,
  powerBudget,
  SIZING_CONDUCTOR_C,
  SOLAR_LOSS_SOURCE,
  type InsulationRating,
  type SolarArray,
} from '../../planning';
import type { Finding } from '../types';
import { caution, missingInputs, num, round } from './wording';

const SEASON_NAMES = { summer: 'Summer', shoulder: 'Spring/autumn', winter: 'Winter' } as const;
const CABLE_SOURCE = 'Voltage drop allowances: ABYC E-11, 3 % critical / 10 % other circuits (secondary: as reproduced in cable makers’ published tables); ampacity: 33 CFR 183.425 Table 5 (regulation text; engine-space and bundling factors from memory); copper 1/58 Ω·mm²/m at 20 °C, 0.00393 per K (IEC 60028, from memory)';
const BATTERY_SOURCE = 'EN 1648-2 cl. 4.3.2: auxiliary battery at least 60 Ah at the 20-hour rate (secondary: as quoted in trade literature; standard text not consulted)';

/** Where the array's rated power came from: "2 solar panels drawn on the roof, 350 W rated" or "300 W of solar panels, as typed on the power tab". */
function solarArrayWords(a: SolarArray): string {
  return a.basis === 'drawn'
    ? `${a.panels} solar ${a.panels === 1 ? 'panel' : 'panels'} drawn on the roof, ${num(a.watts)} W rated`
    : `${num(a.watts)} W of solar panels, as typed on the power tab`;
}

export function powerChecks(doc: LayoutDoc): Finding[] {
  const power = doc.systems?.power;
  const hasElectrics = doc.modules.some((m) => m.kind === 'electrics-bay' || m.kind === 'fridge');
  if (!power && !hasElectrics) return []; // no electrical system drawn or entered
  const b = powerBudget(doc);
  const out: Finding[] = [];
  if (b.missing.length) {
    out.push(missingInputs('power.input', 'The 12 V energy budget', b.missing, 2, 'Energy balance: common practice, no source (loads × hours against charging)'));
  }

  const useText = b.loads.length
    ? b.loads.map((l) => `${l.label} ${num(l.whPerDay)} Wh`).join(', ')
    : 'no loads entered yet (add them under Loads on the power tab)';
  // The balance waits while an array has no peak sun hours typed (power.input names them).
  if (b.battery && (b.solar || power?.alternator || power?.hookup) && !b.sunHoursMissing) {
    const solarFrom = b.solar ? ` from ${solarArrayWords(b.solar)},` : '';
    for (const s of b.seasons) {
      const ok = s.netWh >= 0;
      out.push({
        id: 'power.balance',
        status: ok ? 'pass' : 'warn',
        measured: round(s.chargeWh, 1),
        required: round(s.useWh, 1),
        unit: 'Wh/day',
        message: `${SEASON_NAMES[s.season]}: charging gives ${num(s.chargeWh)} Wh a day into the battery (solar ${num(s.solarWh)} Wh${solarFrom} after ${num(b.solarLossesPct, 2)} % system losses, alternator ${num(b.alternatorWh)} Wh, hook-up ${num(b.hookupWh)} Wh, at ${b.battery.chargeEfficiencyPct} % charge efficiency) against ${num(s.useWh)} Wh used (${useText}). ${ok ? `Surplus ${num(s.netWh)} Wh a day.` : `Deficit ${num(-s.netWh)} Wh a day: the usable ${num(b.battery.usableWh)} Wh lasts about ${num(s.daysToEmpty ?? 0, 1)} days.`}`,
        source: `Energy balance: common practice, no source; charge efficiency by battery type: common practice, no source; ${SOLAR_LOSS_SOURCE}`,
      });
    }
  }

  if (b.battery && b.autonomyDays !== null && Number.isFinite(b.autonomyDays)) {
    const ok = b.autonomyDays >= b.autonomyDaysTarget;
    out.push({
      id: 'power.autonomy',
      status: ok ? 'pass' : 'warn',
      measured: round(b.autonomyDays, 2),
      required: b.autonomyDaysTarget,
      unit: 'days',
      message: `With no sun and no driving the battery's usable ${num(b.battery.usableWh)} Wh (${num(b.battery.capacityAh)} Ah × ${b.battery.volts} V × ${b.battery.usableDodPct} % depth of discharge) carries ${num(b.dailyUseWh)} Wh a day for ${num(b.autonomyDays, 1)} days; the target is ${b.autonomyDaysTarget} days${ok ? '.' : `, which needs ${num(b.requiredAh ?? 0, 1)} Ah of this battery type.`}`,
      source: 'Days of autonomy: common practice; usable depth of discharge by chemistry: common practice, no source',
    });
  }

  if (b.battery) {
    const ok = b.battery.capacityAh >= EN1648_MIN_AUX_AH;
    out.push({
      id: 'power.battery-min',
      status: ok ? 'pass' : 'fail',
      measured: b.battery.capacityAh,
      required: EN1648_MIN_AUX_AH,
      unit: 'Ah (C20)',
      message: `Leisure battery ${num(b.battery.capacityAh)} Ah; EN 1648-2 asks for at least ${EN1648_MIN_AUX_AH} Ah at the 20-hour rate${ok ? '.' : ': fit a larger battery.'}`,
      source: BATTERY_SOURCE,
    });
  }

  // Drop is judged against the system's nominal voltage (12 V, 24 V), never the battery's 12.8 V.
  const volts = nominalSystemVolts(b.battery?.volts ?? 12);
  for (const c of power?.circuits ?? []) {
    const maxDropPct = c.maxDropPct ?? (c.critical ? DROP_CRITICAL_PCT : DROP_NON_CRITICAL_PCT);
    const rating = (c.insulationC as InsulationRating | undefined) ?? DEFAULT_INSULATION_C;
    const input = { amps: c.amps, lengthM: c.lengthM, volts: c.volts ?? volts, maxDropPct, insulationC: rating, bundled: c.bundled, engineSpace: c.engineSpace };
    const choice = cableSize(input);
    const kind = `${c.critical ? 'critical' : 'non-critical'} circuit, ${num(maxDropPct, maxDropPct % 1 ? 1 : 0)} % drop allowed`;
    const base = `${c.label}: ${num(c.amps, 1)} A over ${num(c.lengthM, 1)} m one way on ${num(input.volts, input.volts % 1 ? 1 : 0)} V nominal (${kind})`;
    const basis = `Drops are for copper at ${SIZING_CONDUCTOR_C} °C`;
    if (!choice.metric) {
      out.push({ id: 'power.cable', status: 'fail', measured: round(choice.minAreaForDropMm2, 2), required: 120, unit: 'mm²', message: `${base} needs ${num(choice.minAreaForDropMm2, 2)} mm² or more, beyond the largest common size (120 mm²): shorten the run, raise the voltage or split the load.`, source: CABLE_SOURCE });
      continue;
    }
    const pick = `${choice.metric.label} (${num(choice.metric.dropPct, 2)} % drop, ${num(choice.metric.ampacityA)} A allowed)${choice.awg ? ` or ${choice.awg.label} (${num(choice.awg.dropPct, 2)} %)` : ''}`;
    if (c.fittedMm2 !== undefined) {
      const fitted = checkFittedCable(input, c.fittedMm2);
      const warm = fitted.warmDropPct > maxDropPct + 1e-9 ? ` Run warm, at the insulation's rated ${rating} °C, it would drop ${num(fitted.warmDropPct, 2)} %, over the allowance.` : ` At the insulation's rated ${rating} °C it would drop ${num(fitted.warmDropPct, 2)} %.`;
      out.push({
        id: 'power.cable',
        status: fitted.ok ? 'pass' : 'fail',
        measured: c.fittedMm2,
        required: choice.metric.areaMm2,
        unit: 'mm²',
        message: `${base}: the fitted ${num(c.fittedMm2, c.fittedMm2 % 1 ? 1 : 0)} mm² drops ${num(fitted.dropPct, 2)} % and may carry ${num(fitted.ampacityA)} A${fitted.ok ? ' — within both limits.' : `; fit at least ${pick}.`} The drop alone needs at least ${num(choice.minAreaForDropMm2, 2)} mm². ${basis}.${warm}`,
        source: CABLE_SOURCE,
      });
    } else {
      const warm = choice.metric.warmDropPct > maxDropPct + 1e-9 ? ` Run warm, at the insulation's rated ${rating} °C, it would drop ${num(choice.metric.warmDropPct, 2)} %: take the next size up for a run that will warm.` : ` At the insulation's rated ${rating} °C it would drop ${num(choice.metric.warmDropPct, 2)} %.`;
      out.push({
        id: 'power.cable',
        status: 'pass',
        measured: choice.metric.areaMm2,
        required: round(choice.minAreaForDropMm2, 2),
        unit: 'mm²',
        message: `${base}: fit ${pick}; the drop alone needs at least ${num(choice.minAreaForDropMm2, 2)} mm²${choice.governedBy === 'ampacity' ? ', the current needs the larger size' : ''}. ${basis}.${warm} Enter the size fitted (Fitted, on the power tab) to check it.`,
        source: CABLE_SOURCE,
      });
    }
  }

  // One source of truth for 230 V aboard: the "230 V is fitted" box. A hook-up charger or mains
  // loads without it are a contradiction to resolve, not a second way to raise the caution.
  const acLoads = (power?.loads ?? []).filter((l) => l.supply === 'ac');
  if (power?.mains?.present) {
    out.push(caution(
      'power.mains',
      [
        { done: power.mains.rcd, text: '30 mA RCD protection on every 230 V circuit', field: { label: '30 mA RCD on every 230 V circuit', where: 'power' } },
        { done: power.mains.installedByElectrician, text: 'installed and tested by a qualified electrician', field: { label: 'Installed and tested by a qualified electrician', where: 'power' } },
      ],
      '230 V is fitted: it can kill. The installation must be designed, installed and tested by a qualified electrician under local codes, with RCD protection and a certificate; keep 230 V and 12 V wiring apart.',
      'IEC 60364-7-721 / BS 7671 Section 721, electrical installations in caravans and motor caravans (from memory)',
    ));
  } else if (power?.hookup || acLoads.length) {
    const what = [power?.hookup ? `a hook-up charger (${num(power.hookup.chargerAmps)} A)` : '', acLoads.length ? `${acLoads.length === 1 ? 'a load' : `${acLoads.length} loads`} on 230 V (${acLoads.map((l) => l.label).join(', ')})` : ''].filter(Boolean).join(' and ');
    out.push({
      id: 'power.mains',
      status: 'warn',
      measured: 0,
      required: 1,
      unit: 'inputs',
      message: `The power tab lists ${what}, but “230 V is fitted” is not ticked. If the van has a hook-up socket, an inverter or mains circuits, tick it — the 230 V cautions then apply; if not, remove ${power?.hookup && acLoads.length ? 'them' : 'it'}.`,
      source: 'IEC 60364-7-721 / BS 7671 Section 721, electrical installations in caravans and motor caravans (from memory)',
    });
  }
  return out;
}
