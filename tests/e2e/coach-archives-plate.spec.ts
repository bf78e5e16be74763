import { expect, test } from '@playwright/test';
import { SHOTS, expectNoSeriousA11yViolations, signIn } from './support';

test('the coach retires a plate the demo week plans: archived, off the board’s pickers, kept on its cells, then restored', async ({ page }) => {
  const plate = 'Sausage-cheddar plate with avocado';
  await signIn(page, 'coach@trayline.test');
  const weeks = (await (await page.request.get('/api/weeks')).json()) as { id: number; name: string }[];
  const weekId = weeks.find((w) => w.name === 'Demo week')!.id;

  // Delete asks first; a plate on a board is archived instead, and the page says where it is planned.
  await page.goto('/plates');
  page.once('dialog', (d) => void d.accept());
  await page.getByRole('button', { name: `Delete ${plate}` }).click();
  // The page's own status line (the frame's offline line is a status region too, empty while online).
  const said = page.getByRole('main').getByRole('status').filter({ hasText: /\S/ });
  await expect(said).toContainText(`“${plate}” is planned for`);
  await expect(said).toContainText('so it was archived instead');
  await expect(page.getByRole('heading', { name: plate })).toHaveCount(0);

  // The board: its cells still show the plate, marked archived; the palette no longer offers it.
  await page.goto(`/weeks/${weekId}`);
  await expect(page.getByRole('button', { name: new RegExp(`: ${plate} \\(archived\\)`) }).first()).toBeVisible();
  await expect(page.getByRole('complementary', { name: 'Plates' }).getByText(plate)).toHaveCount(0);

  // Restored from the archived list, by keyboard.
  await page.goto('/plates');
  await page.getByLabel('Show').selectOption('archived');
  await expect(page.getByRole('heading', { name: plate })).toContainText('Archived');
  await expectNoSeriousA11yViolations(page, 'archived plates');
  await page.screenshot({ path: `${SHOTS}/coach-archived-plates.png` });
  await page.getByRole('button', { name: `Restore ${plate}` }).focus();
  await page.keyboard.press('Enter');
  await expect(said).toHaveText(`Restored “${plate}”: it is back in the list and the board’s pickers.`);
  await page.goto(`/weeks/${weekId}`);
  await expect(page.getByRole('complementary', { name: 'Plates' }).getByText(plate)).toBeVisible();
});
