/**
 * `npm run bench:vitals`: Web Vitals of the production build in Debian's Chromium, measured by the
 * `web-vitals` library (from npm) injected into each page before its own scripts.
 *
 *  - LCP and CLS on a cold load (fresh browser context, empty cache) of the start page, sign-in,
 *    the layouts table, the editor on a 30-module layout, its viewer link and its build planner.
 *    Each page is loaded COLD_LOADS (3) times: LCP and the bay drawn are the median of the loads,
 *    CLS the worst. One cold load alone moved by a third from run to run on this machine.
 *  - INP of single interactions, each on its own load of the page, so the figure belongs to that
 *    interaction alone: drop a module from the Parts shelf, drag a module, type a length in the
 *    Details panel, switch arrangement (editor); switch a build-plan tab (build planner).
 *  - Editor: the bay drawn, ms after navigation start (the plan's canvas is in the page and two
 *    frames have been painted since), on the cold loads above. Also, for information, on a repeat
 *    visit: one browser context opens the editor WARM_VISITS (2) times, so Chromium has the
 *    scripts in its HTTP cache and their compiled code in its code cache (it keeps compiled code
 *    from a script's second load on), then REPEAT_VISITS (3) more times, timed; the median.
 *
 * Each runs twice: unthrottled, and with Chromium's CPU throttled 4× (a mid-range tablet) through
 * CDP `Emulation.setCPUThrottlingRate`. Goals at 4×: LCP ≤ 2500 ms, INP ≤ 200 ms, CLS ≤ 0.1 on every
 * page (web.dev's "good" thresholds); unthrottled: bay drawn ≤ 1000 ms, INP ≤ 100 ms.
 * web-vitals reports INP only for interactions of 16 ms or more (its lowest threshold); a missing
 * report is written as 16 ms, an upper bound. An interaction's INP is also read from the Event
 * Timing entries after the interaction began (see inpOf), because web-vitals reports only growth. Prints only; bench/index.ts writes the report.
 */
import fs from 'node:fs';
import path from 'node:path';
import { chromium, type Browser, type BrowserContext, type Page } from '@playwright/test';
import { startTestServer } from '../scripts/lib/test-server';
import { DEMO_PASSWORD } from '../lib/demo-accounts';
import { generateLayout } from '../tests/checks/fixtures/generatedLayout';
import { LAUNCH } from './bundles';
import { median, round } from './stats';
import { inArrangement } from '@/lib/layout/bay';

const VITALS_SOURCE = fs.readFileSync(path.join(process.cwd(), 'node_modules/web-vitals/dist/web-vitals.iife.js'), 'utf8');
/** Registered before any page script runs; every report (reportAllChanges) overwrites the last. */
const COLLECT = `${VITALS_SOURCE}
;(() => {
  const v = (window.__vitals = {});
  const keep = (m) => { v[m.name] = m.value; };
  webVitals.onLCP(keep, { reportAllChanges: true });
  webVitals.onCLS(keep, { reportAllChanges: true });
  webVitals.onINP(keep, { reportAllChanges: true, durationThreshold: 16 });
  // The Event Timing entries INP is made of (those with an interactionId: pointer and key events),
  // and the drop of a drag and drop, which has none (start, duration), for one interaction's figure.
  const events = (window.__events = []);
  new PerformanceObserver((l) => { for (const e of l.getEntries()) if (e.interactionId || e.name === 'drop') events.push([e.startTime, e.duration]); })
    .observe({ type: 'event', durationThreshold: 16, buffered: true });
  // When a drop happened (its Event Timing entry is only there when it took 16 ms or more).
  addEventListener('drop', (e) => { window.__dropAt = e.timeStamp; }, true);
  // The editor's bay: its canvas is in the page, then two frames later it has been painted.
  const seen = () => {
    if (v.bayDrawn !== undefined || !document.querySelector('[data-testid="plan"] canvas')) return false;
    requestAnimationFrame(() => requestAnimationFrame(() => { if (v.bayDrawn === undefined) v.bayDrawn = performance.now(); }));
    return true;
  };
  new MutationObserver((_, obs) => { if (seen()) obs.disconnect(); }).observe(document, { childList: true, subtree: true });
})();`;

/** Cold loads per page; the figures are their median (CLS: the worst). */
const COLD_LOADS = Number(process.env.BENCH_COLD_LOADS ?? 3);
/** Loads of the editor before the repeat visits are timed, and the timed repeat visits. */
const WARM_VISITS = 2;
const REPEAT_VISITS = 3;

export const GOALS = { lcpMs: 2500, clsMax: 0.1, inpThrottledMs: 200, inpMs: 100, bayDrawnMs: 1000 } as const;

export interface PageVitals { page: string; lcpMs: number; cls: number }
export interface InteractionVitals {
  interaction: string;
  inpMs: number;
  /** For the drop: ms from the drop to the frame after the one that drew the placed module (it is selected then). */
  drawnMs?: number;
}
export interface VitalsRun {
  cpuSlowdown: number;
  pages: PageVitals[];
  interactions: InteractionVitals[];
  bayDrawnMs: number;
  /** The bay drawn on a repeat visit (scripts cached and compiled before); no goal. */
  repeatBayDrawnMs: number;
}

async function signIn(page: Page, base: string) {
  await page.goto(`${base}/sign-in`);
  await page.getByLabel('E-mail').fill('ivo@saltmarsh.test');
  await page.getByLabel('Password').fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL(/\/layouts/);
}

async function openPage(context: BrowserContext, rate: number): Promise<Page> {
  const page = await context.newPage();
  await page.addInitScript(COLLECT);
  if (rate > 1) await (await context.newCDPSession(page)).send('Emulation.setCPUThrottlingRate', { rate });
  return page;
}

async function vitals(page: Page): Promise<Record<string, number>> {
  // Let late layout shifts and the last LCP candidate land before reading.
  await page.waitForTimeout(1000);
  return (await page.evaluate('({ ...window.__vitals })')) as Record<string, number>;
}

async function planReady(page: Page) {
  await page.getByTestId('plan').locator('canvas').first().waitFor({ timeout: 120_000 });
  await page.waitForFunction('window.__vitals && window.__vitals.bayDrawn !== undefined', undefined, { timeout: 60_000 });
}

async function screenOf(page: Page, x: number, y: number) {
  const plan = page.getByTestId('plan');
  const box = (await plan.boundingBox())!;
  const scale = Number(await plan.getAttribute('data-scale'));
  const [ox, oy] = (await plan.getAttribute('data-origin'))!.split(',').map(Number);
  return { x: box.x + ox + x * scale, y: box.y + oy + y * scale };
}

/**
 * One interaction on a fresh load of the page, after a settle: the longest of its interactions
 * (INP's own definition below 50 interactions), from the Event Timing entries web-vitals reads.
 * web-vitals reports INP only when it grows, so when getting the page ready took an interaction
 * (the click that selects a module before typing a length) longer than the measured one, it says
 * nothing new: its figure alone would read 16 ms, hiding the measured interaction. The larger
 * of the two is kept. A drop from the Parts shelf is a drag and drop, which INP does not count
 * (the browser gives interaction ids to pointer and key events only): its figure is the drop
 * event's own Event Timing duration, to the next paint, the same measure.
 */
async function inpOf(context: BrowserContext, rate: number, url: string, ready: (p: Page) => Promise<void>, act: (p: Page) => Promise<void>): Promise<{ inpMs: number; drawnMs?: number }> {
  const page = await openPage(context, rate);
  try {
    await page.goto(url);
    await ready(page);
    await page.waitForTimeout(1500); // let start-up work (live checks, lazy chunks) finish first
    await page.evaluate('delete window.__vitals.INP');
    // The placed module is drawn in the frame that shows it selected: two frames after the
    // selection line changes, that frame has been painted (the bay drawn is timed the same way).
    // Pages without the editor's selection line (the build planner) have nothing to time.
    await page.evaluate(`window.__drawn = undefined; const line = document.getElementById('selection-announcer'); if (line) new MutationObserver((_, o) => { o.disconnect(); requestAnimationFrame(() => requestAnimationFrame(() => { window.__drawn = performance.now(); })); }).observe(line, { childList: true, subtree: true, characterData: true });`);
    const from = (await page.evaluate('performance.now()')) as number;
    await act(page);
    await page.waitForTimeout(800);
    const v = (await page.evaluate('({ ...window.__vitals })')) as Record<string, number>;
    const events = (await page.evaluate('window.__events')) as [number, number][];
    const longest = Math.max(0, ...events.filter(([start]) => start >= from).map(([, duration]) => duration));
    const drawn = (await page.evaluate('window.__drawn !== undefined && window.__dropAt !== undefined ? window.__drawn - window.__dropAt : null')) as number | null;
    return { inpMs: round(Math.max(v.INP ?? 0, longest, 16), 0), ...(drawn !== null ? { drawnMs: round(drawn, 0) } : {}) };
  } finally {
    await page.close();
  }
}

async function runOnce(browser: Browser, base: string, rate: number, ids: { layout: string; viewer: string }, storage: Awaited<ReturnType<BrowserContext['storageState']>>, doc: ReturnType<typeof generateLayout>): Promise<VitalsRun> {
  const pages: PageVitals[] = [];
  let bayDrawnMs = NaN;
  const cold: [string, string, boolean, (p: Page) => Promise<unknown>][] = [
    ['start page', '/', false, (p) => p.getByRole('heading').first().waitFor()],
    ['sign-in', '/sign-in', false, (p) => p.getByLabel('E-mail').waitFor()],
    ['layouts table', '/layouts', true, (p) => p.getByRole('link', { name: 'Bench — 30 modules' }).waitFor()],
    ['editor, 30 modules', `/layouts/${ids.layout}`, true, planReady],
    ['viewer link', ids.viewer, false, planReady],
    ['build planner', `/layouts/${ids.layout}/build`, true, (p) => p.locator('[data-testid="build-planner"][data-hydrated="true"]').waitFor()],
  ];
  for (const [name, url, signedIn, ready] of cold) {
    const loads: Record<string, number>[] = [];
    for (let i = 0; i < COLD_LOADS; i++) {
      const context = await browser.newContext({ viewport: { width: 1440, height: 900 }, ...(signedIn ? { storageState: storage } : {}) });
      const page = await openPage(context, rate);
      await page.goto(`${base}${url}`);
      await ready(page);
      loads.push(await vitals(page));
      await context.close();
    }
    pages.push({ page: name, lcpMs: round(median(loads.map((v) => v.LCP ?? NaN)), 0), cls: round(Math.max(...loads.map((v) => v.CLS ?? 0)), 3) });
    if (name.startsWith('editor')) bayDrawnMs = round(median(loads.map((v) => v.bayDrawn)), 0);
  }

  const editor = `${base}/layouts/${ids.layout}`;
  const repeatBayDrawnMs = await repeatVisitBayDrawn(browser, rate, editor, storage);

  const context = await browser.newContext({ viewport: { width: 1440, height: 900 }, storageState: storage });
  const lounge = doc.modules.filter((m) => inArrangement(m, 'lounge') && m.elevation === 0 && m.kind === 'drawer-unit')[0]
    ?? doc.modules.filter((m) => inArrangement(m, 'lounge') && m.elevation === 0)[0];
  const interactions: InteractionVitals[] = [];
  try {
    interactions.push({
      interaction: 'drop a module from the Parts shelf',
      ...await inpOf(context, rate, editor, planReady, async (p) => {
        const plan = p.getByTestId('plan');
        const box = (await plan.boundingBox())!;
        const to = await screenOf(p, doc.bay.length / 2, doc.bay.width / 2);
        await p.locator('[data-kind="step"]').dragTo(plan, { targetPosition: { x: to.x - box.x, y: to.y - box.y } });
      }),
    });
    interactions.push({
      interaction: 'drag a module',
      ...await inpOf(context, rate, editor, planReady, async (p) => {
        const from = await screenOf(p, lounge.x + lounge.length / 2, lounge.y + lounge.width / 2);
        await p.mouse.move(from.x, from.y);
        await p.mouse.down();
        await p.mouse.move(from.x + 60, from.y, { steps: 12 });
        await p.mouse.up();
      }),
    });
    interactions.push({
      interaction: 'type a length in the Details panel',
      ...await inpOf(context, rate, editor, async (p) => {
        await planReady(p);
        const at = await screenOf(p, lounge.x + lounge.length / 2, lounge.y + lounge.width / 2);
        await p.mouse.click(at.x, at.y);
        await p.getByTestId('details-length').waitFor();
      }, async (p) => {
        await p.getByTestId('details-length').click();
        await p.keyboard.press('ControlOrMeta+a');
        await p.keyboard.type(String(lounge.length - 10), { delay: 60 });
        await p.keyboard.press('Tab');
      }),
    });
    interactions.push({
      interaction: 'switch arrangement',
      ...await inpOf(context, rate, editor, planReady, async (p) => {
        await p.getByTestId('arrangement-sleep').click();
      }),
    });
    interactions.push({
      interaction: 'switch a build-plan tab',
      ...await inpOf(context, rate, `${base}/layouts/${ids.layout}/build`, async (p) => {
        await p.locator('[data-testid="build-planner"][data-hydrated="true"]').waitFor();
      }, async (p) => {
        await p.getByRole('tab', { name: /^Power/ }).click();
        await p.getByRole('tabpanel').first().waitFor();
      }),
    });
  } finally {
    await context.close();
  }
  return { cpuSlowdown: rate, pages, interactions, bayDrawnMs, repeatBayDrawnMs };
}

/**
 * The editor's bay drawn as a designer who opened it before sees it: one context (one HTTP cache
 * and code cache) loads the editor WARM_VISITS times untimed, then REPEAT_VISITS times timed.
 */
async function repeatVisitBayDrawn(browser: Browser, rate: number, editor: string, storage: Awaited<ReturnType<BrowserContext['storageState']>>): Promise<number> {
  const context = await browser.newContext({ viewport: { width: 1440, height: 900 }, storageState: storage });
  const timed: number[] = [];
  try {
    for (let i = 0; i < WARM_VISITS + REPEAT_VISITS; i++) {
      const page = await openPage(context, rate);
      await page.goto(editor);
      await planReady(page);
      if (i >= WARM_VISITS) timed.push((await page.evaluate('window.__vitals.bayDrawn')) as number);
      await page.waitForTimeout(500); // the code cache is written after the scripts ran
      await page.close();
    }
  } finally {
    await context.close();
  }
  return round(median(timed), 0);
}

export async function benchVitals(options: { port?: number } = {}): Promise<VitalsRun[]> {
  const port = options.port ?? Number(process.env.BENCH_VITALS_PORT ?? 3330);
  const server = await startTestServer({ port, db: 'bench-vitals', seed: true, fresh: true, quiet: true });
  const browser = await chromium.launch(LAUNCH);
  try {
    const context = await browser.newContext();
    const page = await context.newPage();
    await signIn(page, server.url);
    const doc = generateLayout(30);
    const created = await page.request.post(`${server.url}/api/layouts`, { data: { name: 'Bench — 30 modules', doc: { ...doc, name: 'Bench — 30 modules' } }, headers: { origin: server.url } });
    if (created.status() !== 201) throw new Error(`creating the layout failed: HTTP ${created.status()}`);
    const layout = (await created.json()).id as string;
    const link = await page.request.post(`${server.url}/api/layouts/${layout}/links`, { data: {}, headers: { origin: server.url } });
    if (link.status() !== 201) throw new Error(`making a viewer link failed: HTTP ${link.status()}`);
    const viewer = (await link.json()).path as string;
    const storage = await context.storageState();
    await context.close();
    const runs: VitalsRun[] = [];
    for (const rate of [1, 4]) runs.push(await runOnce(browser, server.url, rate, { layout, viewer }, storage, doc));
    return runs;
  } finally {
    await browser.close();
    await server.stop();
  }
}

/** Lines for the report: figure beside goal. */
export function vitalsLines(runs: VitalsRun[]): { what: string; figure: string; goal: string; met: boolean | null }[] {
  const out: { what: string; figure: string; goal: string; met: boolean | null }[] = [];
  for (const r of runs) {
    const tag = r.cpuSlowdown > 1 ? `CPU ${r.cpuSlowdown}× slower` : 'unthrottled';
    const throttled = r.cpuSlowdown > 1;
    for (const p of r.pages) {
      out.push({
        what: `Web Vitals, ${tag}: ${p.page}, LCP / CLS`,
        figure: `${p.lcpMs} ms / ${p.cls}`,
        goal: throttled ? `≤ ${GOALS.lcpMs} ms / ≤ ${GOALS.clsMax}` : `— / ≤ ${GOALS.clsMax}`,
        met: (throttled ? p.lcpMs <= GOALS.lcpMs : true) && p.cls <= GOALS.clsMax,
      });
    }
    if (!throttled) out.push({ what: `Web Vitals, ${tag}: editor bay drawn after navigation`, figure: `${r.bayDrawnMs} ms`, goal: `≤ ${GOALS.bayDrawnMs} ms`, met: r.bayDrawnMs <= GOALS.bayDrawnMs });
    else out.push({ what: `Web Vitals, ${tag}: editor bay drawn after navigation`, figure: `${r.bayDrawnMs} ms`, goal: '—', met: null });
    // No goal in the issue for it: the goal above is read on cold loads, the stricter case.
    out.push({ what: `Web Vitals, ${tag}: editor bay drawn on a repeat visit (scripts cached)`, figure: `${r.repeatBayDrawnMs} ms`, goal: '—', met: null });
    const goal = throttled ? GOALS.inpThrottledMs : GOALS.inpMs;
    for (const i of r.interactions) {
      out.push({ what: `Web Vitals, ${tag}: INP, ${i.interaction}`, figure: `${i.inpMs} ms`, goal: `≤ ${goal} ms`, met: i.inpMs <= goal });
      // No goal in the issue: shown so the drop's short INP (the module is placed after the paint that answers the drop) is read beside the time to the module on the plan.
      if (i.drawnMs !== undefined) out.push({ what: `Web Vitals, ${tag}: ${i.interaction}, drop → module drawn`, figure: `${i.drawnMs} ms`, goal: '—', met: null });
    }
  }
  return out;
}

if (process.argv[1]?.endsWith('vitals.ts')) {
  benchVitals()
    .then((runs) => {
      console.log('\nWeb Vitals (production build, headless Chromium, web-vitals library)');
      console.table(vitalsLines(runs).map((l) => ({ what: l.what, figure: l.figure, goal: l.goal, met: l.met === null ? '' : l.met ? 'met' : 'NOT met' })));
    })
    .catch((err) => {
      console.error(err instanceof Error ? err.stack : err);
      process.exit(1);
    });
}
