/**
 * `npm run bench:checks`: median time of runChecks on generated realistic layouts of 20, 200 and
 * 2000 modules, and the ratio 2000/200 (goal on a 2-core machine: ≤ 20 ms at 200 modules, ratio
 * ≤ 15). The generator (tests/checks/fixtures/generatedLayout.ts) repeats a 20-module L4H2-sized
 * van cell in proportionally bigger bays: strips of cells side by side joined by a rear
 * cross-aisle. Each size is warmed up first; the run count per size keeps the whole bench short.
 * Prints only; `npm run bench` collects the same figures into bench/results.json.
 */
import { runChecks } from '../lib/checks';
import { generateLayout, gridFor } from '../tests/checks/fixtures/generatedLayout';

function median(values: number[]): number {
  const s = [...values].sort((a, b) => a - b);
  const mid = s.length >> 1;
  return s.length % 2 ? s[mid] : (s[mid - 1] + s[mid]) / 2;
}

function bench(modules: number, runs: number): number {
  const doc = generateLayout(modules);
  for (let i = 0; i < 3; i++) runChecks(doc); // warm-up
  const times: number[] = [];
  let findings = 0;
  let ok = false;
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    const report = runChecks(doc);
    times.push(performance.now() - t0);
    findings = report.findings.length;
    ok = report.ok;
  }
  const m = median(times);
  const g = gridFor(modules);
  console.log(
    `${String(modules).padStart(5)} modules  ${(doc.bay.length / 1000).toFixed(1)} × ${(doc.bay.width / 1000).toFixed(2)} m bay (${g.strips} strip${g.strips > 1 ? 's' : ''} × ${g.cellsPerStrip} cells)  median ${m.toFixed(2)} ms  (min ${Math.min(...times).toFixed(2)}, max ${Math.max(...times).toFixed(2)}, ${runs} runs; ${findings} findings, ok=${ok})`,
  );
  return m;
}

export function benchChecks(): { m20: number; m200: number; m2000: number; ratio: number } {
  const m20 = bench(20, 41);
  const m200 = bench(200, 31);
  const m2000 = bench(2000, 11);
  const ratio = m2000 / m200;
  console.log(`ratio 2000/200: ${ratio.toFixed(1)}  (goal ≤ 15; goal at 200 modules ≤ 20 ms: ${m200 <= 20 ? 'met' : 'NOT met'})`);
  return { m20, m200, m2000, ratio };
}

if (process.argv[1]?.endsWith('checks.ts')) benchChecks();
