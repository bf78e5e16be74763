import { expect, test } from '@playwright/test';
import { PDFParse } from 'pdf-parse';
import { signIn, SHOTS } from './support';

test.use({ viewport: { width: 1366, height: 900 } });

// US Letter is 8.5 × 11 in (ANSI/ASME Y14.1); a CSS inch is 96 px (CSS Values and Units Level 3).
const LETTER_PX = { width: 8.5 * 96, height: 11 * 96 };

test('the coach prints a prep day’s labels: one page per sheet, each sheet whole at real size, nothing of the app around them', async ({ page }) => {
  await signIn(page, 'coach@trayline.test');
  await page.goto('/labels');
  await expect(page).toHaveURL(/\/weeks\/\d+\/labels/);
  const summary = (await page.getByText(/^\d+ labels? on \d+ sheets?, prep day/).textContent())!;
  const [, labelCount, sheetCount] = summary.match(/^(\d+) labels? on (\d+) sheets?/)!.map(Number);
  // US Letter, 2 × 5 labels a sheet (shared/domain/label-sheets.ts).
  expect(sheetCount).toBe(Math.ceil(labelCount / 10));
  const titles = await page.locator('.label-page').first().locator(':scope > div > div > div > p:first-child').allTextContents();
  expect(titles.length).toBe(Math.min(labelCount, 10));

  // As printed: the side rail and the page's controls are gone, and each sheet stands at the page's left edge at its
  // full width (not squeezed into the rail's column and cut off on the right).
  await page.emulateMedia({ media: 'print' });
  await expect(page.getByRole('button', { name: 'Print labels' })).toBeHidden();
  await expect(page.getByRole('navigation', { name: 'Main' })).toBeHidden();
  const region = page.getByRole('region', { name: 'Label sheets at real size' });
  const fits = await region.evaluate((el) => ({ client: el.clientWidth, scroll: el.scrollWidth }));
  expect(fits.scroll, 'nothing of a sheet is cut off').toBeLessThanOrEqual(fits.client);
  const sheet = (await page.locator('.label-page').first().boundingBox())!;
  expect(sheet.x).toBeCloseTo(0, 0);
  expect(sheet.width).toBeCloseTo(LETTER_PX.width, 0);
  expect(sheet.height).toBeCloseTo(LETTER_PX.height, 0);
  // The second column's first label starts 0.15625 + 4 + 0.1875 in from the sheet's left edge (label-sheets.ts).
  const second = (await page.locator('.label-page').first().locator(':scope > div').nth(1).boundingBox())!;
  expect(second.x - sheet.x).toBeCloseTo((0.15625 + 4 + 0.1875) * 96, 0);
  await page.screenshot({ path: `${SHOTS}/coach-prints-labels.png` });

  // The printed file: one page per sheet (no blank page after the last), the first sheet's labels on page 1.
  const pdf = await page.pdf({ preferCSSPageSize: true, printBackground: true });
  const parser = new PDFParse({ data: new Uint8Array(pdf) });
  const text = await parser.getText();
  await parser.destroy();
  expect(text.total).toBe(sheetCount);
  const first = text.pages[0].text.replace(/\s+/g, ' ');
  for (const title of titles) expect(first).toContain(title.trim());
  expect(first).not.toContain('Print at actual size');
  expect(first).not.toContain('Bake rules');
  expect(text.pages[text.pages.length - 1].text.trim()).not.toBe('');
});

test('the coach prints a base tray’s recipe card from the editor: the recipe comes first on paper, the editor not at all', async ({ page }) => {
  await signIn(page, 'coach@trayline.test');
  await page.goto('/trays');
  await page.getByRole('link', { name: /egg slab/i }).first().click();
  await expect(page.getByRole('tab', { name: 'Edit', selected: true })).toBeVisible();
  await expect(page.getByRole('heading', { name: 'Portion card' })).toBeVisible();
  const parser = new PDFParse({ data: new Uint8Array(await page.pdf({ format: 'Letter' })) });
  const text = await parser.getText();
  await parser.destroy();
  const first = text.pages[0].text.replace(/\s+/g, ' ');
  expect(first).toContain('Recipe card');
  expect(first).toContain('Ingredients');
  expect(text.text.indexOf('Recipe card')).toBeLessThan(text.text.indexOf('Portion card'));
  expect(text.text).not.toContain('Print recipe card');
});

test('the coach prints a prep day’s run sheet from the bake run: every tray on paper, no timeline cut off at the page edge', async ({ page }) => {
  await signIn(page, 'coach@trayline.test');
  // The demo's published week, read through the API as the coach.
  const weeks = (await (await page.request.get('/api/weeks')).json()) as { id: number; publishedVersion: number | null }[];
  await page.goto(`/weeks/${(weeks.find((w) => w.publishedVersion !== null) ?? weeks[0]).id}/bake-run`);
  await expect(page.getByRole('heading', { level: 1, name: 'Bake run' })).toBeVisible();
  const trays = page.getByRole('region', { name: 'Trays of the run, as a table' });
  await expect(trays).toBeVisible();
  const names = await trays.locator('tbody tr td:first-child').allTextContents();
  expect(names.length).toBeGreaterThan(0);
  const parser = new PDFParse({ data: new Uint8Array(await page.pdf({ format: 'Letter' })) });
  const text = (await parser.getText()).text.replace(/\s+/g, ' ');
  await parser.destroy();
  expect(text).toContain('Run sheet');
  expect(text).not.toContain('Timeline');
  for (const name of names) expect(text).toContain(name);
});
