import type { FieldError, KindRules } from './spec.js';
import type { TripFields } from './trip.js';

export const tripRules: KindRules<TripFields> = {
  label: 'a trip',
  merge: { crewIds: 'union', notes: 'union', editReasons: 'union' },
  immutable: ['boatId'],
  access: { create: 'driver', update: 'driver', delete: 'driver' },
  recordChecks: (t) => {
    const errors: FieldError[] = [];
    if (t.retrievedAt !== null && Date.parse(t.retrievedAt) < Date.parse(t.launchedAt)) {
      errors.push({ field: 'retrievedAt', message: 'Retrieval must not be before launch.' });
    }
    if (t.engineHoursStart !== null && t.engineHoursEnd !== null && t.engineHoursEnd < t.engineHoursStart) {
      errors.push({ field: 'engineHoursEnd', message: 'Engine hours at the end must not be below the start.' });
    }
    return errors;
  },
};
