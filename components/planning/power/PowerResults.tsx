'use client';
/**
 * What the Power panel's inputs come to: the daily use by load, the energy balance by season,
 * days of autonomy on the battery alone and the capacity the target needs (against the EN 1648-2
 * minimum), the cable each circuit needs in mm² and AWG, the 230 V caution and the `power.*`
 * findings. Reads `powerBudget` and `cableSize` from lib/planning; computes nothing of its own.
 */
import { useMemo } from 'react';
import type { LayoutDoc } from '@/lib/layout';
import type { Finding } from '@/lib/checks/types';
import { cableSize, checkFittedCable, DROP_CRITICAL_PCT, DROP_NON_CRITICAL_PCT, EN1648_MIN_AUX_AH, powerBudget, type InsulationRating } from '@/lib/planning';
import { FindingList, findingsOf } from '../FindingList';
import { Caution } from '../fields';
import { PLANNING_CAUTION } from '@/lib/layout/cautions';
import { formatNumber } from '@/lib/format';

const SEASON = { summer: 'Summer', shoulder: 'Spring/autumn', winter: 'Winter' } as const;
const n0 = (n: number) => formatNumber(n);
const n1 = (n: number) => formatNumber(n, 1);

function circuitRows(doc: LayoutDoc) {
  const power = doc.systems?.power;
  const volts = power?.battery?.volts ?? 12;
  return (power?.circuits ?? []).map((c) => {
    const input = {
      amps: c.amps, lengthM: c.lengthM, volts: c.volts ?? volts,
      maxDropPct: c.maxDropPct ?? (c.critical ? DROP_CRITICAL_PCT : DROP_NON_CRITICAL_PCT),
      insulationC: c.insulationC as InsulationRating | undefined, bundled: c.bundled, engineSpace: c.engineSpace,
    };
    try {
      return { c, input, choice: cableSize(input), fitted: c.fittedMm2 !== undefined ? checkFittedCable(input, c.fittedMm2) : null, error: null };
    } catch (err) {
      return { c, input, choice: null, fitted: null, error: err instanceof Error ? err.message : String(err) };
    }
  });
}

export function PowerResults({ doc, findings }: { doc: LayoutDoc; findings: Finding[] }) {
  const b = useMemo(() => powerBudget(doc), [doc]);
  const circuits = useMemo(() => circuitRows(doc), [doc]);
  const power = doc.systems?.power;
  const mains = power?.mains?.present || power?.hookup || (power?.loads ?? []).some((l) => l.supply === 'ac');
  return (
    <section className="space-y-4" aria-label="Power results" data-testid="power-results">
      <div className="panel p-3">
        <h3 className="text-sm font-semibold">Daily use</h3>
        <table className="mt-1 w-full text-left text-xs">
          <thead><tr className="text-ink-soft"><th className="py-1">Load</th><th className="text-right">W</th><th className="text-right">h/day</th><th className="text-right">Wh/day</th></tr></thead>
          <tbody>
            {b.loads.map((l) => (
              <tr key={l.id} className="border-t border-paper-edge">
                <td className="py-1">{l.label}{l.supply === 'ac' ? ' (230 V, with inverter losses)' : ''}</td>
                <td className="text-right font-mono">{n1(l.watts)}</td>
                <td className="text-right font-mono">{n1(l.hoursPerDay)}</td>
                <td className="text-right font-mono">{n0(l.whPerDay)}</td>
              </tr>
            ))}
            <tr className="border-t border-ink font-semibold"><td className="py-1">Total</td><td /><td /><td className="text-right font-mono" data-testid="daily-wh">{n0(b.dailyUseWh)}</td></tr>
          </tbody>
        </table>
      </div>
      <div className="panel p-3">
        <h3 className="text-sm font-semibold">Energy balance by season</h3>
        <table className="mt-1 w-full text-left text-xs">
          <thead><tr className="text-ink-soft"><th className="py-1">Season</th><th className="text-right">solar Wh</th><th className="text-right">into battery Wh</th><th className="text-right">used Wh</th><th className="text-right">balance Wh</th><th className="text-right">empty in</th></tr></thead>
          <tbody>
            {b.seasons.map((s) => (
              <tr key={s.season} className="border-t border-paper-edge" data-season={s.season}>
                <td className="py-1">{SEASON[s.season]}</td>
                <td className="text-right font-mono">{n0(s.solarWh)}</td>
                <td className="text-right font-mono">{n0(s.chargeWh)}</td>
                <td className="text-right font-mono">{n0(s.useWh)}</td>
                <td className={`text-right font-mono ${s.netWh < 0 ? 'text-brick' : 'text-moss'}`}>{s.netWh >= 0 ? '+' : '−'}{n0(Math.abs(s.netWh))} {s.netWh >= 0 ? 'surplus' : 'deficit'}</td>
                <td className="text-right font-mono">{s.daysToEmpty === null ? '—' : `${n1(s.daysToEmpty)} d`}</td>
              </tr>
            ))}
          </tbody>
        </table>
        <p className="mt-1 text-xs text-ink-soft">Solar{b.solar ? (b.solar.basis === 'drawn' ? ` from the ${b.solar.panels} ${b.solar.panels === 1 ? 'panel' : 'panels'} drawn on the roof (${n0(b.solar.watts)} W rated)` : ` from the ${n0(b.solar.watts)} W typed`) : ''} after {b.solarLossesPct.toFixed(2)} % system losses; alternator {n0(b.alternatorWh)} Wh and hook-up {n0(b.hookupWh)} Wh a day; charging counted at the battery&apos;s charge efficiency.</p>
      </div>
      <div className="panel grid gap-2 p-3 text-sm sm:grid-cols-2">
        <p>Usable energy: <span className="font-mono">{b.battery ? `${n0(b.battery.usableWh)} Wh` : '—'}</span>{b.battery && <span className="text-ink-soft"> ({b.battery.capacityAh} Ah × {b.battery.volts} V × {b.battery.usableDodPct} %)</span>}</p>
        <p>Days on the battery alone: <span className="font-mono" data-testid="autonomy">{b.autonomyDays === null ? '—' : Number.isFinite(b.autonomyDays) ? `${n1(b.autonomyDays)} days` : 'unlimited'}</span> <span className="text-ink-soft">(target {b.autonomyDaysTarget})</span></p>
        <p>Battery for the target: <span className="font-mono">{b.requiredAh === null ? '—' : `${n0(Math.ceil(b.requiredAh))} Ah`}</span></p>
        <p>EN 1648-2 minimum: <span className="font-mono">{EN1648_MIN_AUX_AH} Ah</span> <span className="text-ink-soft">(cl. 4.3.2, as cited)</span></p>
      </div>
      {circuits.length > 0 && (
        <div className="panel p-3">
          <h3 className="text-sm font-semibold">Cable per circuit</h3>
          <table className="mt-1 w-full text-left text-xs" data-testid="cable-table">
            <thead><tr className="text-ink-soft"><th className="py-1">Circuit</th><th className="text-right">A × m</th><th className="text-right">drop allowed</th><th className="text-right">fit (mm²)</th><th className="text-right">or AWG</th><th className="text-right">fitted</th></tr></thead>
            <tbody>
              {circuits.map(({ c, input, choice, fitted, error }) => (
                <tr key={c.id} className="border-t border-paper-edge">
                  <td className="py-1">{c.label}</td>
                  <td className="text-right font-mono">{n1(c.amps)} A × {n1(c.lengthM)} m</td>
                  <td className="text-right font-mono">{input.maxDropPct} %</td>
                  <td className="text-right font-mono">{error ? '—' : choice?.metric ? `${choice.metric.areaMm2} (${choice.metric.dropPct.toFixed(2)} %)` : `> 120 (needs ${n1(choice!.minAreaForDropMm2)})`}</td>
                  <td className="text-right font-mono">{choice?.awg ? choice.awg.label : '—'}</td>
                  <td className={`text-right font-mono ${fitted ? (fitted.ok ? 'text-moss' : 'text-brick') : ''}`}>{fitted ? `${c.fittedMm2} ${fitted.ok ? 'ok' : 'too small'}` : '—'}</td>
                </tr>
              ))}
            </tbody>
          </table>
          <p className="mt-1 text-xs text-ink-soft">Voltage drop over the round trip (copper 1/58 Ω·mm²/m, IEC 60028): 3 % for critical circuits, 10 % for others (ABYC E-11, as cited); ampacity from 33 CFR 183.425 (from memory).</p>
        </div>
      )}
      {mains && (
        <Caution>
          <p>{PLANNING_CAUTION.power}</p>
        </Caution>
      )}
      <FindingList findings={findingsOf(findings, 'power.')} testId="findings-power" />
    </section>
  );
}
