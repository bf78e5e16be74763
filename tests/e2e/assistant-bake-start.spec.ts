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

test('mid-morning the assistant plans the rest of the day again, keeping the trays already out', async ({ page }) => {
  await signIn(page, 'assistant@trayline.test');
  const weeks = (await (await page.request.get('/api/weeks')).json()) as { id: number; publishedVersion: number | null }[];
  const weekId = (weeks.find((w) => w.publishedVersion !== null) ?? weeks[0]).id;
  type Tray = { id: string; inAt: string; outAt: string; outMinute: number };
  const before = (await (await page.request.get(`/api/weeks/${weekId}/bake-run`)).json()) as { prepDate: string; run: { trays: Tray[] } };
  // The demo's cooling record of that day (server/db/seeders/cooling-demo.ts), written against the run as seeded.
  const cooling = (await (await page.request.get(`/api/weeks/${weekId}/bake-run/cooling?prepDate=${before.prepDate}`)).json()) as {
    records: { runTrayId: string; outAt: string }[];
  };
  // The phone's clock: when the third tray of the plan comes out.
  const third = [...before.run.trays].sort((a, b) => a.outMinute - b.outMinute)[2];
  await page.clock.setFixedTime(new Date(`${third.outAt}:00Z`));
  await page.goto(`/weeks/${weekId}/bake-run`);
  await page.locator('summary', { hasText: 'An oven down or a cook missing?' }).click();
  const out = page.getByRole('group', { name: 'Trays already out of the oven' });
  // The trays out by now (and any still baking in an oven that works) are offered ticked; the rest from then.
  // (count() does not wait: wait for the form's ticks first, or a slow render counts none.)
  await expect(out.getByRole('checkbox', { checked: true }).first()).toBeVisible();
  const ticked = await out.getByRole('checkbox', { checked: true }).count();
  expect(ticked).toBeGreaterThanOrEqual(3);
  const from = await page.getByLabel('Plan the rest from').inputValue();
  expect(from >= third.outAt.slice(11)).toBe(true);
  await page.getByRole('button', { name: 'Plan again' }).click();
  await expect(page.getByRole('status').filter({ hasText: new RegExp(`from ${from}; ${ticked} trays already out kept as planned\\.$`) })).toBeVisible();
  await expect(page.getByText(`Planned again from ${from}`, { exact: true })).toBeVisible();
  await expectNoSeriousA11yViolations(page, 'bake run, planned again part-way');
  await page.getByRole('region', { name: 'Timers' }).screenshot({ path: `${SHOTS}/assistant-replan-midday.png` });

  // Everyone reads the same day: the trays out as they were planned, or at the time the cooling record has them out
  // (when that is after they went in), with their cooling deadlines still counted.
  const after = (await (await page.request.get(`/api/weeks/${weekId}/bake-run`)).json()) as {
    settings: { done: { from: string; out: string[] } };
    run: { trays: Tray[]; events: { kind: string; trayId: string | null }[] };
  };
  expect(after.settings.done).toEqual({ from: `${before.prepDate}T${from}`, out: expect.any(Array) });
  expect(after.settings.done.out).toHaveLength(ticked);
  expect(after.settings.done.out).toContain(third.id);
  const recorded = cooling.records.find((r) => r.runTrayId === third.id)?.outAt;
  expect(after.run.trays.find((t) => t.id === third.id)?.outAt).toBe(recorded && recorded >= third.inAt ? recorded : third.outAt);
  expect(after.run.events.filter((e) => e.trayId === third.id && e.kind === 'fridge-41-by')).toHaveLength(1);

  // Said by mistake: one button plans the whole day from its start again.
  await page.getByRole('button', { name: 'Plan the whole day from its start again' }).click();
  await expect(page.getByText(`Planned again from ${from}`, { exact: true })).toBeHidden();
  const whole = (await (await page.request.get(`/api/weeks/${weekId}/bake-run`)).json()) as { settings: { done: unknown }; run: { trays: Tray[] } };
  expect(whole.settings.done).toBeNull();
  expect(whole.run.trays).toHaveLength(before.run.trays.length);
});
