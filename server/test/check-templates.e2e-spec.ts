import { DEFAULT_LAUNCH_TEMPLATE } from '@breakline/sync-protocol';
import { createTestApp, login, type TestApp } from './support/test-app.js';
import { TestDevice, uuid } from './support/sync-fixtures.js';

// Saved template versions are the club's record of what each check asked: the server holds them fixed.
describe('check template versions on the server', () => {
  let t: TestApp;
  let admin: string;
  let captain: string;
  let launch: { id: string; version: number; fields: Record<string, unknown> };
  // One phone a member: a device is its first pusher's.
  const phones = new Map<string, TestDevice>();
  const phoneOf = (token: string) => phones.get(token) ?? phones.set(token, new TestDevice()).get(token)!;
  const push = (token: string, kind: 'checkTemplate' | 'motorMove', id: string, patch: Record<string, unknown>, opts = {}) =>
    t.http().post('/api/sync/push').set('authorization', `Bearer ${token}`).send(phoneOf(token).body([phoneOf(token).mutation(kind, id, patch, opts)])).expect(200)
      .then((res) => res.body.results[0] as { status: string; error?: { message: string } });

  beforeAll(async () => {
    t = await createTestApp();
    admin = (await login(t, 'admin@gannetbay.example')).accessToken;
    captain = (await login(t, 'captain@gannetbay.example')).accessToken;
    const pulled = (await t.http().get('/api/sync/pull?limit=1000').set('authorization', `Bearer ${admin}`).expect(200)).body.changes as
      { id: string; kind: string; version: number; fields: Record<string, unknown> }[];
    launch = pulled.find((r) => r.kind === 'checkTemplate' && r.fields.checkType === 'launch')!;
  });
  afterAll(async () => { await t.app.close(); });

  it('refuses to change the items of a saved version, even for an admin', async () => {
    const sections = [{ ...DEFAULT_LAUNCH_TEMPLATE.sections[0]!, items: DEFAULT_LAUNCH_TEMPLATE.sections[0]!.items.slice(1) }];
    const result = await push(admin, 'checkTemplate', launch.id, { sections }, { baseVersion: launch.version, base: { sections: launch.fields.sections } });
    expect(result).toMatchObject({ status: 'rejected', error: { message: 'The sections of a check template cannot be changed once it is saved; make a new one instead.' } });
    const [row] = await t.db.query('SELECT sections FROM check_templates WHERE id = $1', [launch.id]);
    expect(row.sections).toEqual(DEFAULT_LAUNCH_TEMPLATE.sections);
  });

  it('takes an edit as a new version from an admin, not from a supervisor', async () => {
    const v2 = { ...DEFAULT_LAUNCH_TEMPLATE, templateVersion: 2, name: 'Launch check (surf)' };
    expect(await push(captain, 'checkTemplate', uuid(), v2)).toMatchObject({ status: 'rejected', error: { message: 'Only an admin may add a check template.' } });
    expect(await push(admin, 'checkTemplate', uuid(), v2)).toMatchObject({ status: 'applied' });
    const rows = await t.db.query(`SELECT template_version FROM check_templates WHERE check_type = 'launch' ORDER BY template_version`);
    expect(rows.map((r: { template_version: number }) => r.template_version)).toEqual([1, 2]);
  });

  it('keeps who moved a motor, and refuses a move with no one named', async () => {
    const motor = (await t.http().get('/api/sync/pull?limit=1000').set('authorization', `Bearer ${captain}`).expect(200)).body.changes
      .find((r: { kind: string }) => r.kind === 'motor') as { id: string; fields: { boatId: string | null } };
    const move = { motorId: motor.id, fromBoatId: motor.fields.boatId, toBoatId: null, movedAt: '2026-11-30T21:00:00Z', reason: 'Off for a service' };
    expect(await push(captain, 'motorMove', uuid(), move)).toMatchObject({ status: 'rejected' });
    const id = uuid();
    expect(await push(captain, 'motorMove', id, { ...move, movedBy: 'member-tomas' })).toMatchObject({ status: 'applied' });
    const [row] = await t.db.query('SELECT moved_by FROM motor_moves WHERE id = $1', [id]);
    expect(row.moved_by).toBe('member-tomas');
  });
});
