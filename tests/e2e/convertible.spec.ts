// The convertible lounge as a designer builds it in Chromium: two bench seats along the walls and
// an infill board between them. The benches come off the shelf as seats by day and a bed by night,
// so the made-up bed passes in sleep while the benches stay seats in travel. Invented figures:
// the L4H3 bay template (walls 36 mm), benches 1900 × 600 (cushion top 460 mm), infill 1900 × 528 at
// 380 + 80 = 460 mm; one bed 1900 long and 600 + 528 + 600 = 1728 mm wide.
import { expect, test, type Page } from '@playwright/test';
import { signIn, keepScreenshot, pageErrors } from './helpers';

// Its own layout on the L4H3 bay, so the shared stock layout other specs draw on stays empty.
const LAYOUT = `Convertible lounge ${Date.now()}`;
const detail = (page: Page, field: string) => page.getByTestId(`details-${field}`);

async function place(page: Page, search: string, kind: string, at: Record<string, string>) {
  await page.getByTestId('shelf-search').fill(search);
  await page.keyboard.press('Tab');
  await expect(page.locator(`[data-kind="${kind}"]`)).toBeFocused();
  await page.keyboard.press('Enter');
  await expect(detail(page, 'x')).toBeVisible();
  for (const [field, value] of Object.entries(at)) {
    await detail(page, field).fill(value);
    await detail(page, field).press('Enter');
    await expect(detail(page, field)).toHaveValue(value);
  }
}

test('a convertible lounge: the bed passes in sleep while the benches stay seats in travel', async ({ page }) => {
  const errors = pageErrors(page);
  await signIn(page, 'ivo@saltmarsh.test', { open: null });
  const created = await page.request.post('/api/layouts', { data: { name: LAYOUT, bayTemplateId: 'l4h3' } });
  expect(created.status()).toBe(201);
  await page.goto(`/layouts/${(await created.json()).id}`);
  await expect(page.getByTestId('plan').locator('canvas').first()).toBeVisible({ timeout: 30_000 });

  await place(page, 'bench', 'bench-seat', { x: '1000', y: '36', length: '1900', width: '600' });
  // Off the shelf, a bench is in every arrangement: a seat in travel and lounge, a bed in sleep.
  await expect(page.getByTestId('details-in-travel')).toBeChecked();
  await expect(page.getByTestId('details-top-travel')).toHaveValue('seat');
  await expect(page.getByTestId('details-top-sleep')).toHaveValue('sleep');
  await place(page, 'bench', 'bench-seat', { x: '1000', y: '1164', length: '1900', width: '600' });
  await place(page, 'infill', 'bed-infill', { x: '1000', y: '636', length: '1900', width: '528', elevation: '380', height: '80' });

  // Sleep: one bed of all three pieces, 1900 mm long (1800 + 100 for the tallest) and wide enough.
  await page.getByTestId('arrangement-sleep').click();
  await page.getByLabel('show what meets').check();
  const length = page.locator('[data-finding="sleep.length"][data-arrangement="sleep"]').first();
  await expect(length).toHaveAttribute('data-status', 'pass', { timeout: 20_000 });
  await expect(page.locator('[data-finding="sleep.width"][data-arrangement="sleep"]').first()).toHaveAttribute('data-status', 'pass');
  await keepScreenshot(page, 'convertible-sleep');

  // Travel: the benches are still there, and still seats.
  await page.getByTestId('arrangement-travel').click();
  await page.getByTestId('plan').focus();
  await page.keyboard.press(']');
  await expect(page.getByTestId('details-in-travel')).toBeChecked();
  await expect(page.getByTestId('details-top-travel')).toHaveValue('seat');
  await keepScreenshot(page, 'convertible-travel');
  expect(errors).toEqual([]);
});
