import type { MemberFields } from './member.js';
import { defineRules } from './spec.js';

/** Which sign-on role an award qualifies for; a driver's award also qualifies its holder as crew. */
export const AWARD_ROLES = ['driver', 'crew'] as const;
export type AwardRole = (typeof AWARD_ROLES)[number];

export const memberRules = defineRules<MemberFields>({
  label: 'a member card',
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
