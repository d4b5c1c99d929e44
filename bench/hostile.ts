/**
 * `npm run bench:hostile` (and part of `npm run bench`): the adversarial layouts of
 * tests/hardening/fixtures/adversarial-layouts.ts against the production server (`next start`).
 * - Worst-case time per route and layout (the slowest of three requests): POST /api/checks, the
 *   stored layout's checks, the viewer link's checks, revision compare (A against the current
 *   copy), the plan sheet as PDF and the print view (SVG). Goal: 2 s.
 * - GET /api/health p95 while one client hammers the heaviest check request (5,000 modules on one
 *   spot, posted to /api/checks) as fast as its rate limit lets it (10 a second). Goal: ≤ 50 ms.
 * Runs on BENCH_HOSTILE_PORT (default 3312) on its own database folder; timings on a shared machine are noisy.
 */
import autocannon from 'autocannon';
import { startTestServer } from '../scripts/lib/test-server';
import { signInOverHttp, type HttpSession } from '../tests/system/http-session';
import { DEMO_PASSWORD } from '../lib/demo-accounts';
import { ADVERSARIAL_LAYOUTS, stackedOnOneSpot } from '../tests/hardening/fixtures/adversarial-layouts';
import { percentile, round } from './stats';

export interface RouteWorst {
  layout: string;
  route: string;
  worstMs: number;
  status: number;
  bytes: number;
}

export interface HostileResult {
  routes: RouteWorst[];
  /** The same measurement with nobody attacking, in the same run. */
  healthAlone: { p50: number; p95: number; p99: number; requests: number };
  healthUnderAttack: { p50: number; p95: number; p99: number; requests: number; attackerStatuses: Record<string, number> };
}

const json = { 'content-type': 'application/json' };
const ATTACK_SECONDS = Number(process.env.BENCH_SECONDS ?? 10);
const PORT = Number(process.env.BENCH_HOSTILE_PORT ?? 3312);

async function timedFetch(session: HttpSession | null, base: string, path: string, init: RequestInit = {}): Promise<{ ms: number; status: number; bytes: number }> {
  const t0 = performance.now();
  const res = session ? await session.fetch(path, init) : await fetch(`${base}${path}`, init);
  const bytes = (await res.arrayBuffer()).byteLength;
  return { ms: performance.now() - t0, status: res.status, bytes };
}

export async function benchHostile(): Promise<HostileResult> {
  const server = await startTestServer({ port: PORT, db: 'bench-hostile', seed: true, fresh: true, quiet: true });
  try {
    const session = await signInOverHttp(server.url, 'ivo@saltmarsh.test', DEMO_PASSWORD);
    const routes: RouteWorst[] = [];
    for (const { name, make } of ADVERSARIAL_LAYOUTS) {
      const doc = make();
      const made = await session.fetch('/api/layouts', { method: 'POST', headers: json, body: JSON.stringify({ name: doc.name, doc }) });
      if (made.status !== 201) throw new Error(`${name}: saving the layout answered ${made.status}: ${(await made.text()).slice(0, 300)}`);
      const id = (await made.json()).id as string;
      const issued = await session.fetch(`/api/layouts/${id}/revisions`, { method: 'POST', headers: json, body: JSON.stringify({ note: 'bench' }) });
      if (issued.status !== 201) throw new Error(`${name}: issuing revision A answered ${issued.status}`);
      const linked = await session.fetch(`/api/layouts/${id}/links`, { method: 'POST', headers: json, body: '{}' });
      if (linked.status !== 201) throw new Error(`${name}: making a viewer link answered ${linked.status}`);
      const link = await linked.json();
      const token = String(link.path).split('/').pop();
      // The sheet is measured at a paper and scale that fit: a 422 "does not fit at 1:25" measures nothing.
      let sheetQuery = 'paper=a3&scale=25';
      const probe = await session.fetch(`/api/layouts/${id}/sheet?${sheetQuery}`);
      if (probe.status === 422) {
        const { suggestion } = (await probe.json()) as { suggestion: { paper: string; scale: number } | null };
        if (suggestion) sheetQuery = `paper=${suggestion.paper}&scale=${suggestion.scale}`;
      } else await probe.arrayBuffer();
      await new Promise((res) => setTimeout(res, 3100)); // inside the sheet rate limit
      const cases: Array<[string, () => Promise<{ ms: number; status: number; bytes: number }>]> = [
        ['POST /api/checks', () => timedFetch(session, server.url, '/api/checks', { method: 'POST', headers: json, body: JSON.stringify(doc) })],
        ['GET /api/layouts/:id/checks', () => timedFetch(session, server.url, `/api/layouts/${id}/checks`)],
        ['GET /api/v/:token/checks', () => timedFetch(null, server.url, `/api/v/${token}/checks`)],
        ['revision compare', () => timedFetch(session, server.url, `/api/layouts/${id}/revisions/compare?from=A&to=current`)],
        ['plan sheet PDF', () => timedFetch(session, server.url, `/api/layouts/${id}/sheet?${sheetQuery}`)],
        ['plan sheet print view (SVG)', () => timedFetch(session, server.url, `/layouts/${id}/sheet?${sheetQuery}`)],
      ];
      for (const [route, go] of cases) {
        let worst = { ms: 0, status: 0, bytes: 0 };
        for (let i = 0; i < 3; i++) {
          const r = await go();
          if (r.ms >= worst.ms) worst = r;
          if (route.startsWith('plan sheet')) await new Promise((res) => setTimeout(res, 3100)); // inside the sheet rate limit
        }
        routes.push({ layout: name, route: route.startsWith('plan sheet') ? `${route} (${sheetQuery.replace('&', ', ')})` : route, worstMs: round(worst.ms, 0), status: worst.status, bytes: worst.bytes });
        console.log(`${name.padEnd(36)} ${route.padEnd(30)} worst ${round(worst.ms, 0)} ms  ${worst.status}  ${(worst.bytes / 1024).toFixed(0)} KB`);
      }
    }

    // Health alone first, the same way, so the figure under attack can be read against this machine's own floor.
    const quiet: number[] = [];
    await new Promise<void>((resolve, reject) => {
      const instance = autocannon({ url: `${server.url}/api/health`, connections: 2, duration: ATTACK_SECONDS }, (err) => (err ? reject(err) : resolve()));
      instance.on('response', (_c: unknown, _s: number, _b: number, t: number) => quiet.push(t));
    });
    quiet.sort((a, b) => a - b);
    const healthAlone = { p50: round(percentile(quiet, 50), 1), p95: round(percentile(quiet, 95), 1), p99: round(percentile(quiet, 99), 1), requests: quiet.length };
    console.log(`GET /api/health alone: p50 ${healthAlone.p50} / p95 ${healthAlone.p95} / p99 ${healthAlone.p99} ms (${quiet.length} requests)`);

    // One client posts the heaviest check request as fast as its limit allows; health is measured meanwhile.
    const heavy = JSON.stringify(stackedOnOneSpot());
    const attackerStatuses: Record<string, number> = {};
    let attacking = true;
    const attacker = (async () => {
      while (attacking) {
        const started = performance.now();
        const res = await session.fetch('/api/checks', { method: 'POST', headers: json, body: heavy });
        await res.arrayBuffer();
        attackerStatuses[res.status] = (attackerStatuses[res.status] ?? 0) + 1;
        const wait = 100 - (performance.now() - started); // 10 a second at most: the per-user limit
        if (wait > 0) await new Promise((r) => setTimeout(r, wait));
      }
    })();
    const times: number[] = [];
    await new Promise<void>((resolve, reject) => {
      const instance = autocannon({ url: `${server.url}/api/health`, connections: 2, duration: ATTACK_SECONDS }, (err) => (err ? reject(err) : resolve()));
      instance.on('response', (_c: unknown, _s: number, _b: number, t: number) => times.push(t));
    });
    attacking = false;
    await attacker;
    times.sort((a, b) => a - b);
    const healthUnderAttack = { p50: round(percentile(times, 50), 1), p95: round(percentile(times, 95), 1), p99: round(percentile(times, 99), 1), requests: times.length, attackerStatuses };
    console.log(`GET /api/health under attack: p50 ${healthUnderAttack.p50} / p95 ${healthUnderAttack.p95} / p99 ${healthUnderAttack.p99} ms (${times.length} requests); attacker got ${JSON.stringify(attackerStatuses)}`);
    return { routes, healthAlone, healthUnderAttack };
  } finally {
    await server.stop();
  }
}

if (process.argv[1]?.endsWith('hostile.ts')) void benchHostile();
