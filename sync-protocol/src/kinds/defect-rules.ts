import { roleAtLeast } from '../roles.js';
import type { DefectFields } from './defect.js';
import type { KindRules } from './spec.js';
import { DEFECT_SEVERITIES, type DefectSeverity } from './values.js';

export const defectRules: KindRules<DefectFields> = {
  label: 'a defect',
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
};
