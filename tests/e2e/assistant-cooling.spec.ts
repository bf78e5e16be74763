import { readFile } from 'node:fs/promises';
import { expect, test } from '@playwright/test';
import { expectNoSeriousA11yViolations, signIn, SHOTS } from './support';

test.use({ viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true, timezoneId: 'UTC' });

test('on prep day the assistant writes a tray down as out and its temperatures as it cools, then finds it in the cooling log', async ({ page }) => {
  await signIn(page, 'assistant@trayline.test');
  const weeks = (await (await page.request.get('/api/weeks')).json()) as { id: number; publishedVersion: number | null }[];
  const weekId = (weeks.find((w) => w.publishedVersion !== null) ?? weeks[0]).id;
  type Tray = { id: string; name: string; outAt: string; outMinute: number };
  const dto = (await (await page.request.get(`/api/weeks/${weekId}/bake-run`)).json()) as { prepDate: string; run: { trays: Tray[] } };
  const first = [...dto.run.trays].sort((a, b) => a.outMinute - b.outMinute || (a.id < b.id ? -1 : 1))[0];
  // Start from no record of that tray (a run of this journey before leaves one).
  const before = (await (await page.request.get(`/api/weeks/${weekId}/bake-run/cooling?prepDate=${dto.prepDate}`)).json()) as {
    records: { runTrayId: string; version: number }[];
  };
  const old = before.records.find((r) => r.runTrayId === first.id);
  if (old)
    await page.request.delete(`/api/weeks/${weekId}/bake-run/cooling/${first.id}?prepDate=${dto.prepDate}&version=${old.version}`, {
      headers: { 'x-trayline-csrf': '1' },
    });

  // The phone's clock: 09:30 on the prep day.
  await page.clock.setFixedTime(new Date(`${dto.prepDate}T09:30:00Z`));
  await page.goto(`/weeks/${weekId}/bake-run`);
  const record = page.getByRole('region', { name: 'Cooling record' });
  const card = record.getByRole('listitem').filter({ has: page.getByRole('heading', { name: first.name, exact: true }) });
  // A tray planned out 5 minutes ago or more and not written down is named in the timers until it is.
  const asked = `${first.name} (planned out ${first.outAt.slice(11)})`;
  const timers = page.getByRole('region', { name: 'Timers' });
  // (The demo's run starts at 08:00, its first tray out well before 09:25.)
  expect(first.outAt <= `${dto.prepDate}T09:25`).toBe(true);
  await expect(timers.getByRole('note')).toContainText(asked);
  await card.getByRole('button', { name: 'Out now' }).click();
  // FDA Food Code §3-501.14 from 09:30: 70 °F by 11:30, 41 °F by 15:30.
  await expect(card.getByText('Cool to 70 °F (21 °C) or below by 11:30, then to 41 °F (5 °C) or below by 15:30.')).toBeVisible();
  // The timers count that tray's deadline from its real time out, and no longer ask for it.
  await expect(timers).toBeVisible();
  await expect(timers.getByText(asked, { exact: false })).toHaveCount(0);

  // A reading by keyboard: the temperature, the time, Enter.
  await card.getByLabel('Food temperature (°F)').fill('66');
  await card.getByLabel(/Taken at/).fill('10:50');
  await card.getByLabel(/Taken at/).press('Enter');
  await expect(card.getByText(/70 °F \(21 °C\) reached at 10:50\. Next: 41 °F \(5 °C\) or below by 15:30/)).toBeVisible();
  // Trays written down before (a journey run earlier on this database) count too.
  const inRun = new Set(dto.run.trays.map((t) => t.id));
  const others = before.records.filter((r) => r.runTrayId !== first.id && inRun.has(r.runTrayId)).length;
  await expect(record.getByRole('status')).toContainText(`${others + 1} of ${dto.run.trays.length} out`);
  await expectNoSeriousA11yViolations(page, 'bake run, cooling record');
  await card.screenshot({ path: `${SHOTS}/assistant-cooling.png` });

  // A prep day's page is long on a phone: its parts are a tap away, each landing below the phone's top bar.
  const parts = page.getByRole('navigation', { name: 'On this page' });
  await expect(parts.getByRole('link')).toHaveText(['Now and next', 'Cooling record', 'Timeline', 'Trays', 'Run sheet', 'Food safety']);
  const bar = (await page.locator('header').first().boundingBox())!;
  for (const [link, heading] of [['Run sheet', 'Run sheet'], ['Now and next', 'Now and next']]) {
    await parts.getByRole('link', { name: link }).click();
    const h = page.getByRole('heading', { name: heading, exact: true });
    await expect(h).toBeInViewport();
    expect((await h.boundingBox())!.y).toBeGreaterThanOrEqual(bar.y + bar.height);
  }

  // Everyone reads it: the API has the record, in °F, written by the assistant.
  const after = (await (await page.request.get(`/api/weeks/${weekId}/bake-run/cooling?prepDate=${dto.prepDate}`)).json()) as {
    records: { runTrayId: string; outAt: string; readings: { at: string; tempF: number }[]; recordedBy: string }[];
  };
  expect(after.records.find((r) => r.runTrayId === first.id)).toMatchObject({
    outAt: `${dto.prepDate}T09:30`,
    readings: [{ at: `${dto.prepDate}T10:50`, tempF: 66 }],
  });

  // The cooling log, from the menu: the last 30 days to the kitchen's today, the prep day with the tray's line.
  await page.getByRole('button', { name: 'Menu' }).click();
  await page.getByRole('link', { name: 'Cooling log', exact: true }).click();
  await expect(page.getByRole('heading', { level: 1, name: 'Cooling log' })).toBeVisible();
  await expect(page.getByLabel('Last prep day')).toHaveValue(dto.prepDate);
  const day = page.getByRole('region', { name: new RegExp(`^Prep day `) }).filter({ has: page.getByText(first.name, { exact: true }) });
  const line = day.getByRole('listitem').filter({ has: page.getByText(first.name, { exact: true }) });
  await expect(line).toContainText('Out 09:30 · 70 °F (21 °C) by 11:30 · 41 °F (5 °C) by 15:30');
  // 66 °F = 18.9 °C (NIST SP 811), 19 °C rounded.
  await expect(line).toContainText('10:50 66 °F (19 °C)');
  await expect(line).toContainText('Written down by');
  // Its result: waiting for its 41 °F reading while the server cannot know the kitchen's time (no zone set, prep day within three
  // days), or past the 6-hour deadline with no 41 °F reading once the prep day is older than that.
  await expect(line).toContainText(/70 °F \(21 °C\) reached; no reading at 41 °F \(5 °C\) yet \(due by 15:30\)|Missed: not at 41 °F \(5 °C\) by 15:30/);
  await expectNoSeriousA11yViolations(page, 'cooling log');
  await page.screenshot({ path: `${SHOTS}/assistant-cooling-log.png`, fullPage: true });
  // The same stretch as a CSV file.
  const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('link', { name: 'Download CSV' }).click()]);
  expect(download.suggestedFilename()).toMatch(/^cooling-log-\d{4}-\d{2}-\d{2}-to-\d{4}-\d{2}-\d{2}\.csv$/);
  const csv = await readFile((await download.path())!, 'utf8');
  expect(csv.split('\r\n')[0]).toBe(
    'Prep date,Week,Tray,Out at,Cooling started again at,Readings,70 °F (21 °C) by,41 °F (5 °C) by,70 °F (21 °C) reached at,41 °F (5 °C) reached at,Result,Note,Written down by',
  );
  expect(csv).toContain(`${dto.prepDate} 09:30`);
  expect(csv).toContain(`${dto.prepDate} 10:50 66 °F (19 °C)`);
});
