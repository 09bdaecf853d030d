import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { checkForUpdate, pwaUpdates, registerServiceWorker } from './pwa';

/** Just enough of the browser's service worker objects to play an install through. */
class FakeWorker extends EventTarget {
  state: ServiceWorkerState = 'installing';
  postMessage = vi.fn();
  install() {
    this.state = 'installed';
    this.dispatchEvent(new Event('statechange'));
  }
}

class FakeRegistration extends EventTarget {
  installing: FakeWorker | null = null;
  waiting: FakeWorker | null = null;
  update = vi.fn(async () => {});
  found(worker: FakeWorker) {
    this.installing = worker;
    this.dispatchEvent(new Event('updatefound'));
  }
}

function fakeBrowser({ controlled, waiting }: { controlled: boolean; waiting?: FakeWorker }) {
  const registration = new FakeRegistration();
  registration.waiting = waiting ?? null;
  const container = Object.assign(new EventTarget(), {
    controller: controlled ? {} : null,
    register: vi.fn(async () => registration),
  });
  vi.stubGlobal('navigator', { onLine: true, serviceWorker: container });
  return { registration, container };
}

describe('service worker updates', () => {
  beforeEach(() => vi.stubEnv('PROD', true));
  afterEach(() => {
    vi.unstubAllEnvs();
    pwaUpdates.announce(null);
  });

  it('offers a new version that installs while an older one runs the page, and hands over on request', async () => {
    const { registration, container } = fakeBrowser({ controlled: true });
    await registerServiceWorker();
    expect(container.register).toHaveBeenCalledWith('/sw.js', { scope: '/' });
    expect(pwaUpdates.getSnapshot()).toBeNull();

    const next = new FakeWorker();
    registration.found(next);
    expect(pwaUpdates.getSnapshot()).toBeNull(); // still installing
    next.install();
    const update = pwaUpdates.getSnapshot();
    expect(update).not.toBeNull();
    // Nothing is reloaded until the person asks.
    expect(next.postMessage).not.toHaveBeenCalled();
    const listen = vi.spyOn(container, 'addEventListener');
    update!.apply();
    expect(next.postMessage).toHaveBeenCalledWith({ type: 'SKIP_WAITING' });
    expect(listen).toHaveBeenCalledWith('controllerchange', expect.any(Function), { once: true });
  });

  it('offers a version left waiting by an earlier visit', async () => {
    const waiting = new FakeWorker();
    waiting.state = 'installed';
    fakeBrowser({ controlled: true, waiting });
    await registerServiceWorker();
    pwaUpdates.getSnapshot()!.apply();
    expect(waiting.postMessage).toHaveBeenCalledWith({ type: 'SKIP_WAITING' });
  });

  it('does not offer the first worker on a phone, which has nothing to replace', async () => {
    const { registration } = fakeBrowser({ controlled: false });
    await registerServiceWorker();
    const first = new FakeWorker();
    registration.found(first);
    first.install();
    expect(pwaUpdates.getSnapshot()).toBeNull();
  });

  it('asks the server for a newer worker when told to', async () => {
    const { registration } = fakeBrowser({ controlled: true });
    await registerServiceWorker();
    await checkForUpdate();
    expect(registration.update).toHaveBeenCalledOnce();
  });
});
