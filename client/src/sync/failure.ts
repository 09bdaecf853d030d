import { isApiError } from '@/lib/api-error';
import type { SyncFailure } from '@/db/types';
import { PhotoStoreUnavailableError } from './photo-store-error';
import { SignedOutError } from './transport';

function isStorageFull(error: unknown): boolean {
  const names = [(error as { name?: string })?.name, (error as { inner?: { name?: string } })?.inner?.name];
  return names.some((n) => n === 'QuotaExceededError');
}

/** Why a sync stopped, in words a person on the beach can act on. */
export function describeFailure(error: unknown, at: string): SyncFailure {
  if (error instanceof SignedOutError) {
    return { reason: 'signed-out', at, message: 'Signed out. Sign in again to send the changes waiting on this phone.' };
  }
  if (isApiError(error, 'network_error')) {
    return { reason: 'offline', at, message: 'No signal. Changes stay on this phone and are sent when there is a connection.' };
  }
  if (isApiError(error) && (error.status === 426 || error.code === 'protocol_outdated')) {
    return { reason: 'outdated', at, message: 'This app is out of date. It is fetching the new version; changes wait on this phone until then.' };
  }
  if (error instanceof PhotoStoreUnavailableError) {
    return { reason: 'photos', at, message: `Photos not sent yet: ${error.message}` };
  }
  if (isApiError(error)) {
    return { reason: 'server', at, message: `The server could not sync: ${error.message}` };
  }
  if (isStorageFull(error)) {
    return { reason: 'storage', at, message: 'This phone is out of storage space. Free some space; changes already saved are kept.' };
  }
  const detail = error instanceof Error ? error.message : String(error);
  return { reason: 'app', at, message: `Sync stopped on this phone: ${detail}` };
}

/** Failures worth retrying on a timer; the others wait for the person (sign in) or an update. */
export function retriesOnTimer(failure: SyncFailure): boolean {
  return ['offline', 'server', 'photos', 'app', 'storage'].includes(failure.reason);
}
