// Touch input for the browser tests: one- and two-finger strokes through Chromium's DevTools
// protocol (Input.dispatchTouchEvent), which the page receives as pointer events of type "touch",
// as a finger on a tablet gives them. Playwright's own touchscreen only taps.
import type { CDPSession, Page } from '@playwright/test';

type Point = { x: number; y: number };

/** One DevTools session per page: a touch that starts on one session must move and end on it. */
const sessions = new WeakMap<Page, Promise<CDPSession>>();

async function send(page: Page, type: 'touchStart' | 'touchMove' | 'touchEnd', points: Point[]) {
  if (!sessions.has(page)) sessions.set(page, page.context().newCDPSession(page));
  const cdp = await sessions.get(page)!;
  await cdp.send('Input.dispatchTouchEvent', { type, touchPoints: points.map((p, i) => ({ x: p.x, y: p.y, id: i + 1, radiusX: 4, radiusY: 4 })) });
}

/** One finger from `from` to `to` in `steps` moves, lifted at the end. */
export async function touchDrag(page: Page, from: Point, to: Point, steps = 12): Promise<void> {
  await send(page, 'touchStart', [from]);
  for (let i = 1; i <= steps; i++) {
    await send(page, 'touchMove', [{ x: from.x + ((to.x - from.x) * i) / steps, y: from.y + ((to.y - from.y) * i) / steps }]);
  }
  await send(page, 'touchEnd', []);
}

/** One finger held still for `ms`, then lifted. */
export async function touchHold(page: Page, at: Point, ms: number): Promise<void> {
  await send(page, 'touchStart', [at]);
  await page.waitForTimeout(ms);
  await send(page, 'touchEnd', []);
}

/** Two fingers moving apart from `centre` (spread px each side at the start, `to` at the end). */
export async function pinch(page: Page, centre: Point, spread: number, to: number, steps = 10): Promise<void> {
  const at = (d: number) => [{ x: centre.x - d, y: centre.y }, { x: centre.x + d, y: centre.y }];
  await send(page, 'touchStart', at(spread));
  for (let i = 1; i <= steps; i++) await send(page, 'touchMove', at(spread + ((to - spread) * i) / steps));
  await send(page, 'touchEnd', []);
}
