import { z } from 'zod';
import { atLeastZero, memberId, noteEntry, recordId, utcTime } from './common.js';
import type { FieldError } from './spec.js';
import { defineKind } from './spec.js';

export const TRIP_PURPOSES = [
  'patrol',
  'training',
  'rescue',
  'search',
  'preventive-action',
  'event-support',
  'maintenance-run',
] as const;
export type TripPurpose = (typeof TRIP_PURPOSES)[number];

/** One launch to retrieval. Conditions are as the driver judged them. */
export const tripSpec = defineKind({
  label: 'a trip',
  schema: z.strictObject({
    boatId: recordId(),
    motorId: recordId().nullable(),
    purpose: z.enum(TRIP_PURPOSES),
    driverId: memberId(),
    crewIds: z.array(memberId()).max(8),
    launchedAt: utcTime(),
    retrievedAt: utcTime().nullable(),
    windSpeedKn: atLeastZero().max(200).nullable(),
    windDirectionDeg: atLeastZero().lt(360).nullable(),
    waveHeightM: atLeastZero().max(30).nullable(),
    engineHoursStart: atLeastZero().nullable(),
    engineHoursEnd: atLeastZero().nullable(),
    fuelAddedL: atLeastZero().max(500).nullable(),
    notes: z.array(noteEntry()).max(500),
    /** Why a logged trip was changed afterwards. */
    editReasons: z.array(noteEntry()).max(500),
  }),
  merge: { crewIds: 'union', notes: 'union', editReasons: 'union' },
  immutable: ['boatId'],
  access: { create: 'driver', update: 'driver', delete: 'driver' },
  recordChecks: (t) => {
    const errors: FieldError[] = [];
    if (t.retrievedAt !== null && Date.parse(t.retrievedAt) < Date.parse(t.launchedAt)) {
      errors.push({ field: 'retrievedAt', message: 'Retrieval must not be before launch.' });
    }
    if (t.engineHoursStart !== null && t.engineHoursEnd !== null && t.engineHoursEnd < t.engineHoursStart) {
      errors.push({ field: 'engineHoursEnd', message: 'Engine hours at the end must not be below the start.' });
    }
    return errors;
  },
});
export type TripFields = z.infer<typeof tripSpec.schema>;
