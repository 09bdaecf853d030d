import type { Role } from './api/types';

export const roleLabels: Record<Role, string> = {
  crew: 'Crew',
  driver: 'Driver',
  supervisor: 'Supervisor',
  admin: 'Admin',
};

/** Supervisors and admins read, sign off and settle records on the Review desk. */
export const canUseReviewDesk = (role: Role): boolean => role === 'supervisor' || role === 'admin';

export const canAdminister = (role: Role): boolean => role === 'admin';
