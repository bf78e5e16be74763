import { expect, test } from '@playwright/test';
import { SHOTS, expectNoSeriousA11yViolations, signIn } from './support';

test('the coach invites a kitchen assistant, sees them among the people with access, makes them a coach, and removes that access', async ({ page, browser }) => {
  const email = `helper-${Date.now().toString(36)}@example.test`;
  await signIn(page, 'coach@trayline.test');
  await page.goto('/team');
  await expect(page.getByRole('heading', { name: 'People with access' })).toBeVisible();
  await page.getByLabel('E-mail').fill(email);
  await page.getByRole('button', { name: 'Invite' }).click();
  const link = await page.getByLabel('Invitation link').inputValue();

  // The assistant joins from the link, in their own browser, on a phone-sized screen.
  const phone = await browser.newContext({ viewport: { width: 393, height: 851 } });
  const helper = await phone.newPage();
  await helper.goto(new URL(link).pathname);
  await helper.getByLabel('Your name').fill('Robin Helper');
  await helper.getByLabel('Choose a password').fill('a-long-kitchen-password');
  await helper.getByRole('button', { name: 'Join' }).click();
  await expect(helper.getByRole('heading', { name: 'Hello, Robin' })).toBeVisible();

  // The coach sees them; the invitation says they joined.
  await page.reload();
  const row = page.getByRole('list', { name: 'People with access' }).getByRole('listitem').filter({ hasText: 'Robin Helper' });
  await expect(row).toContainText('Kitchen assistant');
  const invitation = page.getByRole('row').filter({ hasText: email });
  await expect(invitation).toContainText('Joined');
  await expectNoSeriousA11yViolations(page, 'team');
  await page.screenshot({ path: `${SHOTS}/coach-team.png`, fullPage: true });

  // Made a coach: asked first; at their next step they have the coach's pages (the week at a glance, not the kitchen's).
  await expect(helper.getByRole('heading', { name: 'In the kitchen' })).toBeVisible();
  page.once('dialog', (d) => void d.accept());
  await row.getByRole('button', { name: 'Make Robin Helper a coach' }).click();
  await expect(row.getByRole('button', { name: 'Make Robin Helper a kitchen assistant' })).toBeVisible();
  await helper.reload();
  await expect(helper.getByRole('heading', { name: 'This week at a glance' })).toBeVisible();

  // Removing the access: asked first, then they are signed out at their next step.
  page.once('dialog', (d) => void d.accept());
  await row.getByRole('button', { name: "Remove Robin Helper's access" }).click();
  await expect(row).toHaveCount(0);
  await expect(invitation).toContainText('Joined; access removed since');
  await helper.reload();
  await expect(helper).toHaveURL(/\/sign-in/);
  await helper.getByLabel('E-mail').fill(email);
  await helper.getByLabel('Password').fill('a-long-kitchen-password');
  await helper.getByRole('button', { name: 'Sign in' }).click();
  await expect(helper.getByRole('alert').filter({ hasText: 'no access to a workspace any more' })).toBeVisible();
  await phone.close();
});
