import { ROLES, type Role } from '@breakline/sync-protocol';

export const ROLE_CHOICES: readonly { role: Role; label: string; may: string }[] = ROLES.map((role) => ({
  role,
  label: { crew: 'Crew', driver: 'Driver', supervisor: 'Supervisor', admin: 'Admin' }[role],
  may: {
    crew: 'runs checks, reports defects, signs on to a boat',
    driver: 'as crew, plus trips, incident notes and closing the day',
    supervisor: 'as driver, plus the Review desk: sign-off, conflicts, repairs, awards',
    admin: 'as supervisor, plus members, invitations, the fleet and club settings',
  }[role],
}));

export const INVITE_STATUS_WORDS = {
  pending: 'Waiting for them to accept',
  accepted: 'Accepted',
  expired: 'Expired: send a new one',
  withdrawn: 'Withdrawn',
} as const;
