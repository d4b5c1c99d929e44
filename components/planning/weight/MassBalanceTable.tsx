/**
 * The mass-and-balance table of the weight tab: per axle, each group of masses, the laden total,
 * the plate's limits and what is left — the figures a workshop checks against the weighbridge.
 * Draws the `MassBalance` it is given (lib/planning); computes nothing.
 */
import type { MassBalance } from '@/lib/planning';
import { formatWhole } from '@/lib/format';

const kg = (n: number | null) => (n === null ? '—' : formatWhole(n));

export function MassBalanceTable({ balance }: { balance: MassBalance }) {
  const { rows, total, limits, left, split } = balance;
  const over = (n: number | null) => n !== null && n < 0;
  return (
    <div className="panel p-3 text-sm" data-testid="mass-balance">
      <table className="w-full text-left text-xs">
        <caption className="mb-2 text-left text-sm font-semibold">Mass and balance</caption>
        <thead>
          <tr className="text-ink-soft">
            <th scope="col" className="py-1">Mass</th>
            <th scope="col" className="text-right">Front axle, kg</th>
            <th scope="col" className="text-right">Rear axle, kg</th>
            <th scope="col" className="text-right">Total, kg</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r, i) => (
            <tr key={`${r.label}-${i}`} className="border-t border-paper-edge">
              <th scope="row" className="py-1 pr-2 font-normal">{r.label}</th>
              <td className="text-right font-mono">{kg(r.frontKg)}</td>
              <td className="text-right font-mono">{kg(r.rearKg)}</td>
              <td className="text-right font-mono">{kg(r.kg)}</td>
            </tr>
          ))}
        </tbody>
        <tfoot>
          <tr className="border-t-2 border-ink font-semibold">
            <th scope="row" className="py-1">Laden</th>
            <td className="text-right font-mono">{kg(total.frontKg)}</td>
            <td className="text-right font-mono">{kg(total.rearKg)}</td>
            <td className="text-right font-mono">{kg(total.kg)}</td>
          </tr>
          <tr className="border-t border-paper-edge">
            <th scope="row" className="py-1 font-normal">Limit (plate)</th>
            <td className="text-right font-mono">{kg(limits.frontKg)}</td>
            <td className="text-right font-mono">{kg(limits.rearKg)}</td>
            <td className="text-right font-mono">{kg(limits.kg)}</td>
          </tr>
          <tr className="border-t border-paper-edge">
            <th scope="row" className="py-1 font-normal">Payload left</th>
            {[left.frontKg, left.rearKg, left.kg].map((n, i) => (
              <td key={i} className={`text-right font-mono ${over(n) ? 'font-semibold text-brick' : ''}`}>{n === null ? '—' : over(n) ? `${kg(-n)} over` : kg(n)}</td>
            ))}
          </tr>
        </tfoot>
      </table>
      <p className="mt-2 text-xs text-ink-soft">
        {split
          ? 'Split between the axles by the lever rule (moments about the front axle). Planning figures: weigh the finished van, axle by axle.'
          : 'The split between the axles needs the wheelbase, the front axle position and the mass in running order on the front axle.'}
      </p>
      {balance.report.assumptions.length > 0 && <p className="mt-1 text-xs text-ink-soft">Assumed: {balance.report.assumptions.join('; ')}.</p>}
    </div>
  );
}
