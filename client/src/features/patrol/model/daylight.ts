import { isOutsideDaylight, sunTimes, utcToLocal } from '@breakline/sync-protocol';
import type { ClubPlace } from './club-place';

/**
 * A warning for a launch outside daylight at the club on its local date, or null. It reminds; the
 * club's procedures and the patrol captain decide whether a boat goes out in the dark.
 */
export function daylightWarning(instant: string, place: ClubPlace): string | null {
  if (!place.location) return null;
  const { lat, lon } = place.location;
  if (!isOutsideDaylight(instant, lat, lon, place.zone)) return null;
  const date = utcToLocal(instant, place.zone).date;
  const sun = sunTimes(date, lat, lon, place.zone);
  const at = utcToLocal(instant, place.zone).time;
  if (sun.status === 'polar-night') return `Launch at ${at} is in darkness: the sun does not rise at the club on ${date}.`;
  if (sun.status !== 'rises-and-sets') return null;
  const rise = utcToLocal(sun.sunrise, place.zone).time;
  const set = utcToLocal(sun.sunset, place.zone).time;
  return `Launch at ${at} is outside daylight: at the club on ${date} the sun rises at ${rise} and sets at ${set}. Follow the club's procedures for operating in the dark.`;
}

/** "Sun rises 05:41 and sets 19:58 at the club today", or why it cannot be said. */
export function sunLine(date: string, place: ClubPlace): string {
  if (!place.location) return 'The club\'s location is not on this phone yet, so daylight cannot be checked: sign in again when online.';
  const sun = sunTimes(date, place.location.lat, place.location.lon, place.zone);
  if (sun.status === 'polar-day') return 'The sun does not set at the club today.';
  if (sun.status === 'polar-night') return 'The sun does not rise at the club today.';
  return `Sun rises ${utcToLocal(sun.sunrise, place.zone).time} and sets ${utcToLocal(sun.sunset, place.zone).time} at the club`;
}
