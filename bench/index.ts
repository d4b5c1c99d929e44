/**
 * `npm run bench`: the one benchmark report. Runs the check engine, API load, editor, bundle
 * and start-up benchmarks in turn (each starts its own production server on its own database),
 * writes bench/results.json and docs/benchmarks.md (the table, how it was measured and how to
 * reproduce it), and prints the table with the goals beside the figures.
 */
import fs from 'node:fs';
import os from 'node:os';
import { benchChecks } from './checks';
import { benchProposals } from './proposals';
import { benchApi } from './api';
import { benchHostile } from './hostile';
import { benchEditor, gestureWords } from './editor';
import { benchBundles } from './bundles';
import { benchVitals, vitalsLines } from './vitals';
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
  const loadBefore = os.loadavg();
  const checks = benchChecks();
  const proposals = benchProposals();
  const api = await benchApi();
  const hostile = await benchHostile();
  const editor = await benchEditor();
  const bundles = await benchBundles({ floor: true });
  const vitals = await benchVitals();
  const startup = await benchStartup();

  const lines: Line[] = [
    { what: 'runChecks median, 20 modules', figure: `${round(checks.m20, 2)} ms`, goal: '—', met: null },
    { what: 'runChecks median, 200 modules', figure: `${round(checks.m200, 2)} ms`, goal: '≤ 20 ms', met: checks.m200 <= 20 },
    { what: 'runChecks median, 2000 modules', figure: `${round(checks.m2000, 2)} ms`, goal: '—', met: null },
    { what: 'runChecks ratio 2000/200', figure: `${round(checks.ratio, 1)}`, goal: '≤ 15', met: checks.ratio <= 15 },
    ...proposals.map((p) => ({
      what: `proposals, typical two-sleeper brief, ${p.template}: time to the final proposals (${p.checked} candidates checked, ${round(p.perSecond, 0)} a second)`,
      figure: `${round(p.ms, 0)} ms`,
      goal: '≤ 2000 ms, ≥ 250 checked a second',
      met: p.ms <= 2000 && (p.checked === 0 || p.perSecond >= 250),
    })),
    ...(
      [
        ['read a layout', api.read, 50],
        ['save a 12 KB layout', api.save, 100],
        ['POST /api/checks (12 KB)', api.checks, null],
        ['Next.js floor, GET /api/health (one query, no session)', api.floor, null],
        ['bare node:http + PGlite read', api.bareRead, null],
      ] as const
    ).map(([what, r, goal]) => ({
      what: `API ${what}: p50 / p95 / p99, req/s, errors`,
      figure: `${r.p50} / ${r.p95} / ${r.p99} ms, ${r.rps}/s, ${r.errors + r.non2xx}${Object.keys(r.statuses).length ? ` (${Object.entries(r.statuses).map(([k, n]) => `${n}× ${k}`).join(', ')})` : ''}`,
      goal: goal ? `p95 ≤ ${goal} ms, 0 errors` : '—',
      met: goal ? r.p95 <= goal && r.errors + r.non2xx === 0 : null,
    })),
    {
      what: 'GET /api/health p95 while one client hammers POST /api/checks (5,000 modules on one spot) at its rate limit',
      figure: `${hostile.healthUnderAttack.p95} ms (p50 ${hostile.healthUnderAttack.p50}, p99 ${hostile.healthUnderAttack.p99}; attacker: ${Object.entries(hostile.healthUnderAttack.attackerStatuses).map(([k, n]) => `${n}× ${k}`).join(', ')}; with nobody attacking, same run: p95 ${hostile.healthAlone.p95} ms, p50 ${hostile.healthAlone.p50})`,
      goal: '≤ 50 ms',
      met: hostile.healthUnderAttack.p95 <= 50,
    },
    ...hostile.routes.map((r) => ({
      what: `worst case, ${r.route}: ${r.layout}`,
      figure: `${r.worstMs} ms, ${r.status}, ${Math.round(r.bytes / 1024)} KB`,
      goal: '≤ 2000 ms, < 2 MB',
      met: r.worstMs <= 2000 && r.bytes < 2 * 1024 * 1024,
    })),
    { what: 'Baywright ÷ bare read throughput (median of rounds)', figure: `${api.readVsBare} (${api.readVsBareRounds.join(', ')})`, goal: '≥ 0.5', met: api.readVsBare >= 0.5 },
    { what: 'editor drag, 200 modules: frame p95 / draw p95 / frames > 50 ms', figure: `${editor.drag200.frameP95} / ${editor.drag200.drawP95} ms / ${editor.drag200.over50}`, goal: '≤ 17 / ≤ 8 ms / 0', met: editor.drag200.frameP95 <= 17 && editor.drag200.drawP95 <= 8 && editor.drag200.over50 === 0 },
    ...editor.tablet.map((d) => ({
      what: `tablet ${d.viewport} (CPU ${d.cpuSlowdown === 1 ? 'full speed' : `${d.cpuSlowdown}× slower`}), ${gestureWords(d.gesture)}, 200 modules: frame p95 / worst / frames > 100 ms`,
      figure: `${d.frameP95} / ${d.frameMax} ms / ${d.over100}${d.moved ? '' : ' (gesture did not take effect)'}`,
      goal: '≤ 33 ms / — / 0',
      met: d.moved && d.frameP95 <= 33 && d.over100 === 0,
    })),
    { what: 'editor drag, 2000 modules: frame p95 / draw p95 / frames > 50 ms', figure: `${editor.drag2000.frameP95} / ${editor.drag2000.drawP95} ms / ${editor.drag2000.over50}`, goal: '—', met: null },
    { what: 'drop → updated findings p95 (30 modules)', figure: `${editor.checks.p95} ms`, goal: '≤ 150 ms', met: editor.checks.p95 <= 150 },
    ...bundles.routes.map((r) => ({ what: `gzipped JS: ${r.route} (first load ${r.firstLoadKb} KB)`, figure: `${r.kb} KB`, goal: `≤ ${r.budget} KB`, met: r.met })),
    ...(bundles.floor ? [{ what: `gzipped JS: framework floor, an empty server-only page (Next ${bundles.floor.nextVersion}, React ${bundles.floor.reactVersion}); with one next/link ${bundles.floor.link} KB`, figure: `${bundles.floor.empty} KB`, goal: '—', met: null }] : []),
    ...vitalsLines(vitals),
    { what: 'cold start to first 200 (new data folder)', figure: `${startup.coldS} s`, goal: '≤ 6 s', met: startup.coldS <= 6 },
    { what: 'warm start to first 200', figure: `${startup.warmS} s`, goal: '≤ 2 s', met: startup.warmS <= 2 },
    { what: 'cold start to the database answering (first 200 from /api/health)', figure: `${startup.coldDatabaseS} s`, goal: '—', met: null },
    { what: 'warm start to the database answering', figure: `${startup.warmDatabaseS} s`, goal: '—', met: null },
  ];

  const results = {
    at: new Date().toISOString(),
    machine: {
      cpus: os.cpus().length, model: os.cpus()[0]?.model, node: process.version, memoryGiB: round(os.totalmem() / 2 ** 30, 1),
      // Load average (1 min) when the run started and ended: other work on the machine slows every figure.
      load: { before: round(loadBefore[0], 1), after: round(os.loadavg()[0], 1) },
    },
    checks, proposals, api, hostile, editor, bundles, vitals, startup, lines,
  };
  fs.mkdirSync('bench', { recursive: true });
  fs.writeFileSync('bench/results.json', JSON.stringify(results, null, 2) + '\n');
  const table = [`| what | figure | goal | met |`, `| --- | --- | --- | --- |`, ...lines.map((l) => `| ${l.what} | ${l.figure} | ${l.goal} | ${l.met === null ? '' : l.met ? 'yes' : 'NO'} |`)].join('\n');
  fs.mkdirSync('docs', { recursive: true });
  fs.writeFileSync('docs/benchmarks.md', report(table, results.machine, results.at));
  console.log('\nBaywright benchmark report (bench/results.json, docs/benchmarks.md)\n');
  console.log(table);
}

function report(table: string, machine: { cpus: number; model?: string; node: string; memoryGiB: number; load: { before: number; after: number } }, at: string): string {
  const loaded = Math.max(machine.load.before, machine.load.after) > machine.cpus * 0.5;
  return `# Benchmarks

Measured with \`npm run bench\` on ${at.slice(0, 10)}: ${machine.cpus} cores (${machine.model ?? 'unknown CPU'}), ${machine.memoryGiB} GiB, Node ${machine.node}.
Load average when the run started and ended: ${machine.load.before} and ${machine.load.after}${loaded ? ` — the machine was busy with other work (a load above ${machine.cpus * 0.5} on ${machine.cpus} cores), so every time below is slower and noisier than on an idle machine` : ''}.
The raw figures are in \`bench/results.json\`. This file is written by the same run.

${table}

## How each figure is measured

- **Check engine** (\`bench/checks.ts\`, \`npm run bench:checks\`): median wall time of \`runChecks\` on generated,
  realistic layouts (a 20-module van cell repeated in proportionally larger bays), after a warm-up; includes the
  build-planning rules.
- **Proposals** (\`bench/proposals.ts\`, \`npm run bench:proposals\`): \`generateProposals\` with the typical two-sleeper
  brief on each bay template, in this process; the median of at least 3 runs and at least 0.5 s of runs per template,
  after one warm-up run of every template (proposals run on the work pool's threads, whose check code the checks
  keep warm). The rate is candidates laid out and checked per second of the whole run.
- **API under load** (\`bench/api.ts\`, \`npm run bench:api\`): the production server (\`next start\`) on its own embedded
  database on 127.0.0.1 (PGlite on its worker thread), autocannon with 10 connections for 8 s after a 10 s warm-up of
  the same requests (V8 tiers up PGlite's WebAssembly gradually; the first seconds run at about half the steady rate),
  signed in as the demo designer. Percentiles come from every response time (autocannon's summary has no p95); non-2xx
  answers are counted by status. *Read*: \`GET /api/layouts/:id\` of a ~12 KB layout. *Save*: \`PUT\` of that layout
  with its current \`If-Match\` version; ten layouts, and a request borrows one no other connection is saving (autocannon
  clears per-request context on every loop, so a layout cannot stay with one connection). *Checks*: \`POST /api/checks\`
  with the same document (the per-user rate limit raised for the run). *Next.js floor*: \`GET /api/health\`, one
  \`select 1\` and no session, to show what the framework alone costs. *Bare*: a \`node:http\` server on PGlite doing the
  same read with no framework, auth or validation, in the same run. The read and the bare read are warmed up
  alike and then take turns, three rounds of 8 s each (\`BENCH_ROUNDS\`); latencies are pooled, and the ratio is the
  median of the three rounds' ratios (each round's read and bare read ran back to back, so a passing neighbour on the
  machine costs both sides of that round alike; the rounds' ratios are printed beside it).
- **Hostile layouts** (\`bench/hostile.ts\`, \`npm run bench:hostile\`): the adversarial layouts of the hostile-input
  tests (all modules on one spot, 5,000 modules, 5,000 overlapping in sleep, maximum build-up, maximum doors and
  arches), each stored with a revision and a viewer link on a fresh \`next start\`; the slowest of three requests per
  route (checks posted, stored, through the viewer link, revision compare, plan sheet PDF and print view). Then
  \`GET /api/health\` with autocannon (2 connections, 10 s) while one signed-in client posts the 5,000-modules-on-one-spot
  layout to \`/api/checks\` back to back, never faster than its limit of 10 a second.
- **Editor** (\`bench/editor.ts\`, \`npm run bench:editor\`): headless Chromium drags one module across a 200- and a
  2000-module layout for 120 steps; frame intervals from \`requestAnimationFrame\`, Konva draw time per frame, frames
  over 50 ms; then drop → updated findings on a 30-module layout. Headless Chromium paces frames itself, so frame
  figures show main-thread cost, not a particular display.
- **Tablet** (\`bench/editor.ts\`): the editor in a 1024 × 768 window with touch (its tablet arrangement), the same
  120-step drag over 200 modules with one finger and a two-finger zoom on the plan (touch emulation, CDP
  \`Input.dispatchTouchEvent\`), at full speed and with Chromium's CPU slowed 4× (CDP \`Emulation.setCPUThrottlingRate\`,
  a mid-range tablet), and the mouse drag at 4×; frame intervals from \`requestAnimationFrame\`, p95 and the worst.
  Where the worst frames come from (Chromium traces of the 4× one-finger drag, 2026-12-05): since a drag no longer
  redraws the plan's drawing layer in its first frame, the drag's first frames are about 100 ms; the worst ones left
  fall mid-drag, in compositor commits that copy every canvas of the plan at once
  (\`Canvas2DResourceProvider::ProduceCanvasResource\`, about 37 ms each for four canvases, software compositing with
  the GPU off), while the page's own script in those frames takes under 15 ms. A later trace (same day, after the drag
  and overlay layers stopped being hidden between gestures) shows every commit of the drag producing all five of the
  plan's canvases (595 productions: median 1.0 ms, p90 3.3 ms); in the one slow commit each took about 50 ms, with
  only the drag layer redrawn in that frame. Traced again (2026-12-05, later): the slow productions come in batches
  that take every canvas at once, about 40 ms each, busy in the renderer's main thread (thread time about equal to
  wall time), twice while the editor loads and about once a drag, with no change to the page in the frames before
  them (Konva redrew only the drag layer). Since then the plan keeps to three canvases (the rulers and the mark-ups
  draw in the overlay's layer): in three scratch runs each of the 4× one-finger drag, the worst frame went from
  200–217 ms to 117–150 ms, and the 4× zoom from one 200 ms frame in three runs to none over 17 ms. Two canvases
  (the drag layer's nodes in the overlay's layer too) were tried and left: the one-finger drag's worst frame was
  100–133 ms in three runs, and the mouse drag's second frame grew to 67–100 ms (the overlay is redrawn as it starts).
- **Gzipped JavaScript** (\`bench/bundles.ts\`, \`npm run bench:bundles\`): every page route the build lists in
  \`.next/diagnostics/route-bundle-stats.json\` (a route with no visit fails the run), opened in a fresh browser context
  (empty cache; signed in as the demo owner where the page needs it): the encoded size of every script response until the
  page is ready and the network idle, so chunks a page loads by itself (the editor's drawing, the build planner's open
  tab) count and chunks loaded on a later click do not. "First load" beside it is the route's chunks from the build's
  stats, gzipped. The framework floor (\`bench/floor.ts\`) builds an app with one server-only page (no client code at
  all) on the same Next.js and React: no page of this stack can ship less. What each route ships, chunk by chunk, is in
  \`bench/bundle-report.md\`.
- **Web Vitals** (\`bench/vitals.ts\`, \`npm run bench:vitals\`): the \`web-vitals\` library (npm) injected before the
  page's own scripts. LCP and CLS on cold loads (fresh context, empty cache; three per page, LCP and the bay drawn the
  median, CLS the worst) of the start page, sign-in, the layouts table, the editor on a 30-module layout, its viewer
  link and its build planner; INP of one interaction per fresh load
  (drop a module from the Parts shelf, drag a module, type a length in the Details panel, switch arrangement, switch a
  build-plan tab); the editor's bay drawn = the plan's canvas in the page plus two painted frames, from navigation start.
  The bay drawn is also shown, without a goal, on a repeat visit: one context opens the editor twice untimed (its
  scripts then sit in the HTTP cache and their compiled code in Chromium's code cache), then three times timed, median.
  Twice: unthrottled, and with the CPU slowed 4×. web-vitals reports no INP under 16 ms; such a figure reads 16 ms.
  web-vitals reports INP only when it grows, and getting the page ready can take an interaction of its own (the click
  that selects a module before a length is typed); so an interaction's INP is the larger of what web-vitals reports
  after it and its longest Event Timing entry (the entries web-vitals reads; INP is the longest interaction below 50).
  A drop from the Parts shelf is a drag and drop, which INP does not count (only pointer and key events get an
  interaction id): its figure is the \`drop\` event's Event Timing duration, to the next paint. The editor places the
  module in the task after that paint, so beside it stands "drop → module drawn": from the drop to two frames after
  the selection line names the placed module (the frame that drew it, painted), for the time to the module on the plan.
- **Start-up** (\`bench/startup.ts\`): the \`next\` binary's \`start\` (run with node directly, as a process manager
  would; \`npx\` adds about 0.4 s of its own) to the first 200 of \`/sign-in\`; cold = a new data folder (the cluster
  comes from the empty template \`npm install\` makes, then migrations run), warm = the same folder again (best of
  three). Without the template a new folder runs initdb, 3–5 s more. The database opens in the background while the
  server starts (\`instrumentation-node.ts\`), so the first page that reads no data can come before it: the time to
  the database answering (the first 200 from \`/api/health\`, which runs a query) is reported beside it.

## Reading the figures

- **Baywright ÷ bare.** The bare server answers a read with one query and nothing else. Next.js alone, with one
  query and no session, reaches about 0.7–0.8 of it on this machine (the floor row); a Baywright read adds the
  session (cookie, cached token claims, one prepared query for the caller and their membership), the rights check
  and the layout's metadata, and lands at 0.5–0.58 across runs. What brought it there from 0.26: reads on the
  embedded database run as prepared statements (planning the joined reads was most of the database thread's
  time), and the document's JSON text is cached by layout id, version and save time, so a repeated read is not
  parsed, copied between threads and serialised again. The database thread is now mostly idle; the server's main
  thread (Next.js routing and web streams) is the limit.
- **Noise.** Browser figures (frames, Web Vitals) taken while other work shares the two cores are noisy, and more so
  with the CPU throttled; re-run on an idle machine before reading a miss as a regression. On this 2-core machine, repeated runs of the API figures vary by ±20 % with no change to the code
  (autocannon shares the cores with the server). Compare figures from one run, not across runs.

${testTimeSection()}${keptSection('bench/idle-runs.md')}## Reproduce

\`\`\`sh
npm ci
apt-get install -y chromium    # if /usr/bin/chromium is missing
npm run bench                  # ~6 minutes; builds first if needed
\`\`\`

Run it on an otherwise idle machine: the figures above share two cores with nothing else.
`;
}

/** The test suite's time (bench/test-time.md, measured with `npm test`, not by this run), kept in the report. */
function testTimeSection(): string {
  return keptSection('bench/test-time.md');
}

/** A section measured by hand, outside this run (bench/*.md), copied into the report as it is. */
function keptSection(file: string): string {
  try {
    return `${fs.readFileSync(file, 'utf8').trim()}\n\n`;
  } catch {
    return '';
  }
}

main().catch((err) => {
  console.error(err instanceof Error ? err.stack : err);
  process.exit(1);
});
