/**
 * `npm run bench:bundles`: gzipped JavaScript per page route, for EVERY page route of the
 * production build (the list comes from the build's own route bundle stats; a route without a
 * visit here fails the run), beside its budget.
 *
 * Figure: a first visit with an empty cache in Debian's Chromium against the production server
 * (which gzips): the encoded size of every script response until the page is ready and the
 * network is idle, so lazily loaded chunks a page fetches by itself (the editor's Konva drawing,
 * the build planner's open tab) count, and chunks fetched only on a later click do not. Beside it,
 * the route's first-load chunks from `route-bundle-stats.json`, gzipped here (what the HTML asks
 * for before any lazy chunk), and the framework floor (bench/floor.ts) when asked for.
 *
 * Writes bench/bundle-report.md: per route, its chunks with their gzipped size, and the largest
 * modules of each chunk as the build's analyser names them when `.next-analyze` holds an
 * analysis (`npx next analyze -o` with NEXT_DIST_DIR=.next-analyze). Benchmark code only.
 */
import fs from 'node:fs';
import path from 'node:path';
import { spawnSync } from 'node:child_process';
import { chromium, type Browser, type BrowserContext, type Page } from '@playwright/test';
import { startTestServer } from '../scripts/lib/test-server';
import { DEMO_PASSWORD } from '../lib/demo-accounts';
import { gzipBytes, gzipKb, routeChunks } from './bundle-stats';
import { measureFloor, type Floor } from './floor';
import { round } from './stats';

export const LAUNCH = {
  executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
  args: ['--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
};

/**
 * Budgets in gzipped KB (the issue's table). Pages not in that table get the budget of their
 * neighbour: the revisions list, the saved versions and the variants comparison that of the
 * revision comparison; the proposals for a layout that of a new layout (which also proposes).
 */
export const BUDGETS: Record<string, number> = {
  '/': 130,
  '/_not-found': 130,
  '/sign-in': 130,
  '/sign-up': 130,
  '/invite/[token]': 130,
  '/reset-password': 130,
  '/reset-password/[token]': 130,
  '/layouts': 150,
  '/layouts/new': 150,
  '/layouts/[id]': 250,
  '/layouts/[id]/build': 190,
  '/layouts/[id]/quote': 130,
  '/layouts/[id]/revisions': 150,
  '/layouts/[id]/revisions/compare': 150,
  '/layouts/[id]/versions': 150,
  '/layouts/[id]/compare': 150,
  '/layouts/[id]/proposals': 150,
  '/layouts/[id]/sheet': 130,
  '/clients': 150,
  '/settings': 150,
  '/outbox': 130,
  '/outbox/[id]': 130,
  '/v/[token]': 180,
};

export interface RouteBundle {
  route: string;
  /** Transferred gzipped script, first visit, empty cache, until ready + network idle. */
  kb: number;
  /** The route's first-load chunks from the build's stats, gzipped here. */
  firstLoadKb: number;
  budget: number;
  met: boolean;
}

export interface BundleFigures {
  routes: RouteBundle[];
  floor: Floor | null;
}

const OWNER = 'maren@saltmarsh.test';

async function signIn(page: Page, base: string, email: string) {
  await page.goto(`${base}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL(/\/layouts/);
}

async function transferredKb(context: BrowserContext, url: string, ready: (p: Page) => Promise<unknown>): Promise<number> {
  const page = await context.newPage();
  const sizes: Promise<number>[] = [];
  page.on('response', (res) => {
    if (res.request().resourceType() === 'script') sizes.push(res.request().sizes().then((s) => s.responseBodySize));
  });
  await page.goto(url);
  await ready(page);
  await page.waitForLoadState('networkidle');
  const kb = round((await Promise.all(sizes)).reduce((a, b) => a + b, 0) / 1024, 1);
  await page.close();
  return kb;
}

/** The places a visit needs: a layout, a viewer link, an invitation token, a revision, a mail. */
async function prepare(browser: Browser, base: string) {
  const context = await browser.newContext();
  const page = await context.newPage();
  await signIn(page, base, OWNER);
  const post = async (url: string, data: unknown) => {
    const res = await page.request.post(`${base}${url}`, { data, headers: { origin: base } });
    if (res.status() !== 201) throw new Error(`POST ${url}: HTTP ${res.status()} ${(await res.text()).slice(0, 300)}`);
    return res.json();
  };
  const list = await (await page.request.get(`${base}/api/layouts`)).json();
  const layouts = (list.layouts ?? list) as { id: string; name: string }[];
  const layout = layouts.find((l) => l.name === 'Nair — L2H2 weekender') ?? layouts[0];
  if (!layout) throw new Error('the seeded studio has no layout');
  const link = (await post(`/api/layouts/${layout.id}/links`, {})) as { path: string };
  // One revision: the comparison then sets it against the current drawing.
  await post(`/api/layouts/${layout.id}/revisions`, { note: 'Bundle benchmark issue' });
  const invitee = `bundles-${Date.now()}@client.test`;
  await post('/api/invitations', { email: invitee, name: 'Bundle Benchmark' });
  // The invitation's token travels only by mail: read it from the development outbox.
  await page.goto(`${base}/outbox`);
  const row = page.getByRole('row').filter({ hasText: invitee }).first();
  await row.waitFor({ timeout: 15_000 });
  const mailId = (await row.getAttribute('data-mail-id'))!;
  const raw = await (await page.request.get(`${base}/outbox/${mailId}/raw`)).text();
  const token = raw.replace(/=\r?\n/g, '').match(/\/invite\/([A-Za-z0-9_-]{43})/)?.[1];
  if (!token) throw new Error('the invitation mail carries no /invite/ link');
  // A password-reset link for the owner, the same way (the mail goes out after the answer).
  const asked = await page.request.post(`${base}/api/password-reset`, { data: { email: OWNER }, headers: { origin: base } });
  if (asked.status() >= 300) throw new Error(`POST /api/password-reset: HTTP ${asked.status()}`);
  let resetToken: string | undefined;
  for (let i = 0; i < 60 && !resetToken; i++) {
    await page.goto(`${base}/outbox`);
    const resetRow = page.getByRole('row').filter({ hasText: OWNER }).filter({ hasText: /new Baywright password/ }).first();
    if (await resetRow.count()) {
      const resetRaw = await (await page.request.get(`${base}/outbox/${await resetRow.getAttribute('data-mail-id')}/raw`)).text();
      resetToken = resetRaw.replace(/=\r?\n/g, '').match(/\/reset-password\/([A-Za-z0-9_-]{43})/)?.[1];
    } else await page.waitForTimeout(250);
  }
  if (!resetToken) throw new Error('no password-reset mail with a /reset-password/ link reached the outbox');
  const storage = await context.storageState();
  await context.close();
  return { layoutId: layout.id, viewerPath: link.path, token, resetToken, mailId, storage };
}

type Visit = { route: string; path: string; signedIn: boolean; ready: (p: Page) => Promise<unknown> };

function visits(p: Awaited<ReturnType<typeof prepare>>): Visit[] {
  const heading = (page: Page) => page.getByRole('heading').first().waitFor();
  const plan = (page: Page) => page.getByTestId('plan').locator('canvas').first().waitFor({ timeout: 60_000 });
  const id = p.layoutId;
  return [
    { route: '/', path: '/', signedIn: false, ready: heading },
    { route: '/_not-found', path: '/no-such-page', signedIn: false, ready: heading },
    { route: '/sign-in', path: '/sign-in', signedIn: false, ready: (page) => page.getByLabel('E-mail').waitFor() },
    { route: '/sign-up', path: '/sign-up', signedIn: false, ready: heading },
    { route: '/invite/[token]', path: `/invite/${p.token}`, signedIn: false, ready: (page) => page.getByTestId('invited-email').waitFor() },
    { route: '/reset-password', path: '/reset-password', signedIn: false, ready: (page) => page.getByLabel('E-mail').waitFor() },
    { route: '/reset-password/[token]', path: `/reset-password/${p.resetToken}`, signedIn: false, ready: (page) => page.getByRole('button', { name: 'Set the new password' }).waitFor() },
    { route: '/v/[token]', path: p.viewerPath, signedIn: false, ready: plan },
    { route: '/layouts', path: '/layouts', signedIn: true, ready: (page) => page.getByRole('link', { name: 'Nair — L2H2 weekender' }).waitFor() },
    { route: '/layouts/new', path: '/layouts/new', signedIn: true, ready: (page) => page.getByLabel('Layout name').waitFor() },
    { route: '/layouts/[id]', path: `/layouts/${id}`, signedIn: true, ready: plan },
    { route: '/layouts/[id]/build', path: `/layouts/${id}/build`, signedIn: true, ready: (page) => page.locator('[data-testid="build-planner"][data-hydrated="true"]').waitFor() },
    { route: '/layouts/[id]/quote', path: `/layouts/${id}/quote`, signedIn: true, ready: heading },
    { route: '/layouts/[id]/revisions', path: `/layouts/${id}/revisions`, signedIn: true, ready: heading },
    { route: '/layouts/[id]/revisions/compare', path: `/layouts/${id}/revisions/compare`, signedIn: true, ready: heading },
    { route: '/layouts/[id]/versions', path: `/layouts/${id}/versions`, signedIn: true, ready: heading },
    { route: '/layouts/[id]/compare', path: `/layouts/${id}/compare`, signedIn: true, ready: heading },
    { route: '/layouts/[id]/proposals', path: `/layouts/${id}/proposals`, signedIn: true, ready: heading },
    { route: '/layouts/[id]/sheet', path: `/layouts/${id}/sheet`, signedIn: true, ready: (page) => page.locator('svg').first().waitFor() },
    { route: '/clients', path: '/clients', signedIn: true, ready: heading },
    { route: '/settings', path: '/settings', signedIn: true, ready: (page) => page.getByRole('heading', { name: 'Members' }).waitFor() },
    { route: '/outbox', path: '/outbox', signedIn: true, ready: heading },
    { route: '/outbox/[id]', path: `/outbox/${p.mailId}`, signedIn: true, ready: heading },
  ];
}

export async function benchBundles(options: { port?: number; floor?: boolean } = {}): Promise<BundleFigures> {
  const port = options.port ?? Number(process.env.BENCH_BUNDLES_PORT ?? 3320);
  const server = await startTestServer({ port, db: 'bench-bundles', seed: true, fresh: true, quiet: true, env: { BAYWRIGHT_OUTBOX: '1' } });
  const browser = await chromium.launch(LAUNCH);
  const distDir = path.join(process.cwd(), process.env.NEXT_DIST_DIR ?? '.next');
  const stats = routeChunks(distDir);
  try {
    const prepared = await prepare(browser, server.url);
    const routes: RouteBundle[] = [];
    for (const v of visits(prepared)) {
      // A fresh context per route: an empty cache, so nothing comes from an earlier page.
      const context = await browser.newContext(v.signedIn ? { storageState: prepared.storage } : {});
      const kb = await transferredKb(context, `${server.url}${v.path}`, v.ready);
      await context.close();
      const budget = BUDGETS[v.route];
      const chunks = stats[v.route] ?? [];
      routes.push({ route: v.route, kb, firstLoadKb: gzipKb(chunks.map((c) => path.join(process.cwd(), c))), budget, met: kb <= budget });
    }
    const missing = Object.keys(stats).filter((r) => !routes.some((x) => x.route === r) && r !== '/_global-error');
    if (missing.length) throw new Error(`page routes with no visit in bench/bundles.ts: ${missing.join(', ')}`);
    writeReport(routes, stats);
    const floor = options.floor ? measureFloor() : null;
    return { routes, floor };
  } finally {
    await browser.close();
    await server.stop();
  }
}

/** bench/bundle-report.md: what each route ships, chunk by chunk, and what is inside the big ones. */
function writeReport(routes: RouteBundle[], stats: Record<string, string[]>) {
  const modules = analysedModules();
  const lines = ['# What each page ships', '', 'Written by `npm run bench:bundles` (bench/bundles.ts) from the production build. Sizes are gzipped KB.', ''];
  const shared = Object.values(stats).reduce<string[] | null>((acc, list) => (acc ? acc.filter((c) => list.includes(c)) : [...list]), null) ?? [];
  lines.push(`## Shared by every route: ${gzipKb(shared.map((c) => path.join(process.cwd(), c)))} KB`, '');
  for (const c of shared) lines.push(`- \`${path.basename(c)}\` ${round(gzipBytes(path.join(process.cwd(), c)) / 1024, 1)} KB${modules.get(path.basename(c)) ? ` — ${modules.get(path.basename(c))}` : ''}`);
  lines.push('');
  for (const r of routes) {
    lines.push(`## ${r.route}: ${r.kb} KB transferred (first load ${r.firstLoadKb} KB), budget ${r.budget} KB, ${r.met ? 'met' : 'NOT met'}`, '');
    for (const c of (stats[r.route] ?? []).filter((x) => !shared.includes(x))) {
      lines.push(`- \`${path.basename(c)}\` ${round(gzipBytes(path.join(process.cwd(), c)) / 1024, 1)} KB${modules.get(path.basename(c)) ? ` — ${modules.get(path.basename(c))}` : ''}`);
    }
    lines.push('');
  }
  fs.writeFileSync(path.join('bench', 'bundle-report.md'), lines.join('\n'));
}

/**
 * Chunk file name → its largest source modules, from a saved `next analyze` run when there is
 * one (chunk names match only when that analysis was made from the same sources).
 */
function analysedModules(): Map<string, string> {
  const out = new Map<string, string>();
  const dir = path.join(process.cwd(), '.next-analyze', 'diagnostics', 'analyze', 'history');
  if (!fs.existsSync(dir)) return out;
  const res = spawnSync(process.execPath, [path.join('node_modules', 'next', 'dist', 'bin', 'next'), 'analyze', 'export', '--dist-dir', '.next-analyze'], { encoding: 'utf8', maxBuffer: 512 * 1024 * 1024 });
  if (res.status !== 0) return out;
  const byChunk = new Map<string, Map<string, number>>();
  for (const line of res.stdout.split('\n')) {
    if (!line.includes('"type":"part"') || !line.includes('/static/chunks/')) continue;
    const part = JSON.parse(line) as { filename: string; source_path: string; compressed_size: number };
    const chunk = path.basename(part.filename);
    const source = part.source_path.replace('[project]/', '').replace(/^node_modules\/((?:@[^/]+\/)?[^/]+).*/, '$1');
    const m = byChunk.get(chunk) ?? new Map<string, number>();
    m.set(source, (m.get(source) ?? 0) + part.compressed_size);
    byChunk.set(chunk, m);
  }
  for (const [chunk, m] of byChunk) {
    out.set(chunk, [...m.entries()].sort((a, b) => b[1] - a[1]).slice(0, 5).map(([s, n]) => `${s} ${round(n / 1024, 1)}`).join(', '));
  }
  return out;
}

export function printBundles(f: BundleFigures) {
  console.log('\nGzipped JavaScript per route (first visit, empty cache; production build)');
  console.table(f.routes.map((r) => ({ route: r.route, 'gz KB': r.kb, 'first-load KB': r.firstLoadKb, budget: r.budget, met: r.met ? 'met' : 'NOT met' })));
  if (f.floor) console.log(`framework floor (Next ${f.floor.nextVersion}, React ${f.floor.reactVersion}): empty server-only page ${f.floor.empty} KB, with one next/link ${f.floor.link} KB`);
}

if (process.argv[1]?.endsWith('bundles.ts')) {
  benchBundles({ floor: process.argv.includes('--floor') })
    .then(printBundles)
    .catch((err) => {
      console.error(err instanceof Error ? err.stack : err);
      process.exit(1);
    });
}
