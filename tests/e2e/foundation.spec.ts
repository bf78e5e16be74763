import { expect, test } from '@playwright/test';
import { expectNoSeriousA11yViolations, signIn, SHOTS } from './support';

test('the SPA loads with our fonts, and an unknown page shows the 404 page', async ({ page }) => {
  await page.goto('/sign-in');
  await expect(page.getByRole('heading', { name: 'Sign in' })).toBeVisible();
  const fontsLoaded = await page.evaluate(async () => {
    await document.fonts.ready;
    return [...document.fonts].filter((f) => f.status === 'loaded').map((f) => f.family.replace(/"/g, ''));
  });
  expect(fontsLoaded).toEqual(expect.arrayContaining(['Atkinson Hyperlegible', 'Fraunces']));
  await expect(page).toHaveTitle('Sign in · Trayline');
  // The home-screen manifest as Chromium reads it (no parse errors), and each icon it names is served as a PNG.
  const cdp = await page.context().newCDPSession(page);
  const manifest = await cdp.send('Page.getAppManifest');
  expect(manifest.errors).toEqual([]);
  const icons = (JSON.parse(manifest.data ?? '{}') as { icons: { src: string }[] }).icons.map((i) => i.src);
  for (const src of [...new Set(icons), '/apple-touch-icon.png']) {
    const res = await page.request.get(src);
    expect(`${src} ${res.status()} ${res.headers()['content-type']}`).toBe(`${src} 200 image/png`);
  }
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

test('signed out in another tab while typing: the page and its typing stay, the coach signs in again there and saves', async ({ page }) => {
  await signIn(page, 'coach@trayline.test');
  await page.getByRole('link', { name: 'Base trays' }).first().click();
  await page.getByRole('link', { name: 'Cream-cheese almond batter slab' }).first().click();
  const method = page.getByLabel('Description and method');
  await method.fill('Whisk the cream cheese smooth before the eggs go in.');
  // Another tab of the same browser signs out.
  const other = await page.context().newPage();
  await other.goto('/settings');
  await other.getByRole('button', { name: /Sign out/ }).first().click();
  await expect(other).toHaveURL(/\/sign-in/);
  await other.close();

  await page.getByRole('button', { name: 'Save changes' }).click();
  const dialog = page.getByRole('dialog', { name: 'Signed out' });
  await expect(dialog).toBeVisible();
  await expect(method).toHaveValue('Whisk the cream cheese smooth before the eggs go in.');
  // The dialog says it; the form keeps no error of its own for the refused save (it would outlive the dialog).
  await expect(page.getByText('Sign in to continue')).toHaveCount(0);
  await expectNoSeriousA11yViolations(page, 'the signed-out dialog over a tray');
  await page.screenshot({ path: `${SHOTS}/session-ended.png` });
  // The keyboard is in the dialog: the password, then Enter.
  await page.keyboard.type('trayline-demo');
  await page.keyboard.press('Enter');
  await expect(dialog).toBeHidden();
  await page.getByRole('button', { name: 'Save changes' }).click();
  await expect(page.getByText('Saved.')).toBeVisible();
  await expect(method).toHaveValue('Whisk the cream cheese smooth before the eggs go in.');
});
