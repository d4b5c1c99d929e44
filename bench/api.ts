/**
 * API latency under load on 127.0.0.1 (autocannon, 10 connections, after a warm-up): reading a
 * layout, saving a ~12 KB layout (each connection saves its own, carrying its version), and
 * posting a layout to /api/checks — beside a bare node:http + PGlite server doing the same read.
 * p50/p95/p99 are computed from every response time.
 */
import { spawn } from 'node:child_process';
import autocannon from 'autocannon';
import { startTestServer, stopProcessGroup } from '../scripts/lib/test-server';
import { signInOverHttp } from '../tests/system/http-session';
import { DEMO_PASSWORD } from '../lib/demo-accounts';
import { starterLayout } from '../lib/layout/templates';
import type { LayoutDoc } from '../lib/layout/schema';
import { percentile, round } from './stats';

export interface LoadResult {
  requests: number;
  rps: number;
  p50: number;
  p95: number;
  p99: number;
  errors: number;
  non2xx: number;
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

function load(opts: autocannon.Options): Promise<LoadResult> {
  return new Promise((resolve, reject) => {
    const times: number[] = [];
    const instance = autocannon({ connections: CONNECTIONS, duration: DURATION_S, ...opts }, (err, result) => {
      if (err) return reject(err);
      resolve({
        requests: result.requests.total,
        rps: round(result.requests.average, 0),
        p50: round(percentile(times, 50)),
        p95: round(percentile(times, 95)),
        p99: round(percentile(times, 99)),
        errors: result.errors + result.timeouts,
        non2xx: result.non2xx,
      });
    });
    instance.on('response', (_client, _status, _bytes, responseTime) => times.push(responseTime));
  });
}

async function warm(url: string, headers: Record<string, string>) {
  await load({ url, headers, duration: 2 } as autocannon.Options);
}

export async function benchApi(): Promise<{ read: LoadResult; save: LoadResult; checks: LoadResult; bareRead: LoadResult; readVsBare: number }> {
  const server = await startTestServer({ port: 3300, db: 'bench-api', seed: true, fresh: true, quiet: true, env: { CHECKS_RATE_PER_SECOND: '100000' } });
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
    const readUrl = `${server.url}/api/layouts/${ids[0].id}`;
    await warm(readUrl, headers);
    const read = await load({ url: readUrl, headers });

    let next = 0;
    const body = JSON.stringify({ doc });
    const save = await load({
      url: server.url,
      requests: [
        {
          method: 'PUT',
          setupRequest: (req, context: Record<string, unknown>) => {
            if (!context.layout) context.layout = ids[next++ % ids.length];
            const layout = context.layout as { id: string; version: number };
            return { ...req, path: `/api/layouts/${layout.id}`, headers: { ...headers, ...json, 'if-match': String(layout.version) }, body };
          },
          onResponse: (status, resBody, context: Record<string, unknown>) => {
            if (status === 200) (context.layout as { version: number }).version = JSON.parse(resBody).version;
          },
        },
      ],
    } as autocannon.Options);

    const checks = await load({ url: `${server.url}/api/checks`, method: 'POST', headers: { ...headers, ...json }, body: JSON.stringify(doc) });

    const bare = spawn('npx', ['tsx', 'bench/bare-server.ts'], { env: { ...process.env, PORT: '3399', BENCH_DOC: JSON.stringify(doc) }, detached: true });
    await new Promise<void>((resolve) => bare.stdout.on('data', (d) => String(d).includes('listening') && resolve()));
    await warm('http://127.0.0.1:3399/', {});
    const bareRead = await load({ url: 'http://127.0.0.1:3399/' });
    await stopProcessGroup(bare);
    return { read, save, checks, bareRead, readVsBare: round(read.rps / bareRead.rps, 2) };
  } finally {
    await server.stop();
  }
}

if (process.argv[1]?.endsWith('api.ts')) {
  benchApi().then((r) => {
    console.table({ read: r.read, save: r.save, checks: r.checks, 'bare read': r.bareRead });
    console.log(`Baywright ÷ bare read throughput: ${r.readVsBare}`);
  });
}
