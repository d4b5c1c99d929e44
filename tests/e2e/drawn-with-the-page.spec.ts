// What the server draws before any script runs: the layouts table comes with its rows, and the
// editor and a viewer link show the plan (the server-drawn preview) while the drawing loads. Read
// with scripts switched off, so nothing here can come from the browser's own fetches. Then, with
// scripts: the editor and a viewer link open with the findings the server began as the page
// rendered, so opening asks the browser for no checks; an edit still does. On a desktop those
// findings are in the page as served, where the Checks panel goes, and stay put when the editor
// takes over.
import { expect, test } from '@playwright/test';
import { openNewLayout, signIn } from './helpers';

const stamp = Date.now().toString(36);

test('the layouts table, the editor and a viewer link are drawn with the page', async ({ browser }) => {
  const designerContext = await browser.newContext();
  const designer = await designerContext.newPage();
  await signIn(designer, 'ivo@saltmarsh.test', { open: null });
  const name = `Drawn with the page ${stamp}`;
  const created = await designer.request.post('/api/layouts', { data: { name, starterId: 'starter-rear-bed' } });
  expect(created.status()).toBe(201);
  const id: string = (await created.json()).id;
  const link = await designer.request.post(`/api/layouts/${id}/links`, { data: {} });
  expect(link.status()).toBe(201);
  const viewerPath: string = (await link.json()).path;
  const storageState = await designerContext.storageState();
  await designerContext.close();

  const noScripts = await browser.newContext({ javaScriptEnabled: false, storageState });
  const page = await noScripts.newPage();

  // The table's rows are in the page as served.
  await page.goto('/layouts');
  await expect(page.getByRole('link', { name })).toBeVisible();
  await expect(page.getByText('Loading layouts…')).toHaveCount(0);

  // The editor and the viewer link: the plan as an SVG picture, to the bay's proportions, while
  // the drawing's scripts load (here: never).
  for (const path of [`/layouts/${id}`, viewerPath]) {
    await page.goto(path);
    const preview = page.getByTestId('plan-preview');
    await expect(preview).toContainText('Unrolling the drawing…');
    const img = preview.locator('img');
    await expect(img).toBeVisible();
    const src = (await img.getAttribute('src')) ?? '';
    expect(src.startsWith('data:image/svg+xml;charset=utf-8,')).toBe(true);
    const svg = decodeURIComponent(src.slice(src.indexOf(',') + 1));
    // The rear-bed starter's bay is 3800 × 1800 mm (public/templates/starter-rear-bed.json): the
    // viewBox adds the same margin on every side, so its width less its height is 2000 mm.
    const [, , w, h] = svg.match(/viewBox="([-\d.]+) ([-\d.]+) ([\d.]+) ([\d.]+)"/)!.slice(1).map(Number);
    expect(w - h).toBe(2000);
    const shown = await img.evaluate((el: HTMLImageElement) => ({ natural: el.naturalWidth, complete: el.complete }));
    expect(shown).toEqual({ natural: 960, complete: true });
    // The findings, on a desktop, where the Checks panel goes. The server waits only briefly for
    // them (server/api/checks-on-open.ts), so a busy machine may serve "Checking…": load again.
    const findings = page.getByTestId('checks-panel-as-served').locator('li[data-finding]');
    await expect(async () => {
      await page.reload();
      expect(await findings.count()).toBeGreaterThan(0);
    }).toPass({ timeout: 30_000 });
    await expect(page.getByTestId('checks-panel-as-served').getByRole('button')).toHaveCount(0);
  }
  await noScripts.close();

  // A tablet gets the plan alone, as the editor shows it there (its panels are drawers).
  const tablet = await browser.newContext({ javaScriptEnabled: false, storageState, viewport: { width: 1024, height: 768 }, hasTouch: true, isMobile: true });
  const onTablet = await tablet.newPage();
  await onTablet.goto(`/layouts/${id}`);
  await expect(onTablet.getByTestId('plan-preview').locator('img')).toBeVisible();
  await expect(onTablet.getByTestId('checks-panel-as-served')).toBeHidden();
  await tablet.close();
});

test('the findings served with the page stay where they are when the editor takes over', async ({ browser }) => {
  const context = await browser.newContext();
  const page = await context.newPage();
  await signIn(page, 'ivo@saltmarsh.test', { open: null });
  const created = await page.request.post('/api/layouts', { data: { name: `Stays put ${stamp}`, starterId: 'starter-rear-bed' } });
  expect(created.status()).toBe(201);
  const id: string = (await created.json()).id;
  const message = (panel: string) => page.getByTestId(panel).locator('li[data-finding] span.block.text-ink').first();
  const listed = (panel: string) => page.getByTestId(panel).locator('li[data-finding]').evaluateAll((lis) => lis.map((li) => `${li.getAttribute('data-finding')} ${li.getAttribute('data-status')} ${li.textContent}`));
  const boxOf = async (panel: string) => (await message(panel).boundingBox())!;

  // Hold the scripts back, so the page stays as served until the gate opens.
  let open!: () => void;
  const gate = new Promise<void>((resolve) => { open = resolve; });
  await page.route(/\/_next\/static\/chunks\/.*\.js(\?|$)/, async (route) => { await gate; await route.continue(); });
  await expect(async () => {
    await page.goto(`/layouts/${id}`, { waitUntil: 'commit' });
    await expect(message('checks-panel-as-served')).toBeVisible({ timeout: 5_000 });
  }).toPass({ timeout: 30_000 });
  const served = await boxOf('checks-panel-as-served');
  const servedList = await listed('checks-panel-as-served');
  open();
  await expect(page.getByTestId('plan').locator('canvas').first()).toBeVisible({ timeout: 30_000 });
  await expect(message('checks-panel')).toBeVisible();
  const live = await boxOf('checks-panel');
  // Same place, same size: the largest text on the page is painted once, with the page.
  for (const k of ['x', 'y', 'width', 'height'] as const) expect(Math.abs(live[k] - served[k]), k).toBeLessThanOrEqual(1);
  // The same findings, and now they are the editor's: a finding is a button that highlights what it names.
  expect(await listed('checks-panel')).toEqual(servedList);
  await expect(page.getByTestId('checks-panel').locator('li[data-finding] button').first()).toBeVisible();
  await context.close();
});

test('the editor and a viewer link open with their findings, asking the browser for no checks', async ({ browser }) => {
  const context = await browser.newContext();
  const page = await context.newPage();
  await signIn(page, 'ivo@saltmarsh.test', { open: null });
  const asked: string[] = [];
  page.on('request', (r) => { if (/\/api\/(checks|v\/[^/]+\/checks)/.test(new URL(r.url()).pathname)) asked.push(`${r.method()} ${new URL(r.url()).pathname}`); });

  const id = await openNewLayout(page, `Findings with the page ${stamp}`);
  await expect(page.getByTestId('checks-status')).toContainText('up to date', { timeout: 20_000 });
  await expect(page.getByTestId('checks-counts')).toBeVisible();
  expect(asked).toEqual([]);

  // An edit is checked through the API as before.
  await page.getByTestId('plan').focus();
  await page.keyboard.press(']');
  await page.keyboard.press('ArrowDown');
  await expect.poll(() => asked.filter((a) => a === 'POST /api/checks').length, { timeout: 10_000 }).toBeGreaterThanOrEqual(1);
  // Saved before the link opens: a live link that met the save later would (rightly) check the new version.
  await expect(page.getByTestId('save-status')).toHaveAttribute('data-status', 'saved', { timeout: 15_000 });

  // The viewer link of the same layout: no account, and no checks request either.
  const link = await page.request.post(`/api/layouts/${id}/links`, { data: {} });
  expect(link.status()).toBe(201);
  const viewer = await (await browser.newContext()).newPage();
  const viewerAsked: string[] = [];
  viewer.on('request', (r) => { if (/\/checks$/.test(new URL(r.url()).pathname)) viewerAsked.push(new URL(r.url()).pathname); });
  await viewer.goto((await link.json()).path);
  await expect(viewer.getByTestId('plan').locator('canvas').first()).toBeVisible({ timeout: 30_000 });
  await expect(viewer.getByTestId('checks-counts')).toBeVisible({ timeout: 20_000 });
  expect(viewerAsked).toEqual([]);
  await context.close();
});
