import { z } from 'zod';
import { label, memberId, noteEntry, recordId, sha256, text, utcTime } from './common.js';
import { defectRules } from './defect-rules.js';
import { defineKind } from './spec.js';
import { DEFECT_SEVERITIES, DEFECT_STATUSES } from './values.js';

const defectSchema = z.strictObject({
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
});

/** A fault somebody reported, and its path to repair and return to service. */
export const defectSpec = defineKind({ ...defectRules, schema: defectSchema });
export type DefectFields = z.infer<typeof defectSchema>;
