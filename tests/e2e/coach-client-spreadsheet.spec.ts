import fs from 'node:fs';
import Papa from 'papaparse';
import { expect, test } from '@playwright/test';
import { expectNoSeriousA11yViolations, SHOTS, unique } from './support';

test.use({ viewport: { width: 1366, height: 900 }, acceptDownloads: true });

test('a new coach brings their clients from a spreadsheet: the template, a mistake listed by line, every client at once, then their invitations', async ({ page }, info) => {
  // A workspace of its own: the demo's clients stay as the other journeys know them.
  await page.goto('/register');
  await page.getByLabel('Your name').fill('Rae Example');
  await page.getByLabel('Business name').fill('Example Low-Carb Kitchen');
  await page.getByLabel('E-mail').fill(`${unique('rae').replace(' ', '.')}@example.test`);
  await page.getByLabel('Password', { exact: true }).fill('a-long-password-1');
  await page.getByRole('button', { name: 'Open workspace' }).click();
  await expect(page.getByRole('heading', { name: 'First steps' })).toBeVisible();

  await page.goto('/clients');
  await expect(page.getByText('or bring your list of clients from a spreadsheet below')).toBeVisible();
  const download = page.waitForEvent('download');
  await page.getByRole('link', { name: 'Download a template' }).click();
  const template = Papa.parse<Record<string, string>>(fs.readFileSync((await (await download).path())!, 'utf8'), { header: true, skipEmptyLines: true });
  const columns = template.meta.fields!;
  expect(columns).toContain('protein_g_per_lb'); // a new account works in US measures
  // The coach's own clients in place of the examples (one height mistyped as feet with a decimal point).
  const rows = [
    { name: 'Demo client Mara', email: 'mara@example.test', sex: 'female', age: '40', height: '5.5', weight: '143 lb', activity: 'light', goal: 'maintain', allergens: 'tree nuts' },
    { name: 'Demo client Otis', sex: 'male', age: '52', height: '5 ft 11 in', weight: '210', activity: 'moderate', goal: 'lose', dislikes: 'olives; mushrooms' },
    { name: 'Demo client Pia', sex: 'female', age: '29', height: '168 cm', weight: '61 kg', activity: 'active', goal: 'gain', target_kcal: '2300', target_net_carbs_g: '30', target_protein_g: '110', target_fat_g: '180' },
  ];
  const file = (name: string) => {
    const path = info.outputPath(name);
    fs.writeFileSync(path, Papa.unparse(rows, { columns, newline: '\r\n' }));
    return path;
  };

  const chooser = page.getByLabel('CSV file');
  await chooser.setInputFiles(file('clients.csv'));
  await page.getByRole('button', { name: 'Import clients' }).click();
  await expect(page.getByRole('alert')).toContainText('The file was not imported: 1 problem');
  await expect(page.getByRole('cell', { name: /"5.5" would be 5.5 inches: write 5 ft 7 in/ })).toBeVisible();
  await expect(page.getByRole('link', { name: 'Demo client Otis' })).toHaveCount(0);

  rows[0].height = `5' 5"`;
  await chooser.setInputFiles(file('clients-mended.csv'));
  await page.getByRole('button', { name: 'Import clients' }).click();
  await expect(page.getByText('Imported: 3 new clients')).toBeVisible();
  const note = page.getByRole('note').filter({ hasText: 'Added from the file: 3 clients' });
  await expect(note).toContainText('1 of them has an e-mail address. The import sent no invitation');
  await expect(page.getByRole('alert')).toHaveCount(0);
  // The list has them, none invited.
  await expect(page.getByRole('row').filter({ hasText: 'Demo client Pia' })).toContainText('2300');
  await expect(page.getByRole('row').filter({ hasText: 'Demo client Mara' })).toContainText('Not invited');
  await expectNoSeriousA11yViolations(page, 'clients, after an import');
  await page.screenshot({ path: `${SHOTS}/coach-client-import.png`, fullPage: true });

  // Invitations when the coach is ready: one press lists who gets an e-mail; nothing goes before "Send".
  await expect(page.getByText('1 client has an e-mail address and no invitation yet.')).toBeVisible();
  await page.getByRole('button', { name: 'Invite them…' }).click();
  const toSend = page.getByRole('group', { name: 'Invitations to send' });
  await expect(toSend.getByRole('listitem')).toHaveText(['Demo client Mara mara@example.test']);
  await toSend.getByRole('button', { name: 'Send 1 invitation' }).click();
  await expect(page.getByRole('note').filter({ hasText: 'Invited: 1 client' })).toContainText('follow them in the outbox');
  await expect(page.getByRole('row').filter({ hasText: 'Demo client Mara' })).toContainText('Invited');
  await expect(page.getByText('no invitation yet')).toHaveCount(0);
  await page.screenshot({ path: `${SHOTS}/coach-client-invite-all.png`, fullPage: true });

  // A copy to keep: the three clients, measures with their units.
  const copy = page.waitForEvent('download');
  await page.getByRole('link', { name: 'Download my clients (CSV)' }).click();
  const kept = Papa.parse<Record<string, string>>(fs.readFileSync((await (await copy).path())!, 'utf8'), { header: true, skipEmptyLines: true }).data;
  expect(kept.map((r) => [r.name, r.height])).toEqual([
    ['Demo client Mara', '165.1 cm'],
    ['Demo client Otis', '180.34 cm'],
    ['Demo client Pia', '168 cm'],
  ]);

  // A profile from the file reads as one typed in the form: 5 ft 5 in and 143 lb shown back in US measures.
  await note.getByRole('link', { name: 'Demo client Mara' }).click();
  await expect(page.getByRole('heading', { name: 'Demo client Mara' })).toBeVisible();
  await expect(page.getByLabel('Weight (lb)')).toHaveValue('143');
});
