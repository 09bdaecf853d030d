import { z } from 'zod';
import { localDate, memberId, recordId, text, utcTime } from './common.js';
import { daySignOffRules } from './day-sign-off-rules.js';
import { defineKind } from './spec.js';

const daySignOffSchema = z.strictObject({
  sessionDate: localDate(),
  boatId: recordId().nullable(),
  signedOffBy: memberId(),
  signedOffAt: utcTime(),
  note: text(2000),
});

/** The entry that closes a session's log, for one boat or (boatId null) the whole club. */
export const daySignOffSpec = defineKind({ ...daySignOffRules, schema: daySignOffSchema });
export type DaySignOffFields = z.infer<typeof daySignOffSchema>;
