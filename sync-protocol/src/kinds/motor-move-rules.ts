import type { MotorMoveFields } from './motor-move.js';
import type { KindRules } from './spec.js';

export const motorMoveRules: KindRules<MotorMoveFields> = {
  label: 'a motor move',
  immutable: ['motorId', 'movedBy'],
  access: { create: 'driver', update: 'supervisor', delete: 'supervisor', selfFields: ['movedBy'] },
  recordChecks: (m) =>
    m.fromBoatId === m.toBoatId
      ? [{ field: 'toBoatId', message: 'The motor must move to a different boat (or to the store).' }]
      : [],
};
