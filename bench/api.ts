/**
 * API latency under load on 127.0.0.1 (autocannon, 10 connections, after a warm-up): reading a
 * layout, saving a ~12 KB layout (no two connections save the same layout at once), and
 * posting a layout to /api/checks — beside a bare node:http + PGlite server doing the same read.
 * The read and the bare read take turns (BENCH_ROUNDS, default 3) so both see the same machine;
 * the ratio reported is the median of the rounds' ratios. p50/p95/p99 are computed from every
 * response time. Ports: BENCH_PORT (default 3300) and BENCH_BARE_PORT (default 3399).
 */
import { spawn } from 'node:child_process';
import autocannon from 'autocannon';
import { startTestServer, stopProcessGroup } from '../scripts/lib/test-server';
import { signInOverHttp } from '../tests/system/http-session';
import { DEMO_PASSWORD } from '../lib/demo-accounts';
import { starterLayout } from '../lib/layout/templates';
import type { LayoutDoc } from '../lib/layout/schema';
import { median, percentile, round } from './stats';

export interface LoadResult {
  requests: number;
  rps: number;
  p50: number;
  p95: number;
  p99: number;
  errors: number;
  non2xx: number;
  /** Non-2xx answers by status, so an error count can be explained. */
  statuses: Record<string, number>;
}

const CONNECTIONS = 10;
const DURATION_S = Number(process.env.BENCH_SECONDS ?? 8);

/** A starter layout padded with small modules to about 12 KB of JSON. */
export function twelveKbLayout(): LayoutDoc {
  const doc = starterLayout('starter-rear-bed')!;
  const modules = [...doc.modules];
  let i = 0;
  while (JSON.stringify({ ...doc, modules }).length < 12_000) {
    modules.push({ id: `pad${i}`, kind: 'drawer-unit', x: 100 + (i % 20) * 10, y: 600, length: 300, width: 300, elevation: 1200 + i, height: 10, facing: 'front', arrangements: ['lounge'] });
    i++;
  }
  return { ...doc, modules };
}

/** One autocannon run's raw figures: every response time, so runs can be pooled. */
interface Run {
  times: number[];
  seconds: number;
  errors: number;
  non2xx: number;
  statuses: Record<string, number>;
}

function run(opts: autocannon.Options): Promise<Run> {
  return new Promise((resolve, reject) => {
    const times: number[] = [];
    const statuses: Record<string, number> = {};
    const instance = autocannon({ connections: CONNECTIONS, duration: DURATION_S, ...opts }, (err, result) => {
      if (err) return reject(err);
      resolve({ times, seconds: result.duration, errors: result.errors + result.timeouts, non2xx: result.non2xx, statuses });
    });
    instance.on('response', (_client, status, _bytes, responseTime) => {
      times.push(responseTime);
      if (status < 200 || status > 299) statuses[status] = (statuses[status] ?? 0) + 1;
    });
  });
}

function summarise(runs: Run[]): LoadResult {
  const times = runs.flatMap((r) => r.times);
  const seconds = runs.reduce((n, r) => n + r.seconds, 0);
  const statuses: Record<string, number> = {};
  for (const r of runs) for (const [k, n] of Object.entries(r.statuses)) statuses[k] = (statuses[k] ?? 0) + n;
  return {
    requests: times.length,
    rps: round(times.length / seconds, 0),
    p50: round(percentile(times, 50)),
    p95: round(percentile(times, 95)),
    p99: round(percentile(times, 99)),
    errors: runs.reduce((n, r) => n + r.errors, 0),
    non2xx: runs.reduce((n, r) => n + r.non2xx, 0),
    statuses,
  };
}

async function load(opts: autocannon.Options): Promise<LoadResult> {
  return summarise([await run(opts)]);
}

const WARMUP_S = Number(process.env.BENCH_WARMUP_SECONDS ?? 10);
/** `BENCH_CASES=read,bare` runs only those cases (read, save, checks, floor, bare); the rest report zeros. */
const CASES = new Set((process.env.BENCH_CASES ?? 'read,save,checks,floor,bare').split(',').map((c) => c.trim()));
const SKIPPED: LoadResult = { requests: 0, rps: 0, p50: 0, p95: 0, p99: 0, errors: 0, non2xx: 0, statuses: {} };

/**
 * A warm-up run with the same requests, then the measured run. The warm-up is long because V8
 * tiers up the embedded database's WebAssembly and the server's JavaScript gradually: on this
 * 2-core machine the first seconds run at half the steady rate.
 */
async function measure(opts: autocannon.Options, beforeMeasuring?: () => Promise<void>): Promise<LoadResult> {
  await run({ ...opts, duration: WARMUP_S } as autocannon.Options);
  await beforeMeasuring?.();
  return load(opts);
}

const ROUNDS = Number(process.env.BENCH_ROUNDS ?? 3);
const PORT = Number(process.env.BENCH_PORT ?? 3300);
const BARE_PORT = Number(process.env.BENCH_BARE_PORT ?? 3399);

const rate = (r: Run) => r.times.length / r.seconds;

/**
 * For a ratio: both warmed up, then `ROUNDS` turns of a then b, each pooled for the latencies;
 * the ratio of each round is kept too. A neighbour that takes a core for a few seconds then
 * costs both sides of one round alike, and the median round sets the reported ratio.
 */
async function measurePair(a: autocannon.Options, b: autocannon.Options): Promise<[LoadResult, LoadResult, number[]]> {
  await run({ ...a, duration: WARMUP_S } as autocannon.Options);
  await run({ ...b, duration: WARMUP_S } as autocannon.Options);
  const runsA: Run[] = [];
  const runsB: Run[] = [];
  for (let i = 0; i < ROUNDS; i++) {
    runsA.push(await run(a));
    runsB.push(await run(b));
  }
  const ratios = runsA.map((r, i) => round(rate(r) / rate(runsB[i]), 2));
  return [summarise(runsA), summarise(runsB), ratios];
}

export interface ApiBench {
  read: LoadResult;
  save: LoadResult;
  checks: LoadResult;
  floor: LoadResult;
  bareRead: LoadResult;
  /** Median of the rounds' read ÷ bare throughput ratios. */
  readVsBare: number;
  /** Each round's read ÷ bare throughput ratio, in the order they ran. */
  readVsBareRounds: number[];
}

export async function benchApi(): Promise<ApiBench> {
  const server = await startTestServer({ port: PORT, db: 'bench-api', seed: true, fresh: true, quiet: true, env: { CHECKS_RATE_PER_SECOND: '100000' } });
  const doc = twelveKbLayout();
  try {
    const session = await signInOverHttp(server.url, 'ivo@saltmarsh.test', DEMO_PASSWORD);
    const json = { 'content-type': 'application/json' };
    const ids: { id: string; version: number }[] = [];
    for (let i = 0; i < CONNECTIONS; i++) {
      const res = await session.fetch('/api/layouts', { method: 'POST', headers: json, body: JSON.stringify({ name: `Bench ${i}`, doc }) });
      const created = await res.json();
      ids.push({ id: created.id, version: created.version });
    }
    const headers = { cookie: session.cookie };
    const readOpts = { url: `${server.url}/api/layouts/${ids[0].id}`, headers };
    let read = SKIPPED;
    let bareRead = SKIPPED;
    let readVsBareRounds: number[] = [];
    if (CASES.has('read') && CASES.has('bare')) [read, bareRead, readVsBareRounds] = await withBare(doc, (bare) => measurePair(readOpts, bare));
    else if (CASES.has('read')) read = await measure(readOpts);
    else if (CASES.has('bare')) bareRead = await withBare(doc, (bare) => measure(bare));

    // autocannon clears a request's context each time it loops over `requests`, so a layout
    // cannot stay with one connection; instead each request borrows a layout nobody else is
    // saving and gives it back with its new version. With one request in flight per connection
    // and a layout per connection, one is always free.
    let free = [...ids];
    const body = JSON.stringify({ doc });
    const save = !CASES.has('save')
      ? SKIPPED
      : await measure(
          {
            url: server.url,
            requests: [
              {
                method: 'PUT',
                setupRequest: (req, context: Record<string, unknown>) => {
                  const layout = free.shift()!;
                  context.layout = layout;
                  return { ...req, path: `/api/layouts/${layout.id}`, headers: { ...headers, ...json, 'if-match': String(layout.version) }, body };
                },
                onResponse: (status, resBody, context: Record<string, unknown>) => {
                  const layout = context.layout as { id: string; version: number };
                  if (status === 200) layout.version = JSON.parse(resBody).version;
                  free.push(layout);
                },
              },
            ],
          } as autocannon.Options,
          // A save cut off when the warm-up stopped never gave its layout back: start again from
          // the versions the server holds.
          async () => {
            free = await Promise.all(ids.map(async ({ id }) => ({ id, version: (await (await session.fetch(`/api/layouts/${id}`)).json()).version as number })));
          },
        );

    const checks = !CASES.has('checks') ? SKIPPED : await measure({ url: `${server.url}/api/checks`, method: 'POST', headers: { ...headers, ...json }, body: JSON.stringify(doc) });
    // What Next.js itself costs: a route with one query and no session, for reading the ratio.
    const floor = !CASES.has('floor') ? SKIPPED : await measure({ url: `${server.url}/api/health` });

    const readVsBare = readVsBareRounds.length ? median(readVsBareRounds) : 0;
    return { read, save, checks, floor, bareRead, readVsBare, readVsBareRounds };
  } finally {
    await server.stop();
  }
}

/** Runs `fn` while the bare node:http + PGlite server is up. */
async function withBare<T>(doc: LayoutDoc, fn: (bare: autocannon.Options) => Promise<T>): Promise<T> {
  const bare = spawn('npx', ['tsx', 'bench/bare-server.ts'], { env: { ...process.env, PORT: String(BARE_PORT), BENCH_DOC: JSON.stringify(doc) }, detached: true });
  await new Promise<void>((resolve) => bare.stdout.on('data', (d) => String(d).includes('listening') && resolve()));
  try {
    return await fn({ url: `http://127.0.0.1:${BARE_PORT}/` });
  } finally {
    await stopProcessGroup(bare);
  }
}

if (process.argv[1]?.endsWith('api.ts')) {
  benchApi().then((r) => {
    console.table({ read: r.read, save: r.save, checks: r.checks, 'Next.js floor': r.floor, 'bare read': r.bareRead });
    console.log(`Baywright ÷ bare read throughput: ${r.readVsBare} (median of rounds ${r.readVsBareRounds.join(', ')})`);
  });
}
