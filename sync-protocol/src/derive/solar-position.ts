// The sun's declination and the equation of time at an instant, by the NOAA Solar Calculator
// equations (after Meeus, Astronomical Algorithms). Good to about a minute of time.

const RAD = Math.PI / 180;

export interface SolarPosition {
  /** Declination, radians. */
  declination: number;
  /** Apparent minus mean solar time, minutes. */
  equationOfTime: number;
}

export function solarPosition(ms: number): SolarPosition {
  const julianDay = ms / 86_400_000 + 2440587.5;
  const t = (julianDay - 2451545) / 36525; // Julian centuries from J2000.0
  const meanLong = (((280.46646 + t * (36000.76983 + t * 0.0003032)) % 360) + 360) % 360;
  const meanAnomaly = 357.52911 + t * (35999.05029 - 0.0001537 * t);
  const eccentricity = 0.016708634 - t * (0.000042037 + 0.0000001267 * t);
  const m = meanAnomaly * RAD;
  const centre = Math.sin(m) * (1.914602 - t * (0.004817 + 0.000014 * t))
    + Math.sin(2 * m) * (0.019993 - 0.000101 * t) + Math.sin(3 * m) * 0.000289;
  const omega = (125.04 - 1934.136 * t) * RAD;
  const apparentLong = (meanLong + centre - 0.00569 - 0.00478 * Math.sin(omega)) * RAD;
  const meanObliquity = 23 + (26 + (21.448 - t * (46.815 + t * (0.00059 - t * 0.001813))) / 60) / 60;
  const obliquity = (meanObliquity + 0.00256 * Math.cos(omega)) * RAD;
  const declination = Math.asin(Math.sin(obliquity) * Math.sin(apparentLong));
  const y = Math.tan(obliquity / 2) ** 2;
  const l0 = meanLong * RAD;
  const e = eccentricity;
  const eq = y * Math.sin(2 * l0) - 2 * e * Math.sin(m) + 4 * e * y * Math.sin(m) * Math.cos(2 * l0)
    - 0.5 * y * y * Math.sin(4 * l0) - 1.25 * e * e * Math.sin(2 * m);
  return { declination, equationOfTime: (4 * eq) / RAD };
}

/** Cosine of the hour angle at which the sun's upper limb meets the horizon (refraction included). */
export function cosSunriseHourAngle(latitudeDeg: number, declination: number): number {
  const lat = latitudeDeg * RAD;
  return Math.cos(90.833 * RAD) / (Math.cos(lat) * Math.cos(declination)) - Math.tan(lat) * Math.tan(declination);
}
