// The layout editor in Chromium, as a designer uses it: place a bench from the Parts shelf by
// drag, move it with the mouse, watch the Details panel and the sleep findings follow, undo,
// and find the save after a reload. Also: axe on the editor, keyboard-only placing and moving,
// and the read-only view a client gets. Screenshots of lounge and sleep kept as artifacts.
import { expect, test, type Page } from '@playwright/test';
import AxeBuilder from '@axe-core/playwright';
import { signIn, keepScreenshot, pageErrors } from './helpers';

const STOCK = 'Workshop stock — L4H3 empty bay';

async function openLayout(page: Page, name: string) {
  await page.getByRole('link', { name }).first().click();
  await expect(page.getByTestId('plan').locator('canvas').first()).toBeVisible({ timeout: 30_000 });
}

async function planGeometry(page: Page) {
  const plan = page.getByTestId('plan');
  const box = (await plan.boundingBox())!;
  const scale = Number(await plan.getAttribute('data-scale'));
  const [ox, oy] = (await plan.getAttribute('data-origin'))!.split(',').map(Number);
  /** Screen point of a bay point in mm. */
  const at = (x: number, y: number) => ({ x: box.x + ox + x * scale, y: box.y + oy + y * scale });
  return { plan, box, scale, at };
}

const detail = (page: Page, field: string) => page.getByTestId(`details-${field}`);
const numberIn = async (page: Page, field: string) => Number(await detail(page, field).inputValue());

test.describe('layout editor', () => {
  test('place by drag, move with the mouse, sleep findings follow, undo, saved after reload', async ({ page }) => {
    // Nothing the page does here may end in an error (the drag layer once threw on every move).
    const errors = pageErrors(page);
    await signIn(page, 'ivo@saltmarsh.test');
    await openLayout(page, STOCK);
    const { plan, box, scale, at } = await planGeometry(page);
    await expect(page.getByTestId('save-status')).toHaveAttribute('data-status', 'saved');
    expect(scale).toBeGreaterThan(0);

    // Place a bench seat by dragging it from the Parts shelf to the middle of the L4H3 bay, 4500 × 1800 (x 2250, y 900).
    const drop = at(2250, 900);
    await page.locator('[data-kind="bench-seat"]').dragTo(plan, { targetPosition: { x: drop.x - box.x, y: drop.y - box.y } });
    await expect(detail(page, 'x')).toBeVisible();
    const placedX = await numberIn(page, 'x');
    const placedY = await numberIn(page, 'y');
    expect(Math.abs(placedX + 550 - 2250)).toBeLessThanOrEqual(20); // centred on the drop, 10 mm grid
    expect(Math.abs(placedY + 275 - 900)).toBeLessThanOrEqual(20);

    // Move it 100 px rearwards with the mouse: the Details panel shows the new position.
    await expect(page.getByTestId('plan')).toHaveAttribute('data-stroke', 'none');
    const grab = (await planGeometry(page)).at(placedX + 550, placedY + 275);
    // Count each Konva layer's redraws: while the bench is dragged only the drag layer is redrawn
    // (it washes the bench's origin and draws the bench where it goes); the plan's drawing layer,
    // every module and label, is redrawn once the move is committed, not in the frame it starts.
    const draws = () => page.evaluate(() => ({ ...(window as unknown as { __draws: Record<string, number> }).__draws }));
    await page.evaluate(() => {
      const w = window as unknown as { __draws: Record<string, number>; Konva: { Layer: { prototype: { drawScene: (...a: unknown[]) => unknown; name: () => string } } } };
      w.__draws = {};
      const proto = w.Konva.Layer.prototype;
      const original = proto.drawScene;
      proto.drawScene = function (this: { name: () => string }, ...a: unknown[]) {
        w.__draws[this.name()] = (w.__draws[this.name()] ?? 0) + 1;
        return original.apply(this, a);
      };
    });
    // Every canvas of the plan stays shown when the drag starts (DragLayer.tsx: a layer shown or
    // hidden changes the page's layers in the frame the drag starts).
    const shown = () => page.getByTestId('plan').locator('canvas').evaluateAll((cs) => cs.map((c) => getComputedStyle(c).display));
    const before = await shown();
    // Three canvases: the drawing, the overlay (with the mark-ups and the rulers) and the drag
    // layer; Chromium copies every canvas of the plan at each compositor commit (PlanStage.tsx).
    expect(before).toHaveLength(3);
    expect(before).not.toContain('none');
    await page.mouse.move(grab.x, grab.y);
    await page.mouse.down();
    await page.mouse.move(grab.x + 100, grab.y, { steps: 15 });
    await expect(page.getByTestId('plan')).toHaveAttribute('data-stroke', 'gesture');
    await expect.poll(async () => (await draws()).drag ?? 0).toBeGreaterThan(0);
    expect((await draws()).drawing ?? 0).toBe(0);
    expect(await shown()).toEqual(before);
    await page.mouse.up();
    await expect.poll(() => numberIn(page, 'x')).not.toBe(placedX);
    await expect.poll(async () => (await draws()).drawing ?? 0).toBeGreaterThan(0);
    const movedX = await numberIn(page, 'x');
    expect(Math.abs(movedX - placedX - 100 / scale)).toBeLessThanOrEqual(40);
    expect(await numberIn(page, 'y')).toBe(placedY);
    await keepScreenshot(page, 'editor-lounge');

    // Sleep: off the shelf a bench is a bed by night, and alone its 1100 mm is too short a place
    // (the stock layout's tallest sleeper needs more), so the bed-length finding fails; used as a
    // seat at night too there is no bed at all and it warns; placing a bed turns it to a pass.
    await page.getByTestId('arrangement-sleep').click();
    await page.getByLabel('show what meets').check();
    const sleepLength = page.locator('[data-finding="sleep.length"][data-arrangement="sleep"]').first();
    await expect(sleepLength).toHaveAttribute('data-status', 'fail');
    await page.getByTestId('details-top-sleep').selectOption('seat');
    await expect(sleepLength).toHaveAttribute('data-status', 'warn');
    await page.locator('[data-kind="bed-platform"]').click();
    await expect(sleepLength).toHaveAttribute('data-status', 'pass');
    await expect(page.getByTestId('checks-status')).toContainText('up to date');
    await keepScreenshot(page, 'editor-sleep');

    // Undo the bed and the bench's night-time top (the findings go back), then the move (the position comes back).
    await plan.focus();
    await page.keyboard.press('Control+z');
    await expect(sleepLength).toHaveAttribute('data-status', 'warn');
    await page.keyboard.press('Control+z');
    await expect(sleepLength).toHaveAttribute('data-status', 'fail');
    await page.keyboard.press('Control+z');
    await expect.poll(() => numberIn(page, 'x')).toBe(placedX);

    // Autosave, then a reload shows the bench where the undo left it.
    await expect(page.getByTestId('save-status')).toHaveAttribute('data-status', 'saved', { timeout: 15_000 });
    await page.reload();
    await expect(plan.locator('canvas').first()).toBeVisible({ timeout: 30_000 });
    await page.getByTestId('arrangement-lounge').click();
    await plan.focus();
    await page.keyboard.press(']');
    await expect.poll(() => numberIn(page, 'x')).toBe(placedX);
    expect(await numberIn(page, 'y')).toBe(placedY);
    expect(errors).toEqual([]);
  });

  test('a module can be placed and moved with the keyboard alone', async ({ page }) => {
    await signIn(page, 'ivo@saltmarsh.test');
    await openLayout(page, STOCK);
    await page.getByTestId('shelf-search').fill('drawer');
    await page.keyboard.press('Tab');
    await expect(page.locator('[data-kind="drawer-unit"]')).toBeFocused();
    await page.keyboard.press('Enter');
    await expect(page.getByTestId('plan')).toBeFocused();
    const x0 = await numberIn(page, 'x');
    const y0 = await numberIn(page, 'y');
    await page.keyboard.press('Shift+ArrowRight');
    await page.keyboard.press('Shift+ArrowRight');
    await page.keyboard.press('ArrowDown');
    await expect.poll(() => numberIn(page, 'x')).toBe(x0 + 20);
    await expect.poll(() => numberIn(page, 'y')).toBe(y0 + 1);
    await page.keyboard.press('r');
    await expect.poll(() => numberIn(page, 'length')).toBe(450);
    // The shortcut sheet lists the commands.
    await page.keyboard.press('?');
    await expect(page.getByTestId('shortcut-sheet')).toContainText('Nudge rearwards 10 mm');
    await page.keyboard.press('Escape');
    // Typed lengths in another unit land as whole mm.
    await detail(page, 'x').fill('150 cm');
    await detail(page, 'x').press('Enter');
    await expect.poll(() => numberIn(page, 'x')).toBe(1500);
    await page.keyboard.press('Control+z');
  });

  test('axe finds no serious or critical problems in the editor', async ({ page }) => {
    await signIn(page, 'ivo@saltmarsh.test');
    await openLayout(page, STOCK);
    await page.locator('[data-kind="kitchen-counter"]').click();
    const results = await new AxeBuilder({ page }).include('[data-testid="editor"]').analyze();
    const bad = results.violations.filter((v) => v.impact === 'serious' || v.impact === 'critical');
    expect(bad.map((v) => `${v.id}: ${v.help} (${v.nodes.length})`)).toEqual([]);
    await page.keyboard.press('Control+z');
  });

  test('a client sees the same drawing read-only: no shelf, no saving', async ({ page }) => {
    await signIn(page, 'priya@client.test');
    await openLayout(page, 'Nair — L2H2 weekender');
    await expect(page.getByRole('navigation', { name: 'Parts shelf' })).toHaveCount(0);
    await expect(page.getByTestId('save-status')).toHaveAttribute('data-status', 'read-only');
    await expect(page.getByTestId('editor')).toHaveAttribute('data-read-only', 'true');
    await page.getByTestId('plan').focus();
    await page.keyboard.press(']');
    await expect(detail(page, 'x')).toBeDisabled();
    await page.keyboard.press('ArrowRight');
    await expect(page.getByTestId('save-status')).toHaveAttribute('data-status', 'read-only');
  });

  test('zoom with the wheel, pan with space-drag and the middle button, and the context menu', async ({ page }) => {
    await signIn(page, 'ivo@saltmarsh.test');
    await openLayout(page, 'Nair — L2H2 weekender');
    const { plan, box, scale } = await planGeometry(page);
    const origin = async () => (await plan.getAttribute('data-origin'))!;
    await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
    await page.mouse.wheel(0, -300);
    await expect.poll(async () => Number(await plan.getAttribute('data-scale'))).toBeGreaterThan(scale * 1.2);
    await plan.focus();
    await page.keyboard.press('0');
    await expect.poll(async () => Number(await plan.getAttribute('data-scale'))).toBeCloseTo(scale, 6);

    const o0 = await origin();
    await page.keyboard.down(' ');
    await page.mouse.move(box.x + 100, box.y + 100);
    await page.mouse.down();
    await page.mouse.move(box.x + 180, box.y + 140, { steps: 5 });
    await page.mouse.up();
    await page.keyboard.up(' ');
    await expect.poll(origin).not.toBe(o0);
    const o1 = await origin();
    await page.mouse.move(box.x + 200, box.y + 200);
    await page.mouse.down({ button: 'middle' });
    await page.mouse.move(box.x + 150, box.y + 200, { steps: 5 });
    await page.mouse.up({ button: 'middle' });
    await expect.poll(origin).not.toBe(o1);
    await page.keyboard.press('0');

    // Right-click a module: the menu offers the same commands; rotating swaps its footprint.
    await page.keyboard.press(']');
    const len = await numberIn(page, 'length');
    const wid = await numberIn(page, 'width');
    const x = await numberIn(page, 'x');
    const y = await numberIn(page, 'y');
    const g = await planGeometry(page);
    const c = g.at(x + len / 2, y + wid / 2);
    await page.mouse.click(c.x, c.y, { button: 'right' });
    const menu = page.getByRole('menu', { name: 'Module actions' });
    await expect(menu).toBeVisible();
    // The right-click selects whatever module is on top there (a locker may sit over the first one).
    const hitLen = await numberIn(page, 'length');
    const hitWid = await numberIn(page, 'width');
    await menu.getByRole('menuitem', { name: /Rotate 90°/ }).click();
    await expect(menu).toBeHidden();
    await expect.poll(() => numberIn(page, 'length')).toBe(hitWid);
    expect(await numberIn(page, 'width')).toBe(hitLen);
    await page.getByTestId('plan').focus();
    await page.keyboard.press('Control+z');
    await expect.poll(() => numberIn(page, 'length')).toBe(hitLen);
    expect(len * wid).toBeGreaterThan(0);
  });

  test('a save that meets a newer version shows the conflict dialog; reloading theirs takes their change', async ({ browser }) => {
    const a = await (await browser.newContext()).newPage();
    const b = await (await browser.newContext()).newPage();
    for (const p of [a, b]) {
      await signIn(p, 'ivo@saltmarsh.test');
      await openLayout(p, 'Adeyemi — L3H2 touring');
      await p.getByTestId('plan').focus();
      await p.keyboard.press(']');
    }
    const x0 = await numberIn(a, 'x');
    // A moves the first module 10 mm and saves first.
    await a.getByTestId('plan').focus();
    await a.keyboard.press('Shift+ArrowRight');
    await expect(a.getByTestId('save-status')).toHaveAttribute('data-status', 'saved', { timeout: 15_000 });
    await expect.poll(() => numberIn(a, 'x')).toBe(x0 + 10);
    // B, still on the old version, moves it the other way: its save meets A's version.
    await b.getByTestId('plan').focus();
    await b.keyboard.press('ArrowLeft');
    const dialog = b.getByTestId('conflict-dialog');
    await expect(dialog).toBeVisible({ timeout: 15_000 });
    await expect(b.getByTestId('save-status')).toHaveAttribute('data-status', 'conflict');
    await dialog.getByRole('button', { name: /Open the saved version/ }).click();
    await expect(dialog).toBeHidden();
    await expect(b.getByTestId('save-status')).toHaveAttribute('data-status', 'saved');
    await b.getByTestId('plan').focus();
    await b.keyboard.press(']');
    await expect.poll(() => numberIn(b, 'x')).toBe(x0 + 10);
    await a.context().close();
    await b.context().close();
  });
});
