/**
 * 12 V rules (`power.*`): the daily energy balance by season, days of autonomy without charging,
 * the EN 1648-2 minimum auxiliary battery, cable cross-section per circuit (voltage drop, ABYC
 * E-11; ampacity, 33 CFR 183.425), and the 230 V caution. Numbers come from `powerBudget` and
 * `cableSize` in lib/planning; this file judges them and words the findings.
 *
 * Must never import React, Konva, Next or the database; never throws on a valid LayoutDoc.
 */
import type { LayoutDoc } from '../../layout';
import {
  cableSize,
  checkFittedCable,
  DROP_CRITICAL_PCT,
  DROP_NON_CRITICAL_PCT,
  EN1648_MIN_AUX_AH,
  powerBudget,
  type InsulationRating,
} from '../../planning';
import type { Finding } from '../types';
import { caution, missingInputs, num, round } from './wording';

const SEASON_NAMES = { summer: 'Summer', shoulder: 'Spring/autumn', winter: 'Winter' } as const;
const CABLE_SOURCE = 'Voltage drop: ABYC E-11 (3 % critical / 10 % other, as cited); ampacity: 33 CFR 183.425 (from memory); copper 1/58 Ω·mm²/m (IEC 60028)';

export function powerChecks(doc: LayoutDoc): Finding[] {
  const power = doc.systems?.power;
  const hasElectrics = doc.modules.some((m) => m.kind === 'electrics-bay' || m.kind === 'fridge');
  if (!power && !hasElectrics) return []; // no electrical system drawn or entered
  const b = powerBudget(doc);
  const out: Finding[] = [];
  if (b.missing.length) {
    out.push(missingInputs('power.input', 'The 12 V energy budget', b.missing, 2, 'Energy balance: common practice (loads × hours against charging)'));
  }

  const useText = b.loads.length
    ? b.loads.map((l) => `${l.label} ${num(l.whPerDay)} Wh`).join(', ')
    : 'no loads entered (add systems.power.loads)';
  if (b.battery && (power?.solar || power?.alternator || power?.hookup)) {
    for (const s of b.seasons) {
      const ok = s.netWh >= 0;
      out.push({
        id: 'power.balance',
        status: ok ? 'pass' : 'warn',
        measured: round(s.chargeWh, 1),
        required: round(s.useWh, 1),
        unit: 'Wh/day',
        message: `${SEASON_NAMES[s.season]}: charging gives ${num(s.chargeWh)} Wh a day into the battery (solar ${num(s.solarWh)} Wh after ${num(b.solarLossesPct, 2)} % system losses, alternator ${num(b.alternatorWh)} Wh, hook-up ${num(b.hookupWh)} Wh, at ${b.battery.chargeEfficiencyPct} % charge efficiency) against ${num(s.useWh)} Wh used (${useText}). ${ok ? `Surplus ${num(s.netWh)} Wh a day.` : `Deficit ${num(-s.netWh)} Wh a day: the usable ${num(b.battery.usableWh)} Wh lasts about ${num(s.daysToEmpty ?? 0, 1)} days.`}`,
        source: 'Energy balance: common practice; solar losses PVWatts defaults (pvlib pvwatts_losses, secondary)',
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
      message: `Auxiliary battery ${num(b.battery.capacityAh)} Ah; EN 1648-2 asks for at least ${EN1648_MIN_AUX_AH} Ah at the 20-hour rate${ok ? '.' : ': fit a larger battery.'}`,
      source: 'EN 1648-2 cl. 4.3.2 (as cited in the brief; secondary)',
    });
  }

  const volts = b.battery?.volts ?? 12;
  for (const c of power?.circuits ?? []) {
    const maxDropPct = c.maxDropPct ?? (c.critical ? DROP_CRITICAL_PCT : DROP_NON_CRITICAL_PCT);
    const input = { amps: c.amps, lengthM: c.lengthM, volts: c.volts ?? volts, maxDropPct, insulationC: c.insulationC as InsulationRating | undefined, bundled: c.bundled, engineSpace: c.engineSpace };
    const choice = cableSize(input);
    const kind = `${c.critical ? 'critical' : 'non-critical'} circuit, ${maxDropPct} % drop allowed`;
    const base = `${c.label}: ${num(c.amps, 1)} A over ${num(c.lengthM, 1)} m one way at ${input.volts} V (${kind})`;
    if (!choice.metric) {
      out.push({ id: 'power.cable', status: 'fail', measured: round(choice.minAreaForDropMm2, 2), required: 120, unit: 'mm²', message: `${base} needs ${num(choice.minAreaForDropMm2, 2)} mm² or more than 120 mm² can carry: shorten the run, raise the voltage or split the load.`, source: CABLE_SOURCE });
      continue;
    }
    const pick = `${choice.metric.label} (${num(choice.metric.dropPct, 2)} % drop, ${num(choice.metric.ampacityA)} A allowed)${choice.awg ? ` or ${choice.awg.label} (${num(choice.awg.dropPct, 2)} %)` : ''}`;
    if (c.fittedMm2 !== undefined) {
      const fitted = checkFittedCable(input, c.fittedMm2);
      out.push({
        id: 'power.cable',
        status: fitted.ok ? 'pass' : 'fail',
        measured: c.fittedMm2,
        required: choice.metric.areaMm2,
        unit: 'mm²',
        message: `${base}: the fitted ${c.fittedMm2} mm² drops ${num(fitted.dropPct, 2)} % and is allowed ${num(fitted.ampacityA)} A${fitted.ok ? ' — within both limits.' : `; fit at least ${pick}.`} The drop alone needs ≥ ${num(choice.minAreaForDropMm2, 2)} mm².`,
        source: CABLE_SOURCE,
      });
    } else {
      out.push({
        id: 'power.cable',
        status: 'pass',
        measured: choice.metric.areaMm2,
        required: round(choice.minAreaForDropMm2, 2),
        unit: 'mm²',
        message: `${base}: fit ${pick}; the drop alone needs ≥ ${num(choice.minAreaForDropMm2, 2)} mm²${choice.governedBy === 'ampacity' ? ', the current needs the larger size' : ''}. Enter the fitted size (fittedMm2) to check it.`,
        source: CABLE_SOURCE,
      });
    }
  }

  const acLoads = (power?.loads ?? []).some((l) => l.supply === 'ac');
  if (power?.mains?.present || power?.hookup || acLoads) {
    out.push(caution(
      'power.mains',
      [
        { done: power?.mains?.rcd, text: '30 mA RCD protection on every 230 V circuit', field: 'systems.power.mains.rcd' },
        { done: power?.mains?.installedByElectrician, text: 'installed and tested by a qualified electrician', field: 'systems.power.mains.installedByElectrician' },
      ],
      '230 V is aboard (hook-up, inverter or mains loads): it can kill. The installation must be designed, installed and tested by a qualified electrician under local codes, with RCD protection and a certificate; keep 230 V and 12 V wiring apart.',
      'IEC 60364-7-721 / BS 7671 Section 721 (caravans and motor caravans; from memory)',
    ));
  }
  return out;
}
