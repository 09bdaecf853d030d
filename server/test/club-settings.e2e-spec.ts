import { createTestApp, login, type TestApp } from './support/test-app.js';

describe('club settings', () => {
  let t: TestApp;
  beforeAll(async () => { t = await createTestApp(); });
  afterAll(async () => { await t.app.close(); });

  const patch = (token: string, body: object) => t.http().patch('/api/clubs/current').set('authorization', `Bearer ${token}`).send(body);

  it('lets an admin choose to block sign-on without a current award, and the session shows it', async () => {
    const admin = await login(t, 'admin@gannetbay.example');
    const res = await patch(admin.accessToken, { awardCheck: 'block', timeZone: 'Australia/Perth' }).expect(200);
    expect(res.body).toMatchObject({ awardCheck: 'block', timeZone: 'Australia/Perth', pressureUnit: 'kPa' });
    const again = await login(t, 'driver@gannetbay.example');
    expect(again.activeClub).toMatchObject({ awardCheck: 'block', timeZone: 'Australia/Perth' });
    // Another club keeps its own settings.
    const kelp = await login(t, 'admin@kelpreef.example');
    const other = await t.http().get('/api/clubs/current').set('authorization', `Bearer ${kelp.accessToken}`).expect(200);
    expect(other.body.timeZone).not.toBe('Australia/Perth');
  });

  it('answers each bad setting with what to give instead, and changes nothing', async () => {
    const admin = await login(t, 'admin@gannetbay.example');
    const before = (await t.http().get('/api/clubs/current').set('authorization', `Bearer ${admin.accessToken}`)).body;
    const res = await patch(admin.accessToken, { timeZone: 'Sydney', latitude: 123, awardCheck: 'maybe' }).expect(400);
    const fields = res.body.details.map((d: { field: string }) => d.field).sort();
    expect(fields).toEqual(['awardCheck', 'latitude', 'timeZone']);
    expect(res.body.details.find((d: { field: string }) => d.field === 'timeZone').message).toMatch(/IANA name/);
    const after = (await t.http().get('/api/clubs/current').set('authorization', `Bearer ${admin.accessToken}`)).body;
    expect(after).toEqual(before);
  });

  it('answers a club name holding the NUL character with what to do, and keeps the old name', async () => {
    const admin = await login(t, 'admin@gannetbay.example');
    const before = (await t.http().get('/api/clubs/current').set('authorization', `Bearer ${admin.accessToken}`)).body;
    const res = await patch(admin.accessToken, { name: 'Gannet\u0000 Bay' }).expect(400);
    expect(res.body).toMatchObject({ code: 'validation_failed', message: expect.stringMatching(/control character \(NUL\).*retype/) });
    const after = (await t.http().get('/api/clubs/current').set('authorization', `Bearer ${admin.accessToken}`)).body;
    expect(after.name).toBe(before.name);
  });

  it('refuses a supervisor', async () => {
    const captain = await login(t, 'captain@gannetbay.example');
    const res = await patch(captain.accessToken, { awardCheck: 'warn' }).expect(403);
    expect(res.body.message).toMatch(/admin/);
  });
});
