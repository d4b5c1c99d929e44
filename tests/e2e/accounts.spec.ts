// A person's own password, end to end in Chromium: "Forgot your password?" on the sign-in page
// mails a link through the development mail server (the same answer for an unknown address);
// the link sets a new password, signs the person in and ends their other session; then
// Settings → Your password changes it again. Screenshots kept as artifacts.
import { expect, test, type Page } from '@playwright/test';
import { simpleParser } from 'mailparser';
import { keepScreenshot, signInWithForm } from './helpers';

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

test('forgot password → mail → new password → change it in Settings', async ({ browser, baseURL }) => {
  test.setTimeout(180_000);
  const reader = await (await browser.newContext()).newPage();
  const made = await reader.request.post('/api/sign-up', { data: { name: 'Rowan Pike', email: EMAIL, password: FIRST } });
  expect(made.status()).toBe(201);
  await signInWithForm(reader, EMAIL, FIRST);

  // Asking for a link: the same words for an unknown address and a known one.
  const asker = await (await browser.newContext()).newPage();
  await asker.goto('/sign-in');
  await asker.getByRole('link', { name: 'Forgot your password?' }).click();
  await asker.waitForLoadState('networkidle'); // the form must be live before typing into it
  await asker.getByLabel('E-mail').fill(`nobody.${stamp}@selfbuild.test`);
  await asker.getByRole('button', { name: 'Send me a link' }).click();
  const unknownWords = await asker.getByTestId('reset-requested').textContent();
  await asker.goto('/reset-password', { waitUntil: 'networkidle' });
  await asker.getByLabel('E-mail').fill(EMAIL);
  await asker.getByRole('button', { name: 'Send me a link' }).click();
  await expect(asker.getByTestId('reset-requested')).toHaveText(unknownWords!);
  await keepScreenshot(asker, 'accounts-reset-requested');

  const mail = await latestMailTo(reader, EMAIL, /new Baywright password/);
  expect(mail.to && 'value' in mail.to ? mail.to.value.map((a) => a.address) : []).toEqual([EMAIL]);
  expect(mail.text).toContain('within 30 minutes; it works once');
  // Exactly one link: this server's own address, /reset-password/ and a 32-byte token in base64url
  // (43 characters), nothing after it; the HTML part carries the same link. The test server sets
  // no public URL, so the demo answers with the address of the request as Next.js gives it, which
  // names the server's configured host (localhost), never the caller's Host header.
  const links = (mail.text ?? '').match(/https?:\/\/[^\s<>"]+/g) ?? [];
  expect(links).toHaveLength(1);
  const link = new URL(links[0] ?? 'about:blank');
  const served = new URL(baseURL!);
  expect(link.protocol).toBe(served.protocol);
  expect(link.port).toBe(served.port);
  expect(['localhost', '127.0.0.1']).toContain(link.hostname);
  expect(link.pathname).toMatch(/^\/reset-password\/[A-Za-z0-9_-]{43}$/);
  expect(link.search + link.hash).toBe('');
  expect(typeof mail.html === 'string' && mail.html.includes(`href="${link.href}"`)).toBe(true);

  // Following the link as it is in the mail opens the form; a common password is refused with a
  // clear message, then a good one signs the person in.
  await asker.goto(link.href, { waitUntil: 'networkidle' });
  await expect(asker.getByRole('button', { name: 'Set the new password' })).toBeVisible();
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
  await reader.goto(link.href);
  await expect(reader.getByTestId('reset-gone')).toBeVisible();
  // The password the link replaced no longer signs in.
  await reader.goto('/sign-in');
  await reader.getByLabel('E-mail').fill(EMAIL);
  await reader.getByLabel('Password').fill(FIRST);
  await reader.getByRole('button', { name: 'Sign in' }).click();
  await expect(reader.getByRole('alert').filter({ hasText: 'That e-mail and password do not match an account.' })).toBeVisible();
  await expect(reader).toHaveURL(/\/sign-in/);

  // Settings → Your password.
  await asker.goto(new URL('/settings', link.origin).href, { waitUntil: 'networkidle' });
  await asker.getByLabel('Current password').fill(SECOND);
  await asker.getByLabel('New password').fill(THIRD);
  await asker.getByLabel('Repeat it').fill(THIRD);
  await keepScreenshot(asker, 'accounts-change-password');
  await asker.getByRole('button', { name: 'Change password' }).click();
  await expect(asker.getByText('Password changed. You were signed out on every other device.')).toBeVisible({ timeout: 20_000 });
  await asker.goto(new URL('/layouts', link.origin).href);
  await expect(asker).toHaveURL(/\/layouts/);
});
