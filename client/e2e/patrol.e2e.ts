import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { startServer, type RunningServer } from './support/server.js';
import { join } from 'node:path';
import { ARTIFACTS, DESKTOP, openBrowser, PHONE, screenshot, type Browser } from './support/browser.js';

const PASSWORD = 'surf-demo-2026';
// The demo club's beach (server/src/seed/demo-scenario.ts), a little offshore.
const AT_SEA = { latitude: -33.2869, longitude: 151.5731 };

async function signIn(page: Page, baseUrl: string, email: string, name: string) {
  await page.goto(baseUrl);
  await page.getByLabel(/e-mail/i).fill(email);
  await page.getByLabel(/password/i).fill(PASSWORD);
  await page.getByRole('button', { name: /sign in/i }).click();
  await expect.poll(() => page.getByText(name).first().isVisible(), { timeout: 20_000 }).toBe(true);
}

/** What the phone's screen shows, from `locator`'s top: a driver's view rather than the whole page. */
async function screenAt(page: Page, locator: ReturnType<Page['locator']>, name: string) {
  // Below the app bar, which stays at the top of the screen.
  await locator.evaluate((el) => window.scrollTo(0, el.getBoundingClientRect().top + window.scrollY - 72));
  await page.screenshot({ path: join(ARTIFACTS, `${name}.png`) });
}

interface Pulled { id: string; kind: string; fields: Record<string, any> }

async function pullAs(baseUrl: string, email: string): Promise<Pulled[]> {
  const login = await fetch(`${baseUrl}/api/auth/login`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ email, password: PASSWORD }) });
  const { accessToken } = await login.json();
  const out: Pulled[] = [];
  let since = '';
  for (;;) {
    const res = await fetch(`${baseUrl}/api/sync/pull?limit=500${since ? `&since=${encodeURIComponent(since)}` : ''}`, { headers: { authorization: `Bearer ${accessToken}` } });
    const body = await res.json();
    out.push(...body.changes);
    if (!body.hasMore) return out;
    since = body.checkpoint;
  }
}

describe('on patrol, on a phone', () => {
  let server: RunningServer;
  let driver: Browser;
  let tripId = '';
  const note = 'Body-boarder towed back between the flags';

  beforeAll(async () => {
    server = await startServer();
    driver = await openBrowser(PHONE);
  });
  afterAll(async () => {
    await driver?.close();
    await server?.stop();
  });

  it('signs on, launches, times the trip, adds an incident note offline, retrieves, and sends both when back online', async () => {
    const { page, context } = driver;
    await signIn(page, server.baseUrl, 'driver@gannetbay.example', 'Priya Lindholm');
    // Installed, so the app opens with no signal.
    await page.evaluate(() => navigator.serviceWorker.ready.then(() => true));
    await page.reload();
    await expect.poll(() => page.evaluate(() => !!navigator.serviceWorker.controller), { timeout: 15_000 }).toBe(true);

    const card = page.getByRole('article', { name: 'IRB 1 · Shearwater' });
    // The demo's crew member signed on this morning; the pull brings it.
    await expect.poll(() => card.getByText('Crew: Sam Whitcombe').isVisible(), { timeout: 20_000 }).toBe(true);

    await card.getByRole('button', { name: 'Sign on to Shearwater' }).click();
    const dialog = page.getByRole('dialog', { name: 'Sign on to IRB 1 · Shearwater' });
    await expect.poll(() => dialog.getByRole('status').textContent()).toMatch(/^IRB driver award lapsing: valid until \d{4}-\d\d-\d\d \(1[78] days\)\. Renew it before it expires\.$/);
    await dialog.getByRole('button', { name: 'Sign on', exact: true }).click();
    await expect.poll(() => card.getByText('Driver: You').isVisible()).toBe(true);
    expect(await card.getByText('award lapsing').isVisible()).toBe(true);

    await card.getByRole('button', { name: 'Launch Shearwater' }).click();
    const timer = card.getByRole('timer', { name: 'Time on the water' });
    await expect.poll(() => timer.isVisible(), { timeout: 10_000 }).toBe(true);
    const first = await timer.textContent();
    await expect.poll(() => timer.textContent(), { timeout: 10_000 }).not.toBe(first);
    await screenshot(page, 'patrol-today-afloat');
    await screenAt(page, card, 'patrol-today-afloat-screen');

    await context.setOffline(true);
    await card.getByRole('link', { name: 'Trip details' }).click();
    await expect.poll(() => page.getByRole('heading', { name: 'Trip · Patrol' }).isVisible(), { timeout: 10_000 }).toBe(true);
    tripId = new URL(page.url()).pathname.split('/').at(-1)!;
    await page.getByRole('link', { name: 'Add an incident note' }).click();
    const form = page.getByRole('form', { name: 'Incident note' });
    await expect.poll(() => form.isVisible(), { timeout: 10_000 }).toBe(true);
    await context.grantPermissions(['geolocation']);
    await context.setGeolocation({ ...AT_SEA, accuracy: 15 });
    await form.getByRole('button', { name: 'Assist' }).click();
    await form.getByRole('button', { name: "Add this phone's location" }).click();
    await expect.poll(() => form.getByText('33.28690° S, 151.57310° E').isVisible(), { timeout: 10_000 }).toBe(true);
    await form.getByLabel('People helped').fill('1');
    await form.getByLabel('What was done').fill(note);
    await form.getByLabel('Outcome').fill('No further help needed');
    await screenshot(page, 'patrol-incident-note-offline');
    await form.getByRole('button', { name: 'Save incident note' }).click();
    const notes = page.getByRole('list', { name: 'Incident notes' });
    await expect.poll(() => notes.getByText(note).isVisible(), { timeout: 10_000 }).toBe(true);
    expect(await notes.getByText(/waiting to sync/).isVisible()).toBe(true);

    await page.getByRole('button', { name: 'Retrieve now' }).click();
    await expect.poll(() => page.getByRole('region', { name: 'Times' }).isVisible(), { timeout: 10_000 }).toBe(true);
    await screenshot(page, 'patrol-trip-retrieved-offline');
    await screenAt(page, page.getByRole('heading', { name: 'Trip · Patrol' }), 'patrol-trip-retrieved-screen');
    await page.getByRole('button', { name: 'Add conditions and readings' }).click();
    const trip = page.getByRole('form', { name: 'Edit trip' });
    await trip.getByLabel('Wind speed').fill('12');
    await trip.getByLabel('Wave height').fill('1.2');
    await trip.getByLabel('Fuel added').fill('10');
    await expect.poll(() => trip.getByText('12 kn · Beaufort force 4, moderate breeze').isVisible()).toBe(true);
    await screenAt(page, trip.getByLabel('Wind speed'), 'patrol-trip-conditions-screen');
    await trip.getByRole('button', { name: 'Save trip' }).click();
    await expect.poll(() => page.getByText('1.2 m · sea state 3, slight').isVisible(), { timeout: 10_000 }).toBe(true);

    await context.setOffline(false);
    await expect.poll(async () => {
      const records = await pullAs(server.baseUrl, 'captain@gannetbay.example');
      const trip = records.find((r) => r.id === tripId);
      const n = records.find((r) => r.kind === 'incidentNote' && r.fields.tripId === tripId);
      return [trip?.fields.retrievedAt != null, trip?.fields.windSpeedKn, n?.fields.actionTaken, n?.fields.lat];
    }, { timeout: 30_000, interval: 1000 }).toEqual([true, 12, note, -33.2869]);
  });

  it('shows the note to a supervisor\'s browser, and not to a crew member\'s', async () => {
    const captain = await openBrowser(DESKTOP);
    const crew = await openBrowser(PHONE);
    try {
      await signIn(captain.page, server.baseUrl, 'captain@gannetbay.example', 'Tomas Varga');
      await captain.page.goto(`${server.baseUrl}/trips/${tripId}`);
      await expect.poll(() => captain.page.getByRole('list', { name: 'Incident notes' }).getByText(note).isVisible(), { timeout: 30_000 }).toBe(true);
      await screenshot(captain.page, 'patrol-trip-supervisor');

      await signIn(crew.page, server.baseUrl, 'crew@gannetbay.example', 'Sam Whitcombe');
      await crew.page.goto(`${server.baseUrl}/trips/${tripId}`);
      await expect.poll(() => crew.page.getByRole('heading', { name: 'Trip · Patrol' }).isVisible(), { timeout: 30_000 }).toBe(true);
      await expect.poll(() => crew.page.getByText('No incident notes you can see on this trip.').isVisible(), { timeout: 10_000 }).toBe(true);
      expect(await crew.page.getByText(note).count()).toBe(0);
      const held = await crew.page.evaluate(async (id) => {
        const dbs = await indexedDB.databases();
        for (const { name } of dbs) {
          if (!name) continue;
          const db = await new Promise<IDBDatabase>((ok, fail) => { const r = indexedDB.open(name); r.onsuccess = () => ok(r.result); r.onerror = () => fail(r.error); });
          if (!db.objectStoreNames.contains('records')) continue;
          const rows = await new Promise<{ kind: string; fields: { tripId?: string } }[]>((ok) => {
            const r = db.transaction('records').objectStore('records').getAll();
            r.onsuccess = () => ok(r.result);
          });
          db.close();
          return rows.filter((x) => x.kind === 'incidentNote' && x.fields.tripId === id).length;
        }
        return -1;
      }, tripId);
      expect(held).toBe(0);
    } finally {
      await captain.close();
      await crew.close();
    }
  });

  it('shows the trip in the boat file\'s log', async () => {
    const { page } = driver;
    await page.goto(`${server.baseUrl}/trips/${tripId}`);
    await page.getByRole('link', { name: /^Boat file of Shearwater/ }).click();
    const log = page.getByRole('region', { name: 'Boat log' });
    await expect.poll(() => log.isVisible(), { timeout: 15_000 }).toBe(true);
    await expect.poll(() => log.getByRole('link').first().textContent()).toMatch(/^Incident note · Assist/);
    await screenshot(page, 'patrol-boat-file');
    await screenAt(page, log, 'patrol-boat-log-screen');
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Trips' }).click();
    const trips = page.getByRole('list', { name: 'Logged trips' });
    await expect.poll(() => trips.getByRole('link').first().textContent(), { timeout: 15_000 }).toMatch(/^Patrol · Shearwater · \d+ min/);
    await screenAt(page, page.getByRole('heading', { name: 'Trips' }), 'patrol-trips-screen');
  });
});
