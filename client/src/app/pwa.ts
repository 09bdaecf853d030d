import type { Workbox } from 'workbox-window';

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

let workbox: Workbox | null = null;

/**
 * Registers /sw.js (built by vite-plugin-pwa in prompt mode). A new worker waits until the person
 * chooses to reload, so a check half filled in is never reloaded away under them.
 */
export async function registerServiceWorker(): Promise<void> {
  if (!import.meta.env.PROD || !('serviceWorker' in navigator)) return;
  // Loaded after the first screen: nothing on it waits for the worker.
  const { Workbox } = await import('workbox-window');
  const wb = new Workbox('/sw.js', { scope: '/' });
  wb.addEventListener('waiting', () => {
    pwaUpdates.announce({
      apply: () => {
        wb.addEventListener('controlling', () => window.location.reload());
        wb.messageSkipWaiting();
      },
    });
  });
  workbox = wb;
  void wb.register();
  // Phones stay open for days: look for a new version whenever the app comes back to the front.
  document.addEventListener('visibilitychange', () => {
    if (document.visibilityState === 'visible') void checkForUpdate();
  });
}

/** Ask the server for a newer service worker now (e.g. after the server answered 426). */
export async function checkForUpdate(): Promise<void> {
  if (!workbox || !navigator.onLine) return;
  try {
    await workbox.update();
  } catch {
    // Offline or the server is down: the next visibility change tries again.
  }
}
