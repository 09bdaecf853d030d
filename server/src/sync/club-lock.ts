import type { EntityManager } from 'typeorm';

export interface LockedClub { lastSeq: number; purgedThroughSeq: number }

/**
 * Takes the club's sync lock for the rest of the transaction. Sequence numbers are handed out
 * under it, so they commit in order; other clubs have their own rows and never wait on this one.
 */
export async function lockClub(em: EntityManager, clubId: string): Promise<LockedClub> {
  const row = await lockRow(em, 'SELECT last_seq, purged_through_seq FROM sync_club_state WHERE club_id = $1 FOR UPDATE',
    'INSERT INTO sync_club_state (club_id) VALUES ($1) ON CONFLICT DO NOTHING', [clubId]);
  return { lastSeq: Number(row.last_seq), purgedThroughSeq: Number(row.purged_through_seq) };
}

/**
 * Locks a row, making it first when there is none. The row is there on all but the first call,
 * so that costs one statement, not two: a push is a handful of trips to the database, and on a
 * busy machine each trip waits its turn for the processor.
 */
async function lockRow(em: EntityManager, select: string, insert: string, params: unknown[]) {
  const [row] = await em.query(select, params);
  if (row) return row;
  // Two first calls at once: the second insert waits for the first and does nothing; both then lock.
  await em.query(insert, params);
  const [made] = await em.query(select, params);
  return made;
}

/** The device's last accepted seq and its owner, locked like the club (a device pushes one batch at a time). */
export async function lockDevice(em: EntityManager, clubId: string, deviceId: string): Promise<{ deviceSeq: number; ownerId: string | null }> {
  const row = await lockRow(em, 'SELECT last_seq, user_id FROM sync_devices WHERE club_id = $1 AND device_id = $2 FOR UPDATE',
    'INSERT INTO sync_devices (club_id, device_id) VALUES ($1, $2) ON CONFLICT DO NOTHING', [clubId, deviceId]);
  return { deviceSeq: Number(row.last_seq), ownerId: row.user_id ?? null };
}

/**
 * Both locks of a push, club first as everywhere, in one statement when the device has pushed
 * before (the rows of a first push are made by lockClub and lockDevice).
 */
export async function lockClubAndDevice(
  em: EntityManager, clubId: string, deviceId: string,
): Promise<LockedClub & { deviceSeq: number; ownerId: string | null }> {
  const [row] = await em.query(
    `SELECT c.last_seq, c.purged_through_seq, d.last_seq AS device_seq, d.user_id
     FROM sync_club_state c JOIN sync_devices d ON d.club_id = c.club_id AND d.device_id = $2
     WHERE c.club_id = $1 FOR UPDATE OF c, d`, [clubId, deviceId]);
  if (row) {
    return { lastSeq: Number(row.last_seq), purgedThroughSeq: Number(row.purged_through_seq), deviceSeq: Number(row.device_seq), ownerId: row.user_id ?? null };
  }
  const club = await lockClub(em, clubId);
  return { ...club, ...(await lockDevice(em, clubId, deviceId)) };
}

/**
 * The device's new last seq, as a part of a WITH whose $1 is the club; its values are appended to
 * `params`. `owner`, when given, becomes the device's owner if it has none yet (its first push).
 */
export function deviceSeqPart(params: unknown[], deviceId: string, lastSeq: number, userId: string, owner: string | null): string {
  params.push(deviceId, lastSeq, userId, owner);
  const [d, s, u, o] = [params.length - 3, params.length - 2, params.length - 1, params.length];
  return `device_seq AS (UPDATE sync_devices SET last_seq = $${s}, last_user_id = $${u}, user_id = coalesce(user_id, $${o}::uuid), last_push_at = now()
    WHERE club_id = $1 AND device_id = $${d})`;
}

export async function saveDeviceSeq(em: EntityManager, clubId: string, deviceId: string, lastSeq: number, userId: string, owner: string | null) {
  await em.query(
    'UPDATE sync_devices SET last_seq = $3, last_user_id = $4, user_id = coalesce(user_id, $5::uuid), last_push_at = now() WHERE club_id = $1 AND device_id = $2',
    [clubId, deviceId, lastSeq, userId, owner]);
}
