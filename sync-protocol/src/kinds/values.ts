/*
 * The named values fields of the kinds take, apart from the rules and the schemas: screens that
 * only list or filter by them (open defects on a phone's first screen) load nothing else.
 */

export const CHECK_TYPES = ['launch', 'stow'] as const;
export const CHECK_ITEM_KINDS = ['pass-fail', 'count', 'reading', 'text', 'photo'] as const;

export const CHECK_OUTCOMES = ['pass', 'fail', 'na'] as const;
export type CheckOutcome = (typeof CHECK_OUTCOMES)[number];

export const DEFECT_SEVERITIES = ['stand-down', 'limit', 'note'] as const;
export const DEFECT_STATUSES = ['open', 'assigned', 'repaired', 'verified', 'rejected'] as const;
export type DefectSeverity = (typeof DEFECT_SEVERITIES)[number];
export type DefectStatus = (typeof DEFECT_STATUSES)[number];
/** Statuses under which the defect still counts against the boat. */
export const OPEN_DEFECT_STATUSES: readonly DefectStatus[] = ['open', 'assigned', 'repaired'];

/** Which sign-on role an award qualifies for; a driver's award also qualifies its holder as crew. */
export const AWARD_ROLES = ['driver', 'crew'] as const;
export type AwardRole = (typeof AWARD_ROLES)[number];

export const TRIP_PURPOSES = [
  'patrol',
  'training',
  'rescue',
  'search',
  'preventive-action',
  'event-support',
  'maintenance-run',
] as const;
export type TripPurpose = (typeof TRIP_PURPOSES)[number];

export const INCIDENT_KINDS = ['rescue', 'assist', 'first-aid', 'near-miss', 'equipment-failure'] as const;
