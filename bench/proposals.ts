/**
 * `npm run bench:proposals`: for each bay template with the typical two-sleeper brief
 * (lib/proposals TYPICAL_BRIEF; nobody stands in a standard-roof bay), the time to the final
 * proposals and the candidates laid out and checked per second. Goals: the final proposals within
 * 2 s, at a rate of at least 250 checked candidates a second (500 in 2 s). The generator answers
 * in one piece, so the time to the first proposals is the time to the final ones. Median of at
 * least 3 runs and 0.5 s of runs, after one warm-up run of every template (a running server's check code is warm; with a
 * warm-up of its own template only, the first row measured the check engine while the JIT was
 * still cold: L1H1 checks only 5 candidates, so its rate was mostly that). Prints only;
 * `npm run bench` collects the same figures.
 */
import { BAY_TEMPLATES } from '../lib/layout/templates';
import { generateProposals, TYPICAL_BRIEF, type Brief } from '../lib/proposals';

export interface ProposalsBenchRow {
  template: string;
  ms: number;
  checked: number;
  perSecond: number;
  proposals: number;
}

/** Each template is timed for at least this long (and at least 3 runs); our own choice. */
const MIN_TIMED_MS = 500;

function median(values: number[]): number {
  const s = [...values].sort((a, b) => a - b);
  return s[s.length >> 1];
}

export function benchProposals(): ProposalsBenchRow[] {
  const rows: ProposalsBenchRow[] = [];
  const briefFor = (t: (typeof BAY_TEMPLATES)[number]): Brief => ({ ...TYPICAL_BRIEF, bay: { source: 'template', template: t.id }, standing: t.bay.height < 1900 ? null : TYPICAL_BRIEF.standing });
  for (const t of BAY_TEMPLATES) generateProposals(briefFor(t)); // warm-up, every template before any is timed
  for (const t of BAY_TEMPLATES) {
    const brief = briefFor(t);
    const times: number[] = [];
    let last = generateProposals(brief);
    // At least 3 runs and at least MIN_TIMED_MS of them: a 20 ms run is timed often enough that
    // one collection of the warm-up's garbage does not decide its median.
    for (let spent = 0; times.length < 3 || spent < MIN_TIMED_MS; ) {
      const t0 = performance.now();
      last = generateProposals(brief);
      times.push(performance.now() - t0);
      spent += times[times.length - 1];
    }
    const ms = median(times);
    const row = { template: t.sizeClass, ms, checked: last.stats.checked, perSecond: last.stats.checked / (ms / 1000), proposals: last.proposals.length };
    rows.push(row);
    console.log(`${row.template}  final proposals in ${ms.toFixed(0)} ms  (${row.checked} candidates checked of ${last.stats.variants} variants, ${row.perSecond.toFixed(0)} a second; ${row.proposals} proposals${last.ok ? '' : ', none fits: ' + last.reasons[0]?.rule})  goal ≤ 2000 ms: ${ms <= 2000 ? 'met' : 'NOT met'}`);
  }
  return rows;
}

if (process.argv[1]?.endsWith('proposals.ts')) benchProposals();
