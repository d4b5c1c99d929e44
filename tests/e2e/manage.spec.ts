// Managing layouts, end to end in Chromium, as a designer does it from the layouts table: each row
// shows a small plan; the row menu is worked by keyboard to rename a layout; it is duplicated as a
// variant (linked to its original); the variant is changed and the two compared side by side with
// their findings; the original's saved versions are listed with plans and an earlier one restored
// as the newest save; the variant is archived, found under "Show archived" and restored.
// Screenshots kept as artifacts.
import { expect, test, type Page } from '@playwright/test';
import { keepScreenshot, signIn } from './helpers';

const stamp = Date.now().toString(36);
const FIRST = `Lindqvist — L2H2 sketch ${stamp}`;
const RENAMED = `Lindqvist — L2H2 weekender ${stamp}`;

function row(page: Page, name: string) {
  return page.getByRole('row').filter({ has: page.getByRole('link', { name, exact: true }) });
}

test('rename, duplicate as variant, compare variants, restore a saved version, archive and restore', async ({ page }) => {
  test.setTimeout(180_000);
  await signIn(page, 'ivo@saltmarsh.test', { open: null });
  const created = await page.request.post('/api/layouts', { data: { name: FIRST, starterId: 'starter-l-lounge' } });
  expect(created.status()).toBe(201);
  const layoutId: string = (await created.json()).id;

  await page.goto('/layouts');
  await page.getByPlaceholder('Filter by name, client or bay…').fill(stamp);
  const first = row(page, FIRST);
  await expect(first).toHaveCount(1);
  // The row's plan is drawn by the server from the document, and it has loaded.
  const plan = first.getByTestId('layout-thumbnail');
  await expect(plan).toHaveAttribute('alt', `Plan of ${FIRST}`);
  await expect.poll(() => plan.evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth)).toBeGreaterThan(0);

  // Rename, by keyboard only: focus the menu button, open it, walk down to Rename… and press Enter.
  await first.getByRole('button', { name: `Actions for ${FIRST}` }).focus();
  await page.keyboard.press('Enter');
  const menu = page.getByRole('menu', { name: `Actions for ${FIRST}` });
  await expect(menu.getByRole('menuitem', { name: 'Open' })).toBeFocused();
  await page.keyboard.press('ArrowDown');
  await expect(menu.getByRole('menuitem', { name: 'Rename…' })).toBeFocused();
  await page.keyboard.press('End');
  await expect(menu.getByRole('menuitem', { name: 'Delete…' })).toBeFocused();
  await page.keyboard.press('Home');
  await page.keyboard.press('ArrowDown');
  await page.keyboard.press('Enter');
  const rename = page.getByTestId('rename-layout');
  await rename.getByLabel('Name').fill('   ');
  await rename.getByRole('button', { name: 'Rename' }).click();
  await expect(rename.getByRole('alert')).toContainText('name');
  await rename.getByLabel('Name').fill(RENAMED);
  await page.keyboard.press('Enter');
  await expect(row(page, RENAMED)).toHaveCount(1);
  // The table confirms it (its toasts once went nowhere: the page had no outlet for them).
  await expect(page.getByText(`Renamed to “${RENAMED}”.`)).toBeVisible();
  await keepScreenshot(page, 'manage-renamed');

  // Duplicate as a variant: a new row, named "… variant 2", linked to its original.
  await row(page, RENAMED).getByRole('button', { name: `Actions for ${RENAMED}` }).click();
  await page.getByRole('menuitem', { name: 'Duplicate as variant' }).click();
  const variant = row(page, `${RENAMED} variant 2`);
  await expect(variant).toHaveCount(1);
  await expect(variant.getByText('Variant of')).toBeVisible();
  await expect(variant.getByRole('link', { name: RENAMED, exact: true })).toHaveAttribute('href', `/layouts/${layoutId}`);
  await keepScreenshot(page, 'manage-variant');

  // Change the variant (one module fewer), then compare the two side by side.
  const list = await (await page.request.get('/api/layouts')).json();
  const variantDto = list.layouts.find((l: { name: string }) => l.name === `${RENAMED} variant 2`);
  const full = await (await page.request.get(`/api/layouts/${variantDto.id}`)).json();
  const removed = full.doc.modules[0];
  const saved = await page.request.put(`/api/layouts/${variantDto.id}`, { data: { doc: { ...full.doc, modules: full.doc.modules.slice(1) } }, headers: { 'if-match': String(full.version) } });
  expect(saved.status()).toBe(200);
  await page.reload();
  await page.getByPlaceholder('Filter by name, client or bay…').fill(stamp);
  await variant.getByRole('link', { name: 'compare' }).click();
  await expect(page.getByRole('heading', { name: `Compare variants of ${RENAMED} variant 2` })).toBeVisible();
  const plans = page.getByTestId('compare-plans');
  await expect(plans.locator('figure')).toHaveCount(2);
  // Opened from the variant's row: the variant on the left, its original (which still has the sink unit) on the right.
  await expect(page.getByTestId('compare-plans').locator('figcaption')).toHaveText([`${RENAMED} variant 2`, RENAMED]);
  expect(removed.kind).toBe('sink-unit');
  await expect(page.getByTestId('module-changes')).toContainText('Added Sink unit');
  await expect(page.getByTestId('compare-from-status')).toContainText('Checks');
  await expect(page.getByTestId('finding-changes')).toBeVisible();
  await keepScreenshot(page, 'manage-compare');

  // Saved versions of the original: the first save and the rename, each with its plan; restore the first.
  await page.goto(`/layouts/${layoutId}/versions`);
  const table = page.getByTestId('saved-versions');
  await expect(table.getByRole('row')).toHaveCount(3);
  await expect(table.getByRole('img', { name: 'Plan as saved in version 1' })).toBeVisible();
  await table.getByRole('button', { name: 'Restore version 1 as the newest save' }).click();
  const ask = page.getByTestId('restore-version');
  await ask.getByRole('button', { name: 'Restore as the newest save' }).click();
  await expect(page.getByText('Version 1 restored as version 3.')).toBeVisible();
  await expect(table.getByRole('row')).toHaveCount(4);
  await expect(table.getByRole('row').nth(1)).toContainText('restored from version 1');
  await keepScreenshot(page, 'manage-saved-versions');
  // The first save carried the first name: the layout has it again.
  const back = await (await page.request.get(`/api/layouts/${layoutId}`)).json();
  expect(back).toMatchObject({ name: FIRST, version: 3 });

  // Archive the variant: it leaves the list, shows under "Show archived", and comes back on Restore.
  await page.goto('/layouts');
  await page.getByPlaceholder('Filter by name, client or bay…').fill(stamp);
  await variant.getByRole('button', { name: `Actions for ${RENAMED} variant 2` }).click();
  await page.getByRole('menuitem', { name: 'Archive' }).click();
  await expect(variant).toHaveCount(0);
  await page.getByRole('switch').check();
  await expect(variant).toHaveCount(1);
  await variant.getByRole('button', { name: `Actions for ${RENAMED} variant 2` }).click();
  await page.getByRole('menuitem', { name: 'Restore' }).click();
  await expect(variant).toHaveCount(0);
  await page.getByRole('switch').uncheck();
  await expect(variant).toHaveCount(1);
});
