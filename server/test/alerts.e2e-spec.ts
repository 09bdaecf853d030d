import { addDays } from '@breakline/sync-protocol';
import { AwardRemindersService } from '../src/alerts/award-reminders.service.js';
import { StandDownAlertsService } from '../src/alerts/stand-down-alerts.service.js';
import { createTestApp, login, type TestApp } from './support/test-app.js';
import { defectFields, TestDevice, uuid } from './support/sync-fixtures.js';
import { mailEnv, startSmtpFake, type CaughtMail, type SmtpFake } from './support/smtp-fake.js';

type Session = Awaited<ReturnType<typeof login>> & { user: { id: string } };

describe('alerts by e-mail', () => {
  let t: TestApp;
  let mail: SmtpFake & { close: () => Promise<void> };
  let crew: Session;
  let captain: Session;
  let petrel: string;
  // One phone a member, as on the beach: a device is its first pusher's.
  const phones = new Map<string, TestDevice>();
  const phoneOf = (s: { accessToken: string }) => phones.get(s.accessToken) ?? phones.set(s.accessToken, new TestDevice()).get(s.accessToken)!;
  const auth = (s: Session) => ({ authorization: `Bearer ${s.accessToken}` });
  const push = async (s: Session, kind: Parameters<TestDevice['mutation']>[0], id: string, patch: Record<string, unknown>, opts = {}) => {
    const res = await t.http().post('/api/sync/push').set(auth(s)).send(phoneOf(s).body([phoneOf(s).mutation(kind, id, patch, opts)])).expect(200);
    expect(res.body.results[0].status).toMatch(/applied|merged/);
  };
  const about = (text: string) => (m: CaughtMail) => m.text.includes(text);
  // Mail jobs left queued by an earlier run against the same database may still arrive: this
  // run's texts carry their own mark, so they are never mistaken for those.
  const run = uuid().slice(0, 8);
  const alertsFor = async (defectId: string) => (await t.db.query('SELECT * FROM stand_down_alerts WHERE defect_id = $1', [defectId])).length;

  beforeAll(async () => {
    mail = await startSmtpFake();
    t = await createTestApp({ ...mailEnv(mail), MAIL_RETRY_SECONDS: '1', APP_URL: 'https://breakline.gannetbay.example' });
    crew = (await login(t, 'crew@gannetbay.example')) as Session;
    captain = (await login(t, 'captain@gannetbay.example')) as Session;
    const pulled = (await t.http().get('/api/sync/pull?limit=1000').set(auth(crew)).expect(200)).body.changes as { id: string; kind: string; fields: { name: string } }[];
    petrel = pulled.find((r) => r.kind === 'boat' && r.fields.name === 'Petrel')!.id;
  });
  afterAll(async () => {
    await t?.app.close();
    await mail?.close();
  });

  it('mails the club\'s supervisors and admins at once when a stand-down defect arrives, naming the boat', async () => {
    const id = uuid();
    const description = `Transom cracked beside the motor mount; water coming in (${run})`;
    await push(crew, 'defect', id, defectFields(petrel, crew.user.id, { severity: 'stand-down', description }));
    const toCaptain = await mail.waitFor((m) => m.to.includes('captain@gannetbay.example') && about(description)(m));
    const toAdmin = await mail.waitFor((m) => m.to.includes('admin@gannetbay.example') && about(description)(m));
    for (const m of [toCaptain, toAdmin]) {
      expect(m.subject).toBe(`Stood down: IRB 2 Petrel — Transom cracked beside the motor mount; water coming in (${run})`);
      expect(m.text).toContain('IRB 2 Petrel at Gannet Bay Surf Life Saving Club is stood down');
      expect(m.text).toContain('Reported by: Sam Whitcombe, 2026-11-29 08:10 (Australia/Sydney)');
      expect(m.text).toContain('not to be launched until a competent person has repaired it');
      expect(m.text).toContain('https://breakline.gannetbay.example');
      expect(m.tag).toBe('stand-down');
    }
    // Not the crew who reported it, nor another club.
    expect(mail.messages().filter(about(description)).flatMap((m) => m.to).sort()).toEqual(['admin@gannetbay.example', 'captain@gannetbay.example']);
  });

  it('alerts when a defect is raised to stand-down or reopened, not on every later edit', async () => {
    const id = uuid();
    const fields = defectFields(petrel, crew.user.id, { severity: 'limit', description: `Bow handle loose ${run}` });
    await push(crew, 'defect', id, fields);
    expect(await alertsFor(id)).toBe(0);
    await push(crew, 'defect', id, { severity: 'stand-down' }, { baseVersion: 1, base: { severity: 'limit' } });
    expect(await alertsFor(id)).toBe(1);
    await push(crew, 'defect', id, { description: `Bow handle torn out of its patch ${run}` }, { baseVersion: 2, base: { description: `Bow handle loose ${run}` } });
    expect(await alertsFor(id)).toBe(1);
    // Returned to service, then reported again: the boat is stood down anew.
    await push(captain, 'defect', id, { status: 'verified', verifiedBy: captain.user.id, verifiedAt: '2026-11-30T00:00:00Z', actionTaken: 'Handle glued' },
      { baseVersion: 3, base: { status: 'open', verifiedBy: null, verifiedAt: null, actionTaken: null } });
    expect(await alertsFor(id)).toBe(1);
    await push(crew, 'defect', id, { status: 'open' }, { baseVersion: 4, base: { status: 'verified' } });
    expect(await alertsFor(id)).toBe(2);
    await t.app.get(StandDownAlertsService).dispatch();
    const [row] = await t.db.query('SELECT count(*)::int AS unsent FROM stand_down_alerts WHERE sent_at IS NULL');
    expect(row.unsent).toBe(0);
    await mail.waitFor((m) => m.to.includes('captain@gannetbay.example') && m.subject.includes(`Bow handle torn out of its patch ${run}`));
  });

  it('tries again when the mail server refuses a message for a while', async () => {
    const description = `Fuel line split at the primer bulb (${run})`;
    mail.refuseNext(2, about(description));
    const before = mail.attempts();
    await push(crew, 'defect', uuid(), defectFields(petrel, crew.user.id, { severity: 'stand-down', description }));
    const m = await mail.waitFor((x) => x.to.includes('captain@gannetbay.example') && about(description)(x), 30_000);
    expect(m.subject).toContain('IRB 2 Petrel');
    await mail.waitFor((x) => x.to.includes('admin@gannetbay.example') && about(description)(x), 30_000);
    // Two refused tries, then both delivered.
    expect(mail.attempts() - before).toBeGreaterThanOrEqual(4);
  });

  it('mails a member and the supervisors once when an award enters its last 30 days', async () => {
    const pulled = (await t.http().get('/api/sync/pull?limit=1000').set(auth(captain)).expect(200)).body.changes as { id: string; kind: string; version: number; fields: { memberId: string; awards: unknown[] } }[];
    const card = pulled.find((r) => r.kind === 'member' && r.fields.memberId === crew.user.id)!;
    const now = new Date('2026-12-01T20:00:00Z'); // 2 December, 07:00 at the club
    const award = { id: 'radio-2024', name: `Marine radio operator ${run}`, qualifies: 'crew', awardedOn: '2024-12-20', expiresOn: addDays('2026-12-02', 25) };
    const soon = { id: 'first-aid-2024', name: `Advanced first aid ${run}`, qualifies: 'crew', awardedOn: '2024-03-01', expiresOn: addDays('2026-12-02', 31) };
    await push(captain, 'member', card.id, { awards: [...card.fields.awards, award, soon] }, { baseVersion: card.version, base: { awards: card.fields.awards } });

    const first = await t.app.get(AwardRemindersService).run(now);
    expect(first).toContainEqual({ holder: 'Sam Whitcombe', award: `Marine radio operator ${run}`, expiresOn: '2026-12-27', daysLeft: 25 });
    // 31 days left is not yet lapsing (sync-protocol: lapsing with 30 days or fewer).
    expect(first.some((a) => a.award.startsWith('Advanced first aid'))).toBe(false);
    const own = await mail.waitFor((m) => m.to.includes('crew@gannetbay.example') && m.subject === `Your Marine radio operator ${run} lapses on 2026-12-27`);
    expect(own.text).toContain('valid until 2026-12-27 (25 days left)');
    const digest = await mail.waitFor((m) => m.to.includes('captain@gannetbay.example') && m.tag === 'award-lapsing' && m.text.includes(`Marine radio operator ${run}`));
    expect(digest.text).toContain(`- Sam Whitcombe: Marine radio operator ${run}, valid until 2026-12-27 (25 days left)`);

    // Run again the same day: nothing is announced twice.
    expect(await t.app.get(AwardRemindersService).run(now)).toEqual([]);
    // The next day the other award has 30 days left and is announced, the first is not again.
    const next = await t.app.get(AwardRemindersService).run(new Date('2026-12-02T20:00:00Z'));
    expect(next.filter((a) => a.award.endsWith(run))).toEqual([{ holder: 'Sam Whitcombe', award: `Advanced first aid ${run}`, expiresOn: '2027-01-02', daysLeft: 30 }]);
  });
});
