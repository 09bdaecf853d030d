import { z } from 'zod';
import { checkRules } from './check-rules.js';
import { memberId, recordId, sha256, text, utcTime } from './common.js';
import { defineKind } from './spec.js';
import { CHECK_OUTCOMES, CHECK_TYPES } from './values.js';

const itemResult = z.strictObject({
  outcome: z.enum(CHECK_OUTCOMES),
  value: z.union([z.number(), z.string().max(500)]).optional(),
  note: text(2000).optional(),
  photos: z.array(sha256()).max(20).optional(),
});
export type CheckItemEntry = z.infer<typeof itemResult>;

const checkSchema = z.strictObject({
  boatId: recordId(),
  motorId: recordId().nullable(),
  checkType: z.enum(CHECK_TYPES),
  templateId: recordId(),
  templateVersion: z.number().int().min(1),
  startedAt: utcTime(),
  completedAt: utcTime().nullable(),
  status: z.enum(['in-progress', 'complete']),
  results: z.record(z.string().min(1).max(40), itemResult),
  performedBy: memberId(),
  signedOffBy: memberId().nullable(),
  signedOffAt: utcTime().nullable(),
});

/** One run of a launch or stow check against a template version. */
export const checkSpec = defineKind({ ...checkRules, schema: checkSchema });
export type CheckFields = z.infer<typeof checkSchema>;
