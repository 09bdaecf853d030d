import { openReplica } from '@/db/open';
import { logout } from '../api/logout';
import { tokenStore } from '../token-store';
import { withAuthLock } from './auth-lock';
import { roster, type DeviceMember } from './roster';

// Apart from device.ts because these read the members' replicas: the sign-in screen, which
// needs device.ts, loads without the IndexedDB code.

/** Changes on this device not yet accepted by the server: queued edits and photos not yet sent. */
export async function unsentChanges(userId: string): Promise<number> {
  const db = openReplica(userId);
  const queued = await db.outbox.filter((e) => e.status === 'pending').count();
  const photos = (await db.photos.orderBy('[clubId+state]').keys()) as unknown as [string, string][];
  return queued + photos.filter(([, state]) => state !== 'sent').length;
}

export interface RemoveResult {
  /** Changes left on the device, to be sent when the member signs in here again. */
  kept: number;
}

/**
 * Takes a member off this device. Their tokens go (and the server is asked to revoke them).
 * Changes not yet sent are kept, with their copy of the club's records, until they sign in here
 * again; with nothing unsent, that copy is deleted.
 */
export async function removeMember(member: DeviceMember): Promise<RemoveResult> {
  const kept = await unsentChanges(member.userId);
  const refreshToken = await withAuthLock(async () => {
    tokenStore.reload();
    roster.reload();
    const active = tokenStore.getState().session;
    const token = active?.user.id === member.userId ? active.refreshToken : roster.find(member.userId)?.session?.refreshToken;
    if (active?.user.id === member.userId) tokenStore.clear();
    roster.update(member.userId, () => null);
    return token;
  });
  if (kept === 0) await openReplica(member.userId).delete({ disableAutoOpen: false }).catch(() => undefined);
  if (refreshToken) {
    // Offline the server is not told; the token then lapses at its own expiry.
    void logout(refreshToken).catch(() => undefined);
  }
  return { kept };
}
