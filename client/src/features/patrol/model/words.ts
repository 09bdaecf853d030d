import type { KindFields, TripPurpose } from '@breakline/sync-protocol';

export const PURPOSE_WORDS: Record<TripPurpose, string> = {
  patrol: 'Patrol',
  training: 'Training',
  rescue: 'Rescue',
  search: 'Search',
  'preventive-action': 'Preventive action',
  'event-support': 'Event support',
  'maintenance-run': 'Maintenance run',
};

export type IncidentKind = KindFields['incidentNote']['kind'];

export const INCIDENT_WORDS: Record<IncidentKind, string> = {
  rescue: 'Rescue',
  assist: 'Assist',
  'first-aid': 'First aid',
  'near-miss': 'Near miss',
  'equipment-failure': 'Equipment failure',
};

export const ROLE_WORDS = { driver: 'Driver', crew: 'Crew' } as const;
