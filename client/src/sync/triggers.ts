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

/** Calls `sync` when the phone comes online, the app comes to the front, the worker asks, or after writes. */
export function listenForTriggers(sync: () => void, timers: TriggerTimers): () => void {
  const onOnline = () => sync();
  const onVisible = () => {
    if (document.visibilityState === 'visible') sync();
  };
  const onMessage = (event: MessageEvent) => {
    if ((event.data as { type?: unknown } | null)?.type === BACKGROUND_SYNC_MESSAGE) sync();
  };
  let pending: unknown = null;
  const stopWrites = localWrites.subscribe(() => {
    if (pending !== null) timers.clearTimer(pending);
    pending = timers.setTimer(() => {
      pending = null;
      sync();
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

/** Asks the browser to wake the worker when a connection returns, where background sync exists. */
export async function askForBackgroundSync(): Promise<void> {
  try {
    const registration = await navigator.serviceWorker?.getRegistration();
    const sync = (registration as { sync?: { register(tag: string): Promise<void> } } | undefined)?.sync;
    await sync?.register(BACKGROUND_SYNC_TAG);
  } catch {
    // Not offered or refused: the online event and the retry timer still send the outbox.
  }
}
