import type { ReplicaDb } from '@/db/schema';
import { syncActivity } from './activity';
import type { SyncAuth } from './auth-source';
import { backoffDelay } from './backoff';
import { syncOnce, type SyncOutcome } from './engine';
import { retriesOnTimer } from './failure';
import { withLock } from './lock';
import { requestPersistentStorage } from './persist';
import { askForBackgroundSync, listenForTriggers, type TriggerTimers } from './triggers';

export interface RunnerDeps extends Partial<TriggerTimers> {
  auth: SyncAuth;
  openDb: (userId: string) => ReplicaDb;
  onOutdated: () => void | Promise<void>;
  now?: () => number;
  random?: () => number;
  fetch?: typeof fetch;
}

/**
 * Runs syncs one at a time: a trigger during a sync asks for one more run after it rather than a
 * second sync beside it. A failure worth retrying sets a backoff timer; a success clears it.
 */
export class SyncRunner {
  private running: Promise<void> | null = null;
  private again = false;
  private failures = 0;
  private retry: unknown = null;
  /** Set by the stop function of start(): a sync finishing afterwards sets no timer. */
  private stopped = false;
  private readonly timers: TriggerTimers;

  constructor(private readonly deps: RunnerDeps) {
    this.timers = {
      setTimer: deps.setTimer ?? ((run, ms) => setTimeout(run, ms)),
      clearTimer: deps.clearTimer ?? ((h) => clearTimeout(h as ReturnType<typeof setTimeout>)),
    };
  }

  /** Sync now, or once more after the sync under way; resolves when no run is left. */
  requestSync(): Promise<void> {
    if (this.running) {
      this.again = true;
      return this.running;
    }
    this.running = (async () => {
      do {
        this.again = false;
        await this.runOnce();
      } while (this.again);
    })().finally(() => {
      this.running = null;
      syncActivity.set({ running: false, progress: null });
    });
    return this.running;
  }

  /** Resolves when no sync is running (or queued to run again). */
  idle(): Promise<void> {
    return this.running ?? Promise.resolve();
  }

  private async runOnce(): Promise<void> {
    const scope = this.deps.auth.scope();
    if (!scope) return; // signed out: the outbox waits in that person's replica
    const db = this.deps.openDb(scope.userId);
    syncActivity.set({ running: true, progress: null });
    const outcome: SyncOutcome = await withLock(`breakline-sync:${scope.userId}`, () =>
      syncOnce({
        db, scope, auth: this.deps.auth, fetch: this.deps.fetch,
        now: this.deps.now ?? Date.now, onOutdated: this.deps.onOutdated,
        onProgress: (progress) => syncActivity.set({ progress }),
      }),
    );
    this.settle(outcome);
  }

  private settle(outcome: SyncOutcome): void {
    if (this.retry !== null) this.timers.clearTimer(this.retry);
    this.retry = null;
    if (outcome.ok) {
      this.failures = 0;
      return;
    }
    if ('scopeChanged' in outcome) {
      this.again = true;
      return;
    }
    if (this.stopped || !retriesOnTimer(outcome.failure)) return;
    this.failures += 1;
    const wait = backoffDelay(this.failures, (this.deps.random ?? Math.random)());
    this.retry = this.timers.setTimer(() => void this.requestSync(), wait);
    if (outcome.failure.reason === 'offline') void askForBackgroundSync();
  }

  /** App start: sync now, listen for the triggers, and ask to keep the data. Returns a stop function. */
  start(): () => void {
    this.stopped = false;
    const stop = listenForTriggers(() => void this.requestSync(), this.timers);
    void requestPersistentStorage().then((storage) => syncActivity.set({ storage }));
    void this.requestSync();
    return () => {
      this.stopped = true;
      stop();
      if (this.retry !== null) this.timers.clearTimer(this.retry);
      this.retry = null;
    };
  }
}
