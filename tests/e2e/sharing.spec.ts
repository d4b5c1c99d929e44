// Working with a client, end to end in Chromium: the designer issues revision A and shares a live
// viewer link (which follows a save within 2 s), invites a new client; the invitation mail
// arrives at the development mail server and is parsed with mailparser; the client follows the
// link, sets a password, sees the layout, places a mark-up (edits it, removes a stray reply) and
// approves revision A; the designer sees the approval, settles the mark-up, issues revision B and
// compares (revision clouds); the client returns B for changes. The viewer link is withdrawn and
// says so. Screenshots kept as artifacts.
import { expect, test, type Browser, type Page } from '@playwright/test';
import { simpleParser } from 'mailparser';
import { keepScreenshot, signIn } from './helpers';

const stamp = Date.now().toString(36);
const LAYOUT = `Okafor — L3H2 weekender ${stamp}`;
const CLIENT_EMAIL = `sam.${stamp}@client.test`;
const CLIENT_PASSWORD = 'a-long-client-password';

async function signedIn(browser: Browser, email: string): Promise<Page> {
  const page = await (await browser.newContext()).newPage();
  await signIn(page, email, { open: null }); // each test opens its own page first
  return page;
}

async function waitForPlan(page: Page) {
  await expect(page.getByTestId('plan').locator('canvas').first()).toBeVisible({ timeout: 30_000 });
}

/** The owner reads the outbox page and downloads the newest message to `to`, parsed. */
async function latestMailTo(owner: Page, to: string, subject: RegExp) {
  let id: string | null = null;
  await expect.poll(async () => {
    await owner.goto('/outbox');
    const row = owner.getByRole('row').filter({ hasText: to }).filter({ hasText: subject }).first();
    id = (await row.count()) ? await row.getAttribute('data-mail-id') : null;
    return id;
  }, { timeout: 15_000 }).not.toBeNull();
  const res = await owner.request.get(`/outbox/${id}/raw`);
  expect(res.status()).toBe(200);
  expect(res.headers()['content-type']).toContain('message/rfc822');
  return { id: id!, mail: await simpleParser(await res.body()) };
}

test('invite → view → mark-up → settle → approve → issue → return for changes → compare, with a live viewer link', async ({ browser }) => {
  test.setTimeout(180_000);

  // The designer starts a layout for the new client from a starter layout.
  const designer = await signedIn(browser, 'ivo@saltmarsh.test');
  const created = await designer.request.post('/api/layouts', { data: { name: LAYOUT, starterId: 'starter-rear-bed' } });
  expect(created.status()).toBe(201);
  const layout = await created.json();
  await designer.goto(`/layouts/${layout.id}`);
  await waitForPlan(designer);

  // Share: a live viewer link, copied from the Share dialog (shown once).
  await designer.getByRole('button', { name: 'Share', exact: true }).click();
  await designer.getByRole('button', { name: 'Make a viewer link' }).click();
  const linkField = designer.getByTestId('new-viewer-link');
  await expect(linkField).toHaveValue(/\/v\/[A-Za-z0-9_-]{43}$/);
  const viewerUrl = await linkField.inputValue();
  await keepScreenshot(designer, 'sharing-share-dialog');
  await designer.getByRole('button', { name: 'Done' }).click();

  // Someone without an account opens it: read-only, not indexed, no referrer.
  const visitor = await (await browser.newContext()).newPage();
  const opened = await visitor.goto(viewerUrl);
  expect(opened!.headers()['x-robots-tag']).toBe('noindex, nofollow');
  expect(opened!.headers()['referrer-policy']).toBe('no-referrer');
  await expect(visitor.locator('meta[name="robots"]')).toHaveAttribute('content', /noindex/);
  await expect(visitor.getByTestId('viewer-kind')).toContainText('Preliminary: follows the workshop’s saves');
  await expect(visitor.getByTestId('viewer-caution')).toContainText('qualified, licensed people');
  await expect(visitor.getByRole('banner').getByText(LAYOUT)).toBeVisible();
  await waitForPlan(visitor);
  await expect(visitor.getByTestId('editor')).toHaveAttribute('data-read-only', 'true');
  for (const name of ['Share', 'Add a mark-up', 'Revisions']) await expect(visitor.getByRole('button', { name, exact: true })).toHaveCount(0);
  await expect(visitor.getByText('Parts shelf')).toHaveCount(0);
  await expect(visitor.getByTestId('checks-counts')).toBeVisible({ timeout: 15_000 });
  await keepScreenshot(visitor, 'sharing-viewer-live');

  // The designer saves; the live viewer shows the new version within 2 s.
  const current = await (await designer.request.get(`/api/layouts/${layout.id}`)).json();
  const doc = structuredClone(current.doc);
  doc.modules[0].x += 50;
  const saved = await designer.request.put(`/api/layouts/${layout.id}`, { headers: { 'if-match': String(current.version) }, data: { doc } });
  expect(saved.status()).toBe(200);
  const newVersion = (await saved.json()).version;
  const savedAt = Date.now();
  await expect(visitor.getByTestId('viewer')).toHaveAttribute('data-version', String(newVersion), { timeout: 2_000 });
  console.log(`[sharing] live viewer caught up ${Date.now() - savedAt} ms after the save`);

  // Issue revision A.
  await designer.goto(`/layouts/${layout.id}/revisions`);
  await designer.getByLabel('Note for the client').fill('First proposal: fixed bed across the rear, kitchen on the sliding-door side.');
  await designer.getByRole('button', { name: 'Issue revision A' }).click();
  await expect(designer.getByTestId('revision').filter({ hasText: 'Revision A' })).toHaveAttribute('data-state', 'sent');

  // Invite the client with this layout.
  await designer.goto('/clients');
  await designer.getByLabel('Name').fill('Sam Okafor');
  await designer.getByLabel('E-mail').fill(CLIENT_EMAIL);
  await designer.getByLabel('Share a layout').selectOption({ label: LAYOUT });
  await designer.getByRole('button', { name: 'Send invitation' }).click();
  await expect(designer.getByText(`Invitation sent to ${CLIENT_EMAIL}`)).toBeVisible();
  await expect(designer.getByTestId('invitations-table').getByRole('row').filter({ hasText: CLIENT_EMAIL })).toHaveAttribute('data-status', 'pending');
  await keepScreenshot(designer, 'sharing-clients-invited');

  // The mail arrives at the development mail server; the owner's outbox shows it.
  const owner = await signedIn(browser, 'maren@saltmarsh.test');
  const { id: mailId, mail } = await latestMailTo(owner, CLIENT_EMAIL, /invites you/);
  expect(mail.subject).toBe("Saltmarsh Van Works invites you to follow your van's design");
  expect(mail.to && 'text' in mail.to ? mail.to.text : '').toContain(CLIENT_EMAIL);
  const link = (mail.text ?? '').match(/https?:\/\/\S+\/invite\/[A-Za-z0-9_-]{43}/)?.[0];
  expect(link, 'the invitation mail carries a link').toMatch(/\/invite\/[A-Za-z0-9_-]{43}$/);
  await owner.goto(`/outbox/${mailId}`);
  await expect(owner.getByTestId('mail-text')).toContainText('Join the studio');
  await keepScreenshot(owner, 'sharing-outbox-invitation');

  // The client follows the link, sets a password and lands on the layout, read-only.
  const client = await (await browser.newContext()).newPage();
  await client.goto(new URL(link!).pathname);
  await expect(client.getByTestId('invited-email')).toHaveText(CLIENT_EMAIL);
  await keepScreenshot(client, 'sharing-invitation-page');
  await client.getByLabel('Choose a password').fill(CLIENT_PASSWORD);
  await client.getByLabel('Repeat the password').fill(CLIENT_PASSWORD);
  await client.getByRole('button', { name: 'Set password and join' }).click();
  await expect(client).toHaveURL(new RegExp(`/layouts/${layout.id}$`), { timeout: 20_000 });
  await waitForPlan(client);
  await expect(client.getByTestId('editor')).toHaveAttribute('data-read-only', 'true');
  await expect(client.getByRole('button', { name: 'Share', exact: true })).toHaveCount(0);

  // The client places a mark-up about a known point of the bay (x 1500 mm, y 600 mm).
  await client.getByTestId('toggle-markups').click(); // the Mark-ups list opens on demand (the plan refits beside it)
  await client.getByRole('button', { name: 'Add a mark-up' }).click();
  const plan = client.getByTestId('plan');
  const box = (await plan.boundingBox())!;
  const scale = Number(await plan.getAttribute('data-scale'));
  const [ox, oy] = (await plan.getAttribute('data-origin'))!.split(',').map(Number);
  await client.mouse.click(box.x + ox + 1500 * scale, box.y + oy + 600 * scale);
  await client.getByRole('textbox', { name: 'Note', exact: true }).fill('Could the bed be 50 mm longer? I am 1.88 m tall.');
  await client.getByRole('button', { name: 'Place mark-up' }).click();
  const thread = client.getByTestId('markup-thread').filter({ hasText: 'Could the bed be 50 mm longer?' });
  await expect(thread).toBeVisible();
  const threads = await (await client.request.get(`/api/layouts/${layout.id}/comments`)).json();
  expect(threads.threads).toHaveLength(1);
  expect(Math.abs(threads.threads[0].x - 1500)).toBeLessThanOrEqual(Math.ceil(2 / scale));
  expect(Math.abs(threads.threads[0].y - 600)).toBeLessThanOrEqual(Math.ceil(2 / scale));
  await expect(thread).toHaveAttribute('data-settled', 'no');
  await expect(client.getByTestId('markups-panel')).toContainText('1 open');
  await keepScreenshot(client, 'sharing-client-markup-placed');
  // The client sharpens the question (their own mark-up: Edit), then adds and removes a reply.
  await thread.getByRole('button', { name: 'Edit your mark-up' }).click();
  await thread.getByRole('textbox', { name: 'Change your mark-up' }).fill('Could the bed be 50 mm longer? I am 1.88 m tall and sleep stretched out.');
  await thread.getByRole('button', { name: 'Save', exact: true }).click();
  await expect(thread).toContainText('sleep stretched out');
  await expect(thread).toContainText('edited');
  await keepScreenshot(client, 'sharing-client-markup-edited');
  await thread.getByRole('textbox', { name: 'Reply' }).fill('Sent too early, ignore this.');
  await thread.getByRole('button', { name: 'Reply', exact: true }).click();
  const reply = thread.getByTestId('markup-reply').filter({ hasText: 'Sent too early' });
  await reply.getByRole('button', { name: 'Remove this reply' }).click();
  await reply.getByRole('button', { name: 'Remove', exact: true }).click();
  await expect(thread.getByTestId('markup-reply')).toHaveCount(0);
  expect((await (await client.request.get(`/api/layouts/${layout.id}/comments`)).json()).threads[0]).toMatchObject({ replies: [], editedAt: expect.any(String) });

  // The client approves revision A: the dialog says it is final.
  await client.getByRole('link', { name: 'Revisions' }).click();
  await expect(client).toHaveURL(/\/revisions$/);
  await client.getByRole('button', { name: 'Approve revision A' }).click();
  const dialog = client.getByTestId('approve-dialog');
  await expect(dialog).toContainText('cannot be changed afterwards');
  await dialog.getByRole('button', { name: 'Approve revision A' }).click();
  const revA = client.getByTestId('revision').filter({ hasText: 'Revision A' });
  await expect(revA).toHaveAttribute('data-state', 'approved');
  await expect(revA).toContainText('Approved by Sam Okafor');
  await expect(client.getByRole('button', { name: 'Approve revision A' })).toHaveCount(0);
  await keepScreenshot(client, 'sharing-client-approved');

  // The designer sees the approval, the state in the layouts table and the open mark-up count.
  await designer.goto(`/layouts/${layout.id}/revisions`);
  await expect(designer.getByTestId('revision').filter({ hasText: 'Revision A' })).toContainText('Approved by Sam Okafor');
  await keepScreenshot(designer, 'sharing-designer-sees-approval');
  await designer.goto('/layouts');
  const row = designer.getByRole('row', { name: new RegExp(LAYOUT) });
  await expect(row).toContainText('Approved');
  await expect(row.getByRole('link', { name: '1 open mark-ups' })).toBeVisible();
  await keepScreenshot(designer, 'sharing-layouts-table-state');
  // …and the mail about it reached the designer who issued the revision.
  const approvalMail = await latestMailTo(owner, 'ivo@saltmarsh.test', /approved revision A/);
  expect(approvalMail.mail.subject).toBe(`Sam Okafor approved revision A of ${LAYOUT}`);

  // The designer settles the mark-up and answers it with revision B (the bed 50 mm longer) and compares A with B.
  await designer.goto(`/layouts/${layout.id}?markup=${threads.threads[0].id}`);
  await waitForPlan(designer);
  const designerThread = designer.getByTestId('markup-thread').filter({ hasText: 'Could the bed be 50 mm longer?' });
  await designerThread.getByRole('button', { name: 'Mark settled' }).click();
  await expect(designerThread).toHaveAttribute('data-settled', 'yes');
  await expect(designerThread).toContainText('Settled');
  await expect(designer.getByTestId('markups-panel')).toContainText('0 open');
  await keepScreenshot(designer, 'sharing-designer-markup-settled');
  const before = await (await designer.request.get(`/api/layouts/${layout.id}`)).json();
  const next = structuredClone(before.doc);
  const bed = next.modules.find((m: { kind: string }) => m.kind === 'bed-platform');
  bed.length += 50;
  bed.x -= 50;
  expect((await designer.request.put(`/api/layouts/${layout.id}`, { headers: { 'if-match': String(before.version) }, data: { doc: next } })).status()).toBe(200);
  await designer.goto(`/layouts/${layout.id}/revisions`);
  await designer.getByLabel('Note for the client').fill('Bed 50 mm longer, as asked.');
  await designer.getByRole('button', { name: 'Issue revision B' }).click();
  await expect(designer.getByTestId('revision').filter({ hasText: 'Revision B' })).toHaveAttribute('data-state', 'sent');
  await designer.getByRole('link', { name: 'Compare with A' }).click();
  await expect(designer).toHaveURL(/compare\?from=A&to=B/);
  await expect(designer.getByTestId('module-changes')).toContainText('Moved and resized');
  await expect(designer.getByTestId('module-changes')).toContainText('50 mm forwards');
  await expect(designer.getByTestId('module-changes')).not.toContainText(/massKg|props|cabSeats/);
  // A revision cloud round the bed on the later plan only, with a delta triangle carrying B.
  const plans = designer.getByTestId('compare-plans');
  await expect(plans.locator(`[data-side="to"] [data-cloud="${bed.id}"]`)).toHaveCount(1);
  await expect(plans.locator(`[data-side="from"] [data-cloud]`)).toHaveCount(0);
  await expect(plans.locator(`[data-side="to"] [data-cloud="${bed.id}"] text`)).toHaveText('B');
  await expect(plans.locator(`[data-side="to"] [data-phantom="${bed.id}"]`)).toHaveCount(1);
  const table = designer.getByTestId('revision-table');
  await expect(table.locator('tr[data-letter="A"]')).toContainText('Ivo Brandt');
  await expect(table.locator('tr[data-letter="B"]')).toContainText('Bed 50 mm longer, as asked.');
  await keepScreenshot(designer, 'sharing-compare-a-b-clouds');

  // The client returns revision B for changes, in their own words; the designer reads them.
  await client.goto(`/layouts/${layout.id}/revisions`);
  const revB = client.getByTestId('revision').filter({ hasText: 'Revision B' });
  await expect(revB).toContainText('Issued for approval');
  await revB.getByRole('button', { name: 'Return for changes' }).click();
  await revB.getByLabel('What should the workshop change?').fill('Keep the longer bed, but move the fridge nearer the door.');
  await revB.getByRole('button', { name: 'Return revision B for changes' }).click();
  await expect(revB).toHaveAttribute('data-state', 'changes-asked');
  await expect(revB).toContainText('Returned for changes by Sam Okafor');
  await expect(revB).toContainText('move the fridge nearer the door');
  await keepScreenshot(client, 'sharing-client-returned-for-changes');
  const returnedMail = await latestMailTo(owner, 'ivo@saltmarsh.test', /returned revision B/);
  expect(returnedMail.mail.subject).toBe(`Sam Okafor returned revision B of ${LAYOUT} for changes`);
  await designer.goto('/layouts');
  await expect(designer.getByRole('row', { name: new RegExp(LAYOUT) })).toContainText('Returned for changes');

  // Withdrawing the viewer link: the open viewer says so within seconds, and so does a fresh visit.
  await designer.goto(`/layouts/${layout.id}`);
  await waitForPlan(designer);
  await designer.getByRole('button', { name: 'Share', exact: true }).click();
  const links = designer.getByTestId('links-table');
  await expect(links).toContainText('Preliminary (live)');
  await links.getByRole('button', { name: /Withdraw/ }).first().click();
  await expect(links).toContainText('Withdrawn');
  await expect(visitor.getByTestId('viewer-gone')).toHaveAttribute('data-status', 'revoked', { timeout: 5_000 });
  await visitor.goto(viewerUrl);
  await expect(visitor.getByRole('heading', { name: 'This link was withdrawn' })).toBeVisible();
  await keepScreenshot(visitor, 'sharing-viewer-withdrawn');
});
