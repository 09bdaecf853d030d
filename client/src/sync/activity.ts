import type { SyncProgress } from './progress';

export type StorageStatus = 'unknown' | 'persisted' | 'refused' | 'unsupported';

/** What this tab's sync is doing right now; the lasting facts live in IndexedDB. */
export interface SyncActivity {
  running: boolean;
  progress: SyncProgress | null;
  storage: StorageStatus;
}

let state: SyncActivity = { running: false, progress: null, storage: 'unknown' };
const listeners = new Set<() => void>();

/** A tiny store for useSyncExternalStore. */
export const syncActivity = {
  getSnapshot: (): SyncActivity => state,
  subscribe(listener: () => void): () => void {
    listeners.add(listener);
    return () => listeners.delete(listener);
  },
  set(change: Partial<SyncActivity>): void {
    state = { ...state, ...change };
    listeners.forEach((listener) => listener());
  },
};
