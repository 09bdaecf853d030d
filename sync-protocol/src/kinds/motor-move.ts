import { z } from 'zod';
import { memberId, recordId, text, utcTime } from './common.js';
import { defineKind } from './spec.js';

/** A motor taken off one boat and put on another (null: the store). Moves are history. */
export const motorMoveSpec = defineKind({
  label: 'a motor move',
  schema: z.strictObject({
    motorId: recordId(),
    fromBoatId: recordId().nullable(),
    toBoatId: recordId().nullable(),
    movedAt: utcTime(),
    /** The member who moved it, for the motor's history. */
    movedBy: memberId(),
    reason: text(500),
  }),
  immutable: ['motorId', 'movedBy'],
  access: { create: 'driver', update: 'supervisor', delete: 'supervisor', selfFields: ['movedBy'] },
  recordChecks: (m) =>
    m.fromBoatId === m.toBoatId
      ? [{ field: 'toBoatId', message: 'The motor must move to a different boat (or to the store).' }]
      : [],
});
export type MotorMoveFields = z.infer<typeof motorMoveSpec.schema>;
