import { expect, type Page } from '@playwright/test';

export const DEMO_PASSWORD = 'trayline-demo';
export const SHOTS = '.data/screenshots';

export async function signIn(page: Page, email: string, password = DEMO_PASSWORD) {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page.getByRole('button', { name: /Sign out/ }).or(page.getByRole('button', { name: 'Menu' }))).toBeVisible();
}
