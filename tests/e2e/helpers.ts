// Shared steps for the browser tests: signing in as a demo account, keeping screenshots.
import { expect, type Page } from '@playwright/test';
import { DEMO_PASSWORD } from '../../lib/demo-accounts';

/**
 * Signs in the way the sign-in form does, over Auth.js's own endpoints (its CSRF token, then the
 * credentials), without drawing the form: the page's context gets the session cookie. Then opens
 * `open` — by default the layouts table, where the form lands — or nothing when it is null, for a
 * test that goes elsewhere first. The form itself is driven by `signInWithForm`.
 */
export async function signIn(page: Page, email: string, { password = DEMO_PASSWORD, open = '/layouts' as string | null } = {}): Promise<void> {
  const { csrfToken } = (await (await page.request.get('/api/auth/csrf')).json()) as { csrfToken: string };
  const res = await page.request.post('/api/auth/callback/credentials', { form: { csrfToken, email, password, callbackUrl: '/layouts' }, maxRedirects: 0 });
  const to = res.headers().location ?? '';
  const session = (await page.context().cookies()).find((c) => c.name === 'authjs.session-token');
  // A refusal also answers 302, to the sign-in page with an error in its address.
  expect(res.status() === 302 && !/[?&]error=/.test(to) && session !== undefined, `signing in as ${email} (status ${res.status()}, to ${to || 'nowhere'})`).toBe(true);
  if (open) await page.goto(open);
}

/** Signs in through the sign-in page's form, as a person does; lands on the layouts table. */
export async function signInWithForm(page: Page, email: string, password = DEMO_PASSWORD): Promise<void> {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page).toHaveURL(/\/layouts/);
}

/**
 * Every console error and uncaught page error from now on, to assert empty at the end of a flow:
 * an error thrown in an effect or an event handler leaves no other trace on the page.
 */
export function pageErrors(page: Page): string[] {
  const errors: string[] = [];
  page.on('console', (m) => void (m.type() === 'error' && errors.push(m.text())));
  page.on('pageerror', (e) => void errors.push(e.message));
  return errors;
}

export async function keepScreenshot(page: Page, name: string): Promise<void> {
  await page.screenshot({ path: `artifacts/screenshots/${name}.png`, fullPage: false });
}

/**
 * A layout of the test's own, made through the API from a starter layout or a bay template, then
 * opened in the editor: so no other test's layout changes. Returns its id.
 */
export async function openNewLayout(page: Page, name: string, from: { starterId: string } | { bayTemplateId: string } = { starterId: 'starter-rear-bed' }): Promise<string> {
  const created = await page.request.post('/api/layouts', { data: { name, ...from } });
  expect(created.status(), `creating "${name}"`).toBe(201);
  const { id } = (await created.json()) as { id: string };
  await page.goto(`/layouts/${id}`);
  await expect(page.getByTestId('plan').locator('canvas').first()).toBeVisible({ timeout: 30_000 });
  return id;
}
