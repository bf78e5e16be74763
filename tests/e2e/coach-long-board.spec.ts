import { expect, test, type Page } from '@playwright/test';
import { signIn, SHOTS } from './support';

// A board longer than the window: its row of days stays in sight (pinned under the top of the window, or under the
// phone's top bar), lined up with the columns whichever way the grid has scrolled, and what the keyboard focuses
// stops below it (WCAG 2.2, 2.4.11 Focus Not Obscured).

async function openDemoBoard(page: Page) {
  await signIn(page, 'coach@trayline.test');
  await page.goto('/weeks');
  await page.getByRole('link', { name: 'Demo week' }).click();
  await expect(page.getByRole('heading', { level: 1, name: 'Demo week' })).toBeVisible();
}

const lefts = (page: Page, selector: string) =>
  page.locator(selector).evaluateAll((cells) => cells.map((c) => Math.round(c.getBoundingClientRect().left)));

test('the row of days stays in sight down a long board, lined up, and never hides the focused cell', async ({ page, browser, baseURL }) => {
  await page.setViewportSize({ width: 1280, height: 720 });
  await openDemoBoard(page);
  const pinned = page.getByTestId('pinned-days');
  const board = page.getByRole('region', { name: 'Week board, scrolls sideways' });
  const days = await board.locator('thead th').allTextContents();
  expect(days).toHaveLength(8);
  // At the top of the page the table's own row shows; no copy.
  await expect(pinned.locator('th')).toHaveCount(0);

  // The last client's last cell, then back up the board by keyboard.
  const cells = board.locator('[data-cell-id]');
  await cells.last().focus();
  await expect(pinned.locator('th')).toHaveText(days);
  expect(await lefts(page, '[data-testid="pinned-days"] th')).toEqual(await lefts(page, '[aria-label="Week board, scrolls sideways"] thead th'));
  for (let i = 0; i < 30; i++) {
    await page.keyboard.press('Shift+Tab');
    const [focusTop, pinBottom] = await page.evaluate(() => [
      document.activeElement!.getBoundingClientRect().top,
      document.querySelector('[data-testid="pinned-days"] table')?.getBoundingClientRect().bottom ?? 0,
    ]);
    expect(focusTop, `focus ${i + 1} stops below the row of days`).toBeGreaterThanOrEqual(pinBottom);
  }
  await page.screenshot({ path: `${SHOTS}/coach-long-board.png` });

  // Back at the top, the copy goes.
  await page.evaluate(() => window.scrollTo(0, 0));
  await expect(pinned.locator('th')).toHaveCount(0);

  // On a phone, the whole week scrolled sideways: under the top bar, and still lined up.
  const phone = await browser.newContext({ baseURL, viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true });
  const p = await phone.newPage();
  await openDemoBoard(p);
  await p.getByLabel('Days shown').selectOption('');
  const phoneBoard = p.getByRole('region', { name: 'Week board, scrolls sideways' });
  await phoneBoard.locator('[data-cell-id]').last().focus();
  await phoneBoard.evaluate((el) => el.scrollBy(180, 0));
  const pinnedOnPhone = p.getByTestId('pinned-days');
  await expect(pinnedOnPhone.locator('th')).toHaveText(days);
  await expect.poll(() => lefts(p, '[data-testid="pinned-days"] th')).toEqual(await lefts(p, '[aria-label="Week board, scrolls sideways"] thead th'));
  const barBottom = await p.locator('header').first().evaluate((h) => h.getBoundingClientRect().bottom);
  const pinTop = await pinnedOnPhone.locator('table').evaluate((t) => t.getBoundingClientRect().top);
  expect(pinTop).toBeGreaterThanOrEqual(Math.floor(barBottom) - 4);
  await p.screenshot({ path: `${SHOTS}/coach-long-board-phone.png` });
  await phone.close();
});
