import { roleAtLeast } from '../roles.js';
import type { CheckFields } from './check.js';
import type { KindRules } from './spec.js';

export const checkRules: KindRules<CheckFields> = {
  label: 'a check',
  merge: { results: 'check-results' },
  immutable: ['boatId', 'checkType', 'templateId', 'templateVersion', 'performedBy'],
  access: {
    create: 'crew',
    update: 'crew',
    delete: 'supervisor',
    selfFields: ['performedBy'],
    fieldRoles: [
      { field: 'signedOffBy', minRole: 'supervisor' },
      { field: 'signedOffAt', minRole: 'supervisor' },
    ],
  },
  recordChecks: (c) =>
    c.status === 'complete' && c.completedAt === null
      ? [{ field: 'completedAt', message: 'A complete check needs the time it was completed.' }]
      : [],
  // A signed-off check is the club's record: only a supervisor may change it afterwards.
  updateCheck: ({ role, current }) =>
    current.signedOffAt !== null && !roleAtLeast(role, 'supervisor')
      ? 'This check has been signed off; only a supervisor or admin may change it now.'
      : null,
};
