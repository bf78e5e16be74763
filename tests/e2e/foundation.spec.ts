import { expect, test } from '@playwright/test';
import { signIn, SHOTS } from './support';

test('the SPA loads with our fonts, and an unknown page shows the 404 page', async ({ page }) => {
  await page.goto('/sign-in');
  await expect(page.getByRole('heading', { name: 'Sign in' })).toBeVisible();
  const fontsLoaded = await page.evaluate(async () => {
    await document.fonts.ready;
    return [...document.fonts].filter((f) => f.status === 'loaded').map((f) => f.family.replace(/"/g, ''));
  });
  expect(fontsLoaded).toEqual(expect.arrayContaining(['Atkinson Hyperlegible', 'Fraunces']));
  await page.goto('/no-such-page');
  await expect(page.getByRole('heading', { name: 'Nothing on this tray' })).toBeVisible();
});

test('signed out, a deep link goes to sign-in and comes back after signing in', async ({ page }) => {
  await page.goto('/settings');
  await expect(page).toHaveURL(/\/sign-in\?next=%2Fsettings/);
  await page.getByLabel('E-mail').fill('coach@trayline.test');
  await page.getByLabel('Password').fill('trayline-demo');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page.getByRole('heading', { name: 'Settings' })).toBeVisible();
});

test('navigation follows the role: the assistant has no team page', async ({ page }) => {
  await signIn(page, 'assistant@trayline.test');
  await expect(page.getByRole('link', { name: 'Team' })).toHaveCount(0);
  await page.screenshot({ path: `${SHOTS}/assistant-home.png`, fullPage: true });
  await page.goto('/team');
  await expect(page.getByRole('heading', { name: 'Nothing on this tray' })).toBeVisible();
});
