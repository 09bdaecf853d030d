// The client bench's club: an invented fleet with a few seasons of checks, trips and defects,
// pushed through the sync API as phones would, so every record passed the server's own rules.
import { randomUUID } from 'node:crypto';

const BOATS = [
  { fleetNumber: '1', name: 'Kittiwake' },
  { fleetNumber: '2', name: 'Shearwater' },
  { fleetNumber: '3', name: 'Tern' },
  { fleetNumber: '4', name: 'Petrel' },
];
const CHAMBERS = [
  { id: 'port', name: 'Port side pontoon', valve: 'Port valve', minKpa: 17, maxKpa: 24 },
  { id: 'starboard', name: 'Starboard side pontoon', valve: 'Starboard valve', minKpa: 17, maxKpa: 24 },
  { id: 'bow', name: 'Bow chamber', valve: 'Bow valve', minKpa: 17, maxKpa: 24 },
];
const PURPOSES = ['patrol', 'training', 'patrol', 'patrol', 'event-support', 'rescue', 'maintenance-run'];
const DAY_MS = 86_400_000;

let counter = 0;
const hlc = (node) => `${String(Date.now()).padStart(15, '0')}-${String(counter++ % 100_000).padStart(5, '0')}-${node}`;
const iso = (ms) => new Date(ms).toISOString().replace(/\.\d{3}Z$/, 'Z');

/** Every item of a template answered as a crew would on a good day. */
function answers(template, boatIndex, n) {
  const results = {};
  for (const section of template.sections) {
    for (const item of section.items) {
      if (item.kind === 'reading') results[item.id] = { outcome: 'pass', value: 19 + ((n + boatIndex) % 4) };
      else if (item.kind === 'count') results[item.id] = { outcome: 'pass', value: item.required ?? 1 };
      else if (item.kind === 'text') results[item.id] = { outcome: 'pass', value: 'Tell-tale strong, idle steady' };
      else if (item.kind === 'photo') results[item.id] = { outcome: 'na' };
      else results[item.id] = { outcome: n % 97 === 0 && !item.critical ? 'fail' : 'pass', ...(n % 97 === 0 && !item.critical ? { note: 'Strap worn; reported' } : {}) };
    }
  }
  return results;
}

/**
 * The records of a club of `total`: 4 boats, the launch template, one launch check left open for
 * the answer bench, then checks, trips and closed defects, oldest first, about 60/25/15.
 */
export function clubRecords({ userId, template, total, now = Date.now() }) {
  const records = [];
  const add = (kind, fields) => {
    const id = randomUUID();
    records.push({ id, kind, fields });
    return id;
  };
  const boatIds = BOATS.map((b) =>
    add('boat', { ...b, hullSerial: null, airChambers: CHAMBERS, requiredGear: [{ item: 'Rescue tube', count: 2 }], notes: '', inService: true }),
  );
  const templateId = add('checkTemplate', template);
  const openCheckId = add('check', {
    boatId: boatIds[0], motorId: null, checkType: 'launch', templateId, templateVersion: template.templateVersion,
    startedAt: iso(now - 60_000), completedAt: null, status: 'in-progress', results: {}, performedBy: userId,
    signedOffBy: null, signedOffAt: null,
  });
  const rest = total - records.length;
  const start = now - 3 * 365 * DAY_MS;
  const step = (3 * 365 * DAY_MS - DAY_MS) / rest;
  for (let n = 0; n < rest; n++) {
    const at = Math.round(start + n * step);
    const b = n % BOATS.length;
    const boatId = boatIds[b];
    const pick = n % 20;
    if (pick < 12) {
      add('check', {
        boatId, motorId: null, checkType: 'launch', templateId, templateVersion: template.templateVersion,
        startedAt: iso(at), completedAt: iso(at + 11 * 60_000), status: 'complete', results: answers(template, b, n),
        performedBy: userId, signedOffBy: n % 3 === 0 ? userId : null, signedOffAt: n % 3 === 0 ? iso(at + DAY_MS) : null,
      });
    } else if (pick < 17) {
      add('trip', {
        boatId, motorId: null, purpose: PURPOSES[n % PURPOSES.length], driverId: userId, crewIds: [userId],
        launchedAt: iso(at), retrievedAt: iso(at + 42 * 60_000), windSpeedKn: 8 + (n % 12), windDirectionDeg: (n * 37) % 360,
        waveHeightM: 0.5 + (n % 5) * 0.25, engineHoursStart: 100 + n / 10, engineHoursEnd: 100.7 + n / 10, fuelAddedL: n % 4 === 0 ? 12 : null,
        notes: n % 9 === 0 ? [{ at: iso(at + 45 * 60_000), by: userId, text: 'Rip current north of the flags; patrol moved the flags south.' }] : [],
        editReasons: [],
      });
    } else {
      add('defect', {
        boatId, motorId: null, checkId: null, itemId: null, severity: n % 3 === 0 ? 'limit' : 'note',
        description: `Starboard handle strap worn near the transom (report ${n})`, photos: [], status: 'verified',
        reportedBy: userId, reportedAt: iso(at), assignedTo: userId, actionTaken: 'Strap replaced with a new one from the spares box.',
        repairedAt: iso(at + 2 * DAY_MS), verifiedBy: userId, verifiedAt: iso(at + 3 * DAY_MS), rejectedReason: null, notes: [],
      });
    }
  }
  return { records, openCheckId, boatIds, templateId };
}

/** Pushes `records` as new ones from one device, `batch` a request; throws on anything not applied. */
export async function pushRecords(baseUrl, token, records, batch = 1000) {
  const device = `bench-seed-${randomUUID().slice(0, 8)}`;
  let seq = 0;
  for (let i = 0; i < records.length; i += batch) {
    const mutations = records.slice(i, i + batch).map((r) => ({
      mutationId: randomUUID(), seq: ++seq, recordId: r.id, kind: r.kind, baseVersion: 0, base: {}, hlc: hlc(device), patch: r.fields,
    }));
    const res = await fetch(`${baseUrl}/api/sync/push`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', authorization: `Bearer ${token}` },
      body: JSON.stringify({ protocolVersion: 1, deviceId: device, mutations }),
    });
    const json = await res.json();
    if (!res.ok) throw new Error(`Seeding push failed: ${res.status} ${JSON.stringify(json)}`);
    const refused = json.results.find((r) => r.status !== 'applied');
    if (refused) throw new Error(`Seeding push: a record was not applied: ${JSON.stringify(refused)}`);
  }
}

export async function signIn(baseUrl, email, password) {
  const res = await fetch(`${baseUrl}/api/auth/login`, {
    method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ email, password }),
  });
  if (!res.ok) throw new Error(`Bench sign-in failed: ${res.status} ${await res.text()}`);
  return res.json();
}
