import type { KindFields, Role } from '@breakline/sync-protocol';
import { ReplicaDb } from '@/db/schema';
import { createRecord, type WriteContext } from '@/db/write';
import type { SyncAuth, SyncScope } from '../auth-source';
import { syncOnce, type SyncContext } from '../engine';
import { FakeBackend } from './fake-backend';

let dbCount = 0;

export interface TestDevice {
  db: ReplicaDb;
  scope: SyncScope;
  writer: WriteContext;
  auth: SyncAuth & { signedOut: boolean };
  outdatedCalls: number;
  sync(options?: Partial<SyncContext>): ReturnType<typeof syncOnce>;
}

/** A phone with its own database, signed in as `userId` with a token the backend knows. */
export function testDevice(backend: FakeBackend, userId = 'member-ana', role: Role = 'driver', clubId = 'club-saltmarsh'): TestDevice {
  dbCount += 1;
  const db = new ReplicaDb(`test-replica-${dbCount}-${userId}`);
  const scope: SyncScope = { userId, clubId, role };
  const token = `token-${dbCount}`;
  backend.grant(token, { userId, role, clubId });
  const auth = {
    signedOut: false,
    scope: () => (auth.signedOut ? null : scope),
    token: async () => (auth.signedOut ? null : token),
    afterUnauthorized: async () => null,
    sessionLost: () => undefined,
  };
  const device: TestDevice = {
    db,
    scope,
    auth,
    outdatedCalls: 0,
    writer: { db, userId, clubId, role, now: () => backend.now },
    sync: (options = {}) =>
      syncOnce({
        db, scope, auth, fetch: backend.fetch, now: () => backend.now,
        onOutdated: () => void (device.outdatedCalls += 1),
        ...options,
      }),
  };
  return device;
}

// An invented club's boat and defect.
export const BOAT_ID = '0190f1a0-0000-7000-8000-00000000b001';

export function defectFields(overrides: Partial<KindFields['defect']> = {}): KindFields['defect'] {
  return {
    boatId: BOAT_ID,
    motorId: null,
    checkId: null,
    itemId: null,
    severity: 'limit',
    description: 'Starboard handle strap frayed near the transom',
    photos: [],
    status: 'open',
    reportedBy: 'member-ana',
    reportedAt: '2026-12-05T21:30:00Z',
    assignedTo: null,
    actionTaken: null,
    repairedAt: null,
    verifiedBy: null,
    verifiedAt: null,
    rejectedReason: null,
    notes: [],
    ...overrides,
  };
}

export function boatFields(overrides: Partial<KindFields['boat']> = {}): KindFields['boat'] {
  return {
    fleetNumber: 'IRB 2',
    name: 'Tern Reach',
    hullSerial: 'TRX-2291-B',
    airChambers: [{ id: 'port', name: 'port pontoon', valve: 'port aft', minKpa: 16, maxKpa: 24 }],
    requiredGear: [{ item: 'rescue tube', count: 2 }],
    notes: '',
    inService: true,
    ...overrides,
  };
}

/** Two members' phones on one backend, both holding the same synced defect. */
export async function twoPhonesWithOneDefect() {
  const backend = new FakeBackend();
  const ana = testDevice(backend, 'member-ana');
  const ben = testDevice(backend, 'member-ben');
  const id = await createRecord(ana.writer, 'defect', defectFields());
  await ana.sync();
  await ben.sync();
  return { backend, ana, ben, id };
}
