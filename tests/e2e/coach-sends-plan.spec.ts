import { expect, test } from '@playwright/test';
import { expectNoSeriousA11yViolations, signIn, SHOTS, unique } from './support';

// The e2e server runs the pg-boss send worker with SMTP to the local catcher (port 2626, started by scripts/test.sh),
// which stores each message in the e2e database; /dev/mail shows what it caught.
test("the coach e-mails one client the week's plan; the outbox shows it sent and the caught mail has the PDF", async ({ page }) => {
  test.setTimeout(90_000);
  const note = unique('E2E note: enjoy the week');
  const client = { name: 'Dana Whitlock', email: 'client1@trayline.test' };

  await signIn(page, 'coach@trayline.test');
  await page.goto('/weeks');
  await page.getByRole('link', { name: 'Demo week' }).click();
  await expect(page.getByRole('heading', { level: 1, name: 'Demo week' })).toBeVisible();

  // The "Send plans" panel: only one chosen client, with a personal note.
  const panel = page.locator('section, div').filter({ has: page.getByRole('heading', { level: 2, name: 'Send plans' }) }).last();
  await panel.getByRole('radio', { name: 'Only the clients I choose' }).check();
  await panel.getByRole('checkbox', { name: new RegExp(client.name) }).check();
  await panel.getByLabel('Personal note (optional)').fill(note);
  await expectNoSeriousA11yViolations(page, 'week board with the send panel');
  await panel.getByRole('button', { name: 'Send to 1 client' }).click();
  await expect(panel.getByText(/1 plan queued/)).toBeVisible();
  // The batch's progress follows the outbox until the worker has handed the message to SMTP.
  await expect(panel.getByText(/^1 sent · 0 waiting/)).toBeVisible({ timeout: 30_000 });

  // The outbox lists it as sent.
  await page.goto('/outbox');
  const row = page.getByRole('row').filter({ hasText: client.email }).first();
  await expect(row.getByRole('cell').first()).toHaveText(/^\W*Sent$/, { timeout: 15_000 });
  await expect(row.getByText(/^Attached: the week plan \(PDF\)/)).toBeVisible();
  await expectNoSeriousA11yViolations(page, 'outbox');

  // The caught message: to that client, with our note in its text and a PDF attachment.
  await page.goto('/dev/mail');
  await expect(page.getByRole('heading', { level: 1, name: 'Caught mail' })).toBeVisible();
  // Newest first: the first message to that client with a PDF attached.
  const item = page.getByRole('listitem').filter({ hasText: `To ${client.email}` }).filter({ has: page.getByRole('link', { name: /\.pdf$/ }) }).first();
  await expect(item).toBeVisible({ timeout: 15_000 });
  await item.getByRole('button', { name: 'Read' }).click();
  await expect(item.getByText(note)).toBeVisible();
  const attachment = item.getByRole('link', { name: /\.pdf$/ });
  await expect(attachment).toBeVisible();
  await expect(item.getByText(/\(application\/pdf, \d+ KB\)/)).toBeVisible();
  // Dana's week has a frozen plate (the demo's Sunday breakfast): her thaw reminders ride along as a calendar file.
  await expect(item.getByRole('link', { name: /^thaw-reminders-\d{4}-\d{2}-\d{2}\.ics$/ })).toBeVisible();
  await expect(item.getByText(/the calendar file attached reminds you/)).toBeVisible();
  await expectNoSeriousA11yViolations(page, 'caught mail');
  await page.screenshot({ path: `${SHOTS}/coach-sends-plan.png`, fullPage: true });

  // The attachment itself is a PDF: its content type and its first bytes.
  const res = await page.request.get((await attachment.getAttribute('href'))!);
  expect(res.status()).toBe(200);
  expect(res.headers()['content-type']).toMatch(/^application\/pdf/);
  const body = await res.body();
  expect(body.subarray(0, 5).toString('latin1')).toBe('%PDF-');
  expect(body.length).toBeGreaterThan(1000);
});
