/** A waiting service worker: calling `apply` activates it and reloads the page. */
export interface PendingUpdate {
  apply: () => void;
}

let pending: PendingUpdate | null = null;
const listeners = new Set<() => void>();

/** The update the shell offers, as a tiny store for useSyncExternalStore. */
export const pwaUpdates = {
  getSnapshot: (): PendingUpdate | null => pending,
  subscribe(listener: () => void): () => void {
    listeners.add(listener);
    return () => listeners.delete(listener);
  },
  announce(update: PendingUpdate | null): void {
    pending = update;
    listeners.forEach((listener) => listener());
  },
};

let registration: ServiceWorkerRegistration | null = null;

/** Offers `worker`, installed and waiting: applying it tells it to take over, then reloads. */
function offer(worker: ServiceWorker): void {
  pwaUpdates.announce({
    apply: () => {
      navigator.serviceWorker.addEventListener('controllerchange', () => window.location.reload(), { once: true });
      // The generated worker (vite-plugin-pwa, prompt mode) skips waiting on this message.
      worker.postMessage({ type: 'SKIP_WAITING' });
    },
  });
}

/**
 * Registers /sw.js (built by vite-plugin-pwa in prompt mode) with the browser's own API, which is
 * all this needs (a library for it was a request and 2 kB more on the first screen). A new
 * worker waits until the person chooses to reload, so a check half filled in is never reloaded
 * away under them. The first worker on a phone has nothing to replace, so it is not offered.
 */
export async function registerServiceWorker(): Promise<void> {
  if (!import.meta.env.PROD || !('serviceWorker' in navigator)) return;
  // After the page's load event, so the precache downloads do not compete with the first screen.
  if (document.readyState !== 'complete') await new Promise((resolve) => window.addEventListener('load', resolve, { once: true }));
  const { serviceWorker } = navigator;
  const reg = await serviceWorker.register('/sw.js', { scope: '/' });
  registration = reg;
  // A worker installed on an earlier visit may still be waiting for its reload.
  if (reg.waiting && serviceWorker.controller) offer(reg.waiting);
  reg.addEventListener('updatefound', () => {
    const installing = reg.installing;
    installing?.addEventListener('statechange', () => {
      if (installing.state === 'installed' && serviceWorker.controller) offer(installing);
    });
  });
  // Phones stay open for days: look for a new version whenever the app comes back to the front.
  document.addEventListener('visibilitychange', () => {
    if (document.visibilityState === 'visible') void checkForUpdate();
  });
}

/** Ask the server for a newer service worker now (e.g. after the server answered 426). */
export async function checkForUpdate(): Promise<void> {
  if (!registration || !navigator.onLine) return;
  try {
    await registration.update();
  } catch {
    // Offline or the server is down: the next visibility change tries again.
  }
}
