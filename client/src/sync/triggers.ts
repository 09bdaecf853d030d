import { localWrites } from '@/db/events';

/** The message the service worker posts when the browser's background sync fires. */
export const BACKGROUND_SYNC_MESSAGE = 'breakline:sync';
export const BACKGROUND_SYNC_TAG = 'breakline-outbox';
/** A burst of answers in a check becomes one push, not one each. */
export const AFTER_WRITE_DELAY_MS = 2_000;

export interface TriggerTimers {
  setTimer: (run: () => void, ms: number) => unknown;
  clearTimer: (handle: unknown) => void;
}

/** What the page answers the worker on the port it sent: whether the sync went through. */
export interface BackgroundSyncAnswer {
  type: typeof BACKGROUND_SYNC_MESSAGE;
  ok: boolean;
}

/**
 * Calls `sync` when the phone comes online, the app comes to the front, the worker asks, or after
 * writes. `sync` resolves whether it went through; the worker hears that on the port it sent, so
 * the browser tries its background sync again later when it did not.
 */
export function listenForTriggers(sync: () => Promise<boolean>, timers: TriggerTimers): () => void {
  const onOnline = () => void sync();
  const onVisible = () => {
    if (document.visibilityState === 'visible') void sync();
  };
  const onMessage = (event: MessageEvent) => {
    if ((event.data as { type?: unknown } | null)?.type !== BACKGROUND_SYNC_MESSAGE) return;
    const port = event.ports?.[0];
    void sync().then((ok) => port?.postMessage({ type: BACKGROUND_SYNC_MESSAGE, ok } satisfies BackgroundSyncAnswer));
  };
  let pending: unknown = null;
  const stopWrites = localWrites.subscribe(() => {
    // Offline: ask the browser now to wake us when signal returns, even if the app is closed first.
    if (isOffline()) void askForBackgroundSync();
    if (pending !== null) timers.clearTimer(pending);
    pending = timers.setTimer(() => {
      pending = null;
      void sync();
    }, AFTER_WRITE_DELAY_MS);
  });
  const worker = typeof navigator !== 'undefined' ? navigator.serviceWorker : undefined;
  window.addEventListener('online', onOnline);
  document.addEventListener('visibilitychange', onVisible);
  worker?.addEventListener('message', onMessage);
  return () => {
    window.removeEventListener('online', onOnline);
    document.removeEventListener('visibilitychange', onVisible);
    worker?.removeEventListener('message', onMessage);
    stopWrites();
    if (pending !== null) timers.clearTimer(pending);
  };
}

export function isOffline(): boolean {
  return typeof navigator !== 'undefined' && navigator.onLine === false;
}

let askedSinceSync = false;

/** A sync went through: the next time the phone is offline with changes, ask the browser again. */
export function backgroundSyncDone(): void {
  askedSinceSync = false;
}

/**
 * Asks the browser to wake the worker when a connection returns, where background sync exists.
 * Once until a sync goes through: a browser that thinks it is online (one bar, a captive portal)
 * fires the event at once, and asking again from the failed sync it started would go round and
 * round without the backoff. The browser retries a failed event on its own schedule.
 */
export async function askForBackgroundSync(): Promise<void> {
  if (askedSinceSync) return;
  askedSinceSync = true;
  try {
    const registration = await navigator.serviceWorker?.getRegistration();
    const sync = (registration as { sync?: { register(tag: string): Promise<void> } } | undefined)?.sync;
    await sync?.register(BACKGROUND_SYNC_TAG);
  } catch {
    // Not offered or refused: the online event and the retry timer still send the outbox.
  }
}
