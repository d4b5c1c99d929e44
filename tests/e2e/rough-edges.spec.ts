// Rough edges found by using the editor, each checked the way a person meets it: the site's icon
// is served at /favicon.ico, the plan draws without Konva's layer-count warning, the Mark-ups list
// opens on demand (not on every load), and the survey-photos popover closes on Escape and on a
// click elsewhere. (Overhead modules drawn dashed and unfilled: tests/editor/overhead-drawing.test.ts.)
import { expect, test } from '@playwright/test';
import { openNewLayout, signIn } from './helpers';

const STOCK = 'Workshop stock — L4H3 empty bay';

test('/favicon.ico is an icon, not a 404', async ({ request }) => {
  const res = await request.get('/favicon.ico');
  expect(res.status()).toBe(200);
  expect(res.headers()['content-type']).toMatch(/image\//);
});

test('the editor opens with no layer-count warning, the Mark-ups list closed, and a popover that Escape and a click away close', async ({ page }) => {
  const warnings: string[] = [];
  page.on('console', (m) => {
    if (m.type() === 'warning' || m.type() === 'error') warnings.push(m.text());
  });
  await signIn(page, 'ivo@saltmarsh.test');
  await page.getByRole('link', { name: STOCK }).first().click();
  await expect(page.getByTestId('plan').locator('canvas').first()).toBeVisible({ timeout: 30_000 });
  await page.waitForTimeout(500);
  expect(warnings.filter((w) => /layers/i.test(w))).toEqual([]);

  // Mark-ups: closed on load, opened by its button.
  await expect(page.getByTestId('markups-panel')).toBeHidden();
  await page.getByTestId('toggle-markups').click();
  await expect(page.getByTestId('markups-panel')).toBeVisible();
  await page.getByTestId('toggle-markups').click();
  await expect(page.getByTestId('markups-panel')).toBeHidden();

  // Survey photos: Escape closes it even with the focus elsewhere; so does a click on the plan.
  const control = page.getByTestId('tracing-control');
  const popover = control.getByRole('dialog', { name: 'Survey photos' });
  await control.getByRole('button', { name: /Survey photos/ }).click();
  await expect(popover).toBeVisible();
  await page.getByTestId('plan').focus();
  await page.keyboard.press('Escape');
  await expect(popover).toHaveCount(0);
  await control.getByRole('button', { name: /Survey photos/ }).click();
  await expect(popover).toBeVisible();
  const box = (await page.getByTestId('plan').boundingBox())!;
  await page.mouse.click(box.x + box.width / 2, box.y + box.height - 20);
  await expect(popover).toHaveCount(0);
});

test('the Checks panel recovers by itself when the check service comes back', async ({ page }) => {
  await signIn(page, 'ivo@saltmarsh.test');
  await openNewLayout(page, `Checks outage ${Date.now().toString(36)}`);
  const status = page.getByTestId('checks-status');
  // The layout as opened comes with its findings from the page; an edit asks the service.
  await expect(status).toContainText('up to date', { timeout: 20_000 });
  let down = true;
  await page.route('**/api/checks', (route) => (down ? route.abort('connectionrefused') : route.fallback()));
  await page.getByTestId('plan').focus();
  await page.keyboard.press(']');
  await page.keyboard.press('ArrowDown');
  await expect(status).toContainText('checks unavailable', { timeout: 20_000 });
  down = false; // no edit from here on
  await expect(status).toContainText('up to date', { timeout: 20_000 });
});

test('disabled fields look different from editable ones, and radio buttons take the look’s accent', async ({ page, browser }) => {
  // The designer's editable field, then the client's disabled one in the same Details panel.
  await signIn(page, 'ivo@saltmarsh.test');
  await page.getByRole('link', { name: 'Nair — L2H2 weekender', exact: true }).first().click();
  await expect(page.getByTestId('plan').locator('canvas').first()).toBeVisible({ timeout: 30_000 });
  await page.getByTestId('plan').focus();
  await page.keyboard.press(']');
  const editable = page.getByTestId('details-x');
  await expect(editable).toBeEnabled();
  const look = (el: HTMLElement) => { const s = getComputedStyle(el); return { bg: s.backgroundColor, cursor: s.cursor, accent: s.accentColor }; };
  const open = await editable.evaluate(look);

  const client = await (await browser.newContext()).newPage();
  await signIn(client, 'priya@client.test');
  await client.getByRole('link', { name: 'Nair — L2H2 weekender', exact: true }).first().click();
  await expect(client.getByTestId('plan').locator('canvas').first()).toBeVisible({ timeout: 30_000 });
  await client.getByTestId('plan').focus();
  await client.keyboard.press(']');
  const locked = client.getByTestId('details-x');
  await expect(locked).toBeDisabled();
  const shut = await locked.evaluate(look);
  expect(shut.bg).not.toBe(open.bg);
  expect(shut.cursor).toBe('not-allowed');
  const box = client.locator('input[type="checkbox"], input[type="radio"]').first();
  expect((await box.evaluate(look)).accent).toBe('rgb(164, 82, 42)'); // the look's copper, #A4522A (DESIGN.md)
});
