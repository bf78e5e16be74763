import { expect, test, type Page } from '@playwright/test';
import { expectNoSeriousA11yViolations, expectNoSidewaysScroll, signIn } from './support';

/**
 * Every page of each role through axe (WCAG 2 A and AA, serious and critical): the coach at a laptop and on a phone,
 * the assistant and a client on a phone (where no page may scroll sideways as a whole). Ids come from the demo workspace through the API.
 */
async function demoIds(page: Page) {
  const get = async <T,>(path: string) => (await (await page.request.get(path)).json()) as T;
  const weeks = await get<{ id: number; publishedVersion: number | null }[]>('/api/weeks');
  const trays = await get<{ id: number }[]>('/api/trays');
  const ingredients = await get<{ items: { id: number }[] }>('/api/ingredients?pageSize=1');
  const week = (weeks.find((w) => w.publishedVersion !== null) ?? weeks[0]).id;
  return { week, tray: trays[0].id, ingredient: ingredients.items[0].id, get };
}

async function checkPages(page: Page, paths: string[]) {
  for (const path of paths) {
    await page.goto(path);
    await expect(page.getByRole('heading', { level: 1 }).first()).toBeVisible();
    // Pages read their data after the heading shows: wait until no skeleton or spinner is left.
    await expect(page.locator('[aria-busy="true"], .animate-pulse')).toHaveCount(0);
    await expectNoSeriousA11yViolations(page, path);
    if ((page.viewportSize()?.width ?? 1024) < 640) await expectNoSidewaysScroll(page, path);
  }
}

// axe on a 60-client board takes seconds: each test gets two minutes.
test.describe.configure({ timeout: 120_000 });

test('the coach’s planning pages at a laptop', async ({ page }) => {
  await signIn(page, 'coach@trayline.test');
  const ids = await demoIds(page);
  const clients = await ids.get<{ id: number }[]>('/api/clients');
  await checkPages(page, ['/', '/weeks', `/weeks/${ids.week}`, '/clients', `/clients/${clients[0].id}`, '/plates', '/outbox', '/team', '/settings']);
});

test('the coach’s kitchen pages at a laptop', async ({ page }) => {
  await signIn(page, 'coach@trayline.test');
  const ids = await demoIds(page);
  await checkPages(page, [
    `/weeks/${ids.week}/shopping`, `/weeks/${ids.week}/labels`, `/weeks/${ids.week}/bake-run`, '/trays', `/trays/${ids.tray}`, '/trays/new',
    '/ingredients', `/ingredients/${ids.ingredient}`, '/ingredients/new', '/bake-rules', '/bake-run', '/pantry',
  ]);
});

test.describe('on a phone', () => {
  test.use({ viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true });

  test('the coach’s pages', async ({ page }) => {
    await signIn(page, 'coach@trayline.test');
    const ids = await demoIds(page);
    await checkPages(page, ['/', `/weeks/${ids.week}`, '/clients', '/ingredients', `/trays/${ids.tray}`, '/plates', '/team']);
  });

  test('the kitchen assistant’s pages', async ({ page }) => {
    await signIn(page, 'assistant@trayline.test');
    const ids = await demoIds(page);
    await checkPages(page, ['/', '/shopping', '/labels', '/weeks', '/pantry', '/trays', `/trays/${ids.tray}`, '/ingredients', '/bake-rules', '/bake-run', `/weeks/${ids.week}/bake-run`, '/settings']);
  });

  test('a client’s pages', async ({ page }) => {
    await signIn(page, 'client3@trayline.test');
    await checkPages(page, ['/', '/my-plates', '/my-targets', '/settings']);
  });
});

// WCAG 2.2 2.4.7 (Focus Visible): whatever has the keyboard's focus shows it. axe does not judge focus, so the sign-in
// page is walked with Tab and each stop's outline read (the style sheet's 3 px frost outline; the colour is checked
// so an outline that resolves to nothing, or to the button's own colour, fails).
test('the keyboard’s focus is visible on every stop of the sign-in page', async ({ page }) => {
  await page.goto('/sign-in');
  await expect(page.getByLabel('E-mail')).toBeVisible();
  const stops: string[] = [];
  // Every stop up to the Sign in button (at most 12: a page that never reaches it fails below).
  while (!stops.at(-1)?.startsWith('BUTTON Sign in') && stops.length < 12) {
    await page.keyboard.press('Tab');
    // Buttons ease their colours in (transition-colors): read the outline once it has settled.
    await page.waitForTimeout(300);
    const seen = await page.evaluate(() => {
      const el = document.activeElement as HTMLElement;
      const cs = getComputedStyle(el);
      return { name: `${el.tagName} ${(el.textContent ?? '').trim() || el.getAttribute('name') || el.id}`, outline: `${cs.outlineStyle} ${cs.outlineWidth} ${cs.outlineColor}` };
    });
    stops.push(seen.name);
    expect(seen.outline, seen.name).toBe('solid 3px rgb(43, 122, 140)');
  }
  expect(stops.some((s) => s.startsWith('BUTTON Sign in'))).toBe(true);
  expect(stops.some((s) => s.startsWith('BUTTON Show'))).toBe(true);
  expect(stops.some((s) => s.startsWith('A '))).toBe(true);
  expect(stops).toContain('INPUT staySignedIn');
});
