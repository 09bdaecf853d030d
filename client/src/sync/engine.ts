import { countPhotosIn } from '@/db/photos';
import { updateClubState } from '@/db/replica-state';
import type { ReplicaDb } from '@/db/schema';
import type { SyncFailure } from '@/db/types';
import { ScopeChangedError } from './auth-source';
import { describeFailure } from './failure';
import type { ProgressListener } from './progress';
import { pullAll } from './pull';
import { pushOutbox } from './push';
import { syncRequest, type TransportContext } from './transport';

export interface SyncContext extends TransportContext {
  db: ReplicaDb;
  now: () => number;
  /** Called on HTTP 426, before the sync stops with the outbox intact (checkForUpdate in the app). */
  onOutdated: () => void | Promise<void>;
  onProgress?: ProgressListener;
  batchSize?: number;
  pageSize?: number;
}

export type SyncOutcome =
  | { ok: true }
  | { ok: false; failure: SyncFailure }
  /** The person switched club or account mid-sync: run again for the new one. */
  | { ok: false; scopeChanged: true };

interface StatusAnswer {
  openConflicts: number;
}

/**
 * One sync of the scope's club: send the outbox, then pull to the end, then ask how many
 * conflicts wait for a supervisor, then upload the photos the sent records refer to. Push comes
 * first so the pull brings back our own accepted changes and the acknowledged overlays can be
 * let go; photos come last so the records, small and what the club cannot lose, go first on a
 * weak signal. Callers hold the sync lock.
 */
export async function syncOnce(ctx: SyncContext): Promise<SyncOutcome> {
  const { db, scope } = ctx;
  const stamp = () => new Date(ctx.now()).toISOString();
  await updateClubState(db, scope.clubId, { lastAttemptAt: stamp() });
  try {
    await pushOutbox(ctx);
    await pullAll(ctx);
    const status = await syncRequest<StatusAnswer>(ctx, '/api/sync/status');
    const openConflicts = typeof status?.openConflicts === 'number' ? status.openConflicts : undefined;
    await updateClubState(db, scope.clubId, { lastSyncAt: stamp(), lastError: null, openConflicts });
    // The upload's code loads only when a photo waits to go: most syncs send none.
    if ((await countPhotosIn(db, scope.clubId, 'due')) > 0) await (await import('./photo-upload')).uploadPhotos(ctx);
    return { ok: true };
  } catch (error) {
    if (error instanceof ScopeChangedError) return { ok: false, scopeChanged: true };
    const failure = describeFailure(error, stamp());
    if (failure.reason === 'outdated') await ctx.onOutdated();
    await updateClubState(db, scope.clubId, { lastError: failure });
    return { ok: false, failure };
  }
}
