import type { StorageStatus } from './activity';

/** Shown when the browser will not promise to keep the outbox. */
export const STORAGE_NOT_PERSISTED =
  'The browser may clear changes not yet sent if the phone runs short of space or the app is not used for days. Sync often, and install Breakline to the home screen.';

/**
 * Asks the browser to keep this site's data under storage pressure. Unsent changes exist only
 * here, so an eviction would lose them; the answer is shown in the sync status.
 */
export async function requestPersistentStorage(storage: StorageManager | undefined = globalThis.navigator?.storage): Promise<StorageStatus> {
  if (!storage?.persist) return 'unsupported';
  try {
    if (await storage.persisted?.()) return 'persisted';
    return (await storage.persist()) ? 'persisted' : 'refused';
  } catch {
    return 'refused';
  }
}
