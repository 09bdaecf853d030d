import { z } from 'zod';
import { localDate, memberId, recordId, utcTime } from './common.js';
import { defineKind } from './spec.js';

/** A member signed on to a boat for a session, as its driver or as crew. */
export const signOnSpec = defineKind({
  label: 'a sign-on',
  schema: z.strictObject({
    boatId: recordId(),
    memberId: memberId(),
    role: z.enum(['driver', 'crew']),
    /** The club's local date of the session. */
    sessionDate: localDate(),
    signedOnAt: utcTime(),
    signedOffAt: utcTime().nullable(),
  }),
  immutable: ['boatId', 'memberId', 'sessionDate'],
  access: { create: 'crew', update: 'crew', delete: 'driver' },
  recordChecks: (s) =>
    s.signedOffAt !== null && Date.parse(s.signedOffAt) < Date.parse(s.signedOnAt)
      ? [{ field: 'signedOffAt', message: 'Signed off must not be before signed on.' }]
      : [],
});
export type SignOnFields = z.infer<typeof signOnSpec.schema>;
