import { utcToLocal } from '@breakline/sync-protocol';
import type { LocalRecord } from '@/db/types';

/** The club's local date at an instant: the patrol session a sign-on belongs to. */
export function sessionDateOf(instant: string, zone: string): string {
  return utcToLocal(instant, zone).date;
}

/** Who is signed on to a boat for a session and not yet signed off, drivers first, in sign-on order. */
export function signedOn(signOns: readonly LocalRecord<'signOn'>[], boatId: string, date: string): LocalRecord<'signOn'>[] {
  return signOns
    .filter((s) => s.fields.boatId === boatId && s.fields.sessionDate === date && s.fields.signedOffAt === null)
    .sort((a, b) => (a.fields.role === b.fields.role ? a.fields.signedOnAt.localeCompare(b.fields.signedOnAt) : a.fields.role === 'driver' ? -1 : 1));
}

/** A member's open sign-on for the session on any boat, if there is one. */
export function openSignOnOf(signOns: readonly LocalRecord<'signOn'>[], memberId: string, date: string): LocalRecord<'signOn'> | undefined {
  return signOns.find((s) => s.fields.memberId === memberId && s.fields.sessionDate === date && s.fields.signedOffAt === null);
}

/** Trips launched and not yet retrieved, oldest launch first. */
export function openTrips(trips: readonly LocalRecord<'trip'>[], boatId?: string): LocalRecord<'trip'>[] {
  return trips
    .filter((t) => t.fields.retrievedAt === null && (boatId === undefined || t.fields.boatId === boatId))
    .sort((a, b) => a.fields.launchedAt.localeCompare(b.fields.launchedAt));
}
