// A designer signs in, creates a layout from a bay template, finds it in the table and opens it.
import { expect, test } from '@playwright/test';
import { keepScreenshot, signIn, signInWithForm } from './helpers';

test('the demo designer creates a layout from a template and opens it from the table', async ({ page }) => {
  await signInWithForm(page, 'ivo@saltmarsh.test');
  await expect(page.getByRole('link', { name: 'Nair — L2H2 weekender', exact: true })).toBeVisible();
  await keepScreenshot(page, 'layouts-table');

  await page.getByRole('link', { name: 'New layout' }).click();
  await page.getByLabel('Layout name').fill('Holt — L3H3 family van');
  await page.getByLabel('Bay size class').selectOption('l3h3');
  await page.getByRole('button', { name: 'Create layout' }).click();
  await expect(page).toHaveURL(/\/layouts\/[0-9a-f-]{36}$/);
  await keepScreenshot(page, 'new-layout-opened');

  await page.getByRole('link', { name: 'Layouts' }).click();
  await page.getByPlaceholder('Filter by name, client or bay…').fill('family');
  const row = page.getByRole('row', { name: /Holt — L3H3 family van/ });
  await expect(row).toContainText('L3H3');
  await expect(page.getByRole('link', { name: 'Nair — L2H2 weekender' })).toHaveCount(0);
  await row.getByRole('link', { name: 'Holt — L3H3 family van', exact: true }).click();
  await expect(page).toHaveURL(/\/layouts\/[0-9a-f-]{36}$/);
});

test('a wrong password is refused with a clear message', async ({ page }) => {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill('tom@client.test');
  await page.getByLabel('Password').fill('not-the-password');
  await page.getByRole('button', { name: 'Sign in' }).click();
  // Next's own route announcer is an alert too: find ours by its words.
  await expect(page.getByRole('alert').filter({ hasText: 'do not match' })).toBeVisible();
});

test('a client sees only the layout shared with them and cannot create one', async ({ page }) => {
  await signIn(page, 'priya@client.test');
  await expect(page.getByRole('link', { name: 'Nair — L2H2 weekender', exact: true })).toBeVisible();
  await expect(page.getByRole('link', { name: 'Adeyemi — L3H2 touring' })).toHaveCount(0);
  await expect(page.getByRole('link', { name: 'New layout' })).toHaveCount(0);
  await keepScreenshot(page, 'client-layouts');
});

test('a new self-builder signs up and lands on an empty layouts list', async ({ page }) => {
  await page.goto('/sign-up');
  await page.getByLabel('Your name').fill('Sam Okafor');
  await page.getByLabel('E-mail').fill(`sam-${Date.now()}@selfbuild.test`);
  await page.getByLabel('Password').fill('a-long-enough-password');
  await page.getByRole('button', { name: 'Create account' }).click();
  await expect(page).toHaveURL(/\/layouts$/);
  await expect(page.getByText('No layouts yet')).toBeVisible();
});
