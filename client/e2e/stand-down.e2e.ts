import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Locator, Page } from 'playwright-core';
import { startServer, type RunningServer } from './support/server.js';
import { join } from 'node:path';
import { ARTIFACTS, DESKTOP, openBrowser, screenshot, type Browser } from './support/browser.js';

// A boat of its own, added by the supervisor at the start, so other browser tests' boats are untouched.
const BOAT = 'IRB 7 · Tern';
const FAILED = 'Drain bungs in and secure';

async function signIn(page: Page, baseUrl: string, email: string, name: string) {
  await page.goto(baseUrl);
  await page.getByLabel(/e-mail/i).fill(email);
  await page.getByLabel(/password/i).fill('surf-demo-2026');
  await page.getByRole('button', { name: /sign in/i }).click();
  await expect.poll(() => page.getByText(name).first().isVisible(), { timeout: 15_000 }).toBe(true);
}

const allSent = (page: Page) =>
  expect.poll(() => page.getByRole('button', { name: /^Sync: / }).getAttribute('aria-label'), { timeout: 30_000 }).toMatch(/^Sync: Last synced/);

/** The supervisor adds the boat with the maker's range (invented figures) for its three chambers. */
async function addBoat(page: Page) {
  await page.getByRole('link', { name: 'Fleet: add and edit boats and motors' }).click();
  await page.getByRole('link', { name: 'Add a boat' }).click();
  await page.getByLabel('Fleet number').fill('IRB 7');
  await page.getByLabel('Name', { exact: true }).fill('Tern');
  for (const n of [1, 2, 3]) {
    const chamber = page.getByRole('group', { name: `Air chamber ${n}` });
    await chamber.getByLabel('Lowest (kPa)').fill('17');
    await chamber.getByLabel('Highest (kPa)').fill('24');
  }
  await page.getByRole('button', { name: 'Save boat' }).click();
  await page.getByRole('heading', { name: BOAT }).waitFor();
  await allSent(page);
}

/** Answers every item on the runner's screen as fit, the way a crew member would tap it. */
async function passScreen(page: Page) {
  const items = page.locator('main section[aria-label]');
  for (let i = 0; i < (await items.count()); i++) {
    const item = items.nth(i);
    if (await item.getByRole('button', { name: 'Save reading' }).count()) {
      await item.getByRole('textbox').fill('20');
      await item.getByRole('button', { name: 'Save reading' }).click();
      await item.getByText(/^Saved: 20\.0 kPa, pass/).waitFor();
    } else if (await item.getByRole('button', { name: /^Save count/ }).count()) {
      await item.getByRole('button', { name: /^Save count/ }).click();
      await item.getByText(/^Saved: .* Pass$/).waitFor();
    } else if (await item.getByRole('button', { name: 'Pass', exact: true }).count()) {
      await item.getByRole('button', { name: 'Pass', exact: true }).click();
      await expect.poll(() => item.getByRole('button', { name: 'Pass', exact: true }).getAttribute('aria-pressed')).toBe('true');
    }
  }
}

/** What the person sees on the screen now (the full-page shots stretch the fixed bars). */
async function seen(page: Page, name: string, centre?: Locator) {
  await centre?.evaluate((el) => el.scrollIntoView({ block: 'center' }));
  await page.screenshot({ path: join(ARTIFACTS, `${name}.png`) });
}

const reasons = (card: Locator) => card.getByRole('list', { name: /^Why Tern is/ }).innerText();

describe('a failed launch check on a phone with no signal reaches the supervisor', () => {
  let server: RunningServer;
  let crew: Browser;
  let supervisor: Browser;
  let admin: Browser;
  beforeAll(async () => {
    server = await startServer();
    crew = await openBrowser();
    supervisor = await openBrowser(DESKTOP);
    admin = await openBrowser();
  });
  afterAll(async () => {
    await crew?.close();
    await supervisor?.close();
    await admin?.close();
    await server?.stop();
  });

  it('stands the boat down with its reason, takes a defect with a photo in two taps, and syncs both', async () => {
    const desk = supervisor.page;
    await signIn(desk, server.baseUrl, 'captain@gannetbay.example', 'Tomas Varga');
    await addBoat(desk);

    const { page, context } = crew;
    await signIn(page, server.baseUrl, 'crew@gannetbay.example', 'Sam Whitcombe');
    await page.evaluate(() => navigator.serviceWorker.ready.then(() => true));
    await page.reload();
    await expect.poll(() => page.evaluate(() => !!navigator.serviceWorker.controller), { timeout: 15_000 }).toBe(true);
    await expect.poll(() => page.getByRole('article', { name: BOAT }).isVisible(), { timeout: 15_000 }).toBe(true);
    expect(await page.getByRole('article', { name: BOAT }).getByText('Unchecked', { exact: true }).count()).toBe(1);

    // No signal from here on: everything is saved on the phone.
    await context.setOffline(true);
    const nav = page.getByRole('navigation', { name: 'Main' });
    await nav.getByRole('link', { name: 'Checks', exact: true }).click();
    await page.getByRole('link', { name: 'Launch check', exact: true }).click();
    await page.getByRole('button', { name: BOAT, exact: true }).click();
    await page.getByRole('button', { name: 'Start launch check on Tern' }).click();
    await page.getByRole('heading', { name: 'Hull and fittings' }).waitFor();

    await passScreen(page);
    const bungs = page.getByRole('region', { name: FAILED });
    await bungs.getByRole('button', { name: 'Fail', exact: true }).click();
    const report = bungs.getByRole('button', { name: 'Report a defect' });
    await report.waitFor();
    await seen(page, 'stand-down-1-runner-failed-item', bungs);

    // Two taps: Report a defect, then Take a photo and save (the camera opens; the photo saves the defect).
    const photo = await page.evaluate(() => {
      const c = document.createElement('canvas');
      c.width = 640;
      c.height = 480;
      const g = c.getContext('2d')!;
      g.fillStyle = '#5d7f8c';
      g.fillRect(0, 0, 640, 480);
      g.fillStyle = '#1d1d1d';
      g.beginPath();
      g.arc(320, 240, 60, 0, Math.PI * 2);
      g.fill();
      return c.toDataURL('image/png').split(',')[1]!;
    });
    await report.click();
    const dialog = page.getByRole('dialog', { name: 'Report a defect' });
    await dialog.waitFor();
    await seen(page, 'stand-down-2-defect-dialog');
    const [chooser] = await Promise.all([page.waitForEvent('filechooser'), dialog.getByRole('button', { name: 'Take a photo and save' }).click()]);
    await chooser.setFiles({ name: 'drain-bung.png', mimeType: 'image/png', buffer: Buffer.from(photo, 'base64') });
    await bungs.getByRole('link', { name: 'Open the defect' }).waitFor({ timeout: 10_000 });
    expect(await bungs.getByRole('status').innerText()).toBe('Defect reported: stand-down, 1 photo, saved on this phone.');
    await seen(page, 'stand-down-3-runner-defect-reported', bungs);

    for (let screen = 2; screen <= 6; screen++) {
      await page.getByRole('button', { name: 'Next', exact: true }).click();
      await page.getByText(`${screen} of 6`).waitFor();
      await passScreen(page);
    }
    await page.getByRole('button', { name: 'Review', exact: true }).click();
    await expect.poll(() => page.getByText('Drain bungs in and secure failed: this stands the boat down. Do not launch.').isVisible()).toBe(true);
    await page.getByRole('button', { name: 'Finish launch check' }).click();
    await page.getByRole('heading', { name: 'Launch check complete' }).waitFor();

    // The boat's state, worked out on the phone with no signal.
    await nav.getByRole('link', { name: 'Today', exact: true }).click();
    const card = page.getByRole('article', { name: BOAT });
    await card.getByText('Stood down', { exact: true }).waitFor();
    expect(await reasons(card)).toMatch(/Stood down: Drain bungs in and secure failed; launch check \d{4}-\d\d-\d\d/);
    expect(await reasons(card)).toMatch(/Stood down: defect "Drain bungs in and secure: failed" raised/);
    await seen(page, 'stand-down-4-today-phone-offline', card.getByText('Stood down', { exact: true }));
    await screenshot(page, 'stand-down-4-today-phone-offline-full');

    await card.getByRole('link').first().click();
    await page.getByRole('heading', { name: BOAT }).waitFor();
    await seen(page, 'stand-down-5-boat-file-phone');
    await page.getByRole('link', { name: /Drain bungs in and secure: failed/ }).first().click();
    await page.getByText('Stood down: do not launch until a supervisor verifies the repair and returns the boat to service.').waitFor();
    await expect.poll(() => page.getByRole('img', { name: 'Defect photo' }).count()).toBe(1);
    await seen(page, 'stand-down-6-defect-phone');

    // Signal again: the outbox and the photo go without anyone pressing a button.
    await context.setOffline(false);
    await allSent(page);

    // The supervisor's desktop fetches and sees the same state and the defect.
    await desk.getByRole('link', { name: 'Today', exact: true }).first().click();
    await desk.getByRole('button', { name: /^Sync: / }).click();
    await desk.getByRole('button', { name: 'Sync now' }).click();
    await desk.getByRole('button', { name: 'Close' }).click();
    const deskCard = desk.getByRole('article', { name: BOAT });
    await expect.poll(() => deskCard.getByText('Stood down', { exact: true }).isVisible(), { timeout: 20_000 }).toBe(true);
    expect(await reasons(deskCard)).toMatch(/Stood down: Drain bungs in and secure failed; launch check/);
    await screenshot(desk, 'stand-down-7-supervisor-today');
    await desk.getByRole('link', { name: 'Defects', exact: true }).first().click();
    const row = desk.getByRole('link', { name: /Drain bungs in and secure: failed/ });
    await row.waitFor();
    expect(await row.innerText()).toMatch(/Tern[\s\S]*Open · reported \d{4}-\d\d-\d\d · 1 photo/);
    await row.click();
    await desk.getByText('Stood down: do not launch until a supervisor verifies the repair and returns the boat to service.').waitFor();
    // The photo went up from the phone and comes down to the desk.
    await expect.poll(() => desk.getByRole('img', { name: 'Defect photo' }).count(), { timeout: 30_000 }).toBe(1);
    await screenshot(desk, 'stand-down-8-supervisor-defect');
  }, 180_000);

  it('lets an admin edit the launch check on a phone; the check already run keeps the version it was run against', async () => {
    const { page } = admin;
    await signIn(page, server.baseUrl, 'admin@gannetbay.example', 'Mara Okonkwo-Hale');
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'More', exact: true }).click();
    await page.getByRole('link', { name: /^Check templates/ }).click();
    await page.getByRole('link', { name: 'Edit the launch check' }).click();
    await page.getByRole('heading', { name: 'Launch check template' }).waitFor();
    await seen(page, 'template-1-editor-phone');

    const hull = page.getByRole('region', { name: 'Section 1: Hull and fittings' });
    await hull.getByRole('button', { name: 'Edit section 1' }).click();
    const bungs = hull.getByRole('region', { name: 'Item 2' });
    await bungs.getByLabel('What to check').fill('Drain bungs in, tight and secured');
    await bungs.getByRole('button', { name: 'Minor: a failure limits the boat' }).click();
    await bungs.getByLabel('What to check').fill('');
    await page.getByRole('button', { name: 'Save as version 2' }).click();
    const summary = page.getByRole('alert').filter({ hasText: 'Not saved yet' });
    await summary.waitFor();
    await seen(page, 'template-2-editor-phone-refused', summary);
    expect(await summary.innerText()).toContain('Section 1 (Hull and fittings), item 2: Say what to check');
    // Nothing typed is lost: the minor choice is still set; fix the box and save.
    expect(await bungs.getByRole('button', { name: 'Minor: a failure limits the boat' }).getAttribute('aria-pressed')).toBe('true');
    await bungs.getByLabel('What to check').fill('Drain bungs in, tight and secured');
    await seen(page, 'template-3-editor-phone-item', bungs);
    await page.getByRole('button', { name: 'Save as version 2' }).click();
    await page.getByText(/^Saved as version 2\./).waitFor();
    await seen(page, 'template-4-editor-phone-saved');
    await allSent(page);

    // On the supervisor's desk: the boat is still stood down by version 1's critical item, in its words.
    const desk = supervisor.page;
    await desk.getByRole('button', { name: /^Sync: / }).click();
    await desk.getByRole('button', { name: 'Sync now' }).click();
    await desk.getByRole('button', { name: 'Close' }).click();
    await desk.getByRole('link', { name: 'Today', exact: true }).first().click();
    const card = desk.getByRole('article', { name: BOAT });
    await card.getByText('Stood down', { exact: true }).waitFor();
    expect(await reasons(card)).toMatch(/Stood down: Drain bungs in and secure failed; launch check/);
    // And the next check starts from version 2, on the crew's phone once it syncs.
    await desk.goto(`${server.baseUrl}/admin/templates`);
    const versions = desk.getByRole('list', { name: 'Launch check versions' });
    await versions.waitFor();
    expect(await versions.getByRole('listitem').first().innerText()).toMatch(/^Version 2 \(in use\)/);
    await screenshot(desk, 'template-5-versions-desk');
  }, 180_000);
});
