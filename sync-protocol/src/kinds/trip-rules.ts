import type { FieldError } from './spec.js';
import { defineRules } from './spec.js';
import type { TripFields } from './trip.js';

export const TRIP_PURPOSES = [
  'patrol',
  'training',
  'rescue',
  'search',
  'preventive-action',
  'event-support',
  'maintenance-run',
] as const;
export type TripPurpose = (typeof TRIP_PURPOSES)[number];

export const tripRules = defineRules<TripFields>({
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
});
