import { expect, test, type Locator, type Page } from '@playwright/test';
import { expectNoSeriousA11yViolations, signIn, SHOTS, unique } from './support';

/** Picks an ingredient in the tray editor's ARIA combobox with the keyboard (type, ArrowDown, Enter). */
async function pickIngredient(page: Page, line: number, search: string, option: RegExp) {
  const box = page.getByRole('combobox', { name: `Ingredient ${line}` });
  await box.fill(search);
  await expect(page.getByRole('option', { name: option }).first()).toBeVisible();
  await box.press('ArrowDown');
  await box.press('ArrowUp');
  await expect(page.getByRole('option', { name: option, selected: true })).toBeVisible();
  await box.press('Enter');
  await expect(box).toHaveValue(option);
}

/**
 * Drags a palette item onto a cell with the keyboard only (@dnd-kit KeyboardSensor: Space picks up, each arrow
 * press moves 25 px, Space drops). Steers by where the two boxes are after each press, so an auto-scroll of the
 * board while dragging does not throw it off.
 */
async function keyboardDrag(page: Page, item: Locator, target: Locator) {
  await target.scrollIntoViewIfNeeded();
  await item.scrollIntoViewIfNeeded();
  await item.focus();
  await expect(item).toBeFocused();
  await page.keyboard.press('Space');
  for (let i = 0; i < 120; i++) {
    const from = (await item.boundingBox())!;
    const to = (await target.boundingBox())!;
    const dx = to.x + to.width / 2 - (from.x + from.width / 2);
    const dy = to.y + to.height / 2 - (from.y + from.height / 2);
    if (Math.abs(dx) <= to.width / 2 - 8 && Math.abs(dy) <= to.height / 2 - 8) break;
    if (Math.abs(dx) > to.width / 2 - 8) await page.keyboard.press(dx > 0 ? 'ArrowRight' : 'ArrowLeft');
    else await page.keyboard.press(dy > 0 ? 'ArrowDown' : 'ArrowUp');
  }
  // A screen reader hears where the plate is before it drops: the cell's own words.
  const where = ((await target.getAttribute('aria-label')) ?? '').split(':')[0];
  await expect(page.getByText(`Over ${where}`, { exact: true })).toBeAttached();
  await page.keyboard.press('Space');
  await expect(page.getByText(`Over ${where}`, { exact: true })).toHaveCount(0);
  // …and then what was dropped where, in words (not dnd-kit's internal ids).
  await expect(page.getByText(`dropped on ${where}.`)).toBeAttached();
}

test('the coach drafts a week: base tray, plate, board (keyboard drag and cell panel), warning cleared, published, bake run', async ({ page, browser, baseURL }) => {
  test.setTimeout(120_000);
  const trayName = unique('E2E cheddar egg slab');
  const plateName = unique('E2E cheddar slab plate');
  const weekName = unique('E2E week');

  await signIn(page, 'coach@trayline.test');

  // 1. A base tray: two ingredients through the combobox, amounts, pan and a 4 × 6 cut plan; live numbers show.
  await page.goto('/trays/new');
  await expect(page.getByRole('heading', { name: 'New base tray' })).toBeVisible();
  await page.getByLabel('Name', { exact: true }).fill(trayName);
  await page.getByRole('button', { name: 'Add an ingredient' }).click();
  await pickIngredient(page, 1, 'eggs, whole', /^Eggs, whole, raw/);
  await page.getByLabel('Amount').nth(0).fill('24');
  await page.getByLabel('Unit').nth(0).selectOption('large');
  await page.getByRole('button', { name: 'Add an ingredient' }).click();
  await pickIngredient(page, 2, 'cheddar', /^Cheddar cheese/);
  await page.getByLabel('Amount').nth(1).fill('300');
  await page.getByLabel('Unit').nth(1).selectOption('g');
  await page.getByLabel('Pan', { exact: true }).selectOption({ index: 0 });
  await page.getByRole('radio', { name: 'Rows × columns' }).check();
  await page.getByRole('textbox', { name: 'Rows' }).fill('4');
  await page.getByRole('textbox', { name: 'Columns' }).fill('6');
  const live = page.locator('dl').filter({ hasText: 'Net carbs' });
  await expect(live.getByText('kcal')).toBeVisible({ timeout: 10_000 });
  await expect(page.getByText(/per portion of 24/)).toBeVisible();
  await expectNoSeriousA11yViolations(page, 'tray editor');
  await page.getByRole('button', { name: 'Create base tray' }).click();
  await expect(page).toHaveURL(/\/trays\/\d+$/);
  await expect(page.getByRole('heading', { name: trayName })).toBeVisible();
  await expectNoSeriousA11yViolations(page, 'tray page');

  // 2. A plate made of one portion of that tray.
  await page.goto('/plates');
  await page.getByRole('button', { name: 'New plate' }).click();
  await page.getByLabel('Plate name').fill(plateName);
  await page.getByRole('button', { name: 'Add a tray portion' }).click();
  await page.getByLabel('Base tray').selectOption({ label: trayName });
  await page.getByLabel('Portions').fill('1');
  // The plate's numbers while it is being made: one portion of the tray, with the tray's egg and milk.
  const platePreview = page.locator('div[aria-live="polite"]').filter({ hasText: 'This plate adds up to' });
  await expect(platePreview.getByText(/\d kcal/)).toBeVisible({ timeout: 10_000 });
  await expect(platePreview.getByText(/Contains: .*Milk, Egg|Contains: .*Egg, Milk/)).toBeVisible();
  await expectNoSeriousA11yViolations(page, 'plates editor');
  await page.getByRole('button', { name: 'Save plate' }).click();
  await expect(page.getByRole('heading', { name: plateName })).toBeVisible();

  // 3. A new prep week (next Monday by default).
  await page.goto('/weeks');
  await expectNoSeriousA11yViolations(page, 'prep weeks');
  await page.getByLabel('Name (optional)').fill(weekName);
  const startDate = await page.getByLabel('First day of the board').inputValue();
  await page.getByRole('button', { name: 'Create' }).click();
  await expect(page).toHaveURL(/\/weeks\/\d+$/);
  await expect(page.getByRole('heading', { name: weekName })).toBeVisible();
  const weekUrl = page.url();

  // 4. Keyboard only on the board: one plate by drag and drop onto Dana's first breakfast, another through the
  //    cell panel (focus the cell, Enter), then the cover action and publishing (focus, Enter).
  const danaCells = page.getByRole('button', { name: /^Dana Whitlock, .*, breakfast: / });
  const first = danaCells.nth(0);
  await expect(first).toHaveAccessibleName(/: empty$/);
  const item = page.getByRole('button', { name: new RegExp(`^${plateName}`) });
  await keyboardDrag(page, item, first);
  await expect(first).toHaveAccessibleName(new RegExp(`: ${plateName}`));

  const second = danaCells.nth(1);
  await second.focus();
  await page.keyboard.press('Enter');
  const panel = page.getByRole('region', { name: 'Selected cell' });
  // The cell's details open under its client's row, not after the whole board.
  await panel.scrollIntoViewIfNeeded();
  await expect(page.getByRole('row').filter({ has: panel })).toHaveCount(1);
  await expect(page.getByRole('row').filter({ has: panel }).locator('xpath=preceding-sibling::tr[1]')).toContainText('Dana Whitlock');
  // The cell panel's plate select (a native select: keyboard-operable as it is).
  await panel.getByLabel('Plate', { exact: true }).focus();
  await panel.getByLabel('Plate', { exact: true }).selectOption({ label: plateName });
  await expect(second).toHaveAccessibleName(new RegExp(`: ${plateName}`));

  // 4b. And with a mouse, on a screen wide enough to hold the plates beside the board: the plate lands where the
  //     pointer lets go of it (the live region names the cell under it first).
  //     Tall enough that neither the plate nor the cell sits in the band by the window's edge where a drag scrolls
  //     the page (a scroll under a still pointer would move another cell beneath it).
  await page.setViewportSize({ width: 1600, height: 1300 });
  const third = danaCells.nth(2);
  await expect(third).toHaveAccessibleName(/: empty$/);
  await page.evaluate(() => window.scrollTo(0, 0));
  await third.scrollIntoViewIfNeeded();
  const from = (await item.boundingBox())!;
  const to = (await third.boundingBox())!;
  await page.mouse.move(from.x + 12, from.y + 12);
  await page.mouse.down();
  await page.mouse.move(from.x + 40, from.y + 20, { steps: 4 });
  await page.mouse.move(to.x + to.width / 2, to.y + to.height / 2, { steps: 12 });
  await expect(page.getByText(/^Over Dana Whitlock, .*, breakfast$/)).toBeAttached();
  await page.mouse.up();
  await expect(third).toHaveAccessibleName(new RegExp(`: ${plateName}`));
  await page.setViewportSize({ width: 1280, height: 720 });

  // 5a. The plate has egg: on a client allergic to egg the board asks for a reason before it overrides.
  const eggRow = page.getByRole('rowheader').filter({ hasText: /⚠ .*\bEgg\b/ }).first();
  const eggClient = (await eggRow.locator('span.font-bold').first().textContent())!.trim();
  const eggCell = page.getByRole('button', { name: new RegExp(`^${eggClient}, .*, breakfast: empty$`) }).first();
  await eggCell.focus();
  await page.keyboard.press('Enter');
  await panel.getByLabel('Plate', { exact: true }).selectOption({ label: plateName });
  const prompt = page.getByRole('alertdialog', { name: 'Allergen conflict' });
  await expect(prompt).toBeVisible();
  await expectNoSeriousA11yViolations(page, 'allergen prompt');
  await prompt.getByLabel('Reason to override (kept with the plan)').fill('Cleared by the client in writing (e2e)');
  await prompt.getByRole('button', { name: 'Override with this reason' }).click();
  await expect(prompt).toBeHidden();
  await expect(page.getByText(/^Allergen override: Egg \(Cleared by the client in writing \(e2e\)\)/)).toBeVisible();

  // 5b. No trays are counted yet, so portions are short; the cover action clears the warning.
  await expect(page.getByRole('note').filter({ hasText: /portions? short/ })).toBeVisible();
  await expectNoSeriousA11yViolations(page, 'week board');
  await page.getByRole('button', { name: 'Set tray counts to cover the need' }).focus();
  await page.keyboard.press('Enter');
  await expect(page.getByText('Every portion is baked')).toBeVisible();
  await expect(page.getByRole('note').filter({ hasText: /portions? short/ })).toHaveCount(0);
  await expect(page.getByText('Nothing blocks publishing', { exact: true })).toBeVisible();

  // 6. Publish, then the bake run of that week shows its timeline.
  await page.getByRole('button', { name: 'Publish to clients' }).focus();
  await page.keyboard.press('Enter');
  await expect(page.getByText(/published v1/)).toBeVisible();
  await page.screenshot({ path: `${SHOTS}/coach-drafts-week-board.png`, fullPage: true });

  // 6b. Dana, on her phone, can look ahead: the new week is published and comes after the demo week she is on.
  const phone = await browser.newContext({ baseURL, viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true });
  const dana = await phone.newPage();
  await signIn(dana, 'client1@trayline.test');
  const ahead = dana.locator('div').filter({ has: dana.getByRole('heading', { level: 2, name: 'Next week' }) }).last();
  await expect(ahead.getByText(new RegExp(`^${weekName}, from `))).toBeVisible();
  await ahead.getByRole('button', { name: new RegExp(plateName) }).first().click();
  await expect(dana.getByRole('heading', { level: 2, name: plateName }).first()).toBeVisible();
  await expectNoSeriousA11yViolations(dana, 'my plates with next week');
  await phone.close();

  await page.goto(`${weekUrl}/bake-run`);
  await expect(page.getByRole('heading', { name: 'Bake run' })).toBeVisible();
  const timeline = page.getByRole('figure', { name: 'Bake run timeline' });
  await expect(timeline).toBeVisible();
  await expect(timeline.getByRole('listitem', { name: new RegExp(trayName) }).first()).toBeVisible();
  await expectNoSeriousA11yViolations(page, 'bake run');
  await page.screenshot({ path: `${SHOTS}/coach-drafts-week.png`, fullPage: true });

  // 7. The next week starts as a copy of this one (Dana's plates come along); a week made by mistake is deleted.
  await page.goto(weekUrl);
  await page.getByRole('link', { name: 'Copy to a new week' }).click();
  await expect(page.getByLabel('Start from')).toHaveValue(weekUrl.split('/').pop()!);
  // Five weeks after the new one (a day is on one board only; dates follow the calendar the run has).
  const copyStart = new Date(Date.parse(`${startDate}T12:00:00Z`) + 35 * 86_400_000);
  // The demo workspace writes dates month first, as en-US does ("Week of Mon, Jan 11").
  const copyTitle = `Week of ${copyStart.toLocaleDateString('en-US', { weekday: 'short', month: 'short', day: 'numeric', timeZone: 'UTC' })}`;
  await page.getByLabel('First day of the board').fill(copyStart.toISOString().slice(0, 10));
  await page.getByRole('button', { name: 'Copy', exact: true }).click();
  await expect(page.getByRole('heading', { name: copyTitle })).toBeVisible();
  await expect(page.getByRole('button', { name: new RegExp(`^Dana Whitlock, .*, breakfast: ${plateName}`) }).first()).toBeVisible();
  page.once('dialog', (d) => void d.accept());
  await page.getByRole('button', { name: 'Delete week' }).click();
  await expect(page).toHaveURL(/\/weeks$/);
  await expect(page.getByRole('link', { name: copyTitle })).toHaveCount(0);
});
