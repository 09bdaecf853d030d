import { z } from 'zod';
import { localDate, memberId, recordId, utcTime } from './common.js';
import { signOnRules } from './sign-on-rules.js';
import { defineKind } from './spec.js';

const signOnSchema = z.strictObject({
  boatId: recordId(),
  memberId: memberId(),
  role: z.enum(['driver', 'crew']),
  /** The club's local date of the session. */
  sessionDate: localDate(),
  signedOnAt: utcTime(),
  signedOffAt: utcTime().nullable(),
});

/** A member signed on to a boat for a session, as its driver or as crew. */
export const signOnSpec = defineKind({ ...signOnRules, schema: signOnSchema });
export type SignOnFields = z.infer<typeof signOnSchema>;
