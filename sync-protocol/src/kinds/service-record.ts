import { z } from 'zod';
import { atLeastZero, label, recordId, text, utcTime } from './common.js';
import { serviceRecordRules } from './service-record-rules.js';
import { defineKind } from './spec.js';

const serviceRecordSchema = z.strictObject({
  motorId: recordId(),
  servicedAt: utcTime(),
  engineHours: atLeastZero(),
  work: label(4000),
  /** Parts fitted or used; empty when none. */
  parts: text(2000),
  /** Name of whoever did it; may be an outside mechanic, so not a member id. */
  performedBy: label(120),
});

/** A service done on a motor; the motor's service due is worked out from these. */
export const serviceRecordSpec = defineKind({ ...serviceRecordRules, schema: serviceRecordSchema });
export type ServiceRecordFields = z.infer<typeof serviceRecordSchema>;
