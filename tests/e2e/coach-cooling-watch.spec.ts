import { expect, test, type APIRequestContext } from '@playwright/test';
import { wallClockIn } from '../../shared/domain/time-zone';
import { addDays, weekdayOf } from '../../shared/domain/iso-date';
import { expectNoSeriousA11yViolations, SHOTS } from './support';

// The coach's laptop is in the kitchen, in Chicago: a workspace opened on it starts in that zone.
test.use({ viewport: { width: 1366, height: 900 }, timezoneId: 'America/Chicago' });

const csrf = { 'x-trayline-csrf': '1' };
const ZONE = 'America/Chicago';

/** The kitchen's wall clock `minutesAgo` minutes ago, "YYYY-MM-DDTHH:mm". */
const kitchenClock = (minutesAgo: number) => wallClockIn(new Date(Date.now() - minutesAgo * 60_000), ZONE);

async function json<T>(request: APIRequestContext, method: 'get' | 'post' | 'put' | 'patch' | 'delete', url: string, data?: unknown): Promise<T> {
  const res = await request[method](url, { headers: csrf, ...(data === undefined ? {} : { data }) });
  expect(res.ok(), `${method.toUpperCase()} ${url}: ${res.status()} ${await res.text()}`).toBe(true);
  return (res.status() === 204 ? null : await res.json()) as T;
}

test('a coach signs up from a Chicago laptop: the kitchen’s time zone is set; a tray past its 2-hour cooling deadline is e-mailed with nobody on the page', async ({ page, browser }) => {
  test.setTimeout(180_000);
  const email = `rio.${Date.now().toString(36)}@example.test`;
  await page.goto('/register');
  await page.getByLabel('Your name').fill('Rio Example');
  await page.getByLabel('Business name').fill('Example Cold Chain Kitchen');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill('a-long-password-1');
  await page.getByRole('button', { name: 'Open workspace' }).click();
  await expect(page.getByRole('heading', { name: 'First steps' })).toBeVisible();

  // Settings: the zone of the device the workspace was opened on; the kitchen's time now beside it.
  await page.goto('/settings');
  const zone = page.getByLabel('Kitchen time zone');
  await expect(zone).toHaveValue(ZONE);
  await expect(page.getByText(/^Kitchen time now in America\/Chicago: .+\. Trayline watches the cooling record at this time/)).toBeVisible();
  await expect(page.getByRole('button', { name: 'Use this device’s time zone' })).toHaveCount(0);
  await expectNoSeriousA11yViolations(page, 'settings, kitchen time zone');
  await zone.scrollIntoViewIfNeeded();
  await page.screenshot({ path: `${SHOTS}/coach-kitchen-time-zone.png` });
  // Off and on again by keyboard-reachable controls: "Not set" turns the watch off, the device's zone back on.
  await zone.selectOption('');
  await expect(page.getByText(/^Not set: cooling deadlines are watched only on the bake-run page/)).toBeVisible();
  await page.getByRole('button', { name: 'Use this device’s time zone' }).click();
  await expect(zone).toHaveValue(ZONE);
  // The saved toast has finished sliding in before the page is checked (half-faded text has no contrast to judge).
  await expect(page.getByText('Kitchen time zone: America/Chicago')).toBeVisible();
  await page.waitForTimeout(600);
  await expectNoSeriousA11yViolations(page, 'settings, with the saved toast');

  // A prep day today in the kitchen: one base tray, one board, the tray written down as out 2 h 5 min ago with no
  // reading since (70 °F was due 5 minutes ago: FDA Food Code §3-501.14), and the page closed.
  const out = kitchenClock(125);
  const prepDate = out.slice(0, 10);
  // The Monday after the prep day (Sunday is weekday 0): the board of the prep day's week.
  const startDate = addDays(prepDate, 8 - (weekdayOf(prepDate) || 7));
  const [egg] = await json<{ items: { id: number }[] }>(page.request, 'get', '/api/ingredients?q=egg&pageSize=1').then((r) => r.items);
  const tray = await json<{ id: number; name: string }>(page.request, 'post', '/api/trays', {
    name: 'Watch-check egg slab',
    description: '',
    lines: [{ ingredientId: egg.id, amountText: '24', unit: 'oz', note: '' }],
    pan: { code: 'half-sheet' },
    panLining: 'parchment',
    bake: { category: 'egg-slab', tempF: 350, minMinutes: 25, maxMinutes: 30 },
    yieldFactor: 0.9,
    cutPlan: { kind: 'grid', rows: 3, columns: 4 },
    storage: { fridgeDays: 4, freezerWeeks: 8 },
    reheatSteps: [],
    tags: [],
  });
  const { week } = await json<{ week: { id: number; version: number } }>(page.request, 'post', '/api/weeks', { name: 'Cooling watch check', startDate, prepDate });
  await json(page.request, 'put', `/api/weeks/${week.id}/trays`, { version: week.version, trays: [{ trayId: tray.id, prepDate, trayCount: 1 }] });
  // One oven and the day's run from midnight (before the tray came out, whatever the hour of the run).
  await json(page.request, 'post', '/api/ovens', { name: 'Deck oven', racks: 2, traysPerRack: 1, convection: false, heatFPerMin: 25, coolFPerMin: 15, maxF: 500 });
  await json(page.request, 'put', `/api/weeks/${week.id}/bake-run/settings`, { start: `${prepDate}T00:00`, cooks: 1, ovenIds: [] });
  await json(page.request, 'put', `/api/weeks/${week.id}/bake-run/cooling/${tray.id}-1`, { outAt: out });
  await page.goto('/');

  // Within a minute or two the server's once-a-minute watch e-mails the kitchen (the mail catcher has it).
  await page.goto('/dev/mail');
  const item = page.getByRole('listitem').filter({ hasText: `To ${email}` }).filter({ hasText: 'Watch-check egg slab missed its cooling deadline' }).first();
  await expect(async () => {
    await page.reload();
    await expect(item).toBeVisible({ timeout: 2_000 });
  }).toPass({ timeout: 150_000, intervals: [5_000] });
  await item.getByRole('button', { name: 'Read' }).click();
  await expect(item.getByText(/no temperature written down in its cooling record shows it was/)).toBeVisible();
  await expect(item.getByText('No temperature was written down for it.')).toBeVisible();
  await expectNoSeriousA11yViolations(page, 'caught mail, cooling watch');
  await page.screenshot({ path: `${SHOTS}/cooling-watch-mail.png`, fullPage: true });

  // Its link, opened on the coach's phone away from the kitchen (in New York, an hour ahead) and not signed in: sign
  // in, and land on the cooling record (below the run's numbers), its heading clear of the top bar; the page says its
  // times are the kitchen's.
  const link = /Open the cooling record: (\S+)/.exec((await item.textContent()) ?? '')?.[1];
  expect(link).toMatch(new RegExp(`/weeks/${week.id}/bake-run#cooling-record-title$`));
  const phone = await browser.newContext({ viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true, timezoneId: 'America/New_York' });
  const reader = await phone.newPage();
  await reader.goto(link!);
  await reader.getByLabel('E-mail').fill(email);
  await reader.getByLabel('Password').fill('a-long-password-1');
  await reader.getByRole('button', { name: 'Sign in' }).click();
  await expect(reader).toHaveURL(new RegExp(`/weeks/${week.id}/bake-run#cooling-record-title$`));
  const heading = reader.getByRole('heading', { name: 'Cooling record' });
  await expect(heading).toBeInViewport();
  await expect(reader.getByRole('heading', { name: 'Watch-check egg slab' })).toBeInViewport();
  expect(await reader.evaluate(() => window.scrollY)).toBeGreaterThan(0);
  await expect(reader.getByRole('note').filter({ hasText: 'This device is on another clock' })).toContainText(
    'Times on this page, and the ones you type, are the kitchen’s (America/Chicago)',
  );
  const bar = await reader.getByRole('banner').boundingBox();
  expect((await heading.boundingBox())!.y).toBeGreaterThanOrEqual(bar ? bar.y + bar.height : 0);
  await reader.screenshot({ path: `${SHOTS}/cooling-watch-link.png` });
  await phone.close();

  // The outbox names what it was.
  await page.goto('/outbox');
  await expect(page.getByRole('row').filter({ hasText: email }).filter({ hasText: 'missed its cooling deadline' }).first()).toBeVisible();
});
