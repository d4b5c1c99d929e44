// Issued means frozen, end to end in Chromium: the client approves revision A; the designer edits
// on, and the layouts table and the editor say "Approved A · changed since" with a link to what
// changed; the client, a live viewer link, the plan sheet and the quote stay on A; the designer
// issues B, the client approves it, and the documents follow B. The quote page carries the
// workshop's terms and a PDF of it. Screenshots kept as artifacts.
import { expect, test, type Browser, type Page } from '@playwright/test';
import { keepScreenshot, signIn } from './helpers';

const stamp = Date.now().toString(36);
const LAYOUT = `Frozen — approved then changed ${stamp}`;

async function signedIn(browser: Browser, email: string): Promise<Page> {
  const page = await (await browser.newContext()).newPage();
  await signIn(page, email, { open: null }); // each test opens its own page first
  return page;
}

async function waitForPlan(page: Page) {
  await expect(page.getByTestId('plan').locator('canvas').first()).toBeVisible({ timeout: 30_000 });
}

/** The client approves the latest revision on the revisions page, as a person does. */
async function approve(client: Page, layoutId: string, letter: string) {
  await client.goto(`/layouts/${layoutId}/revisions`);
  const item = client.locator(`[data-testid="revision"][data-letter="${letter}"]`);
  await item.getByRole('button', { name: `Approve revision ${letter}` }).click();
  await client.getByTestId('approve-dialog').getByRole('button', { name: `Approve revision ${letter}` }).click();
  await expect(item).toHaveAttribute('data-state', 'approved', { timeout: 10_000 });
}

async function relabel(designer: Page, layoutId: string, label: string) {
  const current = await (await designer.request.get(`/api/layouts/${layoutId}`)).json();
  const doc = structuredClone(current.doc);
  doc.modules[0].label = label;
  const saved = await designer.request.put(`/api/layouts/${layoutId}`, { data: { doc }, headers: { 'if-match': String(current.version) } });
  expect(saved.status()).toBe(200);
}

test('approve A → edit → "changed since A" while the client, the viewer, the sheet and the quote stay on A → issue and approve B → documents follow B', async ({ browser }) => {
  test.setTimeout(240_000);
  const designer = await signedIn(browser, 'ivo@saltmarsh.test');
  const owner = await signedIn(browser, 'maren@saltmarsh.test');
  const client = await signedIn(browser, 'priya@client.test');

  // The owner sets the studio's quote terms in settings.
  await owner.goto('/settings');
  await owner.getByLabel('Workshop details').fill('Unit 4, Quay Road, Saltmarsh');
  await owner.getByLabel('Terms', { exact: true }).fill('The deposit secures a workshop slot.');
  await owner.getByLabel('Quotes hold for').fill('21');
  await owner.getByRole('button', { name: 'Save quote terms' }).click();
  await expect(owner.getByText('Quote terms saved')).toBeVisible();

  // A layout for Priya, issued as A and approved by her.
  const members = await (await designer.request.get('/api/studio/members')).json();
  const priya = members.members.find((m: { name: string }) => m.name === 'Priya Nair');
  const created = await designer.request.post('/api/layouts', { data: { name: LAYOUT, starterId: 'starter-rear-bed', clientId: priya.userId } });
  expect(created.status()).toBe(201);
  const { id } = await created.json();
  await relabel(designer, id, 'Bed as approved');
  await designer.goto(`/layouts/${id}/revisions`);
  await designer.getByRole('button', { name: 'Issue revision A' }).click();
  await expect(designer.locator('[data-testid="revision"][data-letter="A"]')).toBeVisible();
  await approve(client, id, 'A');

  // A live viewer link, made before the edit.
  const link = await designer.request.post(`/api/layouts/${id}/links`, { data: {} });
  expect(link.status()).toBe(201);
  const viewerPath = (await link.json()).path as string;

  // The designer edits on: the next revision's preliminary.
  await relabel(designer, id, 'Bed moved after approval');

  // The layouts table says "Approved A · changed since", linking to what changed.
  await designer.goto('/layouts');
  const row = designer.getByRole('row').filter({ has: designer.getByRole('link', { name: LAYOUT, exact: true }) });
  const badge = row.locator('[data-changed-since="A"]');
  await expect(badge).toContainText('Approved A · changed since');
  await keepScreenshot(designer, 'frozen-layouts-changed-since');
  await badge.getByRole('link', { name: 'changed since' }).click();
  await expect(designer).toHaveURL(new RegExp(`/layouts/${id}/revisions/compare\\?from=A&to=current`));
  await expect(designer.getByRole('heading', { name: new RegExp(`Compare revisions of ${LAYOUT}`) })).toBeVisible();

  // The editor says so too, with the way to the frozen revision.
  await designer.goto(`/layouts/${id}`);
  await waitForPlan(designer);
  const banner = designer.getByTestId('revision-banner');
  await expect(banner).toHaveAttribute('data-changed-since', 'A');
  await expect(banner).toContainText('Approved A · changed since');
  await expect(banner).toContainText('preliminary of revision B');
  await keepScreenshot(designer, 'frozen-editor-banner');
  await banner.getByRole('link', { name: 'Open revision A' }).click();
  await expect(designer.getByTestId('revision-banner')).toHaveAttribute('data-on-show', 'A');
  await expect(designer.getByTestId('editor')).toHaveAttribute('data-read-only', 'true');

  // The client still sees A, read-only, and can look at the preliminary only by choosing it.
  await client.goto(`/layouts/${id}`);
  await waitForPlan(client);
  await expect(client.getByTestId('revision-banner')).toHaveAttribute('data-on-show', 'A');
  await expect(client.getByTestId('revision-banner')).toContainText('not issued yet');
  await keepScreenshot(client, 'frozen-client-sees-a');

  // So does the live viewer link.
  const visitor = await (await browser.newContext()).newPage();
  await visitor.goto(viewerPath);
  await expect(visitor.getByTestId('viewer-kind')).toHaveAttribute('data-revision', 'A');

  // The plan sheet and the build plan's documents default to A.
  await designer.goto(`/layouts/${id}/sheet`);
  await expect(designer.getByTestId('sheet-revision')).toHaveValue('A');
  await expect(designer.getByTestId('sheet-on-show')).toHaveText('revision A');
  await designer.getByTestId('sheet-revision').selectOption('preliminary');
  await expect(designer).toHaveURL(/revision=preliminary/);
  await expect(designer.getByTestId('sheet-on-show')).toHaveText('preliminary, as last saved');
  await designer.goto(`/layouts/${id}/build?tab=quote`);
  await expect(designer.getByTestId('documents-from')).toHaveAttribute('data-revision', 'A');

  // A quote of A goes without a question and says which revision it prices.
  await designer.getByLabel('Deposit').fill('25');
  await designer.getByRole('button', { name: 'Send quote' }).click();
  await expect(designer.getByText('Quote sent to Priya Nair')).toBeVisible();
  await client.goto(`/layouts/${id}/quote`);
  await expect(client.getByTestId('quote-revision')).toHaveText('Priced from revision A (approved)');
  await expect(client.getByTestId('quote-workshop')).toHaveText('Saltmarsh Van Works');
  await expect(client.getByTestId('quote-terms')).toContainText('The deposit secures a workshop slot.');
  await expect(client.getByTestId('quote-valid-until')).toBeVisible();
  await expect(client.getByTestId('quote-cautions')).toContainText('Weight limits');
  const pdf = await client.request.get((await client.getByTestId('quote-pdf').getAttribute('href'))!);
  expect(pdf.status()).toBe(200);
  expect(pdf.headers()['content-type']).toBe('application/pdf');
  await keepScreenshot(client, 'frozen-quote-page');

  // Issue B: the client and the viewer see B; the documents wait on its approval, then follow it.
  await designer.goto(`/layouts/${id}/revisions`);
  await designer.getByRole('button', { name: 'Issue revision B' }).click();
  await expect(designer.locator('[data-testid="revision"][data-letter="B"]')).toBeVisible();
  await expect.poll(async () => (await visitor.request.get(`/api/v/${viewerPath.split('/').pop()}`)).json().then((c) => c.revision?.letter)).toBe('B');
  await designer.goto(`/layouts/${id}/sheet`);
  await expect(designer.getByTestId('sheet-revision')).toHaveValue('A');
  await approve(client, id, 'B');
  await designer.goto(`/layouts/${id}/sheet`);
  await expect(designer.getByTestId('sheet-revision')).toHaveValue('B');
  await keepScreenshot(designer, 'frozen-sheet-follows-b');
  await designer.goto(`/layouts/${id}/build?tab=cut`);
  await expect(designer.getByTestId('documents-from')).toHaveAttribute('data-revision', 'B');
  await designer.goto('/layouts');
  await expect(designer.getByRole('row').filter({ has: designer.getByRole('link', { name: LAYOUT, exact: true }) }).locator('[data-state="approved"]')).toContainText('B');
});
