import { z } from 'zod';
import { memberId, recordId, text, utcTime } from './common.js';
import { motorMoveRules } from './motor-move-rules.js';
import { defineKind } from './spec.js';

const motorMoveSchema = z.strictObject({
  motorId: recordId(),
  fromBoatId: recordId().nullable(),
  toBoatId: recordId().nullable(),
  movedAt: utcTime(),
  /** The member who moved it, for the motor's history. */
  movedBy: memberId(),
  reason: text(500),
});

/** A motor taken off one boat and put on another (null: the store). Moves are history. */
export const motorMoveSpec = defineKind({ ...motorMoveRules, schema: motorMoveSchema });
export type MotorMoveFields = z.infer<typeof motorMoveSchema>;
