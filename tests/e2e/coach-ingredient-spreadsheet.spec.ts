import fs from 'node:fs';
import Papa from 'papaparse';
import { expect, test } from '@playwright/test';
import { expectNoSeriousA11yViolations, signIn, SHOTS } from './support';

test.use({ viewport: { width: 1366, height: 900 }, acceptDownloads: true });

test('the coach downloads their own ingredients, changes a price in a spreadsheet, and imports the file again over them', async ({ page }, info) => {
  await signIn(page, 'coach@trayline.test');
  await page.goto('/ingredients');
  const download = page.waitForEvent('download');
  await page.getByRole('link', { name: 'Download my ingredients (CSV)' }).click();
  const text = fs.readFileSync((await (await download).path())!, 'utf8');
  const parsed = Papa.parse<Record<string, string>>(text, { header: true, skipEmptyLines: true });
  expect(parsed.data.length).toBeGreaterThan(0);
  // The demo's own ingredient, a dollar dearer (what a spreadsheet would save).
  const row = parsed.data.find((r) => r.name === 'House herb salt (demo)')!;
  row.price_cents = String(Number(row.price_cents) + 100);
  const edited = info.outputPath('edited.csv');
  fs.writeFileSync(edited, Papa.unparse(parsed.data, { columns: parsed.meta.fields, newline: '\r\n' }));

  // As it was: a name already in the library is a problem, and the page points to the box.
  const chooser = page.getByLabel('CSV file');
  await chooser.setInputFiles(edited);
  await page.getByRole('button', { name: 'Import' }).click();
  await expect(page.getByRole('alert')).toContainText('tick “Update the ones already in my library” and import again');
  await expect(page.getByRole('cell', { name: 'Your library already has "House herb salt (demo)"' })).toBeVisible();

  // Ticked: the one row that changed is updated, the others are left as they are.
  await page.getByRole('checkbox', { name: 'Update the ones already in my library' }).check();
  await chooser.setInputFiles(edited);
  await page.getByRole('button', { name: 'Import' }).click();
  const others = parsed.data.length - 1;
  await expect(page.getByText(others > 0 ? `Imported: 1 updated, ${others} unchanged` : 'Imported: 1 updated')).toBeVisible();
  await expect(page.getByRole('note').filter({ hasText: 'Updated from the file: 1 ingredient' })).toContainText('House herb salt (demo).');
  await expect(page.getByRole('alert')).toHaveCount(0);
  await expectNoSeriousA11yViolations(page, 'ingredients, after an import that updated');
  await page.screenshot({ path: `${SHOTS}/coach-ingredient-reimport.png` });

  // Its page shows the new price.
  await page.getByLabel('Search by name').fill('House herb salt');
  await page.getByRole('link', { name: 'House herb salt (demo)' }).click();
  await expect(page.getByLabel('Price per package ($)')).toHaveValue((Number(row.price_cents) / 100).toFixed(2));
});
