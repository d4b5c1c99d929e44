// The build plan saves as the editor does: a figure typed in is autosaved, the header names the
// version actually saved (also when the browser's back button brings the page from its cache), and
// an edit not yet saved when the page is left goes to the server all the same (save on leave).
import { expect, test } from '@playwright/test';
import { signIn } from './helpers';

const stamp = Date.now().toString(36);

test('build plan: autosaved figure, header version as saved, nothing lost by leaving at once', async ({ page }, info) => {
  test.setTimeout(120_000);
  page.on('dialog', (d) => void d.accept());
  await signIn(page, 'ivo@saltmarsh.test', { open: null });
  const created = await page.request.post('/api/layouts', { data: { name: `Build plan saving ${stamp}`, starterId: 'starter-l-lounge' } });
  expect(created.status()).toBe(201);
  const { id, version: first } = (await created.json()) as { id: string; version: number };

  // The editor, then its Build plan link (a full page load).
  await page.goto(`/layouts/${id}`);
  await page.getByTestId('build-plan-link').click();
  const planner = page.locator('[data-testid=build-planner][data-hydrated=true]');
  await expect(planner).toBeVisible({ timeout: 30_000 });
  await expect(page.getByTestId('saved-version')).toHaveText(String(first));
  const miro = page.getByTestId('w-miro');

  // 1. A figure typed in is autosaved; the header follows the save (one save: first + 1).
  await miro.fill('2488');
  await expect(page.getByTestId('save-status')).toHaveAttribute('data-status', 'saved', { timeout: 15_000 });
  await expect(page.getByTestId('saved-version')).toHaveText(String(first + 1));
  await expect(page.getByTestId('saved-at')).toBeVisible();
  await page.screenshot({ path: info.outputPath('build-plan-saved.png') });

  // Straight to the plan (inside the app) and back with the browser's button: the page comes from the
  // browser's cache, made before the save, and still shows the figure and the version as saved.
  await page.getByRole('link', { name: 'Back to the plan' }).click();
  await expect(page.getByTestId('editor')).toBeVisible({ timeout: 30_000 });
  await page.goBack();
  await expect(planner).toBeVisible({ timeout: 30_000 });
  await expect(page.getByTestId('saved-version')).toHaveText(String(first + 1), { timeout: 15_000 });
  await expect(miro).toHaveValue('2488');

  // 2. A figure typed and the page left before the autosave's moment (1.2 s): saved on leave.
  await miro.fill('2512');
  await expect(page.getByTestId('build-planner')).toHaveAttribute('data-dirty', 'true');
  await page.goForward();
  await expect(page.getByTestId('editor')).toBeVisible({ timeout: 30_000 });
  // The server has it: one more save (first + 2), carrying 2512 kg.
  await expect.poll(async () => (await (await page.request.get(`/api/layouts/${id}`)).json()).version, { timeout: 15_000 }).toBe(first + 2);
  const saved = await (await page.request.get(`/api/layouts/${id}`)).json();
  expect(JSON.stringify(saved.doc.systems)).toContain('2512');

  // Back on the build plan: the figure is there and the header names that save.
  await page.goBack();
  await expect(planner).toBeVisible({ timeout: 30_000 });
  await expect(page.getByTestId('saved-version')).toHaveText(String(first + 2), { timeout: 15_000 });
  await expect(miro).toHaveValue('2512');
  await expect(page.getByTestId('save-status')).toHaveAttribute('data-status', 'saved');
  await page.screenshot({ path: info.outputPath('build-plan-after-leaving.png') });
});
