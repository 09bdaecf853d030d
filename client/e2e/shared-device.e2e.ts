import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startServer, type RunningServer } from './support/server.js';
import { openBrowser, screenshot, type Browser } from './support/browser.js';
import { queryRows } from './support/database.js';
import { choose, DEMO_PASSWORD, goOffline, goOnline, signInOnPhone, waitForSyncHeadline } from './support/phone.js';

const unique = () => Math.random().toString(36).slice(2, 8);

async function tapPin(page: Page, pin: string, then: string) {
  for (const d of pin) await page.getByRole('button', { name: d, exact: true }).click();
  await page.getByRole('button', { name: then, exact: true }).click();
}

async function choosePin(page: Page, pin: string) {
  await tapPin(page, pin, 'Next');
  await tapPin(page, pin, 'Save');
}

async function openAccountMenu(page: Page, name: string) {
  await page.getByRole('button', { name: `Account: ${name}` }).click();
}

async function raiseDefect(page: Page, baseUrl: string, description: string) {
  await page.goto(`${baseUrl}/defects/new`);
  await choose(page, 'Boat', /^IRB 1 ·/);
  await page.getByRole('button', { name: /^Limit:/ }).click();
  await page.getByLabel('What is wrong').fill(description);
  await page.getByRole('button', { name: 'Save defect' }).click();
  await page.waitForURL(/\/defects\/[0-9a-f-]{36}$/);
}

async function userId(email: string): Promise<string> {
  const [row] = await queryRows<{ id: string }>('select id from users where email = $1', [email]);
  if (!row) throw new Error(`No demo member ${email}; did the seed run?`);
  return row.id;
}

describe('the shed tablet: several members on one device', () => {
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

  it('adds a member, switches back with a PIN offline, and each one\'s defect reaches PostgreSQL as theirs', async () => {
    const { page, context } = b;
    const base = server.baseUrl;
    await signInOnPhone(page, base, 'crew@gannetbay.example', 'Sam Whitcombe');

    // Sam gets a PIN first, then Priya signs in once with her password and chooses hers.
    await openAccountMenu(page, 'Sam Whitcombe');
    await page.getByRole('menuitem', { name: 'Add a member to this device' }).click();
    await page.getByRole('heading', { name: 'First, a PIN for Sam Whitcombe' }).waitFor();
    await choosePin(page, '2580');
    await page.getByLabel(/e-mail/i).fill('driver@gannetbay.example');
    await page.getByLabel(/password/i).fill(DEMO_PASSWORD);
    await page.getByRole('button', { name: 'Sign in', exact: true }).click();
    await page.getByRole('heading', { name: 'Your PIN, Priya Lindholm' }).waitFor({ timeout: 15_000 });
    await choosePin(page, '1357');
    await page.getByRole('heading', { name: 'Today' }).waitFor({ timeout: 15_000 });
    await expect.poll(() => page.getByRole('banner').getByText('Priya Lindholm').isVisible()).toBe(true);
    // Her own copy of the club's records arrives while there is still a signal.
    await waitForSyncHeadline(page, /^Sync: Last synced/);

    // Out on the sand: Priya reports a defect, then Sam takes the tablet back with his PIN.
    await goOffline(context, page);
    const priyas = `Priya: kill cord clip cracked (${unique()})`;
    await raiseDefect(page, base, priyas);
    await openAccountMenu(page, 'Priya Lindholm');
    await page.getByRole('menuitem', { name: /Switch member/ }).click();
    await page.getByText('Sam Whitcombe').click();
    await page.getByText('Enter your PIN').waitFor();
    await screenshot(page, 'pin-entry-phone');
    await tapPin(page, '2580', 'OK');
    await page.getByRole('heading', { name: 'Today' }).waitFor({ timeout: 15_000 });
    await expect.poll(() => page.getByRole('banner').getByText('Sam Whitcombe').isVisible()).toBe(true);
    const sams = `Sam: bow handle strap worn (${unique()})`;
    await raiseDefect(page, base, sams);
    await page.goto(`${base}/members`);
    await expect.poll(() => page.getByText(/1 change waiting to be sent/).count()).toBe(2);
    await screenshot(page, 'switch-member-phone');
    expect(await queryRows('select id from defects where description = any($1)', [[priyas, sams]])).toEqual([]);

    // Back at the clubhouse: both go, each with its own member's tokens.
    await goOnline(context, page);
    const byOf = async (description: string) =>
      (await queryRows<{ reported_by: string; updated_by: string }>('select reported_by, updated_by from defects where description = $1', [description]))[0];
    await expect.poll(() => byOf(priyas), { timeout: 30_000 }).toBeDefined();
    await expect.poll(() => byOf(sams), { timeout: 30_000 }).toBeDefined();
    const priya = await userId('driver@gannetbay.example');
    const sam = await userId('crew@gannetbay.example');
    expect(await byOf(priyas)).toEqual({ reported_by: priya, updated_by: priya });
    expect(await byOf(sams)).toEqual({ reported_by: sam, updated_by: sam });
  }, 120_000);
});
