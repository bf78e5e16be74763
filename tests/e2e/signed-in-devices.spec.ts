import { expect, test } from '@playwright/test';
import { SHOTS, expectNoSeriousA11yViolations, inviteAssistant, signIn } from './support';

// A fresh kitchen assistant (invited here, so no other journey's sessions are touched) signed in on a phone and a
// laptop: from the laptop's Settings they sign the phone out, then change their password, which signs out the phone
// again; the laptop stays signed in throughout.
test('a person sees the devices signed in as them, signs one out, and a new password signs out the others', async ({ page, browser }) => {
  const password = 'a-long-kitchen-password';
  await signIn(page, 'coach@trayline.test');
  const { email, context: phoneContext, page: phone } = await inviteAssistant(page, browser, {
    name: 'Sam Devices',
    password,
    context: {
      viewport: { width: 393, height: 851 },
      isMobile: true,
      userAgent: 'Mozilla/5.0 (Linux; Android 14; Pixel 7) AppleWebKit/537.36 (KHTML, like Gecko) Chrome/131.0.0.0 Mobile Safari/537.36',
    },
  });

  const laptopContext = await browser.newContext({ viewport: { width: 1280, height: 900 } });
  const laptop = await laptopContext.newPage();
  await signIn(laptop, email, password);
  await laptop.goto('/settings');
  const devices = laptop.getByRole('list', { name: 'Devices signed in as you' }).getByRole('listitem');
  await expect(devices).toHaveCount(2);
  await expect(devices.first()).toContainText('(this device)');
  await expect(devices.nth(1)).toContainText('Chrome on an Android phone');
  await expect(devices.nth(1)).toContainText('active now');
  await expectNoSeriousA11yViolations(laptop, 'settings with two devices');
  await laptop.screenshot({ path: `${SHOTS}/signed-in-devices.png`, fullPage: true });

  // Signing the phone out: at its next step it is on the sign-in page.
  await devices.nth(1).getByRole('button', { name: /^Sign out Chrome on an Android phone/ }).click();
  await expect(devices).toHaveCount(1);
  await expect(laptop.getByText('You are signed in on this device only.')).toBeVisible();
  await phone.reload();
  await expect(phone).toHaveURL(/\/sign-in/);

  // Signed in on the phone again, then a new password on the laptop: the phone is signed out, the laptop is not.
  await signIn(phone, email, password);
  await laptop.reload();
  await expect(devices).toHaveCount(2);
  await laptop.getByLabel('Current password').fill(password);
  await laptop.getByLabel('New password').fill('an-even-longer-kitchen-password');
  await laptop.getByRole('button', { name: 'Change password' }).click();
  await expect(laptop.getByText('Password changed; 1 other device was signed out')).toBeVisible();
  await expect(devices).toHaveCount(1);
  await phone.reload();
  await expect(phone).toHaveURL(/\/sign-in/);
  await laptop.reload();
  await expect(laptop.getByRole('heading', { name: 'Settings' })).toBeVisible();

  await phoneContext.close();
  await laptopContext.close();
});

// A demo client on a shared family computer: signed in without "Keep me signed in", their plates show as usual but
// nothing is kept in the browser's storage for offline use (a kept sign-in on the same browser keeps their plan),
// and the session cookie has no expiry, so the browser drops it when it closes (RFC 6265 §4.1.2.1–2,
// from memory). Their own phone lists that computer as signed in "until its browser closes", and signs it out.
test('signed in without "Keep me signed in": nothing kept for offline use, a cookie that ends with the browser', async ({ browser }) => {
  const email = 'client4@trayline.test';
  const keptNames = (p: import('@playwright/test').Page) =>
    p.evaluate(() => Object.keys(localStorage).filter((k) => k.startsWith('trayline.kept.')));

  // Their phone first, signed in alone (any session an earlier run left is ended).
  const phoneContext = await browser.newContext({ viewport: { width: 393, height: 851 }, isMobile: true });
  const phone = await phoneContext.newPage();
  phone.on('dialog', (d) => void d.accept());
  await signIn(phone, email);
  await phone.goto('/settings');
  const devices = phone.getByRole('list', { name: 'Devices signed in as you' }).getByRole('listitem');
  await expect(devices.first()).toContainText('(this device)');
  const others = phone.getByRole('button', { name: 'Sign out everywhere else' });
  if (await others.isVisible()) await others.click();
  await expect(phone.getByText('You are signed in on this device only.')).toBeVisible();

  const shared = await browser.newContext({ viewport: { width: 1280, height: 900 } });
  const computer = await shared.newPage();
  await signIn(computer, email);
  await expect(computer.getByRole('heading', { level: 1, name: "Today's plate" })).toBeVisible();
  await expect.poll(() => keptNames(computer)).toContain('trayline.kept.answer.my-week');
  await computer.getByRole('button', { name: /Sign out/ }).click();
  await expect(computer).toHaveURL(/\/sign-in/);

  await computer.getByLabel('E-mail').fill(email);
  await computer.getByLabel('Password').fill('trayline-demo');
  const keep = computer.getByRole('checkbox', { name: 'Keep me signed in on this device' });
  await expect(keep).toBeChecked();
  await keep.uncheck();
  const plan = computer.waitForResponse((r) => r.url().includes('/api/weeks/mine') && r.ok());
  await computer.getByRole('button', { name: 'Sign in' }).click();
  await expect(computer.getByRole('heading', { level: 1, name: "Today's plate" })).toBeVisible();
  await plan;
  await expect(computer.getByText('Loading')).toHaveCount(0);
  expect(await keptNames(computer)).toEqual([]);
  const [cookie] = (await shared.cookies()).filter((c) => c.name === 'trayline.sid');
  expect(cookie.expires).toBe(-1); // a session cookie

  await phone.reload();
  await expect(devices).toHaveCount(2);
  await expect(devices.first()).toContainText('(this device)');
  await expect(devices.first()).not.toContainText('until its browser closes');
  await expect(devices.nth(1)).toContainText('until its browser closes');
  await phone.screenshot({ path: `${SHOTS}/signed-in-devices-shared.png`, fullPage: true });

  // Signed out from the phone: at the computer's next step (its targets), the page is hidden behind the "Signed out"
  // dialog, so the next person at it sees none of it.
  await devices.nth(1).getByRole('button', { name: /^Sign out/ }).click();
  await expect(devices).toHaveCount(1);
  await computer.getByRole('link', { name: 'My targets' }).click();
  const dialog = computer.getByRole('dialog', { name: 'Signed out' });
  await expect(dialog).toContainText('hidden until you sign in again');
  await expect(computer.getByRole('link', { name: 'My plates' })).toBeHidden();
  await computer.screenshot({ path: `${SHOTS}/shared-computer-signed-out.png` });

  await phoneContext.close();
  await shared.close();
});
