import fs from 'node:fs/promises';
import { expect, test, type Page } from '@playwright/test';
import { expectNoSeriousA11yViolations, signIn, SHOTS } from './support';

// The demo week is seeded from the Monday of the current UTC week through Sunday, with every client's first slot
// planned each day (server/db/seeders/week-demo.ts). The browser runs in UTC too, so "today" is on it, unless this
// run crossed Sunday midnight after the seed: then the phone's clock stays on the demo week's last day.
test.use({ viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true, timezoneId: 'UTC' });

/** Fixes the phone's clock: now when it is in the client's week, else noon on the week's last day (UTC). */
async function clockInTheWeek(page: Page): Promise<Date> {
  const week = (await (await page.request.get('/api/weeks/mine')).json()) as { startDate: string; endDate: string };
  const now = new Date();
  const day = now.toISOString().slice(0, 10);
  const at = day >= week.startDate && day <= week.endDate ? now : new Date(`${week.endDate}T12:00:00Z`);
  await page.clock.setFixedTime(at);
  return at;
}

test("a client on a phone sees today's plate with its macros and eat-by", async ({ page }) => {
  await signIn(page, 'client1@trayline.test');
  await expect(page).toHaveURL(/\/my-plates$/);
  const now = await clockInTheWeek(page);
  await page.reload();
  await expect(page.getByRole('heading', { level: 1, name: "Today's plate" })).toBeVisible();
  const today = now.toLocaleDateString('en-US', { weekday: 'long', day: 'numeric', month: 'short', timeZone: 'UTC' });
  await expect(page.getByText(today, { exact: true })).toBeVisible();

  // The first plate card: its name, the four macros (each a number with its term) and the eat-by (or thaw) note.
  const card = page.locator('main').getByRole('heading', { level: 2 }).first();
  await expect(card).not.toBeEmpty();
  for (const [term, value] of [
    ['kcal', /^\d+$/],
    ['net carbs', /^\d+(\.\d+)? g$/],
    ['protein', /^\d+(\.\d+)? g$/],
    ['fat', /^\d+(\.\d+)? g$/],
  ] as const) {
    const term1 = page.getByRole('term').filter({ hasText: new RegExp(`^${term}$`) }).first();
    await expect(term1).toBeVisible();
    await expect(term1.locator('xpath=preceding-sibling::dd[1]')).toHaveText(value);
  }
  await expect(page.getByText(/^(Eat by|Frozen portion: move it to the fridge on the evening of) /).first()).toBeVisible();
  await expect(page.getByRole('button', { name: /today/ })).toHaveAttribute('aria-current', 'date');

  await expectNoSeriousA11yViolations(page, 'my plates');
  await page.screenshot({ path: `${SHOTS}/client-today.png`, fullPage: true });
});

test('a client sees the evening to move a frozen plate to the fridge, and takes the reminders to their calendar', async ({ page }) => {
  // The demo freezes Dana's Sunday breakfast (server/db/seeders/week-demo.ts): it thaws on Saturday evening.
  await signIn(page, 'client1@trayline.test');
  const evening = page.getByRole('button', { name: /thaw tonight/ }).first();
  await expect(evening).toBeVisible();
  await evening.click();
  await expect(evening).toHaveAttribute('aria-current', 'date');
  const notice = page.getByRole('note').filter({ hasText: /(Tonight|On the evening of .+): move a frozen plate to the fridge/ });
  await expect(notice).toBeVisible();
  await expect(notice).toContainText('never on the counter');

  const download = page.waitForEvent('download');
  await page.getByRole('link', { name: 'Thaw reminders for my calendar' }).click();
  const file = await download;
  expect(file.suggestedFilename()).toMatch(/^thaw-reminders-\d{4}-\d{2}-\d{2}\.ics$/);
  const text = await fs.readFile((await file.path())!, 'utf8');
  expect(text).toMatch(/BEGIN:VEVENT[\s\S]*SUMMARY:Move tomorrow's .+ to the fridge/);
  await expectNoSeriousA11yViolations(page, 'my plates, thaw evening');
});

test('a client finds the day whose plate holds an allergen on their list, and reads what to do', async ({ page }) => {
  // The demo's Priya has milk on her list; her Thursday breakfast, the spinach-feta wrap, holds milk, allowed by the
  // coach with a reason (server/db/seeders/week-demo.ts). The reason stays with the coach.
  await signIn(page, 'client2@trayline.test');
  const marked = page.getByRole('button', { name: /allergen on your list/ });
  await expect(marked).toHaveCount(1);
  await expect(marked).toContainText('Spinach-feta slab wrap');
  await marked.click();
  await expect(marked).toHaveAttribute('aria-current', 'date');
  const note = page.getByRole('note').filter({ hasText: 'Milk is on your allergen list' });
  await expect(note).toBeVisible();
  await expect(note).toContainText('If you have not agreed it with your coach, do not eat it: ask them first.');
  await expect(page.getByText(/Small amount of baked dairy/)).toHaveCount(0);
  await expectNoSeriousA11yViolations(page, 'my plates, an allergen on the list');
  await note.screenshot({ path: `${SHOTS}/client-allergen-note.png` });
});

test.describe('with the service worker', () => {
  test.use({ serviceWorkers: 'allow' });

  test("a client's plates open on the phone without a network, from the plan saved there; signing out forgets it", async ({ page, context }) => {
    await signIn(page, 'client2@trayline.test');
    await expect(page).toHaveURL(/\/my-plates$/);
    const first = page.locator('main').getByRole('heading', { level: 2 }).first();
    await expect(first).not.toBeEmpty();
    const shown = await first.textContent();
    // The app kept for offline use (the service worker keeps the page, then the build's files) and the plan saved.
    // (Polled through evaluate, which waits for the answer: waitForFunction would take the promise itself as "true".)
    const pageKept = () =>
      page.evaluate(async () => {
        await navigator.serviceWorker.ready;
        return (await caches.match('/', { cacheName: 'trayline-page-v1' })) !== undefined;
      });
    await expect.poll(pageKept, { timeout: 20_000 }).toBe(true);
    await page.waitForFunction(() => localStorage.getItem('trayline.kept.answer.my-week') !== null);
    // Their targets, opened once online, are kept too.
    await page.goto('/my-targets');
    await expect(page.getByRole('heading', { level: 1, name: 'My targets' })).toBeVisible();
    await page.waitForFunction(() => localStorage.getItem('trayline.kept.answer.my-targets') !== null);
    await page.goto('/my-plates');
    await expect(first).toHaveText(shown ?? '');

    await context.setOffline(true);
    await page.reload();
    await expect(page.getByText('You are offline.')).toBeVisible();
    await expect(page.getByText('Your plan as saved on this device')).toBeVisible();
    await expect(first).toHaveText(shown ?? '');
    // Files come from the server: not offered offline.
    await expect(page.getByRole('link', { name: /Download my week/ })).toHaveCount(0);
    await expectNoSeriousA11yViolations(page, 'my plates offline');
    await page.screenshot({ path: `${SHOTS}/client-offline.png`, fullPage: true });
    await page.goto('/my-targets');
    await expect(page.getByText('Your targets as saved on this device')).toBeVisible();
    await expect(page.getByText(/^\d+ kcal$/).first()).toBeVisible();
    await page.goto('/my-plates');
    await expect(page.getByText('Your plan as saved on this device')).toBeVisible();

    // Back online: read again from the server, the files offered again.
    await context.setOffline(false);
    await expect(page.getByText('Your plan as saved on this device')).toHaveCount(0);
    await expect(page.getByText('You are offline.')).toHaveCount(0);
    await expect(page.getByRole('link', { name: /Download my week/ }).or(page.getByRole('link', { name: /Download last week/ }))).toBeVisible();

    // Signing out forgets the plan: offline, the phone then only says Trayline opens once back online.
    await page.getByRole('button', { name: 'Menu' }).click();
    await page.getByRole('button', { name: /Sign out/ }).click();
    await expect(page).toHaveURL(/\/sign-in/);
    expect(await page.evaluate(() => localStorage.getItem('trayline.kept.answer.my-week'))).toBeNull();
    await context.setOffline(true);
    await page.goto('/my-plates');
    await expect(page.getByText('Trayline opens once you are back online.')).toBeVisible();
    await expect(page.getByText(shown ?? '')).toHaveCount(0);
    await context.setOffline(false);
  });
});
