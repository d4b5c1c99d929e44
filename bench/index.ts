/**
 * `npm run bench`: the one benchmark report. Runs the check engine, API load, editor, bundle
 * and start-up benchmarks in turn (each starts its own production server on its own database),
 * writes bench/results.json and prints a table with the goals beside the figures.
 * docs/benchmarks.md says how to read and reproduce it.
 */
import fs from 'node:fs';
import os from 'node:os';
import { benchChecks } from './checks';
import { benchApi } from './api';
import { benchEditor } from './editor';
import { benchBundles } from './bundles';
import { benchStartup } from './startup';
import { buildIfNeeded } from '../scripts/lib/build';
import { round } from './stats';

interface Line {
  what: string;
  figure: string;
  goal: string;
  met: boolean | null;
}

async function main() {
  buildIfNeeded();
  const checks = benchChecks();
  const api = await benchApi();
  const editor = await benchEditor();
  const bundles = await benchBundles();
  const startup = await benchStartup();

  const lines: Line[] = [
    { what: 'runChecks median, 20 modules', figure: `${round(checks.m20, 2)} ms`, goal: '—', met: null },
    { what: 'runChecks median, 200 modules', figure: `${round(checks.m200, 2)} ms`, goal: '≤ 20 ms', met: checks.m200 <= 20 },
    { what: 'runChecks median, 2000 modules', figure: `${round(checks.m2000, 2)} ms`, goal: '—', met: null },
    { what: 'runChecks ratio 2000/200', figure: `${round(checks.ratio, 1)}`, goal: '≤ 15', met: checks.ratio <= 15 },
    ...(
      [
        ['read a layout', api.read, 50],
        ['save a 12 KB layout', api.save, 100],
        ['POST /api/checks (12 KB)', api.checks, null],
        ['bare node:http + PGlite read', api.bareRead, null],
      ] as const
    ).map(([what, r, goal]) => ({
      what: `API ${what}: p50 / p95 / p99, req/s, errors`,
      figure: `${r.p50} / ${r.p95} / ${r.p99} ms, ${r.rps}/s, ${r.errors + r.non2xx}`,
      goal: goal ? `p95 ≤ ${goal} ms, 0 errors` : '—',
      met: goal ? r.p95 <= goal && r.errors + r.non2xx === 0 : null,
    })),
    { what: 'Baywright ÷ bare read throughput', figure: `${api.readVsBare}`, goal: '≥ 0.5', met: api.readVsBare >= 0.5 },
    { what: 'editor drag, 200 modules: frame p95 / draw p95 / frames > 50 ms', figure: `${editor.drag200.frameP95} / ${editor.drag200.drawP95} ms / ${editor.drag200.over50}`, goal: '≤ 17 / ≤ 8 ms / 0', met: editor.drag200.frameP95 <= 17 && editor.drag200.drawP95 <= 8 && editor.drag200.over50 === 0 },
    { what: 'editor drag, 2000 modules: frame p95 / draw p95 / frames > 50 ms', figure: `${editor.drag2000.frameP95} / ${editor.drag2000.drawP95} ms / ${editor.drag2000.over50}`, goal: '—', met: null },
    { what: 'drop → updated findings p95 (30 modules)', figure: `${editor.checks.p95} ms`, goal: '≤ 150 ms', met: editor.checks.p95 <= 150 },
    { what: 'gzipped JS: editor route', figure: `${editor.editorKb} KB`, goal: '≤ 300 KB', met: editor.editorKb <= 300 },
    { what: 'gzipped JS: /layouts', figure: `${editor.layoutsKb} KB`, goal: '≤ 170 KB', met: editor.layoutsKb <= 170 },
    ...Object.entries(bundles).map(([route, kb]) => ({ what: `gzipped JS: ${route}`, figure: `${kb} KB`, goal: '≤ 170 KB', met: kb <= 170 })),
    { what: 'cold start to first 200 (new data folder)', figure: `${startup.coldS} s`, goal: '≤ 6 s', met: startup.coldS <= 6 },
    { what: 'warm start to first 200', figure: `${startup.warmS} s`, goal: '≤ 2 s', met: startup.warmS <= 2 },
  ];

  const results = {
    at: new Date().toISOString(),
    machine: { cpus: os.cpus().length, model: os.cpus()[0]?.model, node: process.version, memoryGiB: round(os.totalmem() / 2 ** 30, 1) },
    checks, api, editor, bundles, startup, lines,
  };
  fs.mkdirSync('bench', { recursive: true });
  fs.writeFileSync('bench/results.json', JSON.stringify(results, null, 2) + '\n');
  console.log('\nBaywright benchmark report (bench/results.json)\n');
  console.log(`| what | figure | goal | met |\n| --- | --- | --- | --- |`);
  for (const l of lines) console.log(`| ${l.what} | ${l.figure} | ${l.goal} | ${l.met === null ? '' : l.met ? 'yes' : 'NO'} |`);
}

main().catch((err) => {
  console.error(err instanceof Error ? err.stack : err);
  process.exit(1);
});
