import { requireFinite } from './assert.js';
import { addDays, parseDate } from './calendar.js';
import { cosSunriseHourAngle, solarPosition } from './solar-position.js';
import { localToUtc, utcToLocal } from './time.js';
import { instantMs } from './rfc3339.js';

export type SunTimes =
  | { status: 'rises-and-sets'; sunrise: string; sunset: string; solarNoon: string }
  /** The sun stays above the horizon through this solar day. */
  | { status: 'polar-day'; solarNoon: string }
  /** The sun stays below the horizon through this solar day. */
  | { status: 'polar-night'; solarNoon: string };

const DAY = 86_400_000;
const MINUTE = 60_000;
const DEG = 180 / Math.PI;

function requireCoordinates(lat: number, lon: number): void {
  requireFinite('Latitude', lat);
  requireFinite('Longitude', lon);
  if (lat < -90 || lat > 90) throw new RangeError(`Latitude must be between -90 and 90 degrees; got ${lat}`);
  if (lon < -180 || lon > 180) throw new RangeError(`Longitude must be between -180 and 180 degrees (east positive); got ${lon}`);
}

function localNoonMs(date: string, zone: string): number {
  const r = localToUtc(`${date}T12:00`, zone);
  return Date.parse(r.status === 'ok' ? r.instant : r.status === 'ambiguous' ? r.earlier : r.after);
}

const iso = (ms: number) => new Date(Math.round(ms / 1000) * 1000).toISOString();

/**
 * Sunrise and sunset at a place on a local calendar date in `zone` (WGS 84 degrees, east and
 * north positive), as UTC instants. The solar day used is the one whose noon falls nearest local
 * noon on that date, so the times are the ones a person on the beach calls that day's.
 */
export function sunTimes(localDate: string, lat: number, lon: number, zone: string): SunTimes {
  parseDate(localDate, 'Date');
  requireCoordinates(lat, lon);
  const meanNoonMinutes = 720 - 4 * lon; // past UTC midnight, before the equation of time
  const midnight = Math.round((localNoonMs(localDate, zone) - meanNoonMinutes * MINUTE) / DAY) * DAY;
  const noonAt = (ms: number) => midnight + (meanNoonMinutes - solarPosition(ms).equationOfTime) * MINUTE;
  let noon = noonAt(midnight + meanNoonMinutes * MINUTE);
  noon = noonAt(noon);
  const solarNoon = iso(noon);
  const cosH = cosSunriseHourAngle(lat, solarPosition(noon).declination);
  if (cosH > 1) return { status: 'polar-night', solarNoon };
  if (cosH < -1) return { status: 'polar-day', solarNoon };
  // Each event is refined with the sun's position at the event itself (the calculator's method).
  const event = (sign: -1 | 1) => {
    let t = noon;
    for (let i = 0; i < 4; i++) {
      const hourAngle = Math.acos(Math.min(1, Math.max(-1, cosSunriseHourAngle(lat, solarPosition(t).declination)))) * DEG;
      t = noonAt(t) + sign * 4 * hourAngle * MINUTE;
    }
    return t;
  };
  return { status: 'rises-and-sets', sunrise: iso(event(-1)), sunset: iso(event(1)), solarNoon };
}

/**
 * True when an instant is before sunrise or after sunset at the place, on its local date in
 * `zone`. Neighbouring days are checked as well, for a sunset that falls after local midnight.
 */
export function isOutsideDaylight(instant: string, lat: number, lon: number, zone: string): boolean {
  const t = instantMs(instant, 'Instant');
  const date = utcToLocal(instant, zone).date;
  if (sunTimes(date, lat, lon, zone).status === 'polar-day') return false;
  for (const d of [addDays(date, -1), date, addDays(date, 1)]) {
    const s = sunTimes(d, lat, lon, zone);
    if (s.status === 'rises-and-sets' && t >= Date.parse(s.sunrise) && t <= Date.parse(s.sunset)) return false;
  }
  return true;
}
