import type { BoatFields } from './boat.js';
import type { KindRules } from './spec.js';

export const boatRules: KindRules<BoatFields> = {
  label: 'a boat',
  access: { create: 'supervisor', update: 'supervisor', delete: 'admin' },
  recordChecks: (b) => {
    const ids = b.airChambers.map((c) => c.id);
    const dup = ids.find((id, i) => ids.indexOf(id) !== i);
    return dup === undefined ? [] : [{ field: 'airChambers', message: `Air chamber id "${dup}" is used twice.` }];
  },
};
