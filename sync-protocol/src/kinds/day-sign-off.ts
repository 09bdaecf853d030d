import { z } from 'zod';
import { localDate, memberId, recordId, text, utcTime } from './common.js';
import { defineKind } from './spec.js';

/** The entry that closes a session's log, for one boat or (boatId null) the whole club. */
export const daySignOffSpec = defineKind({
  label: "a day's sign-off",
  schema: z.strictObject({
    sessionDate: localDate(),
    boatId: recordId().nullable(),
    signedOffBy: memberId(),
    signedOffAt: utcTime(),
    note: text(2000),
  }),
  immutable: ['sessionDate', 'boatId'],
  access: { create: 'driver', update: 'driver', delete: 'supervisor', selfFields: ['signedOffBy'] },
});
export type DaySignOffFields = z.infer<typeof daySignOffSpec.schema>;
