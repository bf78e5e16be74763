import { expect, test } from '@playwright/test';
import { expectNoSeriousA11yViolations, signIn, SHOTS } from './support';

test.use({ viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true, timezoneId: 'UTC' });

test('on prep day the assistant moves the bake run to when the kitchen really started, by keyboard', async ({ page }) => {
  await signIn(page, 'assistant@trayline.test');
  // The demo's published week and its first prep day, read through the API as the assistant.
  const weeks = (await (await page.request.get('/api/weeks')).json()) as { id: number; publishedVersion: number | null }[];
  const weekId = (weeks.find((w) => w.publishedVersion !== null) ?? weeks[0]).id;
  const run = (await (await page.request.get(`/api/weeks/${weekId}/bake-run`)).json()) as { prepDate: string; settings: { start: string } };
  // The phone's clock: 08:41 on that prep day, the run planned for 08:00.
  await page.clock.setFixedTime(new Date(`${run.prepDate}T08:41:00Z`));
  await page.goto(`/weeks/${weekId}/bake-run`);
  await expect(page.getByRole('heading', { name: 'Now and next' })).toBeVisible();
  await expect(page.getByText('Start', { exact: true }).locator('xpath=..')).toContainText(run.settings.start.slice(11, 16));

  // Keyboard only: the disclosure, the time, the button.
  await page.locator('summary', { hasText: 'Started at another time?' }).focus();
  await page.keyboard.press('Enter');
  await page.getByLabel('Started at').fill('08:35');
  // Enter in the field sends the form (a time field's Tab moves between its hour and minute parts).
  await page.getByLabel('Started at').press('Enter');
  await expect(page.getByRole('status').filter({ hasText: 'The plan now starts at 08:35.' })).toBeVisible();
  await expect(page.getByText('Start', { exact: true }).locator('xpath=..')).toContainText('08:35');
  await expectNoSeriousA11yViolations(page, 'bake run, start moved');
  await page.screenshot({ path: `${SHOTS}/assistant-bake-start.png`, fullPage: false });

  // Everyone reads the moved run: the API gives the new start.
  const moved = (await (await page.request.get(`/api/weeks/${weekId}/bake-run`)).json()) as { settings: { start: string } };
  expect(moved.settings.start).toBe(`${run.prepDate}T08:35`);
});

test('on prep day the assistant takes an oven that is out of order out of the run', async ({ page }) => {
  await signIn(page, 'assistant@trayline.test');
  const weeks = (await (await page.request.get('/api/weeks')).json()) as { id: number; publishedVersion: number | null }[];
  const weekId = (weeks.find((w) => w.publishedVersion !== null) ?? weeks[0]).id;
  const run = (await (await page.request.get(`/api/weeks/${weekId}/bake-run`)).json()) as { prepDate: string; ovens: { name: string }[] };
  expect(run.ovens.map((o) => o.name)).toEqual(['Left oven', 'Right oven']);
  await page.clock.setFixedTime(new Date(`${run.prepDate}T07:40:00Z`));
  await page.goto(`/weeks/${weekId}/bake-run`);
  await page.locator('summary', { hasText: 'An oven down or a cook missing?' }).click();
  await page.getByRole('checkbox', { name: 'Right oven' }).uncheck();
  await page.getByRole('button', { name: 'Plan again' }).click();
  await expect(page.getByRole('status').filter({ hasText: /^Planned again with Left oven and / })).toBeVisible();
  await expectNoSeriousA11yViolations(page, 'bake run, an oven down');
  await page.getByRole('region', { name: 'Timers' }).screenshot({ path: `${SHOTS}/assistant-oven-down.png` });
  const after = (await (await page.request.get(`/api/weeks/${weekId}/bake-run`)).json()) as { ovens: { name: string }[]; run: { ovens: { name: string; setPoints: unknown[] }[] } };
  expect(after.ovens.map((o) => o.name)).toEqual(['Left oven']);
  expect(after.run.ovens.filter((o) => o.setPoints.length).map((o) => o.name)).toEqual(['Left oven']);
});
