// The side section uses the panel it is shown in: at 1440 × 900 the bay's drawn section (bare floor
// to bare roof, bulkhead to rear doors) fills most of the panel's width or height, true to scale.
import { expect, test } from '@playwright/test';
import { keepScreenshot, signIn } from './helpers';

test('the side section fills its panel, to scale', async ({ page }) => {
  await page.setViewportSize({ width: 1440, height: 900 });
  await signIn(page, 'ivo@saltmarsh.test');
  await page.getByRole('link', { name: 'Nair — L2H2 weekender', exact: true }).first().click();
  await expect(page.getByTestId('plan').locator('canvas').first()).toBeVisible({ timeout: 30_000 });
  await keepScreenshot(page, 'plan-labels-1440');
  await page.getByRole('tab', { name: 'Side section' }).click();
  const panel = page.getByRole('tabpanel', { name: 'Side section' });
  const bay = panel.getByTestId('section-bay');
  await expect(bay).toBeVisible();
  // Let the panel settle at its size (the observer redraws on the next frame).
  await expect.poll(async () => {
    const p = (await panel.boundingBox())!, b = (await bay.boundingBox())!;
    return Math.max(b.width / p.width, b.height / p.height);
  }).toBeGreaterThanOrEqual(0.7);

  // True to scale: the drawn length over the drawn height is the bay's length over its height.
  const p = (await panel.boundingBox())!, b = (await bay.boundingBox())!;
  const bayDims = await page.evaluate(async () => {
    const id = location.pathname.split('/').filter(Boolean).pop();
    const res = await fetch(`/api/layouts/${id}`);
    const body = (await res.json()) as { doc: { bay: { length: number; height: number } } };
    return body.doc.bay;
  });
  // The floor and roof lines are 2.5 px strokes: the box is the line spacing plus one stroke width.
  expect((b.width) / (b.height - 2.5)).toBeCloseTo(bayDims.length / bayDims.height, 1);
  // And the panel itself is more than the old fixed strip: over a third of the screen's height.
  expect(p.height).toBeGreaterThan(900 / 3);
  await keepScreenshot(page, 'side-section-1440');
});
