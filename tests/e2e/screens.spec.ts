// Every screen, photographed for review: the editor in each arrangement, the Checks list (with a
// source opened), the build plan's tabs, the plan sheet, the viewer link, the quote and a mail in
// the outbox. Each screenshot is kept in artifacts/screenshots/screen-*.png; the test also reads
// the words on the way, so a screen that lost its status words or showed a rule id fails here.
import { expect, test, type Browser, type Page } from '@playwright/test';
import { keepScreenshot, signIn } from './helpers';

const stamp = Date.now().toString(36);
const LAYOUT = `Nair — L2H2 weekender ${stamp}`;

async function signedIn(browser: Browser, email: string): Promise<Page> {
  const page = await (await browser.newContext()).newPage();
  await signIn(page, email, { open: null }); // each test opens its own page first
  return page;
}

const RULE_ID = /\b(fit|walkway|headroom|sleep|travel|egress|mass|power|water|gas|heat)\.[a-z][a-z-]+[a-z]\b/;
const OLD_STATUS = /\b(PASS|WARN|FAIL|Pass|Warn|Fail)\b/;

test('every screen, in the studio’s words', async ({ browser }) => {
  test.setTimeout(300_000);
  const designer = await signedIn(browser, 'ivo@saltmarsh.test');
  const members = await (await designer.request.get('/api/studio/members')).json();
  const priya = members.members.find((m: { email?: string }) => m.email === 'priya@client.test');
  const created = await designer.request.post('/api/layouts', { data: { name: LAYOUT, starterId: 'starter-l-lounge', clientId: priya.userId } });
  expect(created.status()).toBe(201);
  const layoutId: string = (await created.json()).id;

  // The editor in each arrangement, with the Checks list along the bottom.
  await designer.goto(`/layouts/${layoutId}`);
  await expect(designer.getByTestId('plan').locator('canvas').first()).toBeVisible({ timeout: 30_000 });
  const checks = designer.getByTestId('checks-panel');
  await expect(designer.getByTestId('checks-status')).toContainText('up to date', { timeout: 30_000 });
  for (const arrangement of ['travel', 'lounge', 'sleep'] as const) {
    await designer.getByTestId(`arrangement-${arrangement}`).click();
    await expect(designer.getByTestId(`arrangement-${arrangement}`)).toHaveAttribute('aria-checked', 'true');
    await keepScreenshot(designer, `screen-editor-${arrangement}`);
  }

  // The Checks list: status as icon and word, the rule by name, the source behind a disclosure.
  await designer.getByLabel('show what meets').check();
  const text = await checks.innerText();
  expect(text).toMatch(/Meets|Needs attention|Does not meet/);
  expect(text).not.toMatch(RULE_ID);
  expect(text).not.toMatch(OLD_STATUS);
  const firstSource = checks.locator('details').first();
  await expect(firstSource.locator('p')).toBeHidden();
  await firstSource.locator('summary').click();
  await expect(firstSource.locator('p')).toBeVisible();
  await checks.screenshot({ path: 'artifacts/screenshots/screen-checks.png' });

  // The build plan, tab by tab.
  await designer.goto(`/layouts/${layoutId}/build`);
  await expect(designer.locator('[data-testid=build-planner][data-hydrated=true]')).toBeVisible({ timeout: 30_000 });
  for (const tab of ['weight', 'power', 'water', 'gas', 'heat', 'parts', 'cut', 'quote']) {
    await designer.locator(`[role=tab][data-tab=${tab}]`).click();
    await expect(designer.locator(`[role=tab][data-tab=${tab}]`)).toHaveAttribute('aria-selected', 'true');
    // Each tab's panel loads on demand: photograph it once it has drawn, not its loading line.
    const panel = designer.getByTestId('build-planner').getByRole('tabpanel');
    await expect(panel).not.toContainText('Loading…', { timeout: 30_000 });
    await keepScreenshot(designer, `screen-build-${tab}`);
  }
  const planText = await designer.getByTestId('build-planner').innerText();
  expect(planText).not.toMatch(RULE_ID);
  expect(planText).not.toMatch(/PVWatts|PVGIS|pvlib/);

  // The plan sheet (HTML view of the same drawing as the PDF).
  await designer.goto(`/layouts/${layoutId}/sheet`);
  await expect(designer.locator('svg').first()).toBeVisible({ timeout: 30_000 });
  await keepScreenshot(designer, 'screen-sheet');
  const sheetText = await designer.locator('main').innerText();
  expect(sheetText).not.toMatch(/\b(PASS|WARN|FAIL|NOT KNOWN)\b/);

  // A viewer link, as the client's visitor sees it.
  await designer.goto(`/layouts/${layoutId}`);
  await expect(designer.getByTestId('plan').locator('canvas').first()).toBeVisible({ timeout: 30_000 });
  await designer.getByRole('button', { name: 'Share', exact: true }).click();
  await designer.getByRole('button', { name: 'Make a viewer link' }).click();
  const viewerUrl = await designer.getByTestId('new-viewer-link').inputValue();
  const visitor = await (await browser.newContext()).newPage();
  await visitor.goto(viewerUrl);
  await expect(visitor.getByTestId('viewer')).toBeVisible({ timeout: 30_000 });
  await expect(visitor.getByTestId('plan').locator('canvas').first()).toBeVisible({ timeout: 30_000 });
  await keepScreenshot(visitor, 'screen-viewer');

  // The quote page (the deposit run's paid quote when that spec ran first, else this layout's).
  const layouts = await (await designer.request.get('/api/layouts')).json();
  const list: { id: string; name: string }[] = Array.isArray(layouts) ? layouts : (layouts.layouts ?? []);
  const quoted = list.find((l) => l.name.startsWith('Nair — deposit run'))?.id ?? layoutId;
  await designer.goto(`/layouts/${quoted}/quote`);
  await expect(designer.locator('main')).toBeVisible();
  await keepScreenshot(designer, 'screen-quote');

  // A mail in the development outbox.
  const owner = await signedIn(browser, 'maren@saltmarsh.test');
  await owner.goto('/outbox');
  await keepScreenshot(owner, 'screen-outbox');
  const firstMail = owner.locator('[data-mail-id]').first();
  if (await firstMail.count()) {
    await owner.goto(`/outbox/${await firstMail.getAttribute('data-mail-id')}`);
    await keepScreenshot(owner, 'screen-outbox-mail');
  }
});
