// Solar on the roof: the rear-bed starter draws two 175 W panels (invented), so the build plan's
// Power tab reads the array from the roof plan instead of asking for a typed figure; a panel placed
// from the Parts shelf takes its rated power in Details, lands in the sum, and the Checks say where
// it overlaps the panels already there.
import { expect, test } from '@playwright/test';
import { keepScreenshot, signIn } from './helpers';

const stamp = Date.now().toString(36);

test('panels drawn on the roof give the Power tab its array; a third one placed and rated in Details joins the sum', async ({ page }) => {
  test.setTimeout(180_000);
  await signIn(page, 'ivo@saltmarsh.test', { open: null });
  const created = await page.request.post('/api/layouts', { data: { name: `Solar ${stamp}`, starterId: 'starter-rear-bed' } });
  expect(created.status()).toBe(201);
  const { id } = (await created.json()) as { id: string };

  // The Power tab: 2 × 175 W = 350 W from the roof plan, and no typed "Solar panels" field.
  await page.goto(`/layouts/${id}/build?tab=power`);
  await expect(page.getByTestId('solar-from-roof')).toHaveText('From the roof plan: 2 panels, 350 W', { timeout: 30_000 });
  await expect(page.getByRole('textbox', { name: /^Solar panels/ })).toHaveCount(0);
  await expect(page.getByRole('textbox', { name: /^Sun, summer/ })).toHaveValue('5.2');
  await expect(page.getByText(/Solar from the 2 panels drawn on the roof \(350 W rated\) after 14\.08 % system losses/)).toBeVisible();
  await keepScreenshot(page, 'solar-power-tab');

  // The editor: a panel from the shelf goes mid-roof, over the two already there.
  await page.goto(`/layouts/${id}`);
  await expect(page.getByTestId('plan').locator('canvas').first()).toBeVisible({ timeout: 30_000 });
  await page.getByRole('button', { name: 'Place Solar panel, 1480 mm by 670 mm' }).click();
  const rated = page.getByRole('textbox', { name: 'Rated power (W)' });
  await expect(rated).toHaveValue('175');
  await rated.fill('200');
  await rated.press('Tab');
  await expect(page.getByTestId('save-status')).toHaveAttribute('data-status', 'saved', { timeout: 15_000 });
  await expect(page.getByText(/overlap by \d+ mm × \d+ mm on the roof/).first()).toBeAttached({ timeout: 30_000 });
  await keepScreenshot(page, 'solar-third-panel');

  // 175 + 175 + 200 = 550 W.
  await page.goto(`/layouts/${id}/build?tab=power`);
  await expect(page.getByTestId('solar-from-roof')).toHaveText('From the roof plan: 3 panels, 550 W', { timeout: 30_000 });
});
