import AxeBuilder from '@axe-core/playwright';
import { expect, type Browser, type BrowserContextOptions, type Page } from '@playwright/test';

export const DEMO_PASSWORD = 'trayline-demo';
export const SHOTS = '.data/screenshots';

export async function signIn(page: Page, email: string, password = DEMO_PASSWORD) {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page.getByRole('button', { name: /Sign out/ }).or(page.getByRole('button', { name: 'Menu' }))).toBeVisible();
}

/**
 * axe-core (WCAG 2 A and AA rules) on the page as it is now: fails on any violation of impact serious or critical,
 * naming the rule, its help text and the first offending nodes.
 */
export async function expectNoSeriousA11yViolations(page: Page, context = '') {
  const results = await new AxeBuilder({ page }).withTags(['wcag2a', 'wcag2aa']).analyze();
  const serious = results.violations.filter((v) => v.impact === 'serious' || v.impact === 'critical');
  const report = serious.map((v) => `${v.id} (${v.impact}): ${v.help}\n    ${v.nodes.slice(0, 4).map((n) => n.target.join(' ')).join('\n    ')}`);
  expect(report, `axe violations${context ? ` on ${context}` : ''} at ${page.url()}`).toEqual([]);
}

/**
 * WCAG 2.2 1.4.10 (Reflow): on a phone the page does not scroll sideways as a whole (a wide table may scroll inside
 * its own frame). Names the elements that stick out past the right edge outside any scrolling frame.
 */
export async function expectNoSidewaysScroll(page: Page, context = '') {
  const out = await page.evaluate(() => {
    const width = document.documentElement.clientWidth;
    if (document.documentElement.scrollWidth <= width) return [];
    const inFrame = (el: Element) => {
      for (let p = el.parentElement; p; p = p.parentElement) if (getComputedStyle(p).overflowX !== 'visible') return true;
      return false;
    };
    return [...document.querySelectorAll('body *')]
      .filter((el) => el.getBoundingClientRect().right > width + 1 && !inFrame(el))
      .slice(0, 4)
      .map((el) => `${el.tagName.toLowerCase()}${el.id ? `#${el.id}` : ''} "${(el.textContent ?? '').trim().slice(0, 40)}"`);
  });
  expect(out, `the page scrolls sideways${context ? ` on ${context}` : ''} at ${page.url()}`).toEqual([]);
}

/** A name no other test (or earlier run) has used. */
export function unique(prefix: string) {
  return `${prefix} ${Date.now().toString(36)}${Math.floor(Math.random() * 1296).toString(36)}`;
}

/**
 * The coach (signed in on `coach`) invites a new kitchen assistant from the Team page, who joins from the link in a
 * browser of their own (a phone-sized one unless `context` says otherwise). A fresh account: a journey that changes
 * its sessions or password touches no other journey's.
 */
export async function inviteAssistant(
  coach: Page,
  browser: Browser,
  opts: { name: string; password: string; email?: string; context?: BrowserContextOptions },
) {
  const email = opts.email ?? `${unique('helper').replace(/\s+/g, '-').toLowerCase()}@example.test`;
  await coach.goto('/team');
  await coach.getByLabel('E-mail').fill(email);
  await coach.getByRole('button', { name: 'Invite' }).click();
  const link = await coach.getByLabel('Invitation link').inputValue();
  const context = await browser.newContext(opts.context ?? { viewport: { width: 393, height: 851 } });
  const page = await context.newPage();
  await page.goto(new URL(link).pathname);
  await page.getByLabel('Your name').fill(opts.name);
  await page.getByLabel('Choose a password').fill(opts.password);
  await page.getByRole('button', { name: 'Join' }).click();
  await expect(page.getByRole('heading', { name: `Hello, ${opts.name.split(' ')[0]}` })).toBeVisible();
  return { email, context, page };
}
