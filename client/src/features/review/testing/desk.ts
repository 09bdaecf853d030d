import type { KindFields } from '@breakline/sync-protocol';
import { createRecord, type WriteContext } from '@/db/write';
import { mockApi } from '@/test/api-mock';
import type { MockAnswer, RecordedCall } from '@/test/api-mock';
import { testPerson } from '@/test/test-person';
import { DESKTOP_WIDTH, setViewportWidth } from '@/test/viewport';

// Invented people and boats of an invented club, for the desk's tests.
export const PEOPLE = {
  captain: { userId: 'u-captain', displayName: 'Tomas Varga', role: 'supervisor' },
  driver: { userId: 'u-driver', displayName: 'Priya Lindholm', role: 'driver' },
  crew: { userId: 'u-crew', displayName: 'Sam Whitcombe', role: 'crew' },
} as const;

export const boat = (over: Partial<KindFields['boat']> = {}): KindFields['boat'] => ({
  fleetNumber: 'IRB 2', name: 'Gannet', hullSerial: null, airChambers: [], requiredGear: [], notes: '', inService: true, ...over,
});

export function checkFields(boatId: string, over: Partial<KindFields['check']> = {}): KindFields['check'] {
  return {
    boatId, motorId: null, checkType: 'launch', templateId: '0190c000-0000-7000-8000-000000000009', templateVersion: 1,
    startedAt: '2026-12-05T20:10:00Z', completedAt: '2026-12-05T20:25:00Z', status: 'complete',
    results: { hull: { outcome: 'pass' }, bung: { outcome: 'fail', note: 'Bung cracked' } },
    performedBy: PEOPLE.crew.userId, signedOffBy: null, signedOffAt: null, ...over,
  };
}

type Handlers = Record<string, MockAnswer | ((call: RecordedCall) => MockAnswer | Promise<MockAnswer>)>;

/** A supervisor (or another role) at a desktop, with a boat on this computer and the club's member list. */
export async function atTheDesk(
  role: 'supervisor' | 'admin' | 'crew' | 'driver' = 'supervisor',
  make: (ctx: { boatId: string; seed: WriteContext }) => Handlers | Promise<Handlers> = () => ({}),
) {
  setViewportWidth(DESKTOP_WIDTH);
  const p = testPerson(role);
  const boatId = await createRecord(p.seed, 'boat', boat());
  const handlers = await make({ boatId, seed: p.seed });
  const api = mockApi({
    'GET /api/auth/me': p.me,
    'GET /api/members': { status: 200, body: Object.values(PEOPLE).map((m) => ({ ...m, membershipId: `m-${m.userId}`, email: `${m.userId}@example.org` })) },
    'GET /api/sync/conflicts': { status: 200, body: [] },
    ...handlers,
  });
  return { ...p, boatId, api };
}

/** The query of the last call to a path, as an object. */
export function lastQuery(calls: readonly RecordedCall[], path: string): Record<string, string> {
  const hit = [...calls].reverse().find((c) => c.path.split('?')[0] === path);
  if (!hit) throw new Error(`No request to ${path}; requests were: ${calls.map((c) => c.path).join(', ')}`);
  return Object.fromEntries(new URLSearchParams(hit.path.split('?')[1] ?? ''));
}

/** Lazy screens load their chunk on first use, which under test can take seconds: wait for the grid that long. */
export const SLOW = { timeout: 30_000 };
