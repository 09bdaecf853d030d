import { z } from 'zod';
import { label, localDate, memberId } from './common.js';
import { memberRules } from './member-rules.js';
import { defineKind } from './spec.js';
import { AWARD_ROLES } from './values.js';

const award = z
  .strictObject({
    id: label(40),
    name: label(80),
    qualifies: z.enum(AWARD_ROLES),
    /** Local calendar date the award was gained, when known. */
    awardedOn: localDate().nullable(),
    /** Last local calendar date it is valid (inclusive); null when it does not expire. */
    expiresOn: localDate().nullable(),
  })
  .refine((a) => a.awardedOn === null || a.expiresOn === null || a.awardedOn <= a.expiresOn, {
    error: 'must not be before the date it was awarded',
    path: ['expiresOn'],
  });

const memberSchema = z.strictObject({
  memberId: memberId(),
  displayName: label(120),
  awards: z.array(award).max(40),
});

/**
 * A club member's card: the name others see and the awards that qualify them to sign on. The
 * record's id is the membership's id (one card a person a club); `memberId` is the id trips,
 * sign-ons and notes name the person by.
 */
export const memberSpec = defineKind({ ...memberRules, schema: memberSchema });
export type MemberFields = z.infer<typeof memberSchema>;
export type MemberAward = MemberFields['awards'][number];
