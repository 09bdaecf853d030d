/** What a long sync is doing now, for "n of m" in the status. */
export type SyncProgress =
  | { phase: 'sending'; done: number; total: number }
  | { phase: 'receiving'; done: number; more: boolean }
  | { phase: 'photos'; done: number; total: number };

export type ProgressListener = (progress: SyncProgress) => void;
