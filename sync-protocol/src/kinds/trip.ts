import { z } from 'zod';
import { atLeastZero, memberId, noteEntry, recordId, utcTime } from './common.js';
import { defineKind } from './spec.js';
import { tripRules } from './trip-rules.js';
import { TRIP_PURPOSES } from './values.js';

const tripSchema = z.strictObject({
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
});

/** One launch to retrieval. Conditions are as the driver judged them. */
export const tripSpec = defineKind({ ...tripRules, schema: tripSchema });
export type TripFields = z.infer<typeof tripSchema>;
