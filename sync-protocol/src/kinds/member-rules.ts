import type { MemberFields } from './member.js';
import type { KindRules } from './spec.js';

export const memberRules: KindRules<MemberFields> = {
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
};
