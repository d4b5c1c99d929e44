/**
 * Gzipped JavaScript transferred per route: a signed-in designer opens each page in Debian's
 * Chromium against the production server (which gzips), and the encoded sizes of every script
 * response are summed. Goal ≤ 170 KB for each of these routes; the editor route and /layouts are
 * measured by bench/editor.ts (goal ≤ 300 KB for the editor).
 */
import { chromium, type Page } from '@playwright/test';
import { startTestServer } from '../scripts/lib/test-server';
import { DEMO_PASSWORD } from '../lib/demo-accounts';
import { round } from './stats';

const LAUNCH = {
  executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
  args: ['--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
};

async function scriptKb(page: Page, url: string, ready: (p: Page) => Promise<unknown>): Promise<number> {
  const sizes: Promise<number>[] = [];
  const onResponse = (res: import('@playwright/test').Response) => {
    if (res.request().resourceType() === 'script') sizes.push(res.request().sizes().then((s) => s.responseBodySize));
  };
  page.on('response', onResponse);
  await page.goto(url);
  await ready(page);
  await page.waitForLoadState('networkidle');
  page.off('response', onResponse);
  return round((await Promise.all(sizes)).reduce((a, b) => a + b, 0) / 1024, 1);
}

export async function benchBundles(): Promise<Record<string, number>> {
  const server = await startTestServer({ port: 3320, db: 'bench-bundles', seed: true, fresh: true, quiet: true });
  const browser = await chromium.launch(LAUNCH);
  try {
    const results: Record<string, number> = {};
    // Each route in a fresh context, so nothing is served from the cache of an earlier page.
    const fresh = async () => {
      const context = await browser.newContext();
      const page = await context.newPage();
      return { context, page };
    };
    {
      const { context, page } = await fresh();
      results['/'] = await scriptKb(page, `${server.url}/`, (p) => p.getByRole('heading').first().waitFor());
      await context.close();
    }
    const signIn = async (page: Page) => {
      await page.goto(`${server.url}/sign-in`);
      await page.getByLabel('E-mail').fill('ivo@saltmarsh.test');
      await page.getByLabel('Password').fill(DEMO_PASSWORD);
      await page.getByRole('button', { name: 'Sign in' }).click();
      await page.waitForURL(/\/layouts/);
      await page.getByRole('link', { name: 'Nair — L2H2 weekender' }).waitFor();
      return (await page.getByRole('link', { name: 'Nair — L2H2 weekender' }).getAttribute('href'))!;
    };
    const routes: [string, (href: string) => string, (p: Page) => Promise<unknown>][] = [
      ['/layouts/[id]/revisions', (href) => `${href}/revisions`, (p) => p.getByRole('heading').first().waitFor()],
      ['/layouts/[id]/sheet', (href) => `${href}/sheet`, (p) => p.getByRole('heading').first().waitFor()],
      ['/layouts/[id]/build', (href) => `${href}/build`, (p) => p.getByRole('heading').first().waitFor()],
      ['/layouts/new', () => '/layouts/new', (p) => p.getByLabel('Layout name').waitFor()],
      ['/settings', () => '/settings', (p) => p.getByRole('heading', { name: 'Members' }).waitFor()],
    ];
    for (const [name, path, ready] of routes) {
      const { context, page } = await fresh();
      const href = await signIn(page);
      // Forget the scripts the sign-in pages loaded, so the route is measured from an empty cache.
      await (await context.newCDPSession(page)).send('Network.clearBrowserCache');
      results[name] = await scriptKb(page, `${server.url}${path(href)}`, ready);
      await context.close();
    }
    return results;
  } finally {
    await browser.close();
    await server.stop();
  }
}

if (process.argv[1]?.endsWith('bundles.ts')) benchBundles().then((r) => console.table(r));
