import { z } from 'zod';
import { memberId, recordId, sha256, text, utcTime } from './common.js';
import { CHECK_TYPES } from './check-template.js';
import { defineKind } from './spec.js';
import { roleAtLeast } from '../roles.js';

export const CHECK_OUTCOMES = ['pass', 'fail', 'na'] as const;
export type CheckOutcome = (typeof CHECK_OUTCOMES)[number];

const itemResult = z.strictObject({
  outcome: z.enum(CHECK_OUTCOMES),
  value: z.union([z.number(), z.string().max(500)]).optional(),
  note: text(2000).optional(),
  photos: z.array(sha256()).max(20).optional(),
});
export type CheckItemEntry = z.infer<typeof itemResult>;

/** One run of a launch or stow check against a template version. */
export const checkSpec = defineKind({
  label: 'a check',
  schema: z.strictObject({
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
  }),
  merge: { results: 'check-results' },
  immutable: ['boatId', 'checkType', 'templateId', 'templateVersion', 'performedBy'],
  access: {
    create: 'crew',
    update: 'crew',
    delete: 'supervisor',
    selfFields: ['performedBy'],
    fieldRoles: [
      { field: 'signedOffBy', minRole: 'supervisor' },
      { field: 'signedOffAt', minRole: 'supervisor' },
    ],
  },
  recordChecks: (c) =>
    c.status === 'complete' && c.completedAt === null
      ? [{ field: 'completedAt', message: 'A complete check needs the time it was completed.' }]
      : [],
  // A signed-off check is the club's record: only a supervisor may change it afterwards.
  updateCheck: ({ role, current }) =>
    current.signedOffAt !== null && !roleAtLeast(role, 'supervisor')
      ? 'This check has been signed off; only a supervisor or admin may change it now.'
      : null,
});
export type CheckFields = z.infer<typeof checkSpec.schema>;
