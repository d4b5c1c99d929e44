// The app works under its Content-Security-Policy (no violations in the console), sends the
// security headers, and sets the session cookie HttpOnly and SameSite=Lax.
import { expect, test } from '@playwright/test';
import { signIn, signInWithForm } from './helpers';

test('pages load with no CSP violation and carry the security headers', async ({ page, context }) => {
  const violations: string[] = [];
  page.on('console', (m) => {
    if (/Content Security Policy|Refused to (load|execute|apply|connect)/i.test(m.text())) violations.push(m.text());
  });
  const res = await page.goto('/');
  const headers = res!.headers();
  expect(headers['content-security-policy']).toMatch(/script-src 'self' 'nonce-[^']+' 'strict-dynamic'/);
  expect(headers['content-security-policy']).toContain("frame-ancestors 'none'");
  expect(headers['x-content-type-options']).toBe('nosniff');
  expect(headers['referrer-policy']).toBe('strict-origin-when-cross-origin');

  await signInWithForm(page, 'ivo@saltmarsh.test');
  const cookie = (await context.cookies()).find((c) => c.name === 'authjs.session-token');
  expect(cookie?.httpOnly).toBe(true);
  expect(cookie?.sameSite).toBe('Lax');
  // 12 h at most (OWASP ASVS 4.0 §3.3: idle and absolute session limits).
  expect(cookie!.expires * 1000 - Date.now()).toBeLessThanOrEqual(12 * 3600 * 1000 + 60_000);

  await page.getByRole('link', { name: 'Nair — L2H2 weekender' }).first().click();
  await page.waitForURL(/\/layouts\/[0-9a-f-]{36}$/);
  await page.locator('canvas').first().waitFor();
  await page.goto('/settings');
  await expect(page.getByRole('heading', { name: 'Members' })).toBeVisible();
  expect(violations).toEqual([]);
});

test('error bodies carry no stack traces or SQL', async ({ request }) => {
  const res = await request.post('/api/sign-up', { data: '{"broken', headers: { 'content-type': 'application/json' } });
  expect(res.status()).toBe(400);
  const text = await res.text();
  expect(text).not.toMatch(/\n\s+at |node_modules|SELECT|ZodError/);
});

test('sign-out ends the session for every copy of the cookie', async ({ page, context, request }) => {
  await signIn(page, 'maren@saltmarsh.test');
  const cookies = await context.cookies();
  const header = cookies.map((c) => `${c.name}=${c.value}`).join('; ');
  expect((await request.get('/api/layouts', { headers: { cookie: header } })).status()).toBe(200);
  await page.getByRole('button', { name: 'Sign out' }).click();
  await expect(page).toHaveURL(/\/$/);
  // The old cookie, replayed after sign-out, no longer opens anything.
  expect((await request.get('/api/layouts', { headers: { cookie: header } })).status()).toBe(401);
});
