// Openings beyond the plan, end to end in Chromium: a left-wall window shows in the build plan's
// Cut list as a cut-out of the wall lining panel it crosses; a mark-up is placed at the window from
// the Mark-ups list (no pointer needed) and is listed near it; after revision A the window moves and
// the revision compare lists and marks the move. Screenshots kept as artifacts.
import { expect, test, type Browser, type Page } from '@playwright/test';
import { keepScreenshot, signIn } from './helpers';

const stamp = Date.now().toString(36);
const LAYOUT = `Openings run ${stamp}`;
const WINDOW = { id: 'w-left', type: 'window', wall: 'left', position: 300, sillHeight: 850, width: 800, height: 400, opens: true };

async function signedIn(browser: Browser, email: string): Promise<Page> {
  const page = await (await browser.newContext()).newPage();
  await signIn(page, email, { open: null }); // each test opens its own page first
  return page;
}

async function putOpenings(page: Page, layoutId: string, openings: unknown[]) {
  const cur = await (await page.request.get(`/api/layouts/${layoutId}`)).json();
  const doc = {
    ...cur.doc,
    bay: { ...cur.doc.bay, openings },
    buildUp: { ...cur.doc.buildUp, walls: [{ material: 'Closed-cell foam', thickness: 24 }, { material: 'Plywood lining', thickness: 12 }] },
  };
  const res = await page.request.put(`/api/layouts/${layoutId}`, { data: { doc }, headers: { 'if-match': String(cur.version) } });
  expect(res.status()).toBe(200);
}

test('a window is a cut-out in the cut list, a mark-up can be placed at it, and its move shows in the compare', async ({ browser }) => {
  test.setTimeout(180_000);
  const designer = await signedIn(browser, 'ivo@saltmarsh.test');
  const created = await designer.request.post('/api/layouts', { data: { name: LAYOUT, starterId: 'starter-l-lounge' } });
  expect(created.status()).toBe(201);
  const layoutId: string = (await created.json()).id;
  await putOpenings(designer, layoutId, [WINDOW]);

  // Cut list: the first left-wall lining panel lists the window's cut-out, placed from its edges.
  await designer.goto(`/layouts/${layoutId}/build`);
  await expect(designer.locator('[data-testid=build-planner][data-hydrated=true]')).toBeVisible({ timeout: 30_000 });
  await designer.getByRole('tab', { name: 'Cut list' }).click();
  const lining = designer.getByRole('region', { name: 'Plywood lining 12 mm' });
  await expect(lining).toBeVisible();
  await lining.locator('summary').click();
  await expect(lining.getByRole('columnheader', { name: 'Cut-outs' })).toBeVisible();
  await expect(lining.getByTestId('cut-outs').filter({ hasText: 'Window in the left wall' })).toContainText('Window in the left wall: 800 × 400 mm, 300 mm from the front edge, 850 mm from the bottom edge');
  await expect(lining.locator('[data-cut-out="w-left"]')).toHaveCount(1);
  await keepScreenshot(designer, 'cut-list-lining-cut-outs');

  // Mark-ups: placed at the window from the list.
  await designer.goto(`/layouts/${layoutId}`);
  await designer.getByTestId('toggle-markups').click();
  await designer.getByRole('button', { name: 'Add a mark-up' }).click();
  await designer.getByLabel('Or place it at an opening').selectOption({ label: 'Window in the left wall' });
  await expect(designer.getByTestId('markup-at-opening')).toContainText('Window in the left wall');
  await designer.getByRole('textbox', { name: 'Note', exact: true }).fill('Blind on this window?');
  await designer.getByRole('button', { name: 'Place mark-up' }).click();
  const thread = designer.getByTestId('markup-thread').filter({ hasText: 'Blind on this window?' });
  await expect(thread.getByTestId('markup-near')).toContainText('near Window in the left wall');
  await keepScreenshot(designer, 'markup-at-window');

  // Revision A, then the window 200 mm further back: the compare lists and marks the move.
  const issued = await designer.request.post(`/api/layouts/${layoutId}/revisions`, { data: { note: 'With the window' } });
  expect(issued.status()).toBe(201);
  const letter: string = (await issued.json()).revision.letter;
  await putOpenings(designer, layoutId, [{ ...WINDOW, position: 500 }]);
  await designer.goto(`/layouts/${layoutId}/revisions/compare?from=${letter}&to=current`);
  const changes = designer.getByTestId('opening-changes');
  await expect(changes).toContainText('Moved Window in the left wall', { timeout: 30_000 });
  await expect(changes).toContainText('200 mm rearwards');
  await expect(designer.locator('[data-side=to] [data-cloud="opening:w-left"]')).toHaveCount(1);
  await expect(designer.locator('[data-side=from] [data-opening-id="w-left"]')).toHaveCount(1);
  await keepScreenshot(designer, 'compare-window-moved');
});
