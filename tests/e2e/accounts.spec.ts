// A person's own password, end to end in Chromium: "Forgot your password?" on the sign-in page
// mails a link through the development mail server (the same answer for an unknown address);
// the link sets a new password, signs the person in and ends their other session; then
// Settings → Your password changes it again. Screenshots kept as artifacts.
import { expect, test, type Page } from '@playwright/test';
import { simpleParser } from 'mailparser';
import { keepScreenshot, signIn } from './helpers';

const stamp = Date.now().toString(36);
const EMAIL = `rowan.${stamp}@selfbuild.test`;
const FIRST = 'rowan-first-long-password';
const SECOND = 'rowan-second-long-password';
const THIRD = 'rowan-third-long-password';

/** The owner (here: the person, owner of their own studio) reads the newest mail to `to` from the outbox. */
async function latestMailTo(owner: Page, to: string, subject: RegExp) {
  let id: string | null = null;
  await expect.poll(async () => {
    await owner.goto('/outbox');
    const row = owner.getByRole('row').filter({ hasText: to }).filter({ hasText: subject }).first();
    id = (await row.count()) ? await row.getAttribute('data-mail-id') : null;
    return id;
  }, { timeout: 15_000 }).not.toBeNull();
  const res = await owner.request.get(`/outbox/${id}/raw`);
  return simpleParser(await res.body());
}

test('forgot password → mail → new password → change it in Settings', async ({ browser }) => {
  test.setTimeout(180_000);
  const reader = await (await browser.newContext()).newPage();
  const made = await reader.request.post('/api/sign-up', { data: { name: 'Rowan Pike', email: EMAIL, password: FIRST } });
  expect(made.status()).toBe(201);
  await signIn(reader, EMAIL, FIRST);

  // Asking for a link: the same words for an unknown address and a known one.
  const asker = await (await browser.newContext()).newPage();
  await asker.goto('/sign-in');
  await asker.getByRole('link', { name: 'Forgot your password?' }).click();
  await asker.getByLabel('E-mail').fill(`nobody.${stamp}@selfbuild.test`);
  await asker.getByRole('button', { name: 'Send me a link' }).click();
  const unknownWords = await asker.getByTestId('reset-requested').textContent();
  await asker.goto('/reset-password');
  await asker.getByLabel('E-mail').fill(EMAIL);
  await asker.getByRole('button', { name: 'Send me a link' }).click();
  await expect(asker.getByTestId('reset-requested')).toHaveText(unknownWords!);
  await keepScreenshot(asker, 'accounts-reset-requested');

  const mail = await latestMailTo(reader, EMAIL, /new Baywright password/);
  const link = (mail.text ?? '').match(/https?:\/\/\S+\/reset-password\/[A-Za-z0-9_-]{43}/)?.[0];
  expect(link, 'the reset mail carries a link').toBeTruthy();

  // The link: a common password is refused with a clear message, then a good one signs the person in.
  await asker.goto(new URL(link!).pathname);
  await asker.getByLabel('New password').fill('qwerty123456');
  await asker.getByLabel('Repeat it').fill('qwerty123456');
  await asker.getByRole('button', { name: 'Set the new password' }).click();
  await expect(asker.getByText(/list of common passwords/)).toBeVisible();
  await asker.getByLabel('New password').fill(SECOND);
  await asker.getByLabel('Repeat it').fill(SECOND);
  await asker.getByRole('button', { name: 'Set the new password' }).click();
  await expect(asker).toHaveURL(/\/layouts/, { timeout: 20_000 });

  // The older session has ended; the link works no more.
  await reader.goto('/layouts');
  await expect(reader).toHaveURL(/\/sign-in/);
  await reader.goto(new URL(link!).pathname);
  await expect(reader.getByTestId('reset-gone')).toBeVisible();

  // Settings → Your password.
  await asker.goto('/settings');
  await asker.getByLabel('Current password').fill(SECOND);
  await asker.getByLabel('New password').fill(THIRD);
  await asker.getByLabel('Repeat it').fill(THIRD);
  await keepScreenshot(asker, 'accounts-change-password');
  await asker.getByRole('button', { name: 'Change password' }).click();
  await expect(asker.getByText('Password changed. You were signed out on every other device.')).toBeVisible({ timeout: 20_000 });
  await asker.goto('/layouts');
  await expect(asker).toHaveURL(/\/layouts/);
});
