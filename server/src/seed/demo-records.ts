// The demo club's records, written through the same push rules as a phone's changes. A fixed
// device id and seq make a second run a replay: every mutation answers "duplicate".
import type { DataSource } from 'typeorm';
import {
  DEFAULT_LAUNCH_TEMPLATE, DEFAULT_STOW_TEMPLATE, encodeHlc, PROTOCOL_VERSION, type KindFields, type Mutation, type RecordKind, type Role,
} from '@breakline/sync-protocol';
import { DEMO_DEVICE as DEVICE, PushService } from '../sync/push.service.js';
import { BOATS, motorMoves, motors } from './demo-fleet.js';
import { demoId } from './demo-ids.js';
import { demoChecks, demoDefects } from './demo-history.js';
import { demoPatrol } from './demo-patrol.js';
import { DEMO_CLUBS } from './demo-scenario.js';

export interface DemoPeople { admin: string; captain: string; driver: string; crew: string }

const GANNET_BAY = DEMO_CLUBS.find((c) => c.slug === 'gannet-bay')!;

export async function seedDemoRecords(db: DataSource, clubId: string, people: DemoPeople, now = new Date()) {
  const day = (offset: number) => new Date(now.getTime() + offset * 86_400_000).toISOString().slice(0, 10);
  const records: [RecordKind, string, Record<string, unknown>][] = [
    ['checkTemplate', demoId('template:launch'), DEFAULT_LAUNCH_TEMPLATE],
    ['checkTemplate', demoId('template:stow'), DEFAULT_STOW_TEMPLATE],
    ...BOATS.map((b): [RecordKind, string, KindFields['boat']] => ['boat', b.id, b.fields]),
    ...motors(day(-20)).map((m): [RecordKind, string, KindFields['motor']] => ['motor', m.id, m.fields]),
    ...demoChecks(people, day, now).map((c): [RecordKind, string, KindFields['check']] => ['check', c.id, c.fields]),
    ...demoDefects(people, day, now).map((d): [RecordKind, string, KindFields['defect']] => ['defect', d.id, d.fields]),
    // Appended, never inserted: a mutation's seq is its place here, and a seeded database skips seqs it has seen.
    ...motorMoves(people, day).map((m): [RecordKind, string, KindFields['motorMove']] => ['motorMove', m.id, m.fields]),
    ...demoPatrol(people, now, GANNET_BAY, Object.fromEntries(motors(day(-20)).map((m) => [m.id, m.fields.hourMeter]))),
  ];
  let c = 0;
  const mutations: Mutation[] = records.map(([kind, recordId, patch], i) => ({
    mutationId: demoId(`mutation:${i}`), seq: i + 1, recordId, kind, baseVersion: 0, base: {},
    hlc: encodeHlc({ l: now.getTime(), c: c++, node: DEVICE }), patch,
  }));
  const principal = { userId: people.admin, clubId, role: 'admin' as Role, membershipId: '' };
  const res = await new PushService(db).push(principal, { protocolVersion: PROTOCOL_VERSION, deviceId: DEVICE, mutations }, { serverDevice: true });
  const refused = res.results.filter((r) => r.status === 'rejected');
  if (refused.length) throw new Error(`The demo records did not pass the sync rules: ${JSON.stringify(refused[0])}`);
  return res.results.filter((r) => r.status !== 'duplicate').length;
}
