import { canSee, type Role } from '@breakline/sync-protocol';
import type { LocalRecord } from '@/db/types';
import { INCIDENT_WORDS, PURPOSE_WORDS } from './words';

export type TimelineKind = 'check' | 'trip' | 'incident' | 'defect' | 'repair' | 'return' | 'motor';

export interface TimelineEntry {
  key: string;
  kind: TimelineKind;
  /** UTC instant the entry is placed at. */
  at: string;
  title: string;
  detail: string;
  /** The record to open: a check, a trip, a defect. */
  link: { to: 'check' | 'trip' | 'defect'; id: string } | null;
}

export interface BoatRecords {
  checks: readonly LocalRecord<'check'>[];
  trips: readonly LocalRecord<'trip'>[];
  incidents: readonly LocalRecord<'incidentNote'>[];
  defects: readonly LocalRecord<'defect'>[];
  moves: readonly LocalRecord<'motorMove'>[];
  motors: readonly LocalRecord<'motor'>[];
}

const CHECK_WORDS = { launch: 'Launch check', stow: 'Stow check' } as const;
const SEVERITY_WORDS = { 'stand-down': 'Stand-down', limit: 'Limit', note: 'Note' } as const;

function checkOutcome(c: LocalRecord<'check'>['fields']): string {
  if (c.status === 'in-progress') return 'in progress';
  const failed = Object.values(c.results).filter((r) => r.outcome === 'fail').length;
  return failed === 0 ? 'nothing failed' : failed === 1 ? '1 item failed' : `${failed} items failed`;
}

const line = (s: string) => {
  const first = s.trim().split('\n')[0]!.trim();
  return first.length > 100 ? `${first.slice(0, 99)}…` : first;
};

/**
 * One boat's log, newest first: checks, trips, the incident notes the person may see, defects with
 * their repairs and returns to service, and motors fitted and taken off. Built from lists read once
 * (by the boat index where the kind has one), so its cost follows the boat's history, not the club's.
 */
export function boatTimeline(
  boatId: string, r: BoatRecords, viewer: { role: Role; userId: string },
  tripDetail: (t: LocalRecord<'trip'>) => string = (t) => (t.fields.retrievedAt === null ? 'afloat now' : ''),
): TimelineEntry[] {
  const out: TimelineEntry[] = [];
  for (const c of r.checks) {
    if (c.fields.boatId !== boatId) continue;
    out.push({ key: `check:${c.id}`, kind: 'check', at: c.fields.completedAt ?? c.fields.startedAt, title: CHECK_WORDS[c.fields.checkType],
      detail: checkOutcome(c.fields) + (c.fields.signedOffAt ? ' · signed off' : ''), link: { to: 'check', id: c.id } });
  }
  for (const t of r.trips) {
    if (t.fields.boatId !== boatId) continue;
    out.push({ key: `trip:${t.id}`, kind: 'trip', at: t.fields.launchedAt, title: `Trip · ${PURPOSE_WORDS[t.fields.purpose]}`,
      detail: tripDetail(t), link: { to: 'trip', id: t.id } });
  }
  for (const n of r.incidents) {
    if (n.fields.boatId !== boatId || !canSee('incidentNote', viewer.role, n.fields, viewer.userId)) continue;
    const helped = n.fields.peopleHelped === 1 ? '1 person helped' : `${n.fields.peopleHelped} people helped`;
    out.push({ key: `incident:${n.id}`, kind: 'incident', at: n.fields.occurredAt, title: `Incident note · ${INCIDENT_WORDS[n.fields.kind]}`,
      detail: [helped, line(n.fields.outcome)].filter(Boolean).join(' · '), link: n.fields.tripId ? { to: 'trip', id: n.fields.tripId } : null });
  }
  for (const d of r.defects) {
    if (d.fields.boatId !== boatId) continue;
    const f = d.fields;
    out.push({ key: `defect:${d.id}`, kind: 'defect', at: f.reportedAt, title: `Defect reported · ${SEVERITY_WORDS[f.severity]}`,
      detail: `${line(f.description)}${f.status === 'rejected' ? ' · not a defect' : ''}`, link: { to: 'defect', id: d.id } });
    if (f.repairedAt) out.push({ key: `repair:${d.id}`, kind: 'repair', at: f.repairedAt, title: 'Repair', detail: line(f.actionTaken ?? line(f.description)), link: { to: 'defect', id: d.id } });
    if (f.status === 'verified' && f.verifiedAt) out.push({ key: `return:${d.id}`, kind: 'return', at: f.verifiedAt, title: 'Returned to service', detail: line(f.description), link: { to: 'defect', id: d.id } });
  }
  const motorName = (id: string) => {
    const m = r.motors.find((x) => x.id === id);
    return m ? `${m.fields.model} · ${m.fields.serial}` : 'a motor';
  };
  for (const m of r.moves) {
    const f = m.fields;
    if (f.toBoatId !== boatId && f.fromBoatId !== boatId) continue;
    out.push({ key: `motor:${m.id}`, kind: 'motor', at: f.movedAt, title: f.toBoatId === boatId ? 'Motor fitted' : 'Motor taken off',
      detail: [motorName(f.motorId), line(f.reason)].filter(Boolean).join(' · '), link: null });
  }
  const ms = new Map(out.map((e) => [e.key, Date.parse(e.at)]));
  return out.sort((a, b) => ms.get(b.key)! - ms.get(a.key)! || a.key.localeCompare(b.key));
}
