// A designer fills in a client's brief on New layout, gets several different checked proposals,
// opens one as a new layout, finds it in the layouts table, and sees every check met in the editor.
import { expect, test } from '@playwright/test';
import { keepScreenshot, signIn } from './helpers';

test('proposals from a brief open as a layout whose checks are all met', async ({ page }) => {
  await signIn(page, 'ivo@saltmarsh.test');
  await page.getByRole('link', { name: 'New layout' }).click();
  await page.getByRole('button', { name: 'Start from a brief' }).click();

  const brief = page.getByRole('form', { name: 'Brief' });
  await brief.getByLabel('Bay').selectOption('l3h2');
  await brief.getByLabel('Sleepers’ statures (mm)').fill('1790, 1640');
  await brief.getByLabel('Counter at least (mm)').fill('900');
  await brief.getByLabel('What matters most').selectOption('bed');
  await brief.getByRole('button', { name: 'Propose layouts' }).click();

  const proposals = page.getByRole('region', { name: 'Proposals' }).getByRole('listitem').filter({ has: page.getByRole('button', { name: 'Open as a new layout' }) });
  await expect(proposals.first()).toBeVisible({ timeout: 30_000 });
  expect(await proposals.count()).toBeGreaterThanOrEqual(3);
  // Different arrangements, not one plan shifted: each card names its own zoning.
  const titles = await proposals.locator('h4').allTextContents();
  expect(new Set(titles.map((t) => t.replace(/^Proposal [A-Z]: /, ''))).size).toBeGreaterThanOrEqual(3);
  await keepScreenshot(page, 'proposals');

  const first = titles[0];
  await proposals.first().getByRole('button', { name: 'Open as a new layout' }).click();
  await expect(page).toHaveURL(/\/layouts\/[0-9a-f-]{36}$/);
  await expect(page.getByTestId('checks-status')).toContainText('up to date', { timeout: 20_000 });
  await page.getByLabel('show what meets').check();
  await expect(page.locator('[data-finding][data-status="pass"]').first()).toBeVisible();
  await expect(page.locator('[data-finding][data-status="fail"]')).toHaveCount(0);
  await keepScreenshot(page, 'proposal-opened');

  await page.getByRole('link', { name: 'Layouts' }).click();
  await page.getByPlaceholder('Filter by name, client or bay…').fill(first.slice(0, 12));
  await expect(page.getByRole('row', { name: new RegExp(first.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')) }).first()).toContainText('L3H2');
});

test('a brief no arrangement can meet says why, with both numbers', async ({ page }) => {
  await signIn(page, 'ivo@saltmarsh.test');
  await page.getByRole('link', { name: 'New layout' }).click();
  await page.getByRole('button', { name: 'Start from a brief' }).click();
  const brief = page.getByRole('form', { name: 'Brief' });
  await brief.getByLabel('Bay').selectOption('l3h2');
  await brief.getByLabel('Sleepers’ statures (mm)').fill('1870, 1650');
  await brief.getByLabel('Bed', { exact: true }).selectOption('across');
  await brief.getByRole('button', { name: 'Propose layouts' }).click();
  const why = page.getByRole('region', { name: 'Why no proposal fits' });
  // 1870 + 100 mm = 1970 mm needed across; 1800 − 2 × 36 mm = 1728 mm lined width.
  await expect(why).toContainText('1970 mm', { timeout: 30_000 });
  await expect(why).toContainText('1728 mm');
  await keepScreenshot(page, 'proposals-impossible');
});

test('proposals for an existing layout open as a variant of it, linked in the layouts table, with every check met', async ({ page }) => {
  test.setTimeout(180_000);
  await signIn(page, 'ivo@saltmarsh.test');
  const stamp = Date.now().toString(36);
  const name = `Okafor — rear bed ${stamp}`;
  const created = await page.request.post('/api/layouts', { data: { name, starterId: 'starter-rear-bed' } });
  expect(created.status()).toBe(201);
  const id: string = (await created.json()).id;

  // From the layouts table's row menu to the layout's Proposals page.
  await page.goto('/layouts');
  await page.getByPlaceholder('Filter by name, client or bay…').fill(stamp);
  await page.getByRole('button', { name: `Actions for ${name}` }).click();
  await page.getByRole('menuitem', { name: 'Proposals from a brief' }).click();
  await expect(page).toHaveURL(new RegExp(`/layouts/${id}/proposals$`));

  // The brief is read from the layout: its own bay, its sleepers (1850 and 1700 mm) and its bed lengthways.
  const brief = page.getByRole('form', { name: 'Brief' });
  await expect(brief.getByLabel('Bay')).toHaveValue('this-layout');
  await expect(brief.getByLabel('Sleepers’ statures (mm)')).toHaveValue('1850, 1700');
  await expect(brief.getByLabel('Bed', { exact: true })).toHaveValue('lengthways');
  await brief.getByRole('button', { name: 'Propose layouts' }).click();

  const proposals = page.getByRole('region', { name: 'Proposals' }).getByRole('listitem').filter({ has: page.getByRole('button', { name: 'Open as a variant of this layout' }) });
  await expect(proposals.first()).toBeVisible({ timeout: 30_000 });
  await keepScreenshot(page, 'proposals-for-layout');
  await proposals.first().getByRole('button', { name: 'Open as a variant of this layout' }).click();
  await expect(page).toHaveURL(/\/layouts\/[0-9a-f-]{36}$/);
  expect(page.url()).not.toContain(id);
  await expect(page.getByTestId('checks-status')).toContainText('up to date', { timeout: 20_000 });
  await page.getByLabel('show what meets').check();
  await expect(page.locator('[data-finding][data-status="pass"]').first()).toBeVisible();
  await expect(page.locator('[data-finding][data-status="fail"]')).toHaveCount(0);

  // In the layouts table: the variant, linked to the layout it was proposed for.
  await page.getByRole('link', { name: 'Layouts' }).click();
  await page.getByPlaceholder('Filter by name, client or bay…').fill(stamp);
  const variant = page.getByRole('row').filter({ has: page.getByRole('link', { name: `${name} variant 2`, exact: true }) });
  await expect(variant).toHaveCount(1);
  await expect(variant).toContainText(`Variant of ${name}`);
  await keepScreenshot(page, 'proposal-variant-in-table');
});
