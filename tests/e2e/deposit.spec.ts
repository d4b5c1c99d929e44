// Build planning to deposit, end to end in Chromium: the designer opens the build plan from the
// editor, changes the maximum authorised mass (typed with its unit), which saves itself with the
// layout version like the editor's drawing (undo and redo included; when someone saved first, the
// build plan goes on their version), looks
// at the cut list and the parts list (with its CSV), and sends the client
// a quote; the client opens it, pays the deposit on the local test checkout and comes back to a
// paid quote; the receipt is in the development outbox. Screenshots kept as artifacts.
import { expect, test, type Browser, type Page } from '@playwright/test';
import { simpleParser } from 'mailparser';
import { keepScreenshot, signIn } from './helpers';

const stamp = Date.now().toString(36);
const LAYOUT = `Nair — deposit run ${stamp}`;

async function signedIn(browser: Browser, email: string): Promise<Page> {
  const page = await (await browser.newContext()).newPage();
  await signIn(page, email, { open: null }); // each test opens its own page first
  return page;
}

test('designer sends a quote → client pays the deposit on the hosted checkout → paid quote and receipt', async ({ browser }) => {
  test.setTimeout(240_000);

  // A layout of our own for Priya, so other specs' edits cannot disturb this one.
  const designer = await signedIn(browser, 'ivo@saltmarsh.test');
  const members = await (await designer.request.get('/api/studio/members')).json();
  const priya = members.members.find((m: { email?: string }) => m.email === 'priya@client.test');
  const created = await designer.request.post('/api/layouts', { data: { name: LAYOUT, starterId: 'starter-l-lounge', clientId: priya.userId } });
  expect(created.status()).toBe(201);
  const layoutId: string = (await created.json()).id;

  // From the editor's toolbar to the build plan.
  await designer.goto(`/layouts/${layoutId}`);
  await designer.getByTestId('build-plan-link').click();
  await expect(designer).toHaveURL(new RegExp(`/layouts/${layoutId}/build`));
  await expect(designer.getByRole('heading', { name: `Build plan · ${LAYOUT}` })).toBeVisible();
  await expect(designer.locator('[data-testid=build-planner][data-hydrated=true]')).toBeVisible({ timeout: 30_000 });

  // Weight: type the maximum authorised mass in tonnes; the results follow at once and the entry
  // saves itself, as the editor does (no save button), and the header shows the saved version.
  const status = designer.getByTestId('save-status');
  const mam = designer.getByTestId('w-mam');
  await mam.fill('3.5 t');
  await expect(designer.getByTestId('bar-total')).toContainText('of 3,500 kg');
  await expect(designer.getByRole('button', { name: /save build plan/i })).toHaveCount(0);
  await expect(status).toHaveAttribute('data-status', 'saved', { timeout: 15_000 });
  await expect(status).toContainText('v2');
  await expect(designer.getByTestId('saved-version')).toHaveText('2');
  await expect(designer.getByTestId('com-marker')).toBeVisible();
  await keepScreenshot(designer, 'build-plan-weight');

  // The entry is one undo step, as in the editor: undo brings the starter's figure back and saves that.
  await designer.getByRole('button', { name: 'Undo' }).click();
  await expect(mam).toHaveValue('3300');
  await expect(designer.getByTestId('saved-version')).toHaveText('3', { timeout: 15_000 });
  await designer.getByRole('button', { name: 'Redo' }).click();
  await expect(mam).toHaveValue('3500');
  await expect(designer.getByTestId('saved-version')).toHaveText('4', { timeout: 15_000 });

  // A field that is not a mass is marked, says why, and is not saved.
  await mam.fill('heavy');
  await expect(designer.getByText('type a mass, e.g. 2100 kg or 2.1 t')).toBeVisible();
  await expect(designer.getByTestId('fields-to-correct')).toContainText('Weight');
  await mam.fill('3500');
  await expect(designer.getByTestId('fields-to-correct')).toHaveCount(0);
  await expect(status).toHaveAttribute('data-status', 'saved');
  await expect(designer.getByTestId('saved-version')).toHaveText('4');

  // Someone saves the drawing meanwhile: the next entry's save is refused (412), and the build
  // plan is put on their version without losing either change.
  const theirs = await (await designer.request.get(`/api/layouts/${layoutId}`)).json();
  theirs.doc.modules[0].label = 'Sink, moved by a colleague';
  const other = await designer.request.put(`/api/layouts/${layoutId}`, { data: { doc: theirs.doc }, headers: { 'if-match': '4' } });
  expect(other.status()).toBe(200);
  await mam.fill('3450 kg');
  const dialog = designer.getByTestId('conflict-dialog');
  await expect(dialog).toContainText('Version 5', { timeout: 15_000 });
  await dialog.getByRole('button', { name: 'Put my build plan on their version' }).click();
  await expect(designer.getByTestId('saved-version')).toHaveText('6', { timeout: 15_000 });
  await expect(status).toHaveAttribute('data-status', 'saved');
  const merged = (await (await designer.request.get(`/api/layouts/${layoutId}`)).json()).doc;
  expect(merged.modules[0].label).toBe('Sink, moved by a colleague');
  expect(merged.systems.vehicle.maxAuthorisedMassKg).toBe(3450);

  // Power: the season balance and cable sizes are there.
  await designer.getByRole('tab', { name: /^Power/ }).click();
  await expect(designer.getByTestId('power-results').locator('[data-season=winter]')).toContainText('deficit');
  await expect(designer.getByTestId('cable-table')).toContainText('AWG');

  // Cut list: nested sheets drawn to scale.
  await designer.getByRole('tab', { name: 'Cut list' }).click();
  await expect(designer.getByTestId('cut-summary')).toContainText(/\d+ sheets/);
  await expect(designer.getByTestId('cut-sheet').first()).toBeVisible();
  await keepScreenshot(designer, 'build-plan-cut-list');

  // Parts list: priced, with a CSV export of the saved version.
  await designer.getByRole('tab', { name: 'Parts list' }).click();
  await expect(designer.getByTestId('parts-total')).toContainText('£');
  const csvHref = await designer.getByRole('link', { name: 'Download CSV' }).getAttribute('href');
  const csv = await designer.request.get(csvHref!);
  expect(csv.status()).toBe(200);
  expect(csv.headers()['content-type']).toContain('text/csv');
  expect(csv.headers()['content-disposition']).toMatch(/attachment; filename=".*-preliminary-v6-parts\.csv"/);
  expect(await csv.text()).toMatch(/^Item,Category,Quantity/);

  // Quote: 25 % deposit, sent to Priya.
  await designer.getByRole('tab', { name: 'Quote' }).click();
  await designer.getByLabel('Deposit').fill('25');
  await designer.getByLabel('Note to the client').fill('The deposit books your workshop slot.');
  const depositText = (await designer.getByTestId('deposit-preview').textContent())!.trim();
  await designer.getByRole('button', { name: 'Send quote' }).click();
  // Nothing has been issued and approved: the quote is sent only once the designer confirms.
  await expect(designer.getByTestId('quote-confirm')).toContainText('preliminary layout');
  await designer.getByRole('button', { name: 'Send anyway, saying so on the quote' }).click();
  await expect(designer.getByText('Quote sent to Priya Nair')).toBeVisible();
  await expect(designer.getByTestId('quote-panel').getByTestId('quote-status')).toHaveText('Waiting for the deposit');

  // The client opens the quote from the build plan's header and pays.
  const client = await signedIn(browser, 'priya@client.test');
  await client.goto(`/layouts/${layoutId}/build`);
  await expect(client.locator('[data-testid=build-planner][data-hydrated=true]')).toBeVisible({ timeout: 30_000 });
  await client.getByRole('link', { name: 'Quote', exact: true }).click();
  await expect(client).toHaveURL(new RegExp(`/layouts/${layoutId}/quote$`), { timeout: 30_000 });
  await expect(client.getByTestId('quote-deposit')).toHaveText(depositText);
  await expect(client.getByText('The deposit books your workshop slot.')).toBeVisible();
  await client.getByRole('button', { name: `Pay deposit ${depositText}` }).click();
  await expect(client).toHaveURL(/\/checkout\/cs_test_/, { timeout: 30_000 });
  await expect(client.getByText('no money moves')).toBeVisible();
  await expect(client.getByRole('heading', { name: `Deposit: ${depositText}` })).toBeVisible();
  await client.getByRole('button', { name: 'Pay' }).click();

  // Back on the quote, paid, with the receipt on its way.
  await expect(client).toHaveURL(new RegExp(`/layouts/${layoutId}/quote\\?paid=cs_test_`), { timeout: 30_000 });
  await expect(client.getByTestId('quote-status')).toHaveText('Deposit paid');
  await expect(client.getByTestId('paid-banner')).toContainText('priya@client.test');
  await expect(client.getByRole('button', { name: /Pay deposit/ })).toHaveCount(0);
  await keepScreenshot(client, 'quote-paid');

  // The workshop sees it paid too.
  await designer.goto(`/layouts/${layoutId}/quote`);
  await expect(designer.getByTestId('quote-status')).toHaveText('Deposit paid');

  // The receipt is in the development outbox, with the amount and a link back to the quote.
  const owner = await signedIn(browser, 'maren@saltmarsh.test');
  let mailId: string | null = null;
  await expect.poll(async () => {
    await owner.goto('/outbox');
    const row = owner.getByRole('row').filter({ hasText: 'priya@client.test' }).filter({ hasText: `Receipt: deposit of ${depositText} for ${LAYOUT}` }).first();
    mailId = (await row.count()) ? await row.getAttribute('data-mail-id') : null;
    return mailId;
  }, { timeout: 15_000 }).not.toBeNull();
  const raw = await owner.request.get(`/outbox/${mailId}/raw`);
  const receipt = await simpleParser(await raw.body());
  expect(receipt.text).toContain(`deposit of ${depositText}`);
  expect(receipt.text).toContain(`/layouts/${layoutId}/quote`);
  expect(receipt.text).toMatch(/not a VAT invoice/);
});
