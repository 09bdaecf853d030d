import type { Role, SessionAnswer } from '@/features/auth/api/types';

// An invented club and person for tests.
export function sessionAnswer(role: Role = 'crew', overrides: Partial<SessionAnswer> = {}): SessionAnswer {
  return {
    accessToken: 'access-1',
    refreshToken: 'refresh-1',
    accessExpiresAt: '2999-01-01T00:00:00.000Z',
    user: { id: 'u-1', email: 'ria.okafor@example.org', displayName: 'Ria Okafor' },
    activeClub: {
      id: 'c-1',
      name: 'Saltmarsh Heads Surf Club',
      timeZone: 'Australia/Sydney',
      pressureUnit: 'kPa',
      role,
    },
    memberships: [{ clubId: 'c-1', clubName: 'Saltmarsh Heads Surf Club', role }],
    ...overrides,
  };
}
