import type { SignOnFields } from './sign-on.js';
import type { KindRules } from './spec.js';

export const signOnRules: KindRules<SignOnFields> = {
  label: 'a sign-on',
  immutable: ['boatId', 'memberId', 'sessionDate'],
  access: { create: 'crew', update: 'crew', delete: 'driver' },
  recordChecks: (s) =>
    s.signedOffAt !== null && Date.parse(s.signedOffAt) < Date.parse(s.signedOnAt)
      ? [{ field: 'signedOffAt', message: 'Signed off must not be before signed on.' }]
      : [],
};
