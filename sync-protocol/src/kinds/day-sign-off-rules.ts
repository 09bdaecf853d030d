import type { DaySignOffFields } from './day-sign-off.js';
import type { KindRules } from './spec.js';

export const daySignOffRules: KindRules<DaySignOffFields> = {
  label: "a day's sign-off",
  immutable: ['sessionDate', 'boatId'],
  access: { create: 'driver', update: 'driver', delete: 'supervisor', selfFields: ['signedOffBy'] },
};
