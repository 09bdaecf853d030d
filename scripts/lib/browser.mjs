// Headless Chromium for the scripts (bench), with the same flags and phone as the browser tests.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

export const CHROMIUM_ARGS = ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking',
  '--disable-component-update', '--disable-sync'];
export const PHONE = { viewport: { width: 390, height: 844 }, deviceScaleFactor: 2, isMobile: true, hasTouch: true };

/**
 * A fresh profile folder each time (launch() refuses --user-data-dir, so a persistent context).
 * playwright-core is passed in: scripts load npm packages only after installing them.
 */
export async function openChromium(playwright, executablePath, device = PHONE) {
  const profile = mkdtempSync(join(tmpdir(), 'breakline-bench-chromium-'));
  const context = await playwright.chromium.launchPersistentContext(profile, { executablePath, headless: true, args: CHROMIUM_ARGS, ...device });
  const page = context.pages()[0] ?? (await context.newPage());
  return {
    context,
    page,
    close: async () => {
      await context.close();
      rmSync(profile, { recursive: true, force: true });
    },
  };
}
