import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startServer, type RunningServer } from './support/server.js';
import { openBrowser, screenshot, type Browser } from './support/browser.js';

describe('the installable shell on a phone', () => {
  let server: RunningServer;
  let b: Browser;
  beforeAll(async () => {
    server = await startServer();
    b = await openBrowser();
  });
  afterAll(async () => {
    await b?.close();
    await server?.stop();
  });

  it('signs in, installs its service worker, and still shows the shell offline after a reload', async () => {
    const { page, context } = b;
    await page.goto(server.baseUrl);
    await page.getByLabel(/e-mail/i).fill('crew@gannetbay.example');
    await page.getByLabel(/password/i).fill('surf-demo-2026');
    await screenshot(page, 'sign-in-phone');
    await page.getByRole('button', { name: /sign in/i }).click();
    await expect.poll(() => page.getByText('Sam Whitcombe').first().isVisible(), { timeout: 15_000 }).toBe(true);

    const manifest = await page.evaluate(async () => {
      const href = document.querySelector('link[rel="manifest"]')?.getAttribute('href');
      return href ? (await fetch(href)).json() : null;
    });
    expect(manifest).toMatchObject({ name: 'Breakline', display: 'standalone' });
    expect(manifest.icons.map((i: { sizes: string }) => i.sizes)).toEqual(expect.arrayContaining(['192x192', '512x512']));

    await page.evaluate(() => navigator.serviceWorker.ready.then(() => true));
    await page.reload();
    await expect.poll(() => page.evaluate(() => !!navigator.serviceWorker.controller), { timeout: 15_000 }).toBe(true);
    await screenshot(page, 'today-phone-online');

    await context.setOffline(true);
    await page.reload();
    await expect.poll(() => page.getByText('Sam Whitcombe').first().isVisible(), { timeout: 15_000 }).toBe(true);
    await expect.poll(() => page.getByRole('navigation').first().isVisible()).toBe(true);
    await screenshot(page, 'today-phone-offline');
    await context.setOffline(false);
  });

  it('keeps what was typed and says why when the sign-in is refused', async () => {
    const { page } = b;
    await page.evaluate(() => localStorage.clear());
    await page.goto(server.baseUrl);
    await page.getByLabel(/e-mail/i).fill('driver@gannetbay.example');
    await page.getByLabel(/password/i).fill('not-the-password');
    await page.getByRole('button', { name: /sign in/i }).click();
    await expect.poll(() => page.getByText('E-mail or password is not right.').isVisible(), { timeout: 10_000 }).toBe(true);
    expect(await page.getByLabel(/e-mail/i).inputValue()).toBe('driver@gannetbay.example');
  });
});
