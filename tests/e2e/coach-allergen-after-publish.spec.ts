import { expect, test, type Page } from '@playwright/test';
import { PDFParse } from 'pdf-parse';
import { expectNoSeriousA11yViolations, signIn, SHOTS } from './support';

// The demo week (server/db/seeders/week-demo.ts) is published, and every plate on Dana Whitlock's days holds egg; Egg is
// not on her list. The coach puts it there after publishing, sees the published plates named on the home page, the
// week, its "Send plans" panel and her plate labels, then takes it off again (the later journeys read the demo as seeded).
test.use({ timezoneId: 'UTC' });

/** Fixes the clock: now when it is in the demo week, else noon on its last day (a run that crossed Sunday midnight). */
async function clockInTheWeek(page: Page) {
  const weeks = (await (await page.request.get('/api/weeks')).json()) as { name: string; startDate: string; endDate: string }[];
  const week = weeks.find((w) => w.name === 'Demo week')!;
  const now = new Date();
  const day = now.toISOString().slice(0, 10);
  await page.clock.setFixedTime(day >= week.startDate && day <= week.endDate ? now : new Date(`${week.endDate}T12:00:00Z`));
}

async function setEgg(page: Page, on: boolean) {
  await page.goto('/clients');
  await page.getByRole('link', { name: /Dana Whitlock/ }).first().click();
  const egg = page.getByRole('checkbox', { name: 'Egg', exact: true });
  await egg.setChecked(on);
  const saved = page.waitForResponse((r) => r.request().method() === 'PATCH' && /\/api\/clients\/\d+$/.test(r.url()));
  await page.getByRole('button', { name: 'Save changes' }).click();
  expect((await saved).status()).toBe(200);
}

test("an allergen put on a client's list after publishing: the coach is shown the published plates that hold it", async ({ page }) => {
  test.setTimeout(90_000);
  await signIn(page, 'coach@trayline.test');
  await clockInTheWeek(page);
  await setEgg(page, true);
  await expect(page.getByText(/^\d+ published plates? from today on holds? an allergen now on Dana Whitlock’s list$/)).toBeVisible();

  // From her profile, the way to tell her by e-mail: the week's "Send plans" opens on her alone (not sent here).
  await page.getByRole('link', { name: 'E-mail Dana Whitlock this week’s plan again' }).click();
  const sendPanel = page.locator('section').filter({ has: page.getByRole('heading', { level: 2, name: 'Send plans' }) });
  await expect(sendPanel.getByRole('radio', { name: 'Only the clients I choose' })).toBeChecked();
  await expect(sendPanel.getByRole('listitem').filter({ hasText: 'Dana Whitlock' }).getByRole('checkbox')).toBeChecked();
  await expect(sendPanel.getByRole('listitem').filter({ hasText: 'Priya Raman' }).getByRole('checkbox')).not.toBeChecked();
  await expect(sendPanel.getByRole('heading', { level: 2, name: 'Send plans' })).toBeInViewport();
  await expect(sendPanel.getByRole('button', { name: 'Send to 1 client' })).toBeEnabled();

  // Home: this week at a glance says so, and leads to the week.
  await page.goto('/');
  const glance = page.getByRole('alert').filter({ hasText: /Published version \d+: \d+ plates? from today on holds? an allergen put on a client’s list since/ });
  await expect(glance).toBeVisible();
  await glance.getByRole('link', { name: 'See which on the week' }).click();

  // The week: the plates named under Dana, with what to do.
  await expect(page.getByRole('heading', { level: 1, name: 'Demo week' })).toBeVisible();
  const notice = page.getByRole('alert').filter({ hasText: /Published version \d+: .* on Dana Whitlock’s list since/ });
  await expect(notice).toBeVisible();
  await expect(notice.getByRole('link', { name: 'Dana Whitlock' })).toHaveAttribute('href', /\/clients\/\d+$/);
  await expect(notice.getByRole('listitem').first()).toHaveText(/^\w{3}, \w{3} \d+, (breakfast|lunch): .+ \(.*\bEgg\b.*\)$/);
  await expect(notice).toContainText('Change them on the board, or allow the allergen there with a reason, then publish a new version.');
  // The draft board blocks publishing on the same allergen, naming her (more than three problems: by kind, with the allergen).
  await expect(page.getByRole('alert').filter({ hasText: /problems? blocks? publishing/ })).toContainText(/\d+ meals holding egg, on the client’s allergen list: Dana Whitlock/);

  // Each is flagged on its day: the list leads to the board's clients with something flagged, her among them.
  await page.getByRole('alert').filter({ hasText: /problems? blocks? publishing/ }).getByRole('button', { name: 'Show only those clients' }).click();
  const flagged = page.getByRole('checkbox', { name: /^Only clients with something flagged/ });
  await expect(flagged).toBeChecked();
  await expect(flagged).toBeFocused();
  await expect(page.getByRole('region', { name: 'Week board, scrolls sideways' }).getByRole('rowheader', { name: /Dana Whitlock/ })).toBeVisible();
  await flagged.uncheck();

  // "Send plans" warns, and marks her among the clients.
  const panel = page.locator('section').filter({ has: page.getByRole('heading', { level: 2, name: 'Send plans' }) });
  await expect(panel.getByText(/^Dana Whitlock’s published plates hold an allergen put on their list since version \d+$/)).toBeVisible();
  await expect(panel.getByRole('listitem').filter({ hasText: 'Dana Whitlock' })).toContainText(/⚠ \d+ plates? with an allergen on their list/);
  await expect(panel.getByRole('listitem').filter({ hasText: 'Priya Raman' })).not.toContainText('⚠');
  await expectNoSeriousA11yViolations(page, 'week with published plates holding an allergen');
  await page.screenshot({ path: `${SHOTS}/coach-allergen-after-publish.png`, fullPage: true });

  // Her plate labels mark it, in words that print without colour (Chromium's print, background graphics off).
  const danaId = (await notice.getByRole('link', { name: 'Dana Whitlock' }).getAttribute('href'))!.split('/').pop();
  await page.goto(`${new URL(page.url()).pathname}/labels?client=${danaId}`);
  await expect(page.getByText(/^\d+ labels? on \d+ sheets?, prep day/)).toBeVisible();
  const marks = page.getByText(/^⚠ On the client’s allergen list: (.+, )?Egg(, .+)?$/);
  await expect(marks.first()).toBeVisible();
  // Named above the sheet too, as many as the labels marked.
  const listed = (await page.getByText(/^\d+ plate labels? marks? an allergen on the client’s own list$/).textContent())!;
  expect(Number(listed.split(' ')[0])).toBe(await marks.count());
  const parser = new PDFParse({ data: new Uint8Array(await page.pdf({ preferCSSPageSize: true })) });
  const printed = (await parser.getText()).text.replace(/\s+/g, ' ');
  await parser.destroy();
  expect(printed).toContain('On the client’s allergen list: Egg');

  // Taken off again: nothing more is said.
  await setEgg(page, false);
  await expect(page.getByText(/published plates? from today on/)).toHaveCount(0);
  await page.goto('/weeks');
  await page.getByRole('link', { name: 'Demo week' }).click();
  await expect(page.getByRole('heading', { level: 1, name: 'Demo week' })).toBeVisible();
  await expect(panel.getByRole('list', { name: 'Clients on this week' })).toBeVisible();
  await expect(page.getByText(/^Published version \d+:/)).toHaveCount(0);
  await expect(panel.getByText('⚠')).toHaveCount(0);
});
