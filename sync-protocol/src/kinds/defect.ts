import { z } from 'zod';
import { label, memberId, noteEntry, recordId, sha256, text, utcTime } from './common.js';
import { defineKind } from './spec.js';
import { roleAtLeast } from '../roles.js';

export const DEFECT_SEVERITIES = ['stand-down', 'limit', 'note'] as const;
export const DEFECT_STATUSES = ['open', 'assigned', 'repaired', 'verified', 'rejected'] as const;
export type DefectSeverity = (typeof DEFECT_SEVERITIES)[number];
export type DefectStatus = (typeof DEFECT_STATUSES)[number];
/** Statuses under which the defect still counts against the boat. */
export const OPEN_DEFECT_STATUSES: readonly DefectStatus[] = ['open', 'assigned', 'repaired'];

/** A fault somebody reported, and its path to repair and return to service. */
export const defectSpec = defineKind({
  label: 'a defect',
  schema: z.strictObject({
    boatId: recordId(),
    motorId: recordId().nullable(),
    checkId: recordId().nullable(),
    itemId: text(40).nullable(),
    severity: z.enum(DEFECT_SEVERITIES),
    description: label(2000),
    photos: z.array(sha256()).max(100),
    status: z.enum(DEFECT_STATUSES),
    reportedBy: memberId(),
    reportedAt: utcTime(),
    assignedTo: memberId().nullable(),
    actionTaken: text(4000).nullable(),
    repairedAt: utcTime().nullable(),
    verifiedBy: memberId().nullable(),
    verifiedAt: utcTime().nullable(),
    rejectedReason: text(1000).nullable(),
    notes: z.array(noteEntry()).max(500),
  }),
  merge: { photos: 'union', notes: 'union', status: 'defect-status' },
  immutable: ['boatId', 'checkId', 'itemId', 'reportedBy', 'reportedAt'],
  access: {
    create: 'crew',
    update: 'crew',
    delete: 'supervisor',
    selfFields: ['reportedBy'],
    // Anyone may report or reopen; returning a boat to service is a supervisor's call.
    fieldRoles: [
      { field: 'status', values: ['verified', 'rejected', 'assigned'], minRole: 'supervisor' },
      { field: 'status', values: ['repaired'], minRole: 'driver' },
      { field: 'assignedTo', minRole: 'supervisor' },
      { field: 'verifiedBy', minRole: 'supervisor' },
      { field: 'verifiedAt', minRole: 'supervisor' },
      { field: 'rejectedReason', minRole: 'supervisor' },
    ],
  },
  recordChecks: (d) => {
    const errors = [];
    if (d.status === 'rejected' && !d.rejectedReason?.trim()) {
      errors.push({ field: 'rejectedReason', message: 'Say why the report is not a defect.' });
    }
    if (d.status === 'verified' && (d.verifiedBy === null || d.verifiedAt === null)) {
      errors.push({ field: 'verifiedBy', message: 'A verified defect needs who verified it and when.' });
    }
    return errors;
  },
  // Raising severity is always allowed (safety); lowering it is a supervisor's decision.
  updateCheck: ({ role, patch, current }) => {
    if (patch.severity === undefined || roleAtLeast(role, 'supervisor')) return null;
    const rank = (s: DefectSeverity) => DEFECT_SEVERITIES.length - DEFECT_SEVERITIES.indexOf(s);
    return rank(patch.severity) < rank(current.severity)
      ? "Only a supervisor or admin may lower a defect's severity."
      : null;
  },
});
export type DefectFields = z.infer<typeof defectSpec.schema>;
