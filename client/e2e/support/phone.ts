// Steps on a phone shared by the offline tests: sign in with the service worker in control, read the sync status.
import type { BrowserContext, Page } from 'playwright-core';
import { expect } from 'vitest';

export const DEMO_PASSWORD = 'surf-demo-2026';

/** Signs in and reloads once so the service worker controls the page: it can then reload offline. */
export async function signInOnPhone(page: Page, baseUrl: string, email: string, displayName: string): Promise<void> {
  await page.goto(baseUrl);
  await page.getByLabel(/e-mail/i).fill(email);
  await page.getByLabel(/password/i).fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: /sign in/i }).click();
  await expect.poll(() => page.getByText(displayName).first().isVisible(), { timeout: 15_000 }).toBe(true);
  await page.evaluate(() => navigator.serviceWorker.ready.then(() => true));
  await page.reload();
  await expect.poll(() => page.evaluate(() => !!navigator.serviceWorker.controller), { timeout: 15_000 }).toBe(true);
  await waitForSyncHeadline(page, /^Sync: Last synced/);
}

/** The one-line summary on the Sync status button in the top bar. */
export function syncHeadline(page: Page): Promise<string | null> {
  return page.getByRole('button', { name: /^Sync: / }).first().getAttribute('aria-label');
}

export async function waitForSyncHeadline(page: Page, pattern: RegExp, timeout = 30_000): Promise<void> {
  await expect.poll(() => syncHeadline(page), { timeout }).toMatch(pattern);
}

/** Opens the Sync status details; returns the dialog's text. */
export async function openSyncDetails(page: Page): Promise<string> {
  await page.getByRole('button', { name: /^Sync: / }).first().click();
  const dialog = page.getByRole('dialog', { name: 'Sync' });
  await dialog.waitFor();
  return (await dialog.textContent()) ?? '';
}

export async function closeSyncDetails(page: Page): Promise<void> {
  await page.getByRole('dialog', { name: 'Sync' }).getByRole('button', { name: 'Close' }).click();
  await page.getByRole('dialog', { name: 'Sync' }).waitFor({ state: 'hidden' });
}

/** Offline in the page and its service worker, as a phone out of coverage. */
export async function goOffline(context: BrowserContext, page: Page): Promise<void> {
  await context.setOffline(true);
  await expect.poll(() => page.evaluate(() => navigator.onLine)).toBe(false);
}

export async function goOnline(context: BrowserContext, page: Page): Promise<void> {
  await context.setOffline(false);
  await expect.poll(() => page.evaluate(() => navigator.onLine)).toBe(true);
}

/** Picks an option of an MUI select by its label and the option's text. */
export async function choose(page: Page, label: string | RegExp, option: string | RegExp): Promise<void> {
  await page.getByRole('combobox', { name: label }).click();
  await page.getByRole('option', { name: option }).click();
}
