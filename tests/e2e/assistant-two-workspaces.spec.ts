import { expect, test } from '@playwright/test';
import { DEMO_PASSWORD, SHOTS, expectNoSeriousA11yViolations, signIn, unique } from './support';

test.use({ viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true });

test('a kitchen assistant who works for two coaches picks the workspace on a phone', async ({ page, browser }) => {
  // A second (invented) business registers and invites the demo's assistant, who joins with their own password.
  const other = await browser.newContext();
  const business = unique('Birch Lane Meals (demo)');
  const csrf = { 'x-trayline-csrf': '1' };
  const email = `${unique('owner').replace(/\W+/g, '-')}@example.test`;
  await other.request.post('/api/auth/register', { headers: csrf, data: { name: 'Sol Varga', email, password: 'birch-lane-password', businessName: business } });
  const inv = await (await other.request.post('/api/invitations', { headers: csrf, data: { email: 'assistant@trayline.test', role: 'assistant' } })).json();
  const token = String(inv.link).split('/invite/')[1];
  const joined = await other.request.post(`/api/invitations/${token}/accept`, { headers: csrf, data: { name: 'ignored', password: DEMO_PASSWORD } });
  expect(joined.ok()).toBe(true);
  await other.close();

  // Signed in, they work where they joined last; the menu offers the demo's workspace too.
  await signIn(page, 'assistant@trayline.test');
  await expect(page.getByRole('heading', { name: 'Hello, Kit' })).toBeVisible();
  await expect(page.getByText('Demo week')).toHaveCount(0);
  expect((await (await page.request.get('/api/auth/me')).json()).workspaceName).toBe(business);
  await page.getByRole('button', { name: 'Menu' }).click();
  const choice = page.getByLabel('Workspace').filter({ visible: true });
  await expect(choice.locator('option:checked')).toHaveText(`${business} (kitchen assistant)`);
  await expectNoSeriousA11yViolations(page, 'menu with the workspace choice');
  await page.screenshot({ path: `${SHOTS}/assistant-two-workspaces.png` });

  // By keyboard to the demo's (listed by name, it comes after "Birch Lane…"): the app starts again at home there.
  await choice.focus();
  await Promise.all([page.waitForEvent('load'), page.keyboard.press('ArrowDown')]);
  // (The demo's week, whatever the day: the next prep day may be past late in the week.)
  await expect(page.getByText('Demo week')).toBeVisible();
  expect((await (await page.request.get('/api/auth/me')).json()).workspaceName).toBe('Oat & Ember Prep (demo)');
  // Remembered: the next sign-in works in the demo's workspace again (the journeys after this one expect it).
  await page.context().clearCookies();
  await signIn(page, 'assistant@trayline.test');
  expect((await (await page.request.get('/api/auth/me')).json()).workspaceName).toBe('Oat & Ember Prep (demo)');
});
