import { TRIP_PURPOSES, roleAtLeast, type Fields, type LocalView, type Role } from '../../src/index.js';

export const BOAT = '0190f1a0-0000-7000-8000-0000000000b1';

/** Unique values, so a value found on the server can be traced to the write that made it. */
export class Uniq {
  private n = 0;
  next(): number {
    return ++this.n;
  }
  sha(): string {
    return this.next().toString(16).padStart(64, '0');
  }
}

const iso = (ms: number) => new Date(ms).toISOString();

export function newDefect(u: Uniq, userId: string, pt: number): Fields {
  return {
    boatId: BOAT, motorId: null, checkId: null, itemId: null, severity: 'limit', description: `desc-${u.next()}`,
    photos: [u.sha()], status: 'open', reportedBy: userId, reportedAt: iso(pt), assignedTo: null, actionTaken: null,
    repairedAt: null, verifiedBy: null, verifiedAt: null, rejectedReason: null, notes: [],
  };
}

export function newTrip(u: Uniq, userId: string, pt: number): Fields {
  return {
    boatId: BOAT, motorId: null, purpose: 'patrol', driverId: userId, crewIds: [], launchedAt: iso(pt), retrievedAt: null,
    windSpeedKn: null, windDirectionDeg: null, waveHeightM: null, engineHoursStart: null, engineHoursEnd: null,
    fuelAddedL: null, notes: [{ at: iso(pt), by: userId, text: `trip-note-${u.next()}` }], editReasons: [],
  };
}

type PatchMaker = (v: LocalView, u: Uniq, userId: string, pt: number, variant: number) => Fields;
const list = (v: LocalView, f: string) => (Array.isArray(v.fields[f]) ? (v.fields[f] as unknown[]) : []);
const note = (u: Uniq, by: string, pt: number) => ({ at: iso(pt), by, text: `note-${u.next()}` });

/** The edits a member with `role` may make, each producing a patch from what the device shows. */
export function editsFor(kind: 'defect' | 'trip', role: Role): PatchMaker[] {
  if (kind === 'trip') {
    if (!roleAtLeast(role, 'driver')) return [];
    return [
      (_v, _u, _id, _pt, variant) => ({ purpose: TRIP_PURPOSES[variant % TRIP_PURPOSES.length] }),
      (_v, u) => ({ windSpeedKn: u.next() % 200 }),
      (v, u, id, pt) => ({ notes: [...list(v, 'notes'), note(u, id, pt)] }),
      (v, u, id, pt, variant) => ({ editReasons: [...list(v, 'editReasons').slice(variant % 2), note(u, id, pt)] }),
      (v, u) => ({ retrievedAt: iso(Date.parse(String(v.fields.launchedAt)) + u.next() * 60_000) }),
    ];
  }
  const makers: PatchMaker[] = [
    (_v, u) => ({ description: `desc-${u.next()}` }),
    (v, u, _id, _pt, variant) => ({ photos: [...list(v, 'photos').slice(variant % 2), u.sha()] }),
    (v, u, id, pt) => ({ notes: [...list(v, 'notes'), note(u, id, pt)] }),
    () => ({ status: 'open' }),
    () => ({ severity: 'stand-down' }),
  ];
  if (roleAtLeast(role, 'driver')) makers.push((_v, u, _id, pt) => ({ status: 'repaired', actionTaken: `fix-${u.next()}`, repairedAt: iso(pt) }));
  if (roleAtLeast(role, 'supervisor')) {
    makers.push(
      (_v, u) => ({ status: 'assigned', assignedTo: `member-${u.next()}` }),
      (_v, _u, id, pt) => ({ status: 'verified', verifiedBy: id, verifiedAt: iso(pt) }),
      (_v, u) => ({ status: 'rejected', rejectedReason: `reason-${u.next()}` }),
      () => ({ severity: 'note' }),
    );
  }
  return makers;
}
