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
