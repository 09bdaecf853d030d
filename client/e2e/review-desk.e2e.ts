// The supervisor's desk on a desktop: a conflict two phones made offline is settled there and
// reaches both phones; each desk screen is photographed for review.
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startServer, type RunningServer } from './support/server.js';
import { DESKTOP, openBrowser, screenshot, type Browser } from './support/browser.js';
import { queryRows } from './support/database.js';
import { DEMO_PASSWORD, goOffline, goOnline, signInOnPhone, waitForSyncHeadline } from './support/phone.js';

const unique = () => Math.random().toString(36).slice(2, 8);

async function boatId(fleetNumber: string): Promise<string> {
  const [row] = await queryRows<{ id: string }>(
    `select b.id from boats b join clubs c on c.id = b.club_id where c.slug = 'gannet-bay' and b.fleet_number = $1 and not b.deleted`,
    [fleetNumber],
  );
  if (!row) throw new Error(`The demo club has no boat ${fleetNumber}; did the seed run?`);
  return row.id;
}

async function notesOnServer(id: string): Promise<string | undefined> {
  return (await queryRows<{ notes: string }>('select notes from boats where id = $1', [id]))[0]?.notes;
}

async function editBoatNotes(page: Page, baseUrl: string, id: string, notes: string): Promise<void> {
  await page.goto(`${baseUrl}/fleet/boats/${id}`);
  await page.getByLabel('Notes').fill(notes);
  await page.getByRole('button', { name: 'Save boat' }).click();
  await page.waitForURL(new RegExp(`/boats/${id}$`));
}

/** Presses Sync now in the Sync status, then waits for the sync to finish with nothing left to send. */
async function syncNow(page: Page): Promise<void> {
  await page.getByRole('button', { name: /^Sync: / }).first().click();
  const dialog = page.getByRole('dialog', { name: 'Sync' });
  await dialog.getByRole('button', { name: 'Sync now' }).click();
  await dialog.getByRole('button', { name: 'Close' }).click();
  await dialog.waitFor({ state: 'hidden' });
  await waitForSyncHeadline(page, /^Sync: Last synced/);
}

async function signInAtDesk(page: Page, baseUrl: string, email: string, name: string): Promise<void> {
  await page.goto(baseUrl);
  await page.getByLabel(/e-mail/i).waitFor({ timeout: 60_000 });
  await page.getByLabel(/e-mail/i).fill(email);
  await page.getByLabel(/password/i).fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: /sign in/i }).click();
  await expect.poll(() => page.getByText(name).first().isVisible(), { timeout: 15_000 }).toBe(true);
  await waitForSyncHeadline(page, /^Sync: Last synced/);
}

/** Opens a desk screen and waits for what shows it has loaded, then photographs it. */
async function shoot(page: Page, url: string, ready: () => Promise<boolean>, name: string): Promise<void> {
  await page.goto(url);
  await expect.poll(ready, { timeout: 20_000 }).toBe(true);
  // Charts and grids finish laying out a frame after their data arrives.
  await page.evaluate(() => new Promise((r) => requestAnimationFrame(() => requestAnimationFrame(r))));
  await screenshot(page, name);
}

describe('the Review desk on a desktop', () => {
  let server: RunningServer;
  const browsers: Browser[] = [];
  const open = async (device?: typeof DESKTOP) => {
    const b = await openBrowser(device);
    browsers.push(b);
    return b;
  };
  beforeAll(async () => {
    server = await startServer();
  });
  afterAll(async () => {
    await Promise.all(browsers.splice(0).map((b) => b.close()));
    await server?.stop();
  });

  it('settles a conflict two phones made offline, and both phones show the settled value after syncing', async () => {
    const boat = await boatId('IRB 2');
    const [phoneA, phoneB] = [await open(), await open()];
    await signInOnPhone(phoneA.page, server.baseUrl, 'captain@gannetbay.example', 'Tomas Varga');
    await signInOnPhone(phoneB.page, server.baseUrl, 'admin@gannetbay.example', 'Mara Okonkwo-Hale');
    const tag = unique();
    const notesA = `Second boat; tow rope frayed, replaced (${tag})`;
    const notesB = `Second boat; tow rope frayed, do not tow with it (${tag})`;
    const settled = `Second boat; tow rope replaced and checked by the gear officer (${tag})`;

    await goOffline(phoneA.context, phoneA.page);
    await goOffline(phoneB.context, phoneB.page);
    await editBoatNotes(phoneA.page, server.baseUrl, boat, notesA);
    await editBoatNotes(phoneB.page, server.baseUrl, boat, notesB);
    await goOnline(phoneA.context, phoneA.page);
    await expect.poll(() => notesOnServer(boat), { timeout: 30_000 }).toBe(notesA);
    await goOnline(phoneB.context, phoneB.page);
    await expect.poll(async () => (await queryRows(
      `select id from sync_conflicts where record_id = $1 and field = 'notes' and status = 'open' and (kept_value #>> '{}' = $2 or overruled_value #>> '{}' = $2)`,
      [boat, notesB],
    )).length, { timeout: 30_000 }).toBe(1);

    const desk = await open(DESKTOP);
    const { page } = desk;
    await signInAtDesk(page, server.baseUrl, 'captain@gannetbay.example', 'Tomas Varga');
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Review desk' }).click();
    await page.getByRole('tab', { name: /^Conflicts/ }).click();
    const card = page.getByRole('article').filter({ hasText: tag });
    await card.waitFor({ timeout: 20_000 });
    // Both values side by side, each with who wrote it.
    expect(await card.textContent()).toContain(notesA);
    expect(await card.textContent()).toContain(notesB);
    expect(await card.textContent()).toContain('Tomas Varga');
    expect(await card.textContent()).toContain('Mara Okonkwo-Hale');
    await screenshot(page, 'desk-conflicts');

    await card.getByLabel('Write another value').check();
    await card.getByLabel('New value').fill(settled);
    await card.getByLabel('Note: why this value (kept with the decision)').fill('Checked the boat in the shed; both notes were out of date.');
    await card.getByRole('button', { name: 'Settle this conflict' }).click();
    await card.waitFor({ state: 'detached', timeout: 20_000 });
    await expect.poll(() => notesOnServer(boat), { timeout: 15_000 }).toBe(settled);
    const [row] = await queryRows<{ status: string; note: string }>(
      `select status, note from sync_conflicts where record_id = $1 and field = 'notes' and settled_value #>> '{}' = $2`, [boat, settled]);
    expect(row).toEqual({ status: 'settled', note: 'Checked the boat in the shed; both notes were out of date.' });

    for (const phone of [phoneA, phoneB]) {
      await syncNow(phone.page);
      await phone.page.goto(`${server.baseUrl}/boats/${boat}`);
      await expect.poll(() => phone.page.getByText(settled).first().isVisible(), { timeout: 20_000 }).toBe(true);
      expect(await phone.page.getByText(notesA).count()).toBe(0);
      expect(await phone.page.getByText(notesB).count()).toBe(0);
    }
    await screenshot(phoneB.page, 'desk-settled-on-phone');

    // The boat's page on the desk lists every version: the two phones' edits and the settlement.
    await page.goto(`${server.baseUrl}/review/records/boat/${boat}`);
    const versions = page.getByRole('listitem').filter({ hasText: /^Version \d+/ });
    await expect.poll(() => versions.filter({ hasText: 'a supervisor settled a conflict' }).filter({ hasText: settled }).count(), { timeout: 20_000 }).toBe(1);
    expect(await versions.filter({ hasText: notesA }).count()).toBeGreaterThan(0);
    expect(await versions.filter({ hasText: notesB }).count()).toBeGreaterThan(0);
    await screenshot(page, 'desk-record-versions');
    // Three browsers and two syncs each: on a busy two-core machine this takes a minute or more.
  }, 240_000);

  it('shows each desk screen on a desktop', async () => {
    const desk = await open(DESKTOP);
    const { page } = desk;
    await signInAtDesk(page, server.baseUrl, 'admin@gannetbay.example', 'Mara Okonkwo-Hale');
    const base = server.baseUrl;
    // A table has loaded when its count line shows ("12 checks in all").
    const counted = (words: string) => () => page.getByText(new RegExp(`^\\d+ ${words} in all$`)).isVisible();
    await shoot(page, `${base}/review?tab=checks`, counted('checks'), 'desk-checks');
    await shoot(page, `${base}/review?tab=trips`, counted('trips'), 'desk-trips');
    await shoot(page, `${base}/review?tab=defects`, counted('defects'), 'desk-defects');
    await shoot(page, `${base}/review?tab=incidentNotes`, counted('incident notes'), 'desk-incident-notes');

    // A row opens its record with every version.
    await page.goto(`${base}/review?tab=defects`);
    await page.getByRole('grid', { name: 'Defects' }).getByRole('link', { name: /Open the record/ }).first().click();
    await expect.poll(() => page.getByText('Every version, newest first').isVisible(), { timeout: 20_000 }).toBe(true);
    await screenshot(page, 'desk-defect-record');

    await shoot(page, `${base}/review/day`, () => page.getByRole('heading', { name: "Day's sign-off" }).isVisible(), 'desk-day-log');
    await shoot(page, `${base}/season-report`, () => page.getByRole('region', { name: 'Trips by purpose' }).isVisible(), 'desk-season-report');
    await shoot(page, `${base}/crew-awards`, () => page.getByRole('table', { name: 'Crew awards' }).isVisible(), 'desk-crew-awards');
    await shoot(page, `${base}/admin`, () => page.getByRole('table', { name: 'Members' }).isVisible(), 'desk-members');

    // Invite someone, then read the invitation the local mail catcher caught.
    const email = `new.crew.${unique()}@example.org`;
    const form = page.getByRole('form', { name: 'Invite a member' });
    await form.getByLabel('E-mail address').fill(email);
    await form.getByRole('button', { name: 'Send invitation' }).click();
    await expect.poll(() => page.getByRole('table', { name: 'Invitations' }).getByText(email).isVisible(), { timeout: 15_000 }).toBe(true);
    if (process.env.MAIL_CAUGHT_DIR) {
      await shoot(page, `${base}/admin/mail`, () => page.getByRole('list', { name: 'Caught e-mails' }).getByText(email).first().isVisible(), 'desk-caught-mail');
    }
  }, 180_000);
});
