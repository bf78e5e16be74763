import sharp from 'sharp';
import { expect, test } from '@playwright/test';
import { SHOTS, signIn } from './support';

// The server here runs as `npm start` runs it: its files folder is the default .data/files.
test('the coach adds a photo to a base tray: it shows in the editor and on the library card, for the assistant too, and to nobody signed out', async ({ page, browser, baseURL }) => {
  const tray = 'Sausage and cheddar egg slab';
  // A plain 800 × 600 PNG made here (no file of anyone's).
  const png = await sharp({ create: { width: 800, height: 600, channels: 3, background: '#c97b3a' } }).png().toBuffer();
  await signIn(page, 'coach@trayline.test');
  await page.goto('/trays');
  await page.getByRole('link', { name: tray }).first().click();
  await expect(page.getByRole('heading', { level: 1, name: tray })).toBeVisible();
  await page.getByLabel('Choose a photo').setInputFiles({ name: 'slab.png', mimeType: 'image/png', buffer: png });
  const photo = page.getByRole('img', { name: `Photo of ${tray}` });
  // Drawn: the browser fetched and decoded it (a refused answer leaves a broken image of width 0).
  await expect.poll(() => photo.evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth)).toBe(800);
  await page.screenshot({ path: `${SHOTS}/coach-tray-photo.png` });
  const url = (await photo.getAttribute('src'))!;

  // The assistant's library card shows its thumbnail.
  const kitchen = await browser.newContext({ baseURL });
  const assistant = await kitchen.newPage();
  await signIn(assistant, 'assistant@trayline.test');
  await assistant.goto('/trays');
  const trayId = url.match(/\/api\/trays\/(\d+)\//)![1];
  const thumb = assistant.locator(`img[src*="/api/trays/${trayId}/thumbnail"]`);
  // (Loaded lazily: brought into view first.)
  await thumb.scrollIntoViewIfNeeded();
  await expect.poll(() => thumb.evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth)).toBeGreaterThan(0);
  await kitchen.close();

  // Nobody signed out gets it.
  const outside = await browser.newContext({ baseURL });
  expect((await outside.request.get(url)).status()).toBe(401);
  await outside.close();
});
