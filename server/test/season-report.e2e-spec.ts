import { PDFParse } from 'pdf-parse';
import { createTestApp, login, type TestApp } from './support/test-app.js';
import { defectFields, incidentFields, TestDevice, uuid } from './support/sync-fixtures.js';

type Session = Awaited<ReturnType<typeof login>> & { user: { id: string } };

/** Reads a whole response body as bytes. */
const binary = (res: NodeJS.EventEmitter, done: (err: Error | null, body: Buffer) => void) => {
  const parts: Buffer[] = [];
  res.on('data', (c: Buffer) => parts.push(c));
  res.on('end', () => done(null, Buffer.concat(parts)));
};

// An invented fortnight at Gannet Bay (Australia/Sydney, daylight time UTC+11 in January; IANA tz
// database, australasia file, from memory for 2025). Weeks start on Monday (ISO 8601): 6 and 13
// January 2025. Every expected figure below is worked out by hand from these records.
describe('the Season report', () => {
  let t: TestApp;
  let driver: Session;
  let captain: Session;
  let boats: Record<string, string>;
  // One phone a member, as on the beach: a device is its first pusher's.
  const phones = new Map<string, TestDevice>();
  const phoneOf = (s: { accessToken: string }) => phones.get(s.accessToken) ?? phones.set(s.accessToken, new TestDevice()).get(s.accessToken)!;
  const auth = (s: Session) => ({ authorization: `Bearer ${s.accessToken}` });
  const push = async (s: Session, kind: Parameters<TestDevice['mutation']>[0], fields: Record<string, unknown>) => {
    const res = await t.http().post('/api/sync/push').set(auth(s)).send(phoneOf(s).body([phoneOf(s).mutation(kind, uuid(), fields)])).expect(200);
    expect(res.body.results[0].status).toBe('applied');
  };
  const trip = (boat: string, purpose: string, launchedAt: string, retrievedAt: string | null) => ({
    boatId: boats[boat], motorId: null, purpose, driverId: driver.user.id, crewIds: [], launchedAt, retrievedAt, windSpeedKn: null,
    windDirectionDeg: null, waveHeightM: null, engineHoursStart: null, engineHoursEnd: null, fuelAddedL: null, notes: [], editReasons: [],
  });
  const range = 'from=2025-01-06&to=2025-01-19';

  beforeAll(async () => {
    t = await createTestApp();
    driver = (await login(t, 'driver@gannetbay.example')) as Session;
    captain = (await login(t, 'captain@gannetbay.example')) as Session;
    const pulled = (await t.http().get('/api/sync/pull?limit=1000').set(auth(captain)).expect(200)).body.changes as { id: string; kind: string; fields: { name: string } }[];
    boats = Object.fromEntries(pulled.filter((r) => r.kind === 'boat').map((b) => [b.fields.name, b.id]));

    await push(driver, 'trip', trip('Shearwater', 'patrol', '2025-01-06T22:00:00Z', '2025-01-07T00:00:00Z')); // 2 h, Tue 7 Jan local
    await push(driver, 'trip', trip('Shearwater', 'training', '2025-01-12T23:00:00Z', '2025-01-13T00:30:00Z')); // 1.5 h, Mon 13 Jan local
    // 00:30 on Monday 13 January at the club, still Sunday in UTC: it counts in the club's week of 13 January.
    await push(driver, 'trip', trip('Petrel', 'rescue', '2025-01-12T13:30:00Z', '2025-01-12T14:00:00Z')); // 0.5 h
    await push(driver, 'trip', trip('Petrel', 'patrol', '2025-01-18T23:00:00Z', null)); // still out: counted, no hours
    await push(driver, 'trip', trip('Petrel', 'search', '2025-01-05T10:00:00Z', '2025-01-05T12:00:00Z')); // 5 Jan local: outside

    await push(driver, 'incidentNote', incidentFields(driver.user.id, { kind: 'rescue', peopleHelped: 2, occurredAt: '2025-01-12T13:40:00Z' }));
    await push(driver, 'incidentNote', incidentFields(driver.user.id, { kind: 'assist', peopleHelped: 1, occurredAt: '2025-01-07T01:00:00Z' }));
    await push(driver, 'incidentNote', incidentFields(driver.user.id, { kind: 'assist', peopleHelped: 3, occurredAt: '2025-01-15T01:00:00Z' }));
    await push(driver, 'incidentNote', incidentFields(driver.user.id, { kind: 'first-aid', peopleHelped: 1, occurredAt: '2025-01-15T02:00:00Z' }));

    const b = boats.Shearwater!;
    const by = driver.user.id;
    await push(captain, 'defect', defectFields(b, by, { reportedAt: '2025-01-07T00:00:00Z', repairedAt: '2025-01-07T06:00:00Z', status: 'verified', actionTaken: 'Strap replaced', verifiedBy: captain.user.id, verifiedAt: '2025-01-08T00:00:00Z' })); // 6 h
    await push(captain, 'defect', defectFields(b, by, { reportedAt: '2025-01-08T00:00:00Z', repairedAt: '2025-01-09T00:00:00Z', status: 'repaired', actionTaken: 'Valve cap reseated' })); // 24 h
    await push(captain, 'defect', defectFields(b, by, { reportedAt: '2025-01-14T00:00:00Z' }));
    await push(captain, 'defect', defectFields(b, by, { reportedAt: '2025-01-15T00:00:00Z', status: 'rejected', rejectedReason: 'Scuff only, not a defect' }));
  });
  afterAll(async () => { await t.app.close(); });

  it('works out hours on the water per boat by week, trips by purpose, defects and assists', async () => {
    const r = (await t.http().get(`/api/reports/season?${range}`).set(auth(captain)).expect(200)).body;
    expect(r).toMatchObject({ from: '2025-01-06', to: '2025-01-19', weeks: ['2025-01-06', '2025-01-13'], club: { name: 'Gannet Bay Surf Life Saving Club', timeZone: 'Australia/Sydney' } });
    expect(r.hoursOnWater.total).toBeCloseTo(4, 9);
    const byBoat = Object.fromEntries(r.hoursOnWater.byBoat.map((x: { boatName: string; totalHours: number; weekly: number[] }) => [x.boatName, x]));
    expect(byBoat.Shearwater.totalHours).toBeCloseTo(3.5, 9);
    expect(byBoat.Shearwater.weekly).toEqual([2, 1.5]);
    expect(byBoat.Petrel.weekly).toEqual([0, 0.5]);
    expect(r.trips).toEqual({
      total: 4, open: 1,
      byPurpose: { patrol: 2, training: 1, rescue: 1, search: 0, 'preventive-action': 0, 'event-support': 0, 'maintenance-run': 0 },
    });
    expect(r.rescues).toEqual({ incidents: 1, persons: 2 });
    expect(r.assists).toEqual({ incidents: 2, persons: 4 });
    // The median of 6 h and 24 h is their mean, 15 h (the median of an even count).
    expect(r.defects).toMatchObject({ raised: 4, closed: 2, medianHoursToRepair: 15, repairedCount: 2 });
    expect(r.defects.weekly).toEqual([{ week: '2025-01-06', raised: 2, returnedToService: 1 }, { week: '2025-01-13', raised: 2, returnedToService: 0 }]);
  });

  it('makes the PDF in a background job, and the PDF holds the same figures', async () => {
    const started = await t.http().post('/api/reports/season/pdf').set(auth(captain)).send({ from: '2025-01-06', to: '2025-01-19' }).expect(202);
    expect(started.body).toMatchObject({ jobId: expect.any(String), state: expect.stringMatching(/queued|working|done/) });
    let state = started.body.state;
    for (let i = 0; i < 100 && state !== 'done' && state !== 'failed'; i++) {
      await new Promise((r) => setTimeout(r, 200));
      state = (await t.http().get(`/api/reports/jobs/${started.body.jobId}`).set(auth(captain)).expect(200)).body.state;
    }
    expect(state).toBe('done');
    const file = await t.http().get(`/api/reports/jobs/${started.body.jobId}/file`).set(auth(captain)).buffer(true).parse(binary).expect(200);
    expect(file.headers['content-type']).toBe('application/pdf');
    expect(file.headers['content-disposition']).toBe('attachment; filename="season-report-2025-01-06-to-2025-01-19.pdf"');
    const parser = new PDFParse({ data: new Uint8Array(file.body as Buffer) });
    const text = (await parser.getText()).text.replace(/[ \t]+/g, ' ');
    await parser.destroy();
    for (const line of [
      'Season report', 'Gannet Bay Surf Life Saving Club', '2025-01-06 to 2025-01-19',
      'Trips 4 (1 not yet retrieved, left out of the hours)', 'Hours on the water 4.0 h',
      'Rescues 1 (2 people)', 'Assists 2 (4 people)', 'Defects raised 4', 'Defects closed 2',
      'Median time from report to repair 15.0 h over 2 repaired defects',
      'Patrol 2', 'Training 1', 'Rescue 1', 'Search 0',
      'IRB 1 Shearwater 3.5 h', 'IRB 2 Petrel 0.5 h',
      '2025-01-06 2.0 -', '2025-01-13 1.5 0.5',
      '2025-01-06 2 1', '2025-01-13 2 0',
    ]) expect(text).toContain(line);
  });

  it('keeps reports to supervisors of the club, and asks for a sensible range', async () => {
    const crew = (await login(t, 'crew@gannetbay.example')) as Session;
    await t.http().get(`/api/reports/season?${range}`).set(auth(crew)).expect(403);
    const missing = await t.http().get('/api/reports/season').set(auth(captain)).expect(400);
    expect(missing.body.message).toMatch(/from and to dates/);
    const backwards = await t.http().get('/api/reports/season?from=2025-02-01&to=2025-01-01').set(auth(captain)).expect(400);
    expect(backwards.body.message).toMatch(/swap the dates/);
    await t.http().get('/api/reports/season?from=2020-01-01&to=2025-01-01').set(auth(captain)).expect(400);
    const bad = await t.http().post('/api/reports/season/pdf').set(auth(captain)).send({ from: 'last spring', to: '2025-01-01' }).expect(400);
    expect(bad.body.details).toEqual([{ field: 'from', message: 'from must be a date such as 2026-09-01.' }]);

    const started = await t.http().post('/api/reports/season/pdf').set(auth(captain)).send({ from: '2025-01-06', to: '2025-01-19' }).expect(202);
    const kelp = (await login(t, 'admin@kelpreef.example')) as Session;
    await t.http().get(`/api/reports/jobs/${started.body.jobId}`).set(auth(kelp)).expect(404);
    await t.http().get(`/api/reports/jobs/${started.body.jobId}/file`).set(auth(kelp)).expect(404);
  });

  it('names the record that stops the figures being worked out', async () => {
    await push(driver, 'trip', trip('Petrel', 'patrol', '2025-02-03T00:00:00Z', '2025-02-03T01:00:00Z'));
    // Only a damaged database could hold this: the sync rules refuse a retrieval before the launch.
    await t.db.query(`UPDATE trips SET retrieved_at = '2025-02-02T00:00:00Z' WHERE launched_at = '2025-02-03T00:00:00Z'`);
    const res = await t.http().get('/api/reports/season?from=2025-02-01&to=2025-02-28').set(auth(captain)).expect(422);
    expect(res.body.message).toMatch(/retrieved \(2025-02-02T00:00:00Z\) before it was launched.*Correct that record/);
  });
});
