// The plan sheet and reference files in the browser: a designer opens the sheet, downloads the
// PDF (read back: A4 landscape per ISO 216, title block), uploads a photo and sees it listed;
// a scale that does not fit says so; the layout's client sees the files but cannot add any.
import fs from 'node:fs';
import { expect, test, type Page } from '@playwright/test';
import { keepScreenshot, signIn } from './helpers';
import { pngBytes } from '../uploads/fixtures';
import { readPdf } from '../sheet/read-pdf';

async function openSheet(page: Page, layout = 'Nair — L2H2 weekender') {
  const href = await page.getByRole('link', { name: layout, exact: true }).first().getAttribute('href');
  expect(href).toMatch(/^\/layouts\/[0-9a-f-]{36}$/);
  await page.goto(`${href}/sheet`);
  await expect(page.getByRole('heading', { name: 'Plan sheet' })).toBeVisible();
  return href!;
}

const PT = 72 / 25.4; // PDF points per mm (ISO 32000-1 §8.3.2.3: 1/72 inch; 25.4 mm per inch)

/**
 * The texts inside the title block of a PDF page, found by where they stand rather than by the order
 * the file lists them in (the schedule and checks may name the same layout and client): our title
 * block is the 24 mm band along the foot of the frame, which sits 10 mm inside the paper's edge.
 * PDF y runs up from the bottom edge.
 */
function titleBlockTexts(page: { width: number; texts: { str: string; x: number; y: number }[] }) {
  return page.texts.filter((t) => t.y > 10 * PT && t.y < 34 * PT && t.x > 10 * PT && t.x < page.width - 10 * PT);
}

test('a designer opens the plan sheet, downloads the PDF and adds a reference photo', async ({ page }, info) => {
  await signIn(page, 'ivo@saltmarsh.test');
  await openSheet(page);

  const first = page.getByRole('img', { name: /^Sheet 1 of \d+, A4 landscape at 1:20$/ });
  await expect(first).toBeVisible();
  await expect(first).toHaveAttribute('width', '297mm');
  await expect(first).toHaveAttribute('height', '210mm');
  await expect(first.getByText('Saltmarsh Van Works')).toBeVisible();
  await keepScreenshot(page, 'sheet-a4-1-20');

  const [download] = await Promise.all([page.waitForEvent('download'), page.getByTestId('download-pdf').click()]);
  expect(download.suggestedFilename()).toMatch(/plan sheet A4 1-20\.pdf$/);
  const file = info.outputPath('sheet.pdf');
  await download.saveAs(file);
  const bytes = new Uint8Array(fs.readFileSync(file));
  expect(new TextDecoder().decode(bytes.slice(0, 5))).toBe('%PDF-');
  const read = await readPdf(bytes);
  expect(read.pages[0].width).toBeCloseTo(841.89, 1); // 297 mm at 72 pt per 25.4 mm
  expect(read.pages[0].height).toBeCloseTo(595.28, 1);
  // Every page carries the title block: layout over client in one cell, the scale to their right.
  expect(read.pages.length).toBeGreaterThanOrEqual(2);
  for (const [n, pdfPage] of read.pages.entries()) {
    const block = titleBlockTexts(pdfPage);
    const at = (str: string) => block.find((t) => t.str === str);
    const layout = at('Nair — L2H2 weekender');
    const client = at('Priya Nair');
    const scale = at('1:20');
    expect([layout, client, scale].map(Boolean), `page ${n + 1}: layout, client and scale in the title block`).toEqual([true, true, true]);
    expect(Math.abs(layout!.x - client!.x), `page ${n + 1}: client under the layout`).toBeLessThan(1);
    expect(layout!.y).toBeGreaterThan(client!.y);
    expect(scale!.x).toBeGreaterThan(layout!.x + 40 * PT);
    expect(block.map((t) => t.str)).toContain(`${n + 1} of ${read.pages.length} · A4`);
  }

  const list = page.getByRole('list', { name: 'Reference files' });
  await expect(page.getByText(/No reference files yet|Reference files/).first()).toBeVisible();
  await page.getByLabel('Choose a photo or drawing').setInputFiles({ name: 'side door open.png', mimeType: 'image/png', buffer: pngBytes(320, 200, [110, 130, 140]) });
  await expect(list.getByRole('link', { name: 'side door open.png' })).toBeVisible();
  await expect(list).toContainText('Photo');
  await keepScreenshot(page, 'sheet-with-reference-photo');

  // A file that is not what it claims is refused with the server's reason.
  await page.getByLabel('Choose a photo or drawing').setInputFiles({ name: 'notes.png', mimeType: 'image/png', buffer: Buffer.from('not really a picture') });
  await expect(page.getByRole('alert').filter({ hasText: 'not a JPEG, PNG, WebP or PDF' })).toBeVisible();

  // After a reload the photo is still there (stored, not just shown).
  await page.reload();
  await expect(page.getByRole('list', { name: 'Reference files' }).getByRole('link', { name: 'side door open.png' })).toBeVisible();
});

test('the HTML sheet prints true to scale: Chromium’s print of it has A4 pages and a 3100 mm line of 439.37 pt at 1:20', async ({ page }) => {
  await signIn(page, 'ivo@saltmarsh.test');
  await openSheet(page);
  await page.emulateMedia({ media: 'print' });
  const printed = await readPdf(new Uint8Array(await page.pdf({ preferCSSPageSize: true, printBackground: true })));
  const sheets = printed.pages.length;
  expect(sheets).toBeGreaterThanOrEqual(5);
  expect(printed.pages[0].width).toBeCloseTo(841.89, 0);
  expect(printed.pages[0].height).toBeCloseTo(595.28, 0);
  // The print has no app header or controls: the first page starts with the drawing.
  expect(printed.pages[0].text).not.toContain('Back to the editor');
  expect(printed.pages[0].text).toContain('3100 mm');
  const label = printed.pages[0].texts.find((t) => t.str.includes('3100 mm'))!;
  const under = printed.pages[0].segments.filter((sg) => Math.abs(sg.y1 - sg.y2) < 0.05 && sg.y1 < label.y && label.y - sg.y1 < 8 && Math.min(sg.x1, sg.x2) < label.x && Math.max(sg.x1, sg.x2) > label.x);
  expect(under.map((sg) => Math.abs(sg.x2 - sg.x1)).some((len) => Math.abs(len - 439.37) < 0.5)).toBe(true);
});

test('a scale the bay does not fit at says so and offers one that fits', async ({ page }) => {
  await signIn(page, 'ivo@saltmarsh.test');
  await openSheet(page);
  await page.getByLabel('Scale').selectOption('10');
  const alert = page.getByTestId('sheet-does-not-fit');
  await expect(alert).toContainText('does not fit on A4 landscape at 1:10');
  await keepScreenshot(page, 'sheet-does-not-fit');
  await alert.getByRole('link', { name: 'Show it at 1:20 on A4' }).click();
  await expect(page.getByRole('img', { name: /A4 landscape at 1:20$/ }).first()).toBeVisible();
  await page.getByLabel('Paper').selectOption('a3');
  await expect(page.getByRole('img', { name: /^Sheet 1 of \d+, A3 landscape at 1:20$/ })).toHaveAttribute('width', '420mm');
});

test('the layout’s client sees the sheet and the files but cannot add or delete', async ({ page }) => {
  await signIn(page, 'priya@client.test');
  await openSheet(page);
  await expect(page.getByRole('img', { name: /^Sheet 1 of/ })).toBeVisible();
  await expect(page.getByRole('heading', { name: 'Reference files' })).toBeVisible();
  await expect(page.getByLabel('Choose a photo or drawing')).toHaveCount(0);
  await expect(page.getByRole('button', { name: /^Delete / })).toHaveCount(0);
});

test('in the editor: Sheets & files gives a picture with its title strip and the layout file, refuses a bad layout file, and a survey photo is scaled under the plan', async ({ page }, info) => {
  await signIn(page, 'ivo@saltmarsh.test');
  await page.getByRole('link', { name: 'Adeyemi — L3H2 touring' }).first().click();
  await expect(page.getByTestId('plan')).toBeVisible();

  await page.getByRole('button', { name: /^Sheets & files/ }).click();
  const [png] = await Promise.all([page.waitForEvent('download'), page.getByRole('menuitem', { name: /Picture of this view/ }).click()]);
  const pngFile = info.outputPath('plan.png');
  await png.saveAs(pngFile);
  expect([...fs.readFileSync(pngFile).subarray(0, 8)]).toEqual([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
  // The picture is the view (at twice the screen resolution) plus its title strip, 58 px × 2.
  const planBox = (await page.getByTestId('plan').boundingBox())!;
  const picture = fs.readFileSync(pngFile);
  const height = picture.readUInt32BE(20);
  expect(Math.abs(height - (Math.round(planBox.height) * 2 + 116))).toBeLessThanOrEqual(4);

  await page.getByRole('button', { name: /^Sheets & files/ }).click();
  const [json] = await Promise.all([page.waitForEvent('download'), page.getByRole('menuitem', { name: /Layout file/ }).click()]);
  const doc = JSON.parse(fs.readFileSync(await json.path(), 'utf8'));
  expect(doc.schemaVersion).toBe(4);
  expect(doc.name).toBe('Adeyemi — L3H2 touring');

  const bad = { ...doc, bay: { ...doc.bay, length: 3000.5 } };
  await page.getByLabel('Choose a layout file to open as a new layout').setInputFiles({ name: 'bad.json', mimeType: 'application/json', buffer: Buffer.from(JSON.stringify(bad)) });
  const problems = page.getByTestId('import-problems');
  await expect(problems).toContainText('Bay length: must be a whole number of millimetres');
  await problems.getByRole('button', { name: 'Close' }).click();

  await page.getByRole('button', { name: /^Survey photos/ }).click();
  await page.getByLabel('Add a survey photo').setInputFiles({ name: 'floor.png', mimeType: 'image/png', buffer: pngBytes(400, 200, [90, 120, 150]) });
  const dialog = page.getByTestId('scale-photo-dialog');
  const img = dialog.getByTestId('calibrate-image');
  await expect(img).toBeVisible();
  const box = (await img.boundingBox())!;
  await page.mouse.click(box.x + 2, box.y + box.height / 2);
  await page.mouse.click(box.x + box.width - 2, box.y + box.height / 2);
  await dialog.getByLabel('Real distance between the points').fill('3800');
  await dialog.getByRole('button', { name: 'Place under the plan' }).click();
  await expect(page.getByRole('button', { name: /^Survey photos\s*1/ })).toBeVisible();
  await expect(page.getByRole('dialog', { name: 'Survey photos' })).toContainText(/mm\/px/);
  await keepScreenshot(page, 'editor-tracing-photo');

  // A good file imports as a new layout.
  await page.keyboard.press('Escape');
  await page.getByLabel('Choose a layout file to open as a new layout').setInputFiles({ name: 'good.json', mimeType: 'application/json', buffer: Buffer.from(JSON.stringify(doc)) });
  await expect(page.getByRole('heading', { name: 'Adeyemi — L3H2 touring (imported)' })).toBeVisible();
});
