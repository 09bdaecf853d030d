import { z } from 'zod';
import { label, localDate, memberId } from './common.js';
import { defineKind } from './spec.js';

/** Which sign-on role an award qualifies for; a driver's award also qualifies its holder as crew. */
export const AWARD_ROLES = ['driver', 'crew'] as const;
export type AwardRole = (typeof AWARD_ROLES)[number];

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

/**
 * A club member's card: the name others see and the awards that qualify them to sign on. The
 * record's id is the membership's id (one card a person a club); `memberId` is the id trips,
 * sign-ons and notes name the person by.
 */
export const memberSpec = defineKind({
  label: 'a member card',
  schema: z.strictObject({
    memberId: memberId(),
    displayName: label(120),
    awards: z.array(award).max(40),
  }),
  immutable: ['memberId'],
  // Cards are made when a person joins; the patrol captain keeps the awards up to date.
  access: {
    create: 'admin',
    update: 'supervisor',
    delete: 'admin',
    fieldRoles: [{ field: 'displayName', minRole: 'admin' }],
  },
  recordChecks: (m) => {
    const ids = m.awards.map((a) => a.id);
    const dup = ids.find((id, i) => ids.indexOf(id) !== i);
    return dup === undefined ? [] : [{ field: 'awards', message: `Award id "${dup}" is used twice on this member card.` }];
  },
});
export type MemberFields = z.infer<typeof memberSpec.schema>;
export type MemberAward = MemberFields['awards'][number];
