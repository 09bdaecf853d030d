/** What a long sync is doing now, for "n of m" in the status. */
export type SyncProgress =
  | { phase: 'sending'; done: number; total: number }
  /** `total`, when the server said how many were left: what this pull brings at most. */
  | { phase: 'receiving'; done: number; more: boolean; total?: number }
  | { phase: 'photos'; done: number; total: number };

export type ProgressListener = (progress: SyncProgress) => void;
