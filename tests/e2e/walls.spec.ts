// The wall elevations and the roof plan beside the side section: the tabs by name, the four walls
// and the roof as named drawings, drawn from the same model as the sheet (its data-tags), and live
// with the arrangement on show.
import { expect, test } from '@playwright/test';
import { keepScreenshot, signIn } from './helpers';

test('the Walls and Roof tabs show the four elevations and the roof plan of the demo layout', async ({ page }) => {
  await page.setViewportSize({ width: 1440, height: 900 });
  await signIn(page, 'ivo@saltmarsh.test');
  await page.getByRole('link', { name: 'Nair — L2H2 weekender', exact: true }).first().click();
  await expect(page.getByTestId('plan').locator('canvas').first()).toBeVisible({ timeout: 30_000 });

  await page.getByRole('tab', { name: 'Wall elevations' }).click();
  const walls = page.getByRole('tabpanel', { name: 'Wall elevations' });
  for (const name of ['Left wall elevation', 'Right wall elevation', 'Rear wall elevation', 'Bulkhead elevation']) {
    await expect(walls.getByRole('img', { name })).toBeVisible();
  }
  // The demo's lounge window is on the left wall, its sliding-door window on the right.
  const left = walls.getByRole('img', { name: 'Left wall elevation' });
  await expect(left.locator('[data-tag="elevation:left:window:lounge-window"]')).toHaveCount(1);
  await expect(walls.getByRole('img', { name: 'Right wall elevation' }).locator('[data-tag="elevation:right:window:slide-window"]')).toHaveCount(1);
  // True to scale: the left wall's bare floor line (3100 mm) over the bay height dimension (2000 mm).
  const floor = (await left.locator('[data-tag="elevation:left:floor"]').boundingBox())!;
  const height = (await left.locator('[data-tag="dimension:elevation:left:height"]').boundingBox())!;
  expect(floor.width / height.height).toBeCloseTo(3100 / 2000, 1);
  await keepScreenshot(page, 'walls-1440');

  await page.getByRole('tab', { name: 'Roof plan' }).click();
  const roof = page.getByRole('tabpanel', { name: 'Roof plan' }).getByRole('img', { name: 'Roof plan' });
  await expect(roof).toBeVisible();
  await expect(roof.locator('[data-tag="roof:opening:roof-fan"]')).toHaveCount(1);
  await keepScreenshot(page, 'roof-1440');
});
