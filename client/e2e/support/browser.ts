// A fresh Chromium profile per test file, with the flags this machine needs.
import { mkdtempSync, mkdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { chromium, type BrowserContext, type Page } from 'playwright-core';

export const ARTIFACTS = fileURLToPath(new URL('../../../test-artifacts/', import.meta.url));

export const PHONE = { viewport: { width: 390, height: 844 }, deviceScaleFactor: 2, isMobile: true, hasTouch: true };
export const DESKTOP = { viewport: { width: 1366, height: 900 } };

export interface Browser { context: BrowserContext; page: Page; close: () => Promise<void> }

export async function openBrowser(device: typeof PHONE | typeof DESKTOP = PHONE): Promise<Browser> {
  const profile = mkdtempSync(join(tmpdir(), 'breakline-chromium-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    headless: true,
    args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking',
      '--disable-component-update', '--disable-sync'],
    ...device,
  });
  const page = context.pages()[0] ?? (await context.newPage());
  return {
    context, page,
    close: async () => { await context.close(); rmSync(profile, { recursive: true, force: true }); },
  };
}

export async function screenshot(page: Page, name: string) {
  mkdirSync(ARTIFACTS, { recursive: true });
  await page.screenshot({ path: join(ARTIFACTS, `${name}.png`), fullPage: true });
}
