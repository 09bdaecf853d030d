import { WIND_SPEED_UNITS, type WindSpeedUnit } from '@breakline/sync-protocol';
import type { ActiveClub } from '@/features/auth/api/types';

/** Where and in which zone the club patrols, as the session knows it. */
export interface ClubPlace {
  zone: string;
  /** Null when the session does not carry the club's location (an older saved session). */
  location: { lat: number; lon: number } | null;
}

const isDegrees = (v: unknown, max: number): v is number => typeof v === 'number' && Number.isFinite(v) && Math.abs(v) <= max;

export function clubPlace(club: ActiveClub): ClubPlace {
  const { latitude, longitude } = club;
  return {
    zone: club.timeZone,
    location: isDegrees(latitude, 90) && isDegrees(longitude, 180) ? { lat: latitude, lon: longitude } : null,
  };
}

/** The club's choice for a sign-on without a current award; warn unless the club chose to block. */
export function awardRule(club: ActiveClub): 'warn' | 'block' {
  return club.awardCheck === 'block' ? 'block' : 'warn';
}

/**
 * The club's wind unit; one the app does not know is shown and typed in knots. Here with the
 * club's other settings rather than with the wind words, which Today does not show.
 */
export function clubWindUnit(value: string | undefined): WindSpeedUnit {
  return (WIND_SPEED_UNITS as readonly string[]).includes(value ?? '') ? (value as WindSpeedUnit) : 'kn';
}
