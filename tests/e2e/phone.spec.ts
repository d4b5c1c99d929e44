// The client's side on a 390 × 844 phone in Chromium's touch emulation: the viewer link, sign-in,
// the layouts list, the layout read-only with a mark-up placed by touch, revision A approved and
// the deposit paid on the local test checkout — each screen without sideways scrolling, axe with
// nothing serious or critical, and a screenshot attached to the report. A designer on a phone
// gets the layout read-only with a line saying editing needs a larger screen.
import { expect, test, type Browser, type Page, type TestInfo } from '@playwright/test';
import AxeBuilder from '@axe-core/playwright';
import { signIn } from './helpers';

const PHONE = { viewport: { width: 390, height: 844 }, hasTouch: true, isMobile: true, deviceScaleFactor: 2 };
const stamp = Date.now().toString(36);

async function designerPage(browser: Browser): Promise<Page> {
  const page = await (await browser.newContext()).newPage();
  await signIn(page, 'ivo@saltmarsh.test', { open: null }); // the test opens its own page first
  return page;
}

/** The screen fits the phone's width, passes axe, and is kept as a picture. */
async function screenFits(page: Page, info: TestInfo, name: string) {
  const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
  expect(overflow, `${name}: no sideways scrolling`).toBeLessThanOrEqual(0);
  const axe = await new AxeBuilder({ page }).analyze();
  expect(axe.violations.filter((v) => v.impact === 'serious' || v.impact === 'critical').map((v) => `${name} ${v.id}: ${v.nodes.map((n) => n.target.join(' ')).join(', ')}`)).toEqual([]);
  await info.attach(name, { body: await page.screenshot(), contentType: 'image/png' });
}

test('a client on a phone: viewer link, mark-up, approval, deposit', async ({ browser }, info) => {
  test.setTimeout(240_000);
  // The workshop's side, on a desktop: a layout for Priya with revision A issued, a viewer link and a quote.
  const designer = await designerPage(browser);
  const members = await (await designer.request.get('/api/studio/members')).json();
  const priya = members.members.find((m: { email?: string }) => m.email === 'priya@client.test');
  const name = `Nair — phone run ${stamp}`;
  const created = await designer.request.post('/api/layouts', { data: { name, starterId: 'starter-l-lounge', clientId: priya.userId } });
  expect(created.status()).toBe(201);
  const id: string = (await created.json()).id;
  expect((await designer.request.post(`/api/layouts/${id}/revisions`, { data: { note: 'First full layout' } })).status()).toBe(201);
  const link = await designer.request.post(`/api/layouts/${id}/links`, { data: { revisionId: null, expiresInDays: null } });
  expect(link.status()).toBe(201);
  const viewerPath: string = (await link.json()).path;
  const version: number = (await (await designer.request.get(`/api/layouts/${id}`)).json()).version;
  expect((await designer.request.post(`/api/layouts/${id}/quote`, { data: { layoutVersion: version, depositPct: 25, confirmUnapproved: true } })).status()).toBe(201);

  const phone = await (await browser.newContext(PHONE)).newPage();
  // The viewer link, without an account.
  await phone.goto(viewerPath);
  await expect(phone.getByTestId('plan').locator('canvas').first()).toBeVisible({ timeout: 30_000 });
  await screenFits(phone, info, 'phone-viewer-link');

  // Sign in, the layouts list.
  await phone.goto('/sign-in');
  await screenFits(phone, info, 'phone-sign-in');
  await phone.getByLabel('E-mail').fill('priya@client.test');
  await phone.getByLabel('Password').fill('baywright-demo');
  await phone.getByRole('button', { name: 'Sign in' }).tap();
  await expect(phone).toHaveURL(/\/layouts/);
  await expect(phone.getByRole('link', { name, exact: true }).first()).toBeVisible();
  await screenFits(phone, info, 'phone-layouts');

  // The layout, read-only; a mark-up placed by touch.
  await phone.getByRole('link', { name, exact: true }).first().tap();
  await expect(phone.getByTestId('plan').locator('canvas').first()).toBeVisible({ timeout: 30_000 });
  await expect(phone.getByTestId('editor')).toHaveAttribute('data-read-only', 'true');
  await screenFits(phone, info, 'phone-layout');
  await phone.getByTestId('toggle-markups').tap();
  await phone.getByRole('button', { name: 'Add a mark-up' }).tap();
  await expect(phone.locator('[data-drawer="markups"]')).toBeHidden(); // out of the way of the plan
  const plan = phone.getByTestId('plan');
  const box = (await plan.boundingBox())!;
  const scale = Number(await plan.getAttribute('data-scale'));
  const [ox, oy] = (await plan.getAttribute('data-origin'))!.split(',').map(Number);
  await phone.touchscreen.tap(box.x + ox + 1500 * scale, box.y + oy + 600 * scale);
  await phone.getByRole('textbox', { name: 'Note', exact: true }).fill('Could the table fold away further?');
  await phone.getByRole('button', { name: 'Place mark-up' }).tap();
  await expect(phone.getByTestId('markup-thread').filter({ hasText: 'Could the table fold away further?' })).toBeVisible();
  const threads = (await (await phone.request.get(`/api/layouts/${id}/comments`)).json()).threads;
  expect(Math.abs(threads[0].x - 1500)).toBeLessThanOrEqual(Math.ceil(2 / scale));
  await screenFits(phone, info, 'phone-markup-placed');

  // Revision A approved.
  await phone.goto(`/layouts/${id}/revisions`);
  await screenFits(phone, info, 'phone-revisions');
  await phone.getByRole('button', { name: 'Approve revision A' }).tap();
  await phone.getByTestId('approve-dialog').getByRole('button', { name: 'Approve revision A' }).tap();
  await expect(phone.getByTestId('revision').filter({ hasText: 'Revision A' })).toHaveAttribute('data-state', 'approved');
  await screenFits(phone, info, 'phone-revision-approved');

  // The quote and the deposit, on the local test checkout.
  await phone.goto(`/layouts/${id}/quote`);
  await screenFits(phone, info, 'phone-quote');
  await phone.getByRole('button', { name: /Pay deposit/ }).tap();
  await expect(phone).toHaveURL(/\/checkout\/cs_test_/, { timeout: 30_000 });
  await phone.getByRole('button', { name: 'Pay' }).tap();
  await expect(phone).toHaveURL(new RegExp(`/layouts/${id}/quote\\?paid=cs_test_`), { timeout: 30_000 });
  await expect(phone.getByTestId('quote-status')).toHaveText('Deposit paid');
  await screenFits(phone, info, 'phone-deposit-paid');
});

test('a designer on a phone sees the layout read-only, with the reason', async ({ browser }, info) => {
  const phone = await (await browser.newContext(PHONE)).newPage();
  await signIn(phone, 'ivo@saltmarsh.test', { open: null });
  // Opened by its address: the designer's full layouts table is a desktop screen, wider than a phone.
  const list = await (await phone.request.get('/api/layouts')).json();
  const stock = list.layouts.find((l: { name: string }) => l.name === 'Workshop stock — L4H3 empty bay');
  await phone.goto(`/layouts/${stock.id}`);
  await expect(phone.getByTestId('plan').locator('canvas').first()).toBeVisible({ timeout: 30_000 });
  await expect(phone.getByTestId('editor')).toHaveAttribute('data-read-only', 'true');
  await expect(phone.getByTestId('larger-screen-note')).toContainText('editing needs a larger screen');
  await expect(phone.getByTestId('toggle-shelf')).toHaveCount(0);
  await screenFits(phone, info, 'phone-designer-read-only');
});
