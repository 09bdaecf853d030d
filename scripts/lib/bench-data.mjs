// Bench data: invented clubs and a long change history written straight into PostgreSQL.
import { randomUUID } from 'node:crypto';
import bcrypt from 'bcryptjs';

export const BENCH_PASSWORD = 'bench-password';

export async function seedBenchClub(client, slug) {
  const { rows: [club] } = await client.query(
    `INSERT INTO clubs (name, slug, time_zone, latitude, longitude) VALUES ($1, $2, 'Australia/Sydney', -33.29, 151.57) RETURNING id`,
    [`Bench club ${slug}`, slug]);
  const email = `${slug}@bench.example`;
  const { rows: [user] } = await client.query(
    'INSERT INTO users (email, display_name, password_hash) VALUES ($1, $2, $3) RETURNING id',
    [email, `Bench ${slug}`, await bcrypt.hash(BENCH_PASSWORD, 4)]);
  await client.query(`INSERT INTO memberships (club_id, user_id, role) VALUES ($1, $2, 'admin')`, [club.id, user.id]);
  return { clubId: club.id, userId: user.id, email, password: BENCH_PASSWORD, boatId: randomUUID(), lastSeq: 0 };
}

/** `n` accepted changes (defect records and their change-log rows), as if phones had pushed them. */
export async function seedHistory(client, club, n) {
  const step = 100_000;
  for (let from = 1; from <= n; from += step) {
    const to = Math.min(n, from + step - 1);
    await client.query(
      `WITH rec AS (
         INSERT INTO defects (id, club_id, version, hlc, updated_at, updated_by, device_id, deleted, change_seq, field_stamps,
           boat_id, motor_id, check_id, item_id, severity, description, photos, status, reported_by, reported_at,
           assigned_to, action_taken, repaired_at, verified_by, verified_at, rejected_reason, notes)
         SELECT gen_random_uuid(), $1, 1, lpad((1790000000000 + g)::text, 15, '0') || '-00000-history', now(), $2, 'history', false, g, '{}',
           $3, NULL, NULL, NULL, 'note', 'Earlier defect number ' || g, '[]', 'open', $6::text, '2026-11-01T00:00:00Z',
           NULL, NULL, NULL, NULL, NULL, NULL, '[]'
         FROM generate_series($4::bigint, $5::bigint) g
         RETURNING id, change_seq, hlc)
       INSERT INTO sync_changes (club_id, seq, kind, record_id, version, device_id, user_id, hlc, patch, deleted, status)
       SELECT $1, change_seq, 'defect', id, 1, 'history', $2, hlc, '{}', false, 'applied' FROM rec`,
      [club.clubId, club.userId, club.boatId, from, to, club.userId]);
  }
  await client.query(
    `INSERT INTO sync_club_state (club_id, last_seq) VALUES ($1, $2) ON CONFLICT (club_id) DO UPDATE SET last_seq = EXCLUDED.last_seq`,
    [club.clubId, n]);
  club.lastSeq = n;
}
