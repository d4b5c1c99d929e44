// Shared steps for the browser tests: signing in as a demo account, keeping screenshots.
import { expect, type Page } from '@playwright/test';
import { DEMO_PASSWORD } from '../../lib/demo-accounts';

export async function signIn(page: Page, email: string, password = DEMO_PASSWORD): Promise<void> {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page).toHaveURL(/\/layouts/);
}

export async function keepScreenshot(page: Page, name: string): Promise<void> {
  await page.screenshot({ path: `artifacts/screenshots/${name}.png`, fullPage: false });
}
