import { afterEach, describe, expect, it } from 'vitest';
import { createRecord } from '@/db/write';
import { BACKOFF_CAP_MS, backoffDelay } from './backoff';
import { SyncRunner } from './runner';
import { AFTER_WRITE_DELAY_MS, BACKGROUND_SYNC_MESSAGE } from './triggers';
import { FakeBackend } from './test/fake-backend';
import { defectFields, testDevice, type TestDevice } from './test/device';

function runnerFor(backend: FakeBackend, phone: TestDevice, timers: { ms: number; run: () => void }[] = []) {
  let outdated = 0;
  const runner = new SyncRunner({
    auth: phone.auth,
    openDb: () => phone.db,
    fetch: backend.fetch,
    now: () => backend.now,
    random: () => 0.5,
    onOutdated: () => void (outdated += 1),
    setTimer: (run, ms) => timers.push({ ms, run }),
    clearTimer: () => undefined,
  });
  return { runner, timers, outdated: () => outdated };
}

describe('backoff', () => {
  it('doubles from 5 s with jitter in the upper half, capped at 5 minutes', () => {
    expect(backoffDelay(1, 0)).toBe(2_500);
    expect(backoffDelay(1, 0.999_999)).toBe(5_000);
    expect(backoffDelay(3, 0)).toBe(10_000);
    expect(backoffDelay(40, 0.5)).toBe(BACKOFF_CAP_MS * 0.75);
    expect(() => backoffDelay(0, 0)).toThrow(/count from 1/);
  });
});

describe('sync runner', () => {
  afterEach(() => {
    Reflect.deleteProperty(navigator, 'locks');
  });

  it('runs one sync at a time and folds triggers during a sync into one more run', async () => {
    const backend = new FakeBackend();
    const phone = testDevice(backend);
    await createRecord(phone.writer, 'defect', defectFields());
    const { runner } = runnerFor(backend, phone);
    const first = runner.requestSync();
    await Promise.all([runner.requestSync(), runner.requestSync(), first]);
    expect(backend.maxInFlight).toBe(1);
    expect(backend.requests.filter((r) => r.path === '/api/sync/status')).toHaveLength(2);
  });

  it('holds a cross-tab lock per person while it syncs, where the browser has one', async () => {
    const backend = new FakeBackend();
    const phone = testDevice(backend);
    const names: string[] = [];
    Object.defineProperty(navigator, 'locks', {
      configurable: true,
      value: { request: (name: string, work: () => Promise<unknown>) => (names.push(name), work()) },
    });
    // Two tabs, each with its own runner, on one replica.
    await Promise.all([runnerFor(backend, phone).runner.requestSync(), runnerFor(backend, phone).runner.requestSync()]);
    expect(names).toEqual(['breakline-sync:member-ana', 'breakline-sync:member-ana']);
  });

  it('keeps two tabs without Web Locks from syncing side by side', async () => {
    const backend = new FakeBackend();
    const phone = testDevice(backend);
    await createRecord(phone.writer, 'defect', defectFields());
    await Promise.all([runnerFor(backend, phone).runner.requestSync(), runnerFor(backend, phone).runner.requestSync()]);
    expect(backend.maxInFlight).toBe(1);
    expect(backend.server.records(phone.scope.clubId)).toHaveLength(1);
  });

  it('retries on a growing timer while offline and stops retrying once through', async () => {
    const backend = new FakeBackend();
    const phone = testDevice(backend);
    const { runner, timers } = runnerFor(backend, phone);
    backend.offline = true;
    await runner.requestSync();
    expect(timers.map((t) => t.ms)).toEqual([backoffDelay(1, 0.5)]);
    timers.shift()!.run();
    await runner.idle();
    expect(timers.map((t) => t.ms)).toEqual([backoffDelay(2, 0.5)]);
    backend.offline = false;
    timers.shift()!.run();
    await runner.idle();
    expect(timers).toEqual([]);
    expect(await phone.db.syncState.get(`club:${phone.scope.clubId}`)).toMatchObject({ lastError: null });
  });

  it('on 426 asks for an update and sets no retry timer', async () => {
    const backend = new FakeBackend();
    const phone = testDevice(backend);
    await createRecord(phone.writer, 'defect', defectFields());
    const { runner, timers, outdated } = runnerFor(backend, phone);
    backend.outdated = true;
    await runner.requestSync();
    expect(outdated()).toBe(1);
    expect(timers).toEqual([]);
  });

  it('syncs when the phone comes back online and when the app returns to the front', async () => {
    const backend = new FakeBackend();
    const phone = testDevice(backend);
    const { runner } = runnerFor(backend, phone);
    const statusCalls = () => backend.requests.filter((r) => r.path === '/api/sync/status').length;
    const stop = runner.start(); // app start syncs once
    await runner.idle();
    expect(statusCalls()).toBe(1);
    window.dispatchEvent(new Event('online'));
    await runner.idle();
    document.dispatchEvent(new Event('visibilitychange'));
    await runner.idle();
    expect(statusCalls()).toBe(3);
    stop();
    window.dispatchEvent(new Event('online'));
    await runner.idle();
    expect(statusCalls()).toBe(3);
  });

  it("syncs on the service worker's background-sync message and shortly after local writes", async () => {
    const backend = new FakeBackend();
    const phone = testDevice(backend);
    const worker = new EventTarget();
    Object.defineProperty(navigator, 'serviceWorker', { configurable: true, value: worker });
    const { runner, timers } = runnerFor(backend, phone);
    const pushes = () => backend.requests.filter((r) => r.path === '/api/sync/push').length;
    const stop = runner.start();
    await runner.idle();
    await createRecord(phone.writer, 'defect', defectFields());
    await createRecord(phone.writer, 'defect', defectFields({ description: 'Second report' }));
    expect(timers.map((t) => t.ms)).toEqual([AFTER_WRITE_DELAY_MS, AFTER_WRITE_DELAY_MS]);
    timers.at(-1)!.run();
    await runner.idle();
    expect(pushes()).toBe(1);
    await createRecord(phone.writer, 'defect', defectFields({ description: 'Third report' }));
    worker.dispatchEvent(new MessageEvent('message', { data: { type: BACKGROUND_SYNC_MESSAGE } }));
    await runner.idle();
    expect(pushes()).toBe(2);
    stop();
    Reflect.deleteProperty(navigator, 'serviceWorker');
  });
});
