/**
 * Takes the club's sync lock for the rest of the transaction. Sequence numbers are handed out
 * under it, so they commit in order; other clubs have their own rows and never wait on this one.
 */
export async function lockClub(em, clubId) {
    await em.query('INSERT INTO sync_club_state (club_id) VALUES ($1) ON CONFLICT DO NOTHING', [clubId]);
    const [row] = await em.query('SELECT last_seq, purged_through_seq FROM sync_club_state WHERE club_id = $1 FOR UPDATE', [clubId]);
    return { lastSeq: Number(row.last_seq), purgedThroughSeq: Number(row.purged_through_seq) };
}
export async function saveClubSeq(em, clubId, lastSeq) {
    await em.query('UPDATE sync_club_state SET last_seq = $2 WHERE club_id = $1', [clubId, lastSeq]);
}
/** The device's last accepted seq, locked like the club (a device pushes one batch at a time). */
export async function lockDevice(em, clubId, deviceId) {
    await em.query('INSERT INTO sync_devices (club_id, device_id) VALUES ($1, $2) ON CONFLICT DO NOTHING', [clubId, deviceId]);
    const [row] = await em.query('SELECT last_seq FROM sync_devices WHERE club_id = $1 AND device_id = $2 FOR UPDATE', [clubId, deviceId]);
    return Number(row.last_seq);
}
export async function saveDeviceSeq(em, clubId, deviceId, lastSeq, userId) {
    await em.query('UPDATE sync_devices SET last_seq = $3, last_user_id = $4, last_push_at = now() WHERE club_id = $1 AND device_id = $2', [clubId, deviceId, lastSeq, userId]);
}
//# sourceMappingURL=club-lock.js.map