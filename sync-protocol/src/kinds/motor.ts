import { z } from 'zod';
import { atLeastZero, label, positive, recordId, utcTime } from './common.js';
import { motorRules } from './motor-rules.js';
import { defineKind } from './spec.js';

const motorSchema = z.strictObject({
  serial: label(40),
  model: label(80),
  powerHp: positive().max(300),
  hourMeter: atLeastZero(),
  serviceIntervalHours: positive().nullable(),
  serviceIntervalMonths: z.number().int().min(1).max(120).nullable(),
  lastServiceAt: utcTime().nullable(),
  lastServiceHours: atLeastZero().nullable(),
  fuelMode: z.enum(['premix', 'oil-injection']),
  /** Petrol to oil, e.g. 50 for 50:1; from the motor's manual, never assumed. */
  premixRatio: z.number().min(10).max(200).nullable(),
  boatId: recordId().nullable(),
});

/** An outboard motor; it moves between boats, so it is its own record. */
export const motorSpec = defineKind({ ...motorRules, schema: motorSchema });
export type MotorFields = z.infer<typeof motorSchema>;
