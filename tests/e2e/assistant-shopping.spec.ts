import { expect, test, type Page } from '@playwright/test';
import { PDFParse } from 'pdf-parse';
import { expectNoSeriousA11yViolations, signIn, SHOTS } from './support';

// The browser's clock on the demo week's Monday morning (UTC): its Wednesday prep day is ahead, whatever day the run is
// on (from Thursday on, "Shopping list" says no prep day is ahead instead of opening a list gone by).
test.use({ viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true, timezoneId: 'UTC' });

async function clockOnTheDemoMonday(page: Page) {
  const weeks = (await (await page.request.get('/api/weeks')).json()) as { name: string; startDate: string }[];
  await page.clock.setFixedTime(new Date(`${weeks.find((w) => w.name === 'Demo week')!.startDate}T09:00:00Z`));
}

/** The item's name as the list shows it: the first line of the checkbox's label. */
const itemName = async (page: Page, index: number) =>
  (await page.getByRole('checkbox', { checked: false }).nth(index).locator('xpath=..').locator('span.font-bold').first().textContent())!.trim();

test('the assistant checks two items on the shopping list (they sink, strike through and stay), then prints it', async ({ page }) => {
  await signIn(page, 'assistant@trayline.test');
  await clockOnTheDemoMonday(page);
  // "Shopping list" opens this week's list; in a week with two prep days (the demo's), the next prep day's.
  await page.goto('/shopping');
  await expect(page).toHaveURL(/\/weeks\/\d+\/shopping\?for=\d{4}-\d{2}-\d{2}$/);
  await expect(page.getByRole('heading', { level: 1, name: /^Shopping list/ })).toBeVisible();
  await expect(page.getByRole('checkbox').first()).toBeVisible();
  await expectNoSeriousA11yViolations(page, 'shopping list');

  const names = [await itemName(page, 0), await itemName(page, 1)];
  for (const name of names) {
    const box = page.getByRole('checkbox', { name: new RegExp(`^${name.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}`) });
    await box.check();
    await expect(box).toBeChecked();
  }

  const checkedState = async () => {
    for (const name of names) {
      const box = page.getByRole('checkbox', { name: new RegExp(`^${name.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}`) });
      await expect(box).toBeChecked();
      // Struck through, and last in its aisle (checked items sink below the ones still to buy).
      await expect(box.locator('xpath=..').getByText(name, { exact: true })).toHaveCSS('text-decoration-line', 'line-through');
      const aisle = page.getByRole('region').filter({ has: box });
      await expect(aisle.getByRole('checkbox').last()).toBeChecked();
      const boxes = await aisle.getByRole('checkbox').all();
      const states = await Promise.all(boxes.map((b) => b.isChecked()));
      expect(states.indexOf(true) === -1 || states.slice(states.indexOf(true)).every(Boolean), 'checked items come after unchecked ones').toBe(true);
    }
  };
  await checkedState();
  await expect(page.getByText(/^2 of \d+ checked/)).toBeVisible();

  // Saved on the server: still checked after a reload.
  await page.reload();
  await expect(page.getByRole('heading', { level: 1, name: /^Shopping list/ })).toBeVisible();
  await checkedState();

  // Print: the app's navigation and the page's buttons are hidden; the list stays.
  await page.emulateMedia({ media: 'print' });
  await expect(page.getByRole('button', { name: 'Menu' })).toBeHidden();
  await expect(page.getByRole('button', { name: 'Print' })).toBeHidden();
  await expect(page.getByRole('heading', { level: 1, name: /^Shopping list/ })).toBeVisible();
  await page.screenshot({ path: `${SHOTS}/assistant-shopping.png`, fullPage: true });
  // On paper (US Letter): an item takes one line where it fits and an aisle runs on to the next page rather than
  // starting a page of its own, so the demo's first two aisles share page 1; every item is printed once.
  const aisles = await page.locator('section > h2').evaluateAll((hs) => hs.map((h) => (h.firstChild?.textContent ?? '').trim()));
  const items = await page.locator('section li label > span.flex > span.font-bold').allTextContents();
  const parser = new PDFParse({ data: new Uint8Array(await page.pdf({ format: 'Letter' })) });
  const printed = await parser.getText();
  await parser.destroy();
  const flat = (t: string) => t.replace(/\s+/g, ' ');
  expect(aisles.length).toBeGreaterThan(1);
  expect(flat(printed.pages[0].text)).toContain(aisles[0]);
  expect(flat(printed.pages[0].text)).toContain(aisles[1]);
  const all = flat(printed.text);
  for (const item of items) expect(all.split(flat(item)).length - 1, item).toBeGreaterThanOrEqual(1);

  // Home: the kitchen's week shows the same progress, the next prep day and the way to the bake run.
  await page.emulateMedia({ media: 'screen' });
  await page.goto('/');
  await expect(page.getByRole('heading', { name: 'In the kitchen' })).toBeVisible();
  await expect(page.getByRole('progressbar', { name: 'In the trolley' })).toHaveAttribute('aria-valuenow', '2');
  await expect(page.getByText(/^Next prep day: Wednesday, .+$/)).toBeVisible();
  await expect(page.getByRole('link', { name: 'Bake run' }).first()).toBeVisible();
  await expectNoSeriousA11yViolations(page, 'assistant home');
});

test.describe('with the service worker', () => {
  test.use({ serviceWorkers: 'allow' });

  test('the assistant shops with no signal: the list kept on the phone opens offline, and its ticks reach the server once back online, even after the page was closed', async ({ page, context }) => {
    await signIn(page, 'assistant@trayline.test');
    await clockOnTheDemoMonday(page);
    await page.goto('/shopping');
    await expect(page).toHaveURL(/\/weeks\/\d+\/shopping\?for=\d{4}-\d{2}-\d{2}$/);
    const listUrl = new URL(page.url());
    const api = `/api${listUrl.pathname}${listUrl.search.replace('for=', 'prepDate=')}`;
    const checkedOnServer = async () => ((await (await page.request.get(api)).json()) as { checkedCount: number }).checkedCount;
    const before = await checkedOnServer();
    await expect(page.getByText(new RegExp(`^${before} of \\d+ checked`))).toBeVisible();
    // Kept: the app (the service worker's page and files; polled through evaluate, which waits for the answer) and the list.
    const pageKept = () =>
      page.evaluate(async () => {
        await navigator.serviceWorker.ready;
        return (await caches.match('/', { cacheName: 'trayline-page-v1' })) !== undefined;
      });
    await expect.poll(pageKept, { timeout: 20_000 }).toBe(true);
    await page.waitForFunction(() => Object.keys(localStorage).some((k) => k.startsWith('trayline.kept.answer.shopping:')));

    // In the store: no signal. "Shopping list" offers the list kept on the phone.
    await context.setOffline(true);
    await page.goto('/shopping');
    await expect(page.getByRole('heading', { name: 'You are offline' })).toBeVisible();
    await page.getByRole('link', { name: /^Open the shopping list saved / }).click();
    await expect(page.getByText('Your list as saved on this device')).toBeVisible();
    await expect(page.getByRole('link', { name: 'CSV' })).toHaveCount(0);
    const name = await itemName(page, 0);
    await page.getByRole('checkbox', { name: new RegExp(`^${name.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}`) }).check();
    await expect(page.getByText(new RegExp(`^${before + 1} of \\d+ checked`))).toBeVisible();
    await expectNoSeriousA11yViolations(page, 'shopping list offline');
    await page.screenshot({ path: `${SHOTS}/assistant-shopping-offline.png` });

    // The phone closes the page; opened again, still offline, the tick is there.
    await page.close();
    const again = await context.newPage();
    await again.goto(listUrl.pathname + listUrl.search);
    await expect(again.getByText('Your list as saved on this device')).toBeVisible();
    await expect(again.getByText(new RegExp(`^${before + 1} of \\d+ checked`))).toBeVisible();

    // Back online: the tick goes to the server, and the page says nothing more of a saved copy.
    await context.setOffline(false);
    await expect.poll(async () => ((await (await again.request.get(api)).json()) as { checkedCount: number }).checkedCount, { timeout: 15_000 }).toBe(before + 1);
    await expect(again.getByText('Your list as saved on this device')).toHaveCount(0);
    expect(await again.evaluate(() => Object.keys(localStorage).filter((k) => k.startsWith('trayline.kept.answer.shopping-ticks:')))).toEqual([]);
  });
});
