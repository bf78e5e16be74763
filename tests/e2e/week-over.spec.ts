import { devices, expect, test, type Page } from '@playwright/test';
import { expectNoSeriousA11yViolations, signIn, SHOTS } from './support';

// The day after the workspace's last planned week (the demo week, or a week an earlier journey drafted after it):
// nothing covers it. The coach is told so at a glance and plans this week from a copy of the last one (then deletes
// it: the journeys read the demo as seeded); the assistant's home and the client's phone say it in their words.
test.use({ timezoneId: 'UTC' });

/** The first day after every week of the workspace (read as the coach), as YYYY-MM-DD. */
async function dayAfterTheLastWeek(page: Page): Promise<string> {
  const weeks = (await (await page.request.get('/api/weeks')).json()) as { endDate: string }[];
  const last = weeks.map((w) => w.endDate).sort().pop()!;
  return new Date(Date.parse(`${last}T12:00:00Z`) + 86_400_000).toISOString().slice(0, 10);
}

test('once the last week is over: the coach plans this week from a copy of it; the kitchen and the client are told', async ({ page, browser }) => {
  test.setTimeout(90_000);
  await signIn(page, 'coach@trayline.test');
  const day = await dayAfterTheLastWeek(page);
  const noon = new Date(`${day}T12:00:00Z`);
  await page.clock.setFixedTime(noon);

  // Home: nothing planned for this week, and the way to plan it.
  await page.goto('/');
  const notice = page.getByRole('note').or(page.getByRole('alert')).filter({ hasText: 'Nothing planned for this week' });
  await expect(notice).toContainText(/The latest week, .+, ended on .+\. Clients see no plate for today until a week that covers it is published\./);
  await expect(page.getByText(/\d+ warnings?$/)).toHaveCount(0);
  await expectNoSeriousA11yViolations(page, 'home with the last week over');
  await notice.getByRole('link', { name: 'Plan this week from a copy of it' }).click();

  // The new week starts today, in the last week's rhythm, and is prepped today (no prep day gone by is proposed).
  await expect(page.getByLabel('Start from')).not.toHaveValue('');
  await expect(page.getByLabel('First day of the board')).toHaveValue(day);
  await expect(page.getByLabel('Prep day', { exact: true })).toHaveValue(day);
  await page.getByRole('button', { name: 'Copy', exact: true }).click();
  const title = `Week of ${noon.toLocaleDateString('en-US', { weekday: 'short', month: 'short', day: 'numeric', timeZone: 'UTC' })}`;
  await expect(page.getByRole('heading', { level: 1, name: title })).toBeVisible();
  await expect(page.getByText(/^Copied from /)).toBeVisible();

  // At a glance it is this week now; then it is deleted again.
  await page.goto('/');
  await expect(page.getByRole('heading', { name: 'This week at a glance' })).toBeVisible();
  await expect(page.getByRole('link', { name: title })).toBeVisible();
  await page.getByRole('link', { name: title }).click();
  page.once('dialog', (d) => void d.accept());
  await page.getByRole('button', { name: 'Delete week' }).click();
  await expect(page).toHaveURL(/\/weeks$/);
  await expect(page.getByRole('link', { name: title })).toHaveCount(0);

  // The assistant's phone: no prep day planned, the coach has not planned the next week.
  const kitchen = await browser.newContext({ ...devices['Pixel 7'], timezoneId: 'UTC' });
  const assistant = await kitchen.newPage();
  await assistant.clock.setFixedTime(noon);
  await signIn(assistant, 'assistant@trayline.test');
  await expect(assistant.getByText('No prep day planned')).toBeVisible();
  await expect(assistant.getByText(/ ended on .+; the coach has not planned the next week yet\.$/)).toBeVisible();
  // "Shopping list" does not open the ended week's list as if it were to buy now.
  await assistant.getByRole('button', { name: 'Menu' }).click();
  await assistant.getByRole('link', { name: 'Shopping list' }).first().click();
  await expect(assistant.getByRole('heading', { name: 'No prep day ahead' })).toBeVisible();
  await expect(assistant.getByText(/’s prep days? \(.+\) ha(s|ve) passed, and no later prep day is planned yet\.$/)).toBeVisible();
  await expect(assistant.getByRole('link', { name: /^Open .+’s shopping list$/ })).toBeVisible();
  await expectNoSeriousA11yViolations(assistant, 'shopping list with no prep day ahead');
  await kitchen.close();

  // Dana's phone: no plate today, said as such, never the first day of the week gone by as if it were today.
  const phone = await browser.newContext({ ...devices['Pixel 7'], timezoneId: 'UTC' });
  const dana = await phone.newPage();
  await dana.clock.setFixedTime(noon);
  await signIn(dana, 'client1@trayline.test');
  await expect(dana.getByRole('heading', { level: 1, name: 'My plates' })).toBeVisible();
  await expect(dana.getByRole('heading', { name: 'Nothing planned today' })).toBeVisible();
  await expect(dana.getByText(/^Your last plan ended on .+\. Your coach has not published your next week yet/)).toBeVisible();
  await expect(dana.getByRole('heading', { name: "Today's plate" })).toHaveCount(0);
  await expectNoSeriousA11yViolations(dana, 'my plates with the last week over');
  await dana.screenshot({ path: `${SHOTS}/client-week-over.png`, fullPage: true });
  await phone.close();
});
