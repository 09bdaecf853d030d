import { afterEach, describe, expect, it } from 'vitest';
import { createRecord } from '@/db/write';
import { SyncRunner } from './runner';
import { BACKGROUND_SYNC_MESSAGE, BACKGROUND_SYNC_TAG } from './triggers';
import { FakeBackend } from './test/fake-backend';
import { defectFields, testDevice, type TestDevice } from './test/device';
// The file the built worker imports, as text, to run against a stand-in `self`.
import WORKER_SCRIPT from '../../public/sw-background-sync.js?raw';

function runnerFor(backend: FakeBackend, phone: TestDevice) {
  const timers: { ms: number; run: () => void }[] = [];
  const runner = new SyncRunner({
    auth: phone.auth, openDb: () => phone.db, fetch: backend.fetch, now: () => backend.now, random: () => 0.5,
    onOutdated: () => undefined, setTimer: (run, ms) => timers.push({ ms, run }), clearTimer: () => undefined,
  });
  return { runner, timers };
}

/** A service worker container whose registration records the background-sync tags asked for. */
function fakeWorker() {
  const tags: string[] = [];
  const worker = Object.assign(new EventTarget(), {
    getRegistration: async () => ({ sync: { register: async (tag: string) => void tags.push(tag) } }),
  });
  Object.defineProperty(navigator, 'serviceWorker', { configurable: true, value: worker });
  return { worker, tags };
}

function setOnline(online: boolean) {
  Object.defineProperty(navigator, 'onLine', { configurable: true, get: () => online });
}

afterEach(() => {
  Reflect.deleteProperty(navigator, 'serviceWorker');
  Reflect.deleteProperty(navigator, 'onLine');
});

describe('background sync, page side', () => {
  it('asks the browser for a background sync when a change is saved offline, and not online', async () => {
    const backend = new FakeBackend();
    const phone = testDevice(backend);
    const { tags } = fakeWorker();
    const { runner } = runnerFor(backend, phone);
    const stop = runner.start();
    await runner.idle();
    await createRecord(phone.writer, 'defect', defectFields());
    await new Promise((r) => setTimeout(r, 0));
    expect(tags).toEqual([]);

    setOnline(false);
    backend.offline = true;
    await createRecord(phone.writer, 'defect', defectFields({ description: 'Drain bung missing' }));
    await expect.poll(() => tags).toEqual([BACKGROUND_SYNC_TAG]);
    // Asked once until a sync goes through: a failing sync started by the event does not ask again.
    expect(await runner.requestSync()).toBe(false);
    await createRecord(phone.writer, 'defect', defectFields({ description: 'Valve cap lost' }));
    await new Promise((r) => setTimeout(r, 0));
    expect(tags).toHaveLength(1);
    setOnline(true);
    backend.offline = false;
    expect(await runner.requestSync()).toBe(true);
    setOnline(false);
    backend.offline = true;
    await createRecord(phone.writer, 'defect', defectFields({ description: 'Paddle cracked' }));
    await expect.poll(() => tags).toHaveLength(2);
    stop();
  });

  it("answers the worker's message on its port: whether the outbox went", async () => {
    const backend = new FakeBackend();
    const phone = testDevice(backend);
    const { worker } = fakeWorker();
    const { runner } = runnerFor(backend, phone);
    const stop = runner.start();
    await runner.idle();
    await createRecord(phone.writer, 'defect', defectFields());

    const ask = () => {
      const channel = new MessageChannel();
      const answer = new Promise<unknown>((resolve) => (channel.port1.onmessage = (e) => resolve(e.data)));
      worker.dispatchEvent(new MessageEvent('message', { data: { type: BACKGROUND_SYNC_MESSAGE }, ports: [channel.port2] }));
      return answer.finally(() => channel.port1.close());
    };
    backend.offline = true;
    expect(await ask()).toEqual({ type: BACKGROUND_SYNC_MESSAGE, ok: false });
    expect(await phone.db.outbox.count()).toBe(1);
    backend.offline = false;
    expect(await ask()).toEqual({ type: BACKGROUND_SYNC_MESSAGE, ok: true });
    expect(backend.server.records(phone.scope.clubId)).toHaveLength(1);
    stop();
  });
});

interface SyncEventLike { tag: string; lastChance: boolean; waitUntil: (p: Promise<unknown>) => void }

/** Runs the worker script against a stand-in `self` with the given open pages. */
function loadWorker(pages: { answer: boolean | null }[]) {
  const handlers: Record<string, (e: SyncEventLike) => void> = {};
  const posted: unknown[] = [];
  const clients = pages.map((p) => ({
    postMessage(message: unknown, [port]: MessagePort[]) {
      posted.push(message);
      if (p.answer !== null) port!.postMessage({ type: BACKGROUND_SYNC_MESSAGE, ok: p.answer });
      setTimeout(() => port!.close(), 0);
    },
  }));
  let asked: unknown = null;
  const self = {
    addEventListener: (type: string, fn: (e: SyncEventLike) => void) => void (handlers[type] = fn),
    clients: { matchAll: async (options: unknown) => ((asked = options), clients) },
  };
  new Function('self', WORKER_SCRIPT)(self);
  const fire = (tag: string, lastChance = false) => {
    let held: Promise<unknown> | null = null;
    handlers.sync!({ tag, lastChance, waitUntil: (p) => void (held = p) });
    return held as Promise<unknown> | null;
  };
  return { fire, posted, asked: () => asked };
}

describe('background sync, worker side', () => {
  it('tells every open page to sync and holds the event until one answers that it went', async () => {
    const w = loadWorker([{ answer: false }, { answer: true }]);
    await expect(w.fire(BACKGROUND_SYNC_TAG)).resolves.toBeUndefined();
    expect(w.posted).toEqual([{ type: BACKGROUND_SYNC_MESSAGE }, { type: BACKGROUND_SYNC_MESSAGE }]);
    expect(w.asked()).toEqual({ type: 'window', includeUncontrolled: true });
  });

  it('fails the event when no page got the outbox through, so the browser tries again', async () => {
    await expect(loadWorker([{ answer: false }]).fire(BACKGROUND_SYNC_TAG)).rejects.toThrow(/try again/);
    // On the browser's last try there is nothing more to ask for; the app sends on its next start.
    await expect(loadWorker([{ answer: false }]).fire(BACKGROUND_SYNC_TAG, true)).resolves.toBeUndefined();
  });

  it('leaves the outbox to the next app start when no page is open, and ignores other tags', async () => {
    const none = loadWorker([]);
    await expect(none.fire(BACKGROUND_SYNC_TAG)).resolves.toBeUndefined();
    expect(loadWorker([{ answer: true }]).fire('some-other-tag')).toBeNull();
  });
});
