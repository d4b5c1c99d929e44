// Openings in the layout editor, as a designer uses them: add a window from the Parts shelf's
// Openings group, find it drawn on the plan and select it by clicking its mark, type its Position
// in Details, and undo the edit to see the window go back where it was.
import { expect, test } from '@playwright/test';
import { keepScreenshot, openNewLayout, pageErrors, signIn } from './helpers';


test('a window added from the shelf is drawn, selected by a click on its mark, moved in Details, and undo puts it back', async ({ page }) => {
  const errors = pageErrors(page);
  await signIn(page, 'ivo@saltmarsh.test', { open: null });
  await openNewLayout(page, 'Openings — window');
  const listed = page.getByTestId('plan-openings').locator('li[data-opening-type="window"]');
  const before = await listed.count();

  await page.getByRole('button', { name: 'Add window' }).click();
  const form = page.getByTestId('opening-form');
  await expect(form).toBeVisible();
  await expect(form.getByRole('heading', { name: 'Window' })).toBeVisible();
  await expect(listed).toHaveCount(before + 1);
  const id = (await form.getAttribute('data-opening-id'))!;
  const mark = page.locator(`[data-testid="plan-openings"] li[data-opening-id="${id}"]`);
  await expect(mark).toHaveAttribute('data-selected', 'true');

  // Click on empty plan (the cab end's margin) clears the selection; a click on the mark selects it again.
  const plan = (await page.getByTestId('plan').boundingBox())!;
  await page.mouse.click(plan.x + 8, plan.y + plan.height - 8);
  await expect(form).toHaveCount(0);
  await expect(mark).toHaveAttribute('data-selected', 'false');
  const x = Number(await mark.getAttribute('data-x'));
  const y = Number(await mark.getAttribute('data-y'));
  await page.mouse.click(plan.x + x, plan.y + y);
  await expect(form).toBeVisible();
  await expect(mark).toHaveAttribute('data-selected', 'true');
  await expect(page.getByTestId('selection-announcer')).toContainText(/^Window in the (left|right|rear) wall selected/);

  // Type a new Position (0: the wall's start, always inside the wall) and leave the field with Enter.
  const position = form.getByLabel('Position', { exact: true });
  const was = await position.inputValue();
  const to = was === '0' ? '10' : '0';
  await position.fill(to);
  await position.press('Enter');
  await expect(position).toHaveValue(to);
  await expect(page.getByTestId('selection-announcer')).toContainText(`selected: ${to} mm from`);
  await keepScreenshot(page, 'openings-window-moved');

  // Undo (from the plan, as the keyboard user would): the window is back where it was, still selected.
  await page.getByTestId('plan').focus();
  await page.keyboard.press('Control+z');
  await expect(form.getByLabel('Position', { exact: true })).toHaveValue(was);
  await expect(mark).toHaveAttribute('data-selected', 'true');

  // Delete removes it; undo brings it back.
  await form.getByRole('button', { name: 'Delete window' }).click();
  await expect(listed).toHaveCount(before);
  await page.getByTestId('plan').focus();
  await page.keyboard.press('Control+z');
  await expect(listed).toHaveCount(before + 1);
  expect(errors).toEqual([]);
});

test('a heater exhaust by the sliding door fails its clearance; the finding selects it, and moving it in Details clears it', async ({ page }) => {
  await signIn(page, 'ivo@saltmarsh.test', { open: null });
  // The rear-bed starter: 3800 mm long, a sliding door on the right wall from 150 to 1350 mm.
  await openNewLayout(page, 'Openings — exhaust');
  await page.getByRole('button', { name: 'Add heater exhaust' }).click();
  const form = page.getByTestId('opening-form');
  await expect(form.getByRole('heading', { name: 'Heater exhaust' })).toBeVisible();
  const id = (await form.getAttribute('data-opening-id'))!;

  // On the right wall at 0 mm, on the bare floor: 150 mm from the door's front edge, under the 300 mm asked
  // (common practice, no source; lib/checks/sources.ts `exhaust`).
  await form.getByLabel('Wall or underside').selectOption({ label: 'Right wall' });
  await expect(form.getByLabel('Position', { exact: true })).toHaveValue('0');
  const failing = page.locator('[data-finding="clearance.exhaust"][data-status="fail"]');
  await expect(failing.first()).toBeVisible({ timeout: 20_000 });

  // A click on the finding selects the exhaust it names.
  await page.getByTestId('plan').focus();
  await page.keyboard.press('Escape');
  await expect(form).toHaveCount(0);
  await failing.first().getByRole('button').first().click();
  await expect(page.getByTestId('opening-form')).toHaveAttribute('data-opening-id', id);

  // 2000 mm along: 2000 − 1350 = 650 mm past the door, clear of everything else too.
  const position = page.getByTestId('opening-form').getByLabel('Position', { exact: true });
  await position.fill('2000');
  await position.press('Enter');
  await expect(page.getByTestId('selection-announcer')).toContainText('Heater exhaust selected: on the right wall, 2000 mm from its front end');
  await expect(failing).toHaveCount(0, { timeout: 20_000 });
  await page.getByLabel('show what meets').check();
  await expect(page.locator('[data-finding="clearance.exhaust"][data-status="pass"]', { hasText: 'is 650 mm from the right-hand door' })).toBeVisible();
});
