import Papa from 'papaparse';
import { createTestApp, login, type TestApp } from './support/test-app.js';
import { defectFields, incidentFields, TestDevice, uuid } from './support/sync-fixtures.js';

type Session = Awaited<ReturnType<typeof login>> & { user: { id: string; displayName: string } };

// Dates are in March 2025 at Gannet Bay (Australia/Sydney), when the club keeps daylight time,
// UTC+11, until the first Sunday in April (IANA tz database, australasia file; from memory for 2025).
describe('the Review desk tables, their CSV and record history', () => {
  let t: TestApp;
  let crew: Session;
  let driver: Session;
  let captain: Session;
  let boats: { id: string; name: string }[];
  let templateId: string;
  const auth = (s: Session) => ({ authorization: `Bearer ${s.accessToken}` });
  // One phone a member, as on the beach: a device is its first pusher's.
  const phones = new Map<string, TestDevice>();
  const phoneOf = (s: { accessToken: string }) => phones.get(s.accessToken) ?? phones.set(s.accessToken, new TestDevice()).get(s.accessToken)!;

  const push = async (s: Session, kind: Parameters<TestDevice['mutation']>[0], id: string, patch: Record<string, unknown>, opts = {}) => {
    const res = await t.http().post('/api/sync/push').set(auth(s)).send(phoneOf(s).body([phoneOf(s).mutation(kind, id, patch, opts)])).expect(200);
    expect(res.body.results[0].status).toMatch(/applied|merged/);
    return res.body.results[0];
  };
  const check = (over: Record<string, unknown>) => ({
    boatId: boats[0]!.id, motorId: null, checkType: 'launch', templateId, templateVersion: 1, startedAt: '2025-03-03T20:00:00Z',
    completedAt: '2025-03-03T20:15:00Z', status: 'complete', results: { 'pressure-bow': { outcome: 'pass', value: 20 } },
    performedBy: crew.user.id, signedOffBy: null, signedOffAt: null, ...over,
  });
  const trip = (over: Record<string, unknown>) => ({
    boatId: boats[0]!.id, motorId: null, purpose: 'patrol', driverId: driver.user.id, crewIds: [crew.user.id], launchedAt: '2025-03-08T00:00:00Z',
    retrievedAt: '2025-03-08T01:30:00Z', windSpeedKn: 12, windDirectionDeg: 90, waveHeightM: 1, engineHoursStart: null, engineHoursEnd: null,
    fuelAddedL: null, notes: [], editReasons: [], ...over,
  });
  const get = (s: Session, path: string) => t.http().get(path).set(auth(s));
  const checkIds: Record<string, string> = {};

  beforeAll(async () => {
    t = await createTestApp();
    crew = (await login(t, 'crew@gannetbay.example')) as Session;
    driver = (await login(t, 'driver@gannetbay.example')) as Session;
    captain = (await login(t, 'captain@gannetbay.example')) as Session;
    const pulled = (await get(crew, '/api/sync/pull?limit=1000').expect(200)).body.changes as { id: string; kind: string; fields: Record<string, string> }[];
    boats = pulled.filter((r) => r.kind === 'boat').map((b) => ({ id: b.id, name: b.fields.name! })).sort((a, b) => a.name.localeCompare(b.name));
    templateId = pulled.find((r) => r.kind === 'checkTemplate' && r.fields.checkType === 'launch')!.id;

    // Five checks from 1 to 4 March local, two on either side of local midnight; one signed off.
    const rows: [string, Record<string, unknown>][] = [
      ['late-feb', { startedAt: '2025-03-01T12:59:59Z', completedAt: '2025-03-01T13:10:00Z' }], // 23:59:59 on 1 March local
      ['midnight', { startedAt: '2025-03-01T13:00:00Z', completedAt: '2025-03-01T13:10:00Z', boatId: boats[1]!.id }], // 00:00 on 2 March
      ['failed', { startedAt: '2025-03-02T05:00:00Z', completedAt: '2025-03-02T05:20:00Z', results: { 'pressure-bow': { outcome: 'fail', value: 12 }, 'kill-cord': { outcome: 'fail' } } }],
      ['running', { startedAt: '2025-03-03T00:00:00Z', completedAt: null, status: 'in-progress', performedBy: driver.user.id }],
      ['signed', { startedAt: '2025-03-03T22:00:00Z', completedAt: '2025-03-03T22:20:00Z' }],
    ];
    for (const [name, over] of rows) {
      checkIds[name] = uuid();
      // Each check is pushed by the member who did it: only a supervisor enters one for someone else.
      await push(over.performedBy === driver.user.id ? driver : crew, 'check', checkIds[name]!, check(over));
    }
    await push(captain, 'check', checkIds.signed!, { signedOffBy: captain.user.id, signedOffAt: '2025-03-04T01:00:00Z' }, { baseVersion: 1, base: { signedOffBy: null, signedOffAt: null } });
  });
  afterAll(async () => { await t.app.close(); });

  const march = 'from=2025-03-01&to=2025-03-31';

  it('pages the table on the server, newest first by default, with the total', async () => {
    const p0 = (await get(captain, `/api/review/checks?${march}&pageSize=2&page=0`).expect(200)).body;
    const p2 = (await get(captain, `/api/review/checks?${march}&pageSize=2&page=2`).expect(200)).body;
    expect(p0.total).toBe(5);
    expect(p0.rows.map((r: { id: string }) => r.id)).toEqual([checkIds.signed, checkIds.running]);
    expect(p2.rows.map((r: { id: string }) => r.id)).toEqual([checkIds['late-feb']]);
    expect(p0).toMatchObject({ page: 0, pageSize: 2 });
  });

  it('carries the names a person reads beside the ids, and the failed items', async () => {
    const { rows } = (await get(captain, `/api/review/checks?${march}&sort=startedAt&dir=asc`).expect(200)).body;
    const signed = rows.find((r: { id: string }) => r.id === checkIds.signed);
    expect(signed).toMatchObject({
      boatId: boats[0]!.id, boatName: boats[0]!.name, boatFleetNumber: expect.stringMatching(/^IRB/), performedBy: crew.user.id, performedByName: 'Sam Whitcombe',
      signedOffBy: captain.user.id, signedOffByName: 'Tomas Varga', signedOffAt: '2025-03-04T01:00:00Z', version: 2, failedItems: 0,
    });
    expect(rows.find((r: { id: string }) => r.id === checkIds.failed).failedItems).toBe(2);
  });

  it('filters by the club\'s local dates, boat, member and state', async () => {
    const ids = async (q: string) => (await get(captain, `/api/review/checks?${q}&sort=startedAt&dir=asc`).expect(200)).body.rows.map((r: { id: string }) => r.id);
    // Local midnight at the club is the edge, not UTC midnight.
    expect(await ids('from=2025-03-02&to=2025-03-02')).toEqual([checkIds.midnight, checkIds.failed]);
    expect(await ids('from=2025-03-01&to=2025-03-01')).toEqual([checkIds['late-feb']]);
    expect(await ids(`${march}&boatId=${boats[1]!.id}`)).toEqual([checkIds.midnight]);
    expect(await ids(`${march}&memberId=${driver.user.id}`)).toEqual([checkIds.running]);
    expect(await ids(`${march}&memberId=${captain.user.id}`)).toEqual([checkIds.signed]);
    expect(await ids(`${march}&state=in-progress`)).toEqual([checkIds.running]);
    expect(await ids(`${march}&state=signed-off`)).toEqual([checkIds.signed]);
    expect(await ids(`${march}&state=complete`)).toEqual([checkIds['late-feb'], checkIds.midnight, checkIds.failed]);
  });

  it('sorts by a field or by the name behind an id, either way', async () => {
    const asc = (await get(captain, `/api/review/checks?${march}&sort=boatId&dir=asc`).expect(200)).body.rows as { boatFleetNumber: string }[];
    const fleet = asc.map((r) => r.boatFleetNumber);
    expect(fleet).toEqual([...fleet].sort());
    expect(new Set(fleet).size).toBe(2);
    const byFailed = (await get(captain, `/api/review/checks?${march}&sort=failedItems&dir=desc`).expect(200)).body.rows;
    expect(byFailed[0].id).toBe(checkIds.failed);
    const byPerson = (await get(captain, `/api/review/checks?${march}&sort=performedBy&dir=asc`).expect(200)).body.rows;
    expect(byPerson.map((r: { performedByName: string }) => r.performedByName)).toEqual(['Priya Lindholm', 'Sam Whitcombe', 'Sam Whitcombe', 'Sam Whitcombe', 'Sam Whitcombe']);
  });

  it('answers a bad filter or sort with a sentence saying what is allowed', async () => {
    let res = await get(captain, `/api/review/checks?sort=colour`).expect(400);
    expect(res.body).toMatchObject({ code: 'validation_failed', message: expect.stringMatching(/cannot be sorted by colour; sort by one of startedAt/) });
    res = await get(captain, `/api/review/checks?severity=stand-down`).expect(400);
    expect(res.body.message).toBe('Only defects have a severity; leave severity out for checks.');
    res = await get(captain, `/api/review/trips?state=stowed`).expect(400);
    expect(res.body.message).toBe('state must be one of afloat, retrieved for trips.');
    res = await get(captain, `/api/review/checks?from=2025-03-10&to=2025-03-01`).expect(400);
    expect(res.body.message).toMatch(/starts \(2025-03-10\) after it ends/);
    res = await get(captain, `/api/review/checks?pageSize=500`).expect(400);
    expect(res.body.details[0]).toMatchObject({ field: 'pageSize' });
    res = await get(captain, `/api/review/sailboats`).expect(404);
    expect(res.body.message).toMatch(/checks, trips, defects, incidentNotes/);
  });

  it('lists trips with crew names and time on the water, and defects by severity', async () => {
    const afloat = uuid();
    const done = uuid();
    await push(driver, 'trip', done, trip({}));
    await push(driver, 'trip', afloat, trip({ launchedAt: '2025-03-09T02:00:00Z', retrievedAt: null, purpose: 'rescue' }));
    const trips = (await get(captain, `/api/review/trips?${march}&sort=launchedAt&dir=asc`).expect(200)).body;
    expect(trips.total).toBe(2);
    expect(trips.rows[0]).toMatchObject({ id: done, driverName: 'Priya Lindholm', crewNames: ['Sam Whitcombe'], durationMinutes: 90 });
    expect(trips.rows[1]).toMatchObject({ id: afloat, durationMinutes: null });
    expect((await get(captain, `/api/review/trips?${march}&state=afloat`).expect(200)).body.rows.map((r: { id: string }) => r.id)).toEqual([afloat]);
    expect((await get(captain, `/api/review/trips?${march}&memberId=${crew.user.id}`).expect(200)).body.total).toBe(2);
    expect((await get(captain, `/api/review/trips?${march}&type=rescue`).expect(200)).body.rows.map((r: { id: string }) => r.id)).toEqual([afloat]);

    const sd = uuid();
    await push(crew, 'defect', sd, defectFields(boats[0]!.id, crew.user.id, { severity: 'stand-down', reportedAt: '2025-03-10T03:00:00Z' }));
    await push(crew, 'defect', uuid(), defectFields(boats[0]!.id, crew.user.id, { severity: 'note', reportedAt: '2025-03-11T03:00:00Z' }));
    const defects = (await get(captain, `/api/review/defects?${march}&severity=stand-down`).expect(200)).body;
    expect(defects.rows.map((r: { id: string }) => r.id)).toEqual([sd]);
    expect(defects.rows[0]).toMatchObject({ reportedByName: 'Sam Whitcombe', boatName: boats[0]!.name, status: 'open' });
    const bySeverity = (await get(captain, `/api/review/defects?${march}&sort=severity&dir=asc`).expect(200)).body.rows;
    expect(bySeverity.map((r: { severity: string }) => r.severity)).toEqual(['stand-down', 'note']);
  });

  it('shows incident notes to supervisors, and to anyone else only their own', async () => {
    const mine = uuid();
    const other = uuid();
    await push(crew, 'incidentNote', mine, incidentFields(crew.user.id, { occurredAt: '2025-03-12T01:00:00Z' }));
    await push(driver, 'incidentNote', other, incidentFields(driver.user.id, { occurredAt: '2025-03-12T02:00:00Z', kind: 'rescue' }));
    const all = (await get(captain, `/api/review/incidentNotes?${march}`).expect(200)).body;
    expect(all.rows.map((r: { id: string }) => r.id)).toEqual([other, mine]);
    expect(all.rows[1]).toMatchObject({ authorName: 'Sam Whitcombe', actionTaken: 'Brought a tired swimmer back to the flags' });
    const own = (await get(crew, `/api/review/incidentNotes?${march}`).expect(200)).body;
    expect(own).toMatchObject({ total: 1, rows: [expect.objectContaining({ id: mine })] });
    const res = await get(crew, `/api/review/checks?${march}`).expect(403);
    expect(res.body.message).toMatch(/supervisor role or higher/);
    await get(crew, `/api/review/trips.csv?${march}`).expect(403);
    expect((await get(captain, `/api/review/incidentNotes?motorId=${uuid()}`).expect(400)).body.message).toMatch(/name no motor/);
  });

  it('exports the filtered table as CSV with a header row and exactly the rows asked for', async () => {
    const res = await get(captain, `/api/review/checks.csv?from=2025-03-02&to=2025-03-04&sort=startedAt&dir=asc`).expect(200);
    expect(res.headers['content-type']).toMatch(/^text\/csv/);
    expect(res.headers['content-disposition']).toBe('attachment; filename="checks-2025-03-02-2025-03-04.csv"');
    const parsed = Papa.parse<string[]>(res.text.trim(), { skipEmptyLines: true });
    expect(parsed.errors).toEqual([]);
    const [header, ...rows] = parsed.data;
    expect(header).toEqual(['started', 'completed', 'boat', 'motor', 'check', 'status', 'failed items', 'failed item ids', 'done by',
      'signed off by', 'signed off', 'template version', 'record id']);
    expect(rows.map((r) => r[12])).toEqual([checkIds.midnight, checkIds.failed, checkIds.running, checkIds.signed]);
    // Times are the club's local time with its offset.
    expect(rows[0]![0]).toBe('2025-03-02T00:00:00+11:00');
    expect(rows[1]!.slice(6, 9)).toEqual(['2', 'kill-cord; pressure-bow', 'Sam Whitcombe']);
    expect(rows[3]!.slice(9, 11)).toEqual(['Tomas Varga', '2025-03-04T12:00:00+11:00']);
  });

  it('exports an empty selection as the header row alone, and defuses cells a spreadsheet would run', async () => {
    const empty = await get(captain, `/api/review/defects.csv?from=2024-01-01&to=2024-01-31`).expect(200);
    expect(empty.text.trim().split('\r\n')).toHaveLength(1);
    await push(crew, 'defect', uuid(), defectFields(boats[0]!.id, crew.user.id, { description: '=HYPERLINK("http://x.example")', reportedAt: '2025-03-20T03:00:00Z' }));
    const res = await get(captain, `/api/review/defects.csv?from=2025-03-20&to=2025-03-20`).expect(200);
    const [, row] = Papa.parse<string[]>(res.text.trim()).data;
    expect(row![4]).toBe(`'=HYPERLINK("http://x.example")`);
  });

  it('gives every version of a record: who, when, from which device and what changed', async () => {
    const id = uuid();
    const a = new TestDevice('phone-shed');
    const b = new TestDevice('desk-office');
    const c = new TestDevice('phone-beach');
    const fields = defectFields(boats[1]!.id, crew.user.id);
    await t.http().post('/api/sync/push').set(auth(crew)).send(a.body([a.mutation('defect', id, fields)])).expect(200);
    await t.http().post('/api/sync/push').set(auth(captain))
      .send(b.body([b.mutation('defect', id, { status: 'assigned', assignedTo: driver.user.id }, { baseVersion: 1, base: { status: 'open', assignedTo: null } })])).expect(200);
    await t.http().post('/api/sync/push').set(auth(driver))
      .send(c.body([c.mutation('defect', id, { status: 'repaired', actionTaken: 'New strap stitched on', repairedAt: '2026-11-29T02:00:00Z' },
        { baseVersion: 2, base: { status: 'assigned', actionTaken: null, repairedAt: null } })])).expect(200);

    const res = await get(captain, `/api/records/defect/${id}/history`).expect(200);
    const v = res.body.versions;
    expect(v.map((x: { version: number }) => x.version)).toEqual([1, 2, 3]);
    expect(v[0]).toMatchObject({ user: { id: crew.user.id, name: 'Sam Whitcombe' }, deviceId: 'phone-shed', status: 'applied' });
    expect(v[0].changes.description).toEqual({ from: null, to: fields.description, label: 'description' });
    expect(v[1]).toMatchObject({ user: { name: 'Tomas Varga' }, deviceId: 'desk-office' });
    expect(v[1].changes).toEqual({
      status: { from: 'open', to: 'assigned', label: 'status' },
      assignedTo: { from: null, to: driver.user.id, label: 'assigned to' },
    });
    expect(v[2]).toMatchObject({ deviceId: 'phone-beach' });
    expect(Object.keys(v[2].changes).sort()).toEqual(['actionTaken', 'repairedAt', 'status']);
    expect(v[2].changes.status).toEqual({ from: 'assigned', to: 'repaired', label: 'status' });
    expect(new Date(v[2].at).getTime()).toBeGreaterThanOrEqual(new Date(v[0].at).getTime());
    expect(v[0].hlc).toEqual(expect.any(String));
  });

  it('keeps history behind the same walls as the record', async () => {
    const note = uuid();
    await push(driver, 'incidentNote', note, incidentFields(driver.user.id));
    await get(captain, `/api/records/incidentNote/${note}/history`).expect(200);
    const res = await get(crew, `/api/records/incidentNote/${note}/history`).expect(403);
    expect(res.body.code).toBe('forbidden');
    const kelp = (await login(t, 'admin@kelpreef.example')) as Session;
    await get(kelp, `/api/records/incidentNote/${note}/history`).expect(404);
    await get(captain, `/api/records/sailboat/${note}/history`).expect(404);
    await get(captain, `/api/records/check/${uuid()}/history`).expect(404);
  });
});
