import { requireNonNegative, requireOneOf } from './assert.js';
import { WIND_SPEED_UNITS, type WindSpeedUnit } from './wind-units.js';

export type { WindSpeedUnit };

/** The international knot, exactly 1852 m per hour. */
export const METRES_PER_SECOND_PER_KNOT = 1852 / 3600;

export function toKnots(speed: number, unit: WindSpeedUnit): number {
  requireNonNegative('Wind speed', speed);
  requireOneOf('Wind speed unit', unit, WIND_SPEED_UNITS);
  if (unit === 'kn') return speed;
  return unit === 'm/s' ? speed / METRES_PER_SECOND_PER_KNOT : (speed * 1000) / 1852;
}

/** A speed in knots in another unit, for showing a stored knot figure in the club's unit. */
export function fromKnots(knots: number, unit: WindSpeedUnit): number {
  requireNonNegative('Wind speed', knots);
  requireOneOf('Wind speed unit', unit, WIND_SPEED_UNITS);
  if (unit === 'kn') return knots;
  return unit === 'm/s' ? knots * METRES_PER_SECOND_PER_KNOT : (knots * 1852) / 1000;
}

/**
 * The whole-knot speed the tables are looked up with. The knot table is written in whole knots
 * and winds are reported in whole knots, so a fractional mean is rounded to the nearest knot,
 * halves up, before the look-up. Each band therefore runs from half a knot below its first
 * whole knot up to (not including) half a knot above its last: force 2 (4-6 kn) is 3.5 ≤ v < 6.5.
 */
export function roundedKnots(speed: number, unit: WindSpeedUnit = 'kn'): number {
  return Math.round(toKnots(speed, unit));
}

// First whole knot of forces 1 to 12.
const FORCE_STARTS = [1, 4, 7, 11, 17, 22, 28, 34, 41, 48, 56, 64];

const TERMS = [
  'calm', 'light air', 'light breeze', 'gentle breeze', 'moderate breeze', 'fresh breeze',
  'strong breeze', 'near gale', 'gale', 'strong gale', 'storm', 'violent storm', 'hurricane force',
];

export type BeaufortForce = 0 | 1 | 2 | 3 | 4 | 5 | 6 | 7 | 8 | 9 | 10 | 11 | 12;

export function beaufortForce(speed: number, unit: WindSpeedUnit = 'kn'): BeaufortForce {
  const kn = roundedKnots(speed, unit);
  return FORCE_STARTS.filter((start) => kn >= start).length as BeaufortForce;
}

export function beaufortTerm(force: number): string {
  if (!Number.isInteger(force) || force < 0 || force > 12) {
    throw new RangeError(`Beaufort force must be a whole number from 0 to 12; got ${force}`);
  }
  return TERMS[force]!;
}

export type MarineWindWarning = 'strong wind' | 'gale' | 'storm' | 'hurricane force';

/** The marine warning term for a 10-minute mean wind, or null below strong wind (26 kn). */
export function marineWindWarning(speed: number, unit: WindSpeedUnit = 'kn'): MarineWindWarning | null {
  const kn = roundedKnots(speed, unit);
  if (kn >= 64) return 'hurricane force';
  if (kn >= 48) return 'storm';
  if (kn >= 34) return 'gale';
  if (kn >= 26) return 'strong wind';
  return null;
}

export interface WindDescription {
  knots: number;
  force: BeaufortForce;
  term: string;
  warning: MarineWindWarning | null;
}

export function describeWind(speed: number, unit: WindSpeedUnit = 'kn'): WindDescription {
  const force = beaufortForce(speed, unit);
  return { knots: toKnots(speed, unit), force, term: beaufortTerm(force), warning: marineWindWarning(speed, unit) };
}
