import type { ReplicaDb } from '@/db/schema';
import { syncActivity } from './activity';
import type { SyncAuth } from './auth-source';
import { backoffDelay } from './backoff';
import { syncOnce, type SyncOutcome } from './engine';
import { retriesOnTimer } from './failure';
import { withLock } from './lock';
import { requestPersistentStorage } from './persist';
import { askForBackgroundSync, backgroundSyncDone, listenForTriggers, type TriggerTimers } from './triggers';

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
  private running: Promise<boolean> | null = null;
  /** Whether the last run went through, for the service worker's background sync. */
  private lastOk = false;
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

  /** Sync now, or once more after the sync under way; resolves, when no run is left, whether the last went through. */
  requestSync(): Promise<boolean> {
    if (this.running) {
      this.again = true;
      return this.running;
    }
    this.running = (async () => {
      do {
        this.again = false;
        await this.runOnce();
      } while (this.again);
      return this.lastOk;
    })().finally(() => {
      this.running = null;
      syncActivity.set({ running: false, progress: null });
    });
    return this.running;
  }

  /** Resolves when no sync is running (or queued to run again). */
  idle(): Promise<void> {
    return this.running ? this.running.then(() => undefined) : Promise.resolve();
  }

  private async runOnce(): Promise<void> {
    this.lastOk = false;
    const scope = this.deps.auth.scope();
    // Signed out: the outbox waits in that person's replica. Other members of a shared device still send theirs.
    if (!scope) return this.sendForOthers();
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
    await this.sendForOthers();
  }

  /**
   * On a shared device, each other signed-in member with changes waiting gets a sync of their
   * own replica with their own tokens. Best effort: a failure is kept in that member's status
   * and retried on the next trigger; the backoff follows the active member alone.
   */
  private async sendForOthers(): Promise<void> {
    for (const auth of this.deps.auth.others?.() ?? []) {
      const scope = auth.scope();
      if (!scope) continue;
      const db = this.deps.openDb(scope.userId);
      if ((await db.outbox.where('[clubId+status]').equals([scope.clubId, 'pending']).count()) === 0) continue;
      await withLock(`breakline-sync:${scope.userId}`, () =>
        syncOnce({ db, scope, auth, fetch: this.deps.fetch, now: this.deps.now ?? Date.now, onOutdated: this.deps.onOutdated }),
      );
    }
  }

  private settle(outcome: SyncOutcome): void {
    if (this.retry !== null) this.timers.clearTimer(this.retry);
    this.retry = null;
    this.lastOk = outcome.ok;
    if (outcome.ok) {
      this.failures = 0;
      backgroundSyncDone();
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
    const stop = listenForTriggers(() => this.requestSync(), this.timers);
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
