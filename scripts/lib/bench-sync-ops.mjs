// The measured operations of the sync bench: HTTP push, the raw-SQL baseline, and pulls.
import { randomUUID } from 'node:crypto';

let clockCounter = 0;
const hlc = (node) => `${String(Date.now()).padStart(15, '0')}-${String(clockCounter++ % 100000).padStart(5, '0')}-${node}`;

/** `n` new defects as a phone would push them. */
export function mutationsFor(club, n, device = { id: `bench-${randomUUID().slice(0, 8)}`, seq: 0 }) {
  return Array.from({ length: n }, (_, i) => ({
    mutationId: randomUUID(), seq: ++device.seq, recordId: randomUUID(), kind: 'defect', baseVersion: 0, base: {}, hlc: hlc(device.id),
    patch: {
      boatId: club.boatId, motorId: null, checkId: null, itemId: null, severity: 'limit', description: `Bench defect ${i}: bow handle strap worn`,
      photos: [], status: 'open', reportedBy: club.userId, reportedAt: '2026-11-30T21:00:00Z', assignedTo: null, actionTaken: null,
      repairedAt: null, verifiedBy: null, verifiedAt: null, rejectedReason: null, notes: [],
    },
  }));
}

async function signIn(baseUrl, club) {
  const res = await fetch(`${baseUrl}/api/auth/login`, {
    method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ email: club.email, password: club.password }),
  });
  if (!res.ok) throw new Error(`bench sign-in failed: ${res.status} ${await res.text()}`);
  return (await res.json()).accessToken;
}

export async function httpPush(baseUrl, club, batches) {
  const token = await signIn(baseUrl, club);
  const device = { id: `bench-${randomUUID().slice(0, 8)}`, seq: 0 };
  const bodies = batches.map((n) => JSON.stringify({ protocolVersion: 1, deviceId: device.id, mutations: mutationsFor(club, n, device) }));
  let changes = 0;
  const t0 = performance.now();
  for (const body of bodies) {
    const res = await fetch(`${baseUrl}/api/sync/push`, { method: 'POST', headers: { 'content-type': 'application/json', authorization: `Bearer ${token}` }, body });
    const json = await res.json();
    if (!res.ok) throw new Error(`push failed: ${res.status} ${JSON.stringify(json)}`);
    const applied = json.results.filter((r) => r.status === 'applied').length;
    if (applied !== json.results.length) throw new Error(`push: only ${applied} of ${json.results.length} applied: ${JSON.stringify(json.results.find((r) => r.status !== 'applied'))}`);
    changes += applied;
  }
  return { changes, perSecond: changes / ((performance.now() - t0) / 1000) };
}

const DEFECT_COLS = `boat_id text, motor_id text, check_id text, item_id text, severity text, description text, photos jsonb, status text,
  reported_by text, reported_at text, assigned_to text, action_taken text, repaired_at text, verified_by text, verified_at text,
  rejected_reason text, notes jsonb`;
const DEFECT_NAMES = 'boat_id, motor_id, check_id, item_id, severity, description, photos, status, reported_by, reported_at, assigned_to, action_taken, repaired_at, verified_by, verified_at, rejected_reason, notes';

/**
 * The floor to compare against: each batch in one statement that numbers the changes under the
 * club's row lock, upserts with a version check, and writes the change log with each change's
 * values — no validation, no merge, no HTTP.
 */
export async function baselinePush(client, club, batches) {
  let changes = 0;
  const t0 = performance.now();
  for (const mutations of batches) {
    const rows = mutations.map((m, i) => ({
      id: m.recordId, ord: i + 1, hlc: m.hlc, base_version: m.baseVersion, patch: m.patch,
      ...Object.fromEntries(Object.entries(m.patch).map(([k, v]) => [k.replace(/[A-Z]/g, (c) => `_${c.toLowerCase()}`), v])),
    }));
    const res = await client.query(
      `WITH input AS (SELECT * FROM jsonb_to_recordset($2::jsonb) AS x(id uuid, ord int, hlc text, base_version int, patch jsonb, ${DEFECT_COLS})),
       st AS (UPDATE sync_club_state SET last_seq = last_seq + (SELECT count(*) FROM input) WHERE club_id = $1
              RETURNING last_seq - (SELECT count(*) FROM input) AS base),
       up AS (INSERT INTO defects (id, club_id, version, hlc, updated_at, updated_by, device_id, deleted, change_seq, field_stamps, ${DEFECT_NAMES})
              SELECT i.id, $1, i.base_version + 1, i.hlc, now(), $3, 'baseline', false, st.base + i.ord, '{}', ${DEFECT_NAMES.split(', ').map((c) => `i.${c}`).join(', ')}
              FROM input i, st
              ON CONFLICT (id) DO UPDATE SET version = EXCLUDED.version, hlc = EXCLUDED.hlc, change_seq = EXCLUDED.change_seq, description = EXCLUDED.description
              WHERE defects.version = EXCLUDED.version - 1
              RETURNING id, change_seq, version, hlc)
       -- the log keeps what each change wrote, as the product's log does
       INSERT INTO sync_changes (club_id, seq, kind, record_id, version, device_id, user_id, hlc, patch, deleted, status)
       SELECT $1, up.change_seq, 'defect', up.id, up.version, 'baseline', $3, up.hlc, i.patch, false, 'applied' FROM up JOIN input i ON i.id = up.id`,
      [club.clubId, JSON.stringify(rows), club.userId]);
    changes += res.rowCount;
  }
  return { changes, perSecond: changes / ((performance.now() - t0) / 1000) };
}

/** Median time of pulling `limit` changes after a checkpoint `limit` short of the end. */
export async function timePulls(baseUrl, club, limit, runs = 15) {
  const token = await signIn(baseUrl, club);
  const since = club.lastSeq - limit;
  const once = async () => {
    const t0 = performance.now();
    const res = await fetch(`${baseUrl}/api/sync/pull?since=${since}&limit=${limit}`, { headers: { authorization: `Bearer ${token}` } });
    const json = await res.json();
    const ms = performance.now() - t0;
    if (json.changes?.length !== limit) throw new Error(`pull returned ${json.changes?.length} changes, expected ${limit}`);
    return ms;
  };
  for (let i = 0; i < 3; i++) await once();
  const times = [];
  for (let i = 0; i < runs; i++) times.push(await once());
  times.sort((a, b) => a - b);
  return times[Math.floor(times.length / 2)];
}
