import type { Role } from '@breakline/sync-protocol';
import { openReplica } from '@/db/open';
import type { WriteContext } from '@/db/write';
import { sessionAnswer } from '@/test/fixtures';

/** A signed-in person with a replica of their own, so tests never see each other's records. */
export function testPerson(role: Role, pressureUnit = 'kPa') {
  const userId = `u-${crypto.randomUUID()}`;
  const base = sessionAnswer(role);
  const session = { ...base, user: { ...base.user, id: userId }, activeClub: { ...base.activeClub, pressureUnit } };
  const ctx: WriteContext = { db: openReplica(userId), userId, clubId: session.activeClub.id, role };
  // Fixtures are written as an admin would, into the same replica the person's screens read.
  const seed: WriteContext = { ...ctx, role: 'admin' };
  const me = { status: 200, body: { user: session.user, activeClub: session.activeClub, memberships: session.memberships } };
  return { session, ctx, seed, me };
}
