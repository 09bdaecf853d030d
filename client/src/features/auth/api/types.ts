// Wire shapes of /api/auth/*. They belong in the shared protocol package once it has them.
export type Role = 'crew' | 'driver' | 'supervisor' | 'admin';

export interface AuthUser {
  id: string;
  email: string;
  displayName: string;
}

export interface ActiveClub {
  id: string;
  name: string;
  timeZone: string;
  pressureUnit: string;
  role: Role;
  /** WGS 84 degrees of the patrolled beach; absent in a session saved by an older app. */
  latitude?: number;
  longitude?: number;
  /** The unit wind speeds are typed in: kn, km/h or m/s. */
  windUnit?: string;
  /** Sign-on without a current award: 'warn' or 'block'. */
  awardCheck?: string;
}

export interface Membership {
  clubId: string;
  clubName: string;
  role: Role;
}

export interface Me {
  user: AuthUser;
  activeClub: ActiveClub;
  memberships: Membership[];
}

/** What login, refresh and switch-club answer. */
export interface SessionAnswer extends Me {
  accessToken: string;
  refreshToken: string;
  /** ISO 8601 instant. */
  accessExpiresAt: string;
}
