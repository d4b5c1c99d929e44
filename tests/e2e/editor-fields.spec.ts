// A Details-panel field holding a value that does not read never holds the focus (WCAG 2.1
// SC 2.1.2, No Keyboard Trap): the message shows beside the field as it is typed, Tab leaves,
// leaving puts the last valid value back with a note saying the edit was not applied and why,
// and Escape puts it back too. Also: a click on "Build plan" straight after an edit is held until
// the edit is saved, then followed — the edit is there after a reload.
import { expect, test, type Page } from '@playwright/test';
import { keepScreenshot, openNewLayout, pageErrors, signIn } from './helpers';


async function selectFirstModule(page: Page) {
  await page.getByTestId('plan').focus();
  await page.keyboard.press(']');
  await expect(page.getByTestId('details-length')).toBeVisible();
}

test('an unreadable length shows why beside its field, lets the focus go, and goes back to the last valid value', async ({ page }) => {
  await signIn(page, 'ivo@saltmarsh.test', { open: null });
  await openNewLayout(page, 'Fields — invalid values');
  await selectFirstModule(page);
  const length = page.getByTestId('details-length');
  const before = await length.inputValue();

  // Past the schema's limit (100 000 mm): the message is beside the field and tied to it.
  await length.fill('99999999');
  const error = page.getByTestId('details-length-error');
  await expect(error).toContainText('Length must be between');
  await expect(length).toHaveAttribute('aria-invalid', 'true');
  await expect(length).toHaveAttribute('aria-describedby', (await error.getAttribute('id'))!);
  await keepScreenshot(page, 'details-invalid-length');

  // Tab leaves the field: the focus moves on, the last valid value is back, a note says why.
  await page.keyboard.press('Tab');
  expect(await length.evaluate((el) => el === document.activeElement)).toBe(false);
  await expect(length).toHaveValue(before);
  await expect(length).toHaveAttribute('aria-invalid', 'false');
  await expect(page.getByText(/Not applied: Length must be between \d+ and \d+ mm/)).toBeVisible();

  // Escape puts the last valid value back, the message goes, the focus stays to try again.
  await length.fill('twelve');
  await expect(error).toContainText('type a length');
  await page.keyboard.press('Escape');
  await expect(length).toHaveValue(before);
  await expect(error).toHaveCount(0);
  await expect(length).toBeFocused();

  // A click on the plan with a bad value in the field: the note says the edit was not applied.
  await length.fill('abc');
  const plan = (await page.getByTestId('plan').boundingBox())!;
  await page.mouse.click(plan.x + 8, plan.y + 8);
  await expect(page.getByText(/Not applied: Length: type a length/)).toBeVisible();
  // The plan has the focus now (the field may be gone with the selection).
  expect(await page.evaluate(() => document.activeElement?.getAttribute('data-testid'))).not.toBe('details-length');
});

test('a click on Build plan straight after an edit waits for the save, then opens the build plan with the edit kept', async ({ page }) => {
  await signIn(page, 'ivo@saltmarsh.test', { open: null });
  const id = await openNewLayout(page, 'Fields — leave while saving');
  await selectFirstModule(page);
  const length = page.getByTestId('details-length');
  const before = Number(await length.inputValue());
  const after = before - 10; // 10 mm shorter: within every limit of a placed module
  await length.fill(String(after));
  // Straight away (the autosave waits 1.2 s after an edit): leaving the field applies it, the click is held.
  await page.getByTestId('build-plan-link').click();
  await expect(page).toHaveURL(new RegExp(`/layouts/${id}/build`), { timeout: 20_000 });

  // The edit was saved before the page changed: the stored layout has a module of the new length.
  const lengths = await page.evaluate(async (layoutId) => {
    const res = await fetch(`/api/layouts/${layoutId}`);
    return ((await res.json()) as { doc: { modules: { length: number }[] } }).doc.modules.map((m) => m.length);
  }, id);
  expect(lengths).toContain(after);
  await page.goto(`/layouts/${id}`);
  await expect(page.getByTestId('plan').locator('canvas').first()).toBeVisible({ timeout: 30_000 });
  await selectFirstModule(page);
  await expect(page.getByTestId('details-length')).toHaveValue(String(after));
});

test('Enter and then Tab straight after apply an edit once: one undo puts the old length back', async ({ page }) => {
  await signIn(page, 'ivo@saltmarsh.test', { open: null });
  await openNewLayout(page, 'Fields — one edit, one undo');
  await selectFirstModule(page);
  const length = page.getByTestId('details-length');
  const before = Number(await length.inputValue());
  await length.fill(String(before - 10));
  // Both keys come before the edit's paint; the edit is applied after it, once.
  await length.press('Enter');
  await page.keyboard.press('Tab');
  await expect(length).toHaveValue(String(before - 10));
  await page.getByTestId('plan').focus();
  await page.keyboard.press('ControlOrMeta+z');
  await expect(length).toHaveValue(String(before));
});

test('a drop from the shelf and a key straight after: the module is placed first, and the key acts on it', async ({ page }) => {
  await signIn(page, 'ivo@saltmarsh.test', { open: null });
  await openNewLayout(page, 'Fields — drop, then a key');
  const undo = page.getByRole('button', { name: 'Undo', exact: true });
  await expect(undo).toBeDisabled();
  // The drop is placed after the paint that answers it; a key pressed before that paint (both
  // events are sent in one script, so no frame comes between them) must still find it placed.
  await page.getByTestId('plan').evaluate((plan) => {
    const r = plan.getBoundingClientRect();
    const data = new DataTransfer();
    data.setData('application/x-baywright-kind', 'step');
    plan.dispatchEvent(new DragEvent('drop', { dataTransfer: data, clientX: r.left + r.width / 2, clientY: r.top + r.height / 2, bubbles: true, cancelable: true }));
    plan.dispatchEvent(new KeyboardEvent('keydown', { key: 'Delete', bubbles: true, cancelable: true }));
  });
  // Placed, then deleted: the last step is the deletion of the placed (selected) module.
  await expect(undo).toHaveAttribute('title', /^Undo: Delete 1 module/);
  await page.getByTestId('plan').focus();
  await page.keyboard.press('ControlOrMeta+z');
  await expect(undo).toHaveAttribute('title', /^Undo: Place module/);
  await expect(page.getByTestId('selection-announcer')).toContainText(/^Step selected/);
});

test('what is typed in the next field is kept when the last field\'s edit reaches the plan after the paint', async ({ page }) => {
  const errors = pageErrors(page);
  await signIn(page, 'ivo@saltmarsh.test', { open: null });
  await openNewLayout(page, 'Fields — typing on while an edit lands');
  await selectFirstModule(page);
  const x = page.getByTestId('details-x');
  const y = page.getByTestId('details-y');
  const x0 = Number(await x.inputValue());
  const y0 = Number(await y.inputValue());
  // In one script, so no frame comes between: a new x and Enter, then on to y and a new value in it.
  await page.evaluate(([nx, ny]) => {
    const type = (el: HTMLInputElement, v: string) => {
      Object.getOwnPropertyDescriptor(HTMLInputElement.prototype, 'value')!.set!.call(el, v);
      el.dispatchEvent(new Event('input', { bubbles: true }));
    };
    const xi = document.querySelector<HTMLInputElement>('[data-testid="details-x"]')!;
    const yi = document.querySelector<HTMLInputElement>('[data-testid="details-y"]')!;
    xi.focus();
    type(xi, nx);
    xi.form!.requestSubmit();
    yi.focus();
    type(yi, ny);
  }, [String(x0 + 10), String(y0 + 10)]);
  // The x edit lands after the next paint and the form follows the store; y keeps what was typed.
  await expect(x).toHaveValue(String(x0 + 10));
  await page.evaluate(() => new Promise((r) => requestAnimationFrame(() => requestAnimationFrame(() => setTimeout(r, 50)))));
  await expect(y).toHaveValue(String(y0 + 10));
  await y.press('Enter');
  await expect(y).toHaveValue(String(y0 + 10));
  // Both edits are in the document: one undo takes y back, the next x.
  await page.getByTestId('plan').focus();
  await page.keyboard.press('ControlOrMeta+z');
  await expect(y).toHaveValue(String(y0));
  await expect(x).toHaveValue(String(x0 + 10));
  expect(errors).toEqual([]);
});
