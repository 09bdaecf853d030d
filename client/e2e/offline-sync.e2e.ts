import { createHash } from 'node:crypto';
import type { Page } from 'playwright-core';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { startServer, type RunningServer } from './support/server.js';
import { openBrowser, screenshot, type Browser } from './support/browser.js';
import { queryRows } from './support/database.js';
import { readStoredPhoto } from './support/photo-store.js';
import {
  choose, closeSyncDetails, DEMO_PASSWORD, goOffline, goOnline, openSyncDetails, signInOnPhone, syncHeadline, waitForSyncHeadline,
} from './support/phone.js';


const unique = () => Math.random().toString(36).slice(2, 8);

/**
 * A picture as a camera would give it, drawn in the browser with a mark of its own: photos are
 * content-addressed, so the same picture twice would be found on the server and not sent again.
 */
async function cameraPicture(page: Page, mark: string): Promise<Buffer> {
  const bytes = await page.evaluate(async (text) => {
    const canvas = new OffscreenCanvas(2400, 1800);
    const g = canvas.getContext('2d')!;
    g.fillStyle = '#2a6f7a';
    g.fillRect(0, 0, 2400, 1800);
    g.fillStyle = '#f4ebdd';
    g.font = '64px sans-serif';
    g.fillText(text, 60, 900, 2280);
    const blob = await canvas.convertToBlob({ type: 'image/png' });
    return Array.from(new Uint8Array(await blob.arrayBuffer()));
  }, mark);
  return Buffer.from(bytes);
}

async function boatId(fleetNumber: string): Promise<string> {
  const [row] = await queryRows<{ id: string }>(
    `select b.id from boats b join clubs c on c.id = b.club_id where c.slug = 'gannet-bay' and b.fleet_number = $1 and not b.deleted`,
    [fleetNumber],
  );
  if (!row) throw new Error(`The demo club has no boat ${fleetNumber}; did the seed run?`);
  return row.id;
}

/** The background-sync tags the page's service worker registration holds. */
function syncTags(page: Page): Promise<string[]> {
  return page.evaluate(async () => {
    const registration = await navigator.serviceWorker.ready;
    const sync = (registration as ServiceWorkerRegistration & { sync?: { getTags(): Promise<string[]> } }).sync;
    return sync ? sync.getTags() : ['this browser has no background sync'];
  });
}

/** Notes the messages the service worker posts to the page, to see its background sync at work. */
async function listenToWorker(page: Page): Promise<() => Promise<unknown[]>> {
  await page.evaluate(() => {
    const seen: unknown[] = [];
    (window as unknown as { workerMessages: unknown[] }).workerMessages = seen;
    navigator.serviceWorker.addEventListener('message', (e) => seen.push(e.data));
  });
  return () => page.evaluate(() => (window as unknown as { workerMessages: unknown[] }).workerMessages);
}

async function apiToken(baseUrl: string, email: string): Promise<string> {
  const answer = await fetch(`${baseUrl}/api/auth/login`, {
    method: 'POST', headers: { 'Content-Type': 'application/json' }, body: JSON.stringify({ email, password: DEMO_PASSWORD }),
  });
  if (!answer.ok) throw new Error(`Sign-in for ${email} failed: ${answer.status} ${await answer.text()}`);
  return ((await answer.json()) as { accessToken: string }).accessToken;
}

async function raiseDefect(b: Browser, baseUrl: string, description: string, withPhoto = false): Promise<string> {
  const { page } = b;
  await page.goto(`${baseUrl}/defects/new`);
  await choose(page, 'Boat', /^IRB 1 ·/);
  await page.getByRole('button', { name: /^Limit:/ }).click();
  await page.getByLabel('What is wrong').fill(description);
  if (withPhoto) {
    const buffer = await cameraPicture(page, description);
    await page.getByLabel('Photo', { exact: true }).setInputFiles({ name: 'camera.png', mimeType: 'image/png', buffer });
    await expect.poll(() => page.getByRole('img', { name: 'Defect photo' }).count(), { timeout: 10_000 }).toBe(1);
  }
  await page.getByRole('button', { name: 'Save defect' }).click();
  await page.waitForURL(/\/defects\/[0-9a-f-]{36}$/);
  return page.url();
}

async function editBoatNotes(b: Browser, baseUrl: string, id: string, notes: string): Promise<void> {
  const { page } = b;
  await page.goto(`${baseUrl}/fleet/boats/${id}`);
  await page.getByLabel('Notes').fill(notes);
  await page.getByRole('button', { name: 'Save boat' }).click();
  await page.waitForURL(new RegExp(`/boats/${id}$`));
}

describe('a phone with no signal', () => {
  let server: RunningServer;
  const browsers: Browser[] = [];
  const phone = async () => {
    const b = await openBrowser();
    browsers.push(b);
    return b;
  };
  beforeAll(async () => {
    server = await startServer();
  });
  afterEach(async () => {
    await Promise.all(browsers.splice(0).map((b) => b.close()));
  });
  afterAll(async () => {
    await server?.stop();
  });

  it('keeps changes made offline through a reload and sends them when signal returns, with no button pressed', async () => {
    const b = await phone();
    const { page, context } = b;
    await signInOnPhone(page, server.baseUrl, 'captain@gannetbay.example', 'Tomas Varga');
    const boat = await boatId('IRB 2');
    const description = `Bow handle loose at the rivets (${unique()})`;
    const notes = `Second boat; spare kill cord in the shed locker (${unique()})`;

    await goOffline(context, page);
    const defectUrl = await raiseDefect(b, server.baseUrl, description);
    await editBoatNotes(b, server.baseUrl, boat, notes);
    await waitForSyncHeadline(page, /^Sync: (No signal|2 changes waiting to be sent)$/);
    expect(await openSyncDetails(page)).toContain('2 changes waiting to be sent');
    await screenshot(page, 'sync-offline-changes-waiting');
    await closeSyncDetails(page);

    await page.reload();
    await page.goto(defectUrl);
    await expect.poll(() => page.getByText(description).first().isVisible(), { timeout: 15_000 }).toBe(true);
    expect(await openSyncDetails(page)).toContain('2 changes waiting to be sent');
    await closeSyncDetails(page);
    // Nothing has reached the server yet, and the browser holds a background sync for when it can.
    expect(await queryRows('select id from defects where description = $1', [description])).toEqual([]);
    await expect.poll(() => syncTags(page)).toEqual(['breakline-outbox']);
    const workerMessages = await listenToWorker(page);

    await goOnline(context, page);
    await expect.poll(async () => (await queryRows('select status from defects where description = $1', [description])).length, { timeout: 30_000 }).toBe(1);
    await expect.poll(async () => (await queryRows<{ notes: string }>('select notes from boats where id = $1', [boat]))[0]?.notes, { timeout: 30_000 }).toBe(notes);
    await waitForSyncHeadline(page, /^Sync: Last synced/);
    expect(await openSyncDetails(page)).toContain('All changes sent');
    await screenshot(page, 'sync-online-all-sent');
    // The worker's sync event fired on the way back online, told the page, and was answered as done.
    expect(await workerMessages()).toContainEqual({ type: 'breakline:sync' });
    await expect.poll(() => syncTags(page), { timeout: 15_000 }).toEqual([]);
  });

  it('lists two phones\' offline edits of one field as a conflict for a supervisor, keeping both values', async () => {
    const boat = await boatId('IRB 1');
    const [admin, captain] = [await phone(), await phone()];
    await signInOnPhone(admin.page, server.baseUrl, 'admin@gannetbay.example', 'Mara Okonkwo-Hale');
    await signInOnPhone(captain.page, server.baseUrl, 'captain@gannetbay.example', 'Tomas Varga');
    const adminNotes = `Main patrol boat; starboard valve cap replaced (${unique()})`;
    const captainNotes = `Main patrol boat; starboard valve cap missing, do not launch without one (${unique()})`;

    await goOffline(admin.context, admin.page);
    await goOffline(captain.context, captain.page);
    await editBoatNotes(admin, server.baseUrl, boat, adminNotes);
    await editBoatNotes(captain, server.baseUrl, boat, captainNotes);

    await goOnline(admin.context, admin.page);
    await expect.poll(async () => (await queryRows<{ notes: string }>('select notes from boats where id = $1', [boat]))[0]?.notes, { timeout: 30_000 }).toBe(adminNotes);
    await goOnline(captain.context, captain.page);

    const token = await apiToken(server.baseUrl, 'captain@gannetbay.example');
    type Conflict = { recordId: string; field: string; keptValue: unknown; overruledValue: unknown; status: string };
    const conflictOnBoat = async () => {
      const answer = await fetch(`${server.baseUrl}/api/sync/conflicts`, { headers: { Authorization: `Bearer ${token}` } });
      expect(answer.status).toBe(200);
      const list = (await answer.json()) as Conflict[];
      return list.find((c) => c.recordId === boat && c.field === 'notes' && [c.keptValue, c.overruledValue].includes(captainNotes));
    };
    await expect.poll(conflictOnBoat, { timeout: 30_000 }).toBeDefined();
    const conflict = (await conflictOnBoat())!;
    expect(conflict.status).toBe('open');
    // Neither value is lost: one is on the boat, the other kept in the conflict.
    expect([conflict.keptValue, conflict.overruledValue].sort()).toEqual([adminNotes, captainNotes].sort());
    const [stored] = await queryRows<{ notes: string }>('select notes from boats where id = $1', [boat]);
    expect(stored!.notes).toBe(conflict.keptValue);
    await waitForSyncHeadline(captain.page, /^Sync: Last synced/);
    expect(await openSyncDetails(captain.page)).toMatch(/\d+ conflicts? waiting for a supervisor/);
    await screenshot(captain.page, 'sync-conflict-waiting');
  });

  it('sends a photo taken offline to the photo store after its defect, the same bytes under the same hash', async () => {
    const b = await phone();
    const { page, context } = b;
    await signInOnPhone(page, server.baseUrl, 'crew@gannetbay.example', 'Sam Whitcombe');
    const description = `Propeller guard cracked, photo attached (${unique()})`;
    await goOffline(context, page);
    const defectUrl = await raiseDefect(b, server.baseUrl, description, true);
    await page.reload();
    // Still on the phone after a reload offline, and shown from there.
    await expect.poll(() => page.getByRole('img', { name: 'Defect photo' }).count(), { timeout: 15_000 }).toBe(1);
    const local = await page.evaluate(async () => {
      const dbs = await indexedDB.databases();
      const name = dbs.find((d) => d.name?.startsWith('breakline-replica-'))!.name!;
      const db = await new Promise<IDBDatabase>((resolve, reject) => {
        const open = indexedDB.open(name);
        open.onsuccess = () => resolve(open.result);
        open.onerror = () => reject(open.error);
      });
      const rows = await new Promise<{ sha256: string; bytes: ArrayBuffer; state: string; type: string }[]>((resolve) => {
        const req = db.transaction('photos').objectStore('photos').getAll();
        req.onsuccess = () => resolve(req.result);
      });
      db.close();
      return rows.map((r) => ({ sha256: r.sha256, state: r.state, type: r.type, bytes: Array.from(new Uint8Array(r.bytes)) }));
    });
    expect(local).toHaveLength(1);
    const photo = local[0]!;
    expect(photo).toMatchObject({ state: 'kept', type: 'image/jpeg' });

    // Hold the upload a moment so the status can be seen while it runs.
    let release: () => void = () => undefined;
    const held = new Promise<void>((resolve) => (release = resolve));
    await context.route('**/api/attachments/**', async (route) => {
      if (route.request().method() === 'PUT') await held;
      await route.continue();
    });
    await goOnline(context, page);
    await waitForSyncHeadline(page, /^Sync: Sending photos: 0 of 1$/);
    expect(await openSyncDetails(page)).toContain('Sending photos: 0 of 1');
    await screenshot(page, 'sync-photo-uploading');
    await closeSyncDetails(page);
    release();
    await expect.poll(async () => (await queryRows<{ photos: string[] }>('select photos from defects where description = $1', [description]))[0]?.photos, { timeout: 30_000 })
      .toEqual([photo.sha256]);
    await expect.poll(() => syncHeadline(page), { timeout: 30_000 }).toMatch(/^Sync: Last synced/);
    await screenshot(page, 'sync-photo-sent');

    const [club] = await queryRows<{ id: string }>(`select id from clubs where slug = 'gannet-bay'`);
    const stored = await readStoredPhoto(`clubs/${club!.id}/photos/${photo.sha256}`);
    expect(createHash('sha256').update(stored).digest('hex')).toBe(photo.sha256);
    expect(Buffer.compare(stored, Buffer.from(photo.bytes))).toBe(0);
    expect([...stored.subarray(0, 3)]).toEqual([0xff, 0xd8, 0xff]); // a JPEG, made on the phone

    // Another member's phone fetches it when the defect is shown, and keeps it for offline.
    const other = await phone();
    await signInOnPhone(other.page, server.baseUrl, 'driver@gannetbay.example', 'Priya Lindholm');
    await other.page.goto(defectUrl);
    await expect.poll(() => other.page.getByRole('img', { name: 'Defect photo' }).count(), { timeout: 15_000 }).toBe(1);
    await goOffline(other.context, other.page);
    await other.page.reload();
    await expect.poll(() => other.page.getByRole('img', { name: 'Defect photo' }).count(), { timeout: 15_000 }).toBe(1);
  });
});
