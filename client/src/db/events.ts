/**
 * Told after every local write commits, so the sync engine can send soon without the db layer
 * importing it (imports go sync → db, never back).
 */
const listeners = new Set<(clubId: string) => void>();

export const localWrites = {
  subscribe(listener: (clubId: string) => void): () => void {
    listeners.add(listener);
    return () => listeners.delete(listener);
  },
  notify(clubId: string): void {
    listeners.forEach((listener) => listener(clubId));
  },
};
