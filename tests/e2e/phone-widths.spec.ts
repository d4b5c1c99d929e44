// The workshop's screens on a phone, 360 × 740 and 390 × 844 (the narrow and the common width):
// the full layouts table, clients, settings, the build plan, the quote and the saved versions fit
// the width with no sideways scrolling — of the page, nor of the tables inside it. Columns of
// little use on a phone leave the table (DataTable `phone: 'hide'`) or fold under the row's name
// (`phone: 'fold'`); what a hidden column said is still found on the layout's own pages.
// A picture of each screen is kept with the test's results.
import { expect, test, type Browser, type Page, type TestInfo } from '@playwright/test';
import { signIn } from './helpers';

const stamp = Date.now().toString(36);
const SIZES = [{ width: 360, height: 740 }, { width: 390, height: 844 }];

/** The page is no wider than the phone, and each table's own box does not scroll sideways either. */
async function fits(page: Page, info: TestInfo, width: number, name: string) {
  const wide = await page.evaluate((limit) => ({
    // The innermost elements that stick out past the phone's width, named for the failure message.
    over: [...document.querySelectorAll('body *')].filter((e) => e.getBoundingClientRect().right > limit + 0.5 && ![...e.children].some((c) => c.getBoundingClientRect().right > limit + 0.5))
      .slice(0, 6).map((e) => `${e.tagName.toLowerCase()}${e.getAttribute('data-testid') ? `[${e.getAttribute('data-testid')}]` : ''}.${String(e.className).slice(0, 60)} "${(e.textContent ?? '').trim().slice(0, 30)}"`),
    page: document.documentElement.scrollWidth,
    inner: window.innerWidth,
    tables: [...document.querySelectorAll('table')].filter((t) => t.offsetParent !== null).map((t) => {
      const box = t.parentElement!;
      return { id: t.getAttribute('data-testid') ?? 'table', scroll: box.scrollWidth, client: box.clientWidth };
    }),
  }), width);
  expect.soft(wide.page, `${name} at ${width} px: the page scrolls sideways`).toBeLessThanOrEqual(wide.inner);
  expect.soft(wide.page, `${name} at ${width} px: wider than the phone; sticking out: ${wide.over.join(' | ')}`).toBeLessThanOrEqual(width);
  for (const t of wide.tables) expect.soft(t.scroll, `${name} at ${width} px: table ${t.id} scrolls sideways`).toBeLessThanOrEqual(t.client);
  await page.screenshot({ path: info.outputPath(`phone-${width}-${name}.png`), fullPage: true });
}

async function workshopLayout(browser: Browser): Promise<{ id: string; name: string }> {
  const owner = await (await browser.newContext()).newPage();
  await signIn(owner, 'maren@saltmarsh.test', { open: null });
  const members = await (await owner.request.get('/api/studio/members')).json();
  const priya = members.members.find((m: { email?: string }) => m.email === 'priya@client.test');
  const name = `Nair — phone widths ${stamp}`;
  const created = await owner.request.post('/api/layouts', { data: { name, starterId: 'starter-l-lounge', clientId: priya.userId } });
  expect(created.status()).toBe(201);
  const { id, version } = await created.json();
  expect((await owner.request.post(`/api/layouts/${id}/revisions`, { data: { note: 'First full layout' } })).status()).toBe(201);
  expect((await owner.request.post(`/api/layouts/${id}/quote`, { data: { layoutVersion: version, depositPct: 25, confirmUnapproved: true } })).status()).toBe(201);
  // Changed after revision A: its state reads "Issued for approval A · changed since", the longest the table shows.
  const cur = await (await owner.request.get(`/api/layouts/${id}`)).json();
  const doc = { ...cur.doc, modules: cur.doc.modules.map((m: { x: number }, i: number) => (i === 0 ? { ...m, x: m.x + 10 } : m)) };
  expect((await owner.request.put(`/api/layouts/${id}`, { data: { doc }, headers: { 'if-match': String(cur.version) } })).status()).toBe(200);
  await owner.context().close();
  return { id, name };
}

test('the workshop screens fit a phone, and what a hidden column says is found on the layout’s pages', async ({ browser }, info) => {
  test.setTimeout(240_000);
  const layout = await workshopLayout(browser);
  for (const size of SIZES) {
    const context = await browser.newContext({ viewport: size, hasTouch: true, isMobile: true, deviceScaleFactor: 2 });
    const page = await context.newPage();
    await signIn(page, 'maren@saltmarsh.test');

    // The full layouts table: the layout's row, its client folded under the name, no Last change column.
    const row = page.getByRole('row').filter({ has: page.getByRole('link', { name: layout.name, exact: true }) });
    await expect(row).toBeVisible({ timeout: 30_000 });
    await expect(row.locator('[data-changed-since="A"]')).toContainText('Issued for approval A · changed since');
    await expect(row.getByTestId('phone-folded')).toContainText('Client:');
    await expect(row.getByTestId('phone-folded')).toContainText('Priya Nair');
    await expect(page.getByRole('columnheader', { name: 'Last change' })).toBeHidden();
    await expect(page.getByRole('columnheader', { name: 'State' })).toBeVisible();
    await fits(page, info, size.width, 'layouts');
    // The hidden cell's words (when it last changed), to find them again on the build plan.
    const lastChange = await row.locator('td').nth(7).textContent();

    await page.goto('/clients');
    await expect(page.getByTestId('clients-table')).toBeVisible();
    await expect(page.getByTestId('clients-table').getByTestId('phone-folded').first()).toContainText('E-mail:');
    await fits(page, info, size.width, 'clients');

    await page.goto('/settings');
    await expect(page.getByRole('heading', { level: 1 })).toBeVisible();
    await fits(page, info, size.width, 'settings');

    // The build plan names the last save, which the table's hidden Last change column gave.
    await page.goto(`/layouts/${layout.id}/build`);
    await expect(page.locator('[data-testid=build-planner][data-hydrated=true]')).toBeVisible({ timeout: 30_000 });
    const savedAt = (await page.getByTestId('saved-at').innerText()).trim();
    expect(savedAt.length).toBeGreaterThan(0);
    expect(lastChange).toContain(savedAt);
    await fits(page, info, size.width, 'build-plan');

    await page.goto(`/layouts/${layout.id}/quote`);
    await expect(page.getByRole('heading', { level: 1 })).toBeVisible();
    await fits(page, info, size.width, 'quote');

    await page.goto(`/layouts/${layout.id}/versions`);
    await expect(page.getByTestId('saved-versions')).toBeVisible({ timeout: 30_000 });
    await fits(page, info, size.width, 'saved-versions');
    await context.close();
  }
});
