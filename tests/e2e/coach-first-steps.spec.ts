import { expect, test } from '@playwright/test';
import { expectNoSeriousA11yViolations, SHOTS } from './support';

test('a new coach opens a workspace: the home lists the first steps, the first leads to a new base tray', async ({ page }) => {
  await page.goto('/register');
  await page.getByLabel('Your name').fill('Noor Example');
  await page.getByLabel('Business name').fill('Example Prep Kitchen');
  await page.getByLabel('E-mail').fill(`noor.${Date.now().toString(36)}@example.test`);
  await page.getByLabel('Password', { exact: true }).fill('a-long-password-1');
  await page.getByRole('button', { name: 'Open workspace' }).click();

  await expect(page.getByRole('heading', { name: 'First steps' })).toBeVisible();
  const bar = page.getByRole('progressbar', { name: 'Steps done' });
  await expect(bar).toHaveAttribute('aria-valuenow', '0');
  await expect(bar).toHaveAttribute('aria-valuemax', '5');
  await expectNoSeriousA11yViolations(page, 'the first steps');
  await page.screenshot({ path: `${SHOTS}/coach-first-steps.png`, fullPage: true });

  // By keyboard, as a coach who tabs through the page: the first step's link is the one to follow.
  const first = page.getByRole('listitem').filter({ hasText: 'Write a base tray' }).getByRole('link', { name: 'New base tray' });
  await first.focus();
  await page.keyboard.press('Enter');
  await expect(page).toHaveURL(/\/trays\/new$/);
});
