import type { KindFields } from '@breakline/sync-protocol';
import type { LocalRecord } from '@/db/types';
import { createRecord, updateRecord, type WriteContext } from '@/db/write';
import { LocalWriteError } from '@/db/write-error';

type Trip = KindFields['trip'];
const iso = (now: Date) => now.toISOString();

export interface NewSignOn {
  boatId: string;
  memberId: string;
  role: 'driver' | 'crew';
  sessionDate: string;
  /** An open sign-on of the same member on another boat today, signed off first. */
  moveFrom?: LocalRecord<'signOn'>;
}

export async function signOn(ctx: WriteContext, s: NewSignOn, now = new Date()): Promise<string> {
  if (s.moveFrom) await signOff(ctx, s.moveFrom.id, now);
  return createRecord(ctx, 'signOn', {
    boatId: s.boatId, memberId: s.memberId, role: s.role, sessionDate: s.sessionDate, signedOnAt: iso(now), signedOffAt: null,
  });
}

export const signOff = (ctx: WriteContext, signOnId: string, now = new Date()) =>
  updateRecord(ctx, 'signOn', signOnId, { signedOffAt: iso(now) });

export interface NewTrip {
  boatId: string;
  motorId: string | null;
  driverId: string;
  crewIds: string[];
  purpose?: Trip['purpose'];
}

/** One tap: the trip starts now with who is signed on; conditions and readings are added as they come. */
export function launchTrip(ctx: WriteContext, t: NewTrip, now = new Date()): Promise<string> {
  return createRecord(ctx, 'trip', {
    boatId: t.boatId, motorId: t.motorId, purpose: t.purpose ?? 'patrol', driverId: t.driverId, crewIds: t.crewIds,
    launchedAt: iso(now), retrievedAt: null, windSpeedKn: null, windDirectionDeg: null, waveHeightM: null,
    engineHoursStart: null, engineHoursEnd: null, fuelAddedL: null, notes: [], editReasons: [],
  });
}

export async function retrieveTrip(ctx: WriteContext, trip: LocalRecord<'trip'>, now = new Date()): Promise<void> {
  if (trip.fields.retrievedAt !== null) throw new LocalWriteError('invalid', 'This trip is already retrieved; change its retrieval time in the trip instead.');
  await updateRecord(ctx, 'trip', trip.id, { retrievedAt: iso(now) });
}

/**
 * Saves changed fields of a trip. A `reason` is kept beside the trip (its edit reasons merge by
 * union, so two phones' reasons both stay). A higher hour meter reading also moves the motor's
 * meter on, so its service forecast follows.
 */
export async function saveTrip(
  ctx: WriteContext, trip: LocalRecord<'trip'>, patch: Partial<Trip>, reason: string | null,
  motor: LocalRecord<'motor'> | null, now = new Date(),
): Promise<void> {
  const full: Partial<Trip> = { ...patch };
  if (reason !== null) full.editReasons = [...trip.fields.editReasons, { at: iso(now), by: ctx.userId, text: reason.trim() }];
  await updateRecord(ctx, 'trip', trip.id, full);
  const end = patch.engineHoursEnd;
  if (motor && typeof end === 'number' && end > motor.fields.hourMeter && motor.id === (patch.motorId ?? trip.fields.motorId)) {
    await updateRecord(ctx, 'motor', motor.id, { hourMeter: end });
  }
}

/** Notes merge by union, so two phones adding one each keep both. */
export const addTripNote = (ctx: WriteContext, trip: LocalRecord<'trip'>, text: string, now = new Date()) =>
  updateRecord(ctx, 'trip', trip.id, { notes: [...trip.fields.notes, { at: iso(now), by: ctx.userId, text: text.trim() }] });

export type IncidentDraft = Omit<KindFields['incidentNote'], 'authorId'>;

export const addIncidentNote = (ctx: WriteContext, note: IncidentDraft) =>
  createRecord(ctx, 'incidentNote', { ...note, authorId: ctx.userId });

export const updateIncidentNote = (ctx: WriteContext, id: string, note: Partial<IncidentDraft>) =>
  updateRecord(ctx, 'incidentNote', id, note);
