import { describe, expect, it } from 'vitest';
import {
  beaufortForce, beaufortTerm, describeWind, fromKnots, marineWindWarning, toKnots, type WindSpeedUnit,
} from '../../src/derive/beaufort.js';
import { nextDown } from './support.js';

// Met Office Fact sheet 6, knots: force, first and last whole knot of its band
const BANDS: Array<[number, number, number]> = [
  [0, 0, 0], [1, 1, 3], [2, 4, 6], [3, 7, 10], [4, 11, 16], [5, 17, 21], [6, 22, 27],
  [7, 28, 33], [8, 34, 40], [9, 41, 47], [10, 48, 55], [11, 56, 63], [12, 64, Infinity],
];

describe('Beaufort force from knots (Met Office Fact sheet 6)', () => {
  // Our rule: round the mean to the nearest knot, halves up, so a band spans lo − 0.5 ≤ v < hi + 0.5.
  it.each(BANDS)('force %s spans %s–%s kn, with half-knot edges', (force, lo, hi) => {
    expect(beaufortForce(lo)).toBe(force); // Met Office Fact sheet 6
    if (force > 0) {
      expect(beaufortForce(lo - 0.5)).toBe(force);
      expect(beaufortForce(nextDown(lo - 0.5))).toBe(force - 1);
    } else {
      expect(beaufortForce(0)).toBe(0);
    }
    if (hi !== Infinity) {
      expect(beaufortForce(hi)).toBe(force);
      expect(beaufortForce(nextDown(hi + 0.5))).toBe(force);
      expect(beaufortForce(hi + 0.5)).toBe(force + 1);
    } else {
      expect(beaufortForce(150)).toBe(12);
    }
  });

  it.each([
    [0, 'calm'], [1, 'light air'], [2, 'light breeze'], [3, 'gentle breeze'], [4, 'moderate breeze'],
    [5, 'fresh breeze'], [6, 'strong breeze'], [7, 'near gale'], [8, 'gale'], [9, 'strong gale'],
    [10, 'storm'], [11, 'violent storm'], [12, 'hurricane force'],
  ] as const)('force %s is "%s"', (force, term) => {
    expect(beaufortTerm(force)).toBe(term); // Met Office Fact sheet 6 descriptions (from memory)
  });
});

describe('other units, converted with the exact knot', () => {
  it('uses 1 kn = 1852/3600 m/s = 1.852 km/h', () => {
    // NIST SP 811 (2008) App. B.8: 1 knot = 1852/3600 m/s exactly
    expect(toKnots(1852 / 3600, 'm/s')).toBeCloseTo(1, 14);
    expect(toKnots(1.852, 'km/h')).toBeCloseTo(1, 14);
  });

  it('shows a knot figure in the club unit with the same exact knot, and back', () => {
    // NIST SP 811 (2008) App. B.8: 1 knot = 1852/3600 m/s exactly
    expect(fromKnots(1, 'km/h')).toBeCloseTo(1.852, 14);
    expect(fromKnots(10, 'm/s')).toBeCloseTo(5.144444444, 9);
    expect(fromKnots(12, 'kn')).toBe(12);
    for (const unit of ['kn', 'm/s', 'km/h'] as const) expect(toKnots(fromKnots(17.3, unit), unit)).toBeCloseTo(17.3, 12);
    expect(() => fromKnots(-1, 'kn')).toThrow(/Wind speed/);
  });

  it.each([
    [0.2, 'm/s', 0], // national m/s table: 0 is 0–0.2 m/s; 0.39 kn
    [0.3, 'm/s', 1], // national m/s table: 1 is 0.3–1.5 m/s; 0.58 kn
    [10, 'm/s', 5], // 19.4 kn, Met Office Fact sheet 6 force 5
    [32.7, 'm/s', 12], // national m/s table: 12 from 32.7 m/s; 63.6 kn
    [3.3439, 'm/s', 3], // 6.50004 kn: just past the half-knot edge of force 3
    [3.3438, 'm/s', 2], // 6.49985 kn
    [100, 'km/h', 10], // 54.0 kn
    [118, 'km/h', 12], // 63.7 kn
  ] as const)('%s %s is force %s', (speed, unit, force) => {
    expect(beaufortForce(speed, unit as WindSpeedUnit)).toBe(force);
  });

  it('follows the knot table where the m/s table disagrees', () => {
    // checks.md: 17.2 m/s = 33.43 kn, force 8 by the m/s table but 7 by the knot table we use
    expect(toKnots(17.2, 'm/s')).toBeCloseTo(33.434, 3);
    expect(beaufortForce(17.2, 'm/s')).toBe(7);
    // 1.6 m/s is force 2 in the m/s table; 3.11 kn rounds to 3 kn, force 1 by the knot table
    expect(beaufortForce(1.6, 'm/s')).toBe(1);
  });
});

describe('marine wind warnings (Bureau of Meteorology terms)', () => {
  it.each([
    [25, null], [nextDown(25.5), null], [25.5, 'strong wind'], [26, 'strong wind'], [33, 'strong wind'],
    [nextDown(33.5), 'strong wind'], [33.5, 'gale'], [34, 'gale'], [47, 'gale'], [nextDown(47.5), 'gale'],
    [47.5, 'storm'], [48, 'storm'], [63, 'storm'], [nextDown(63.5), 'storm'], [63.5, 'hurricane force'],
    [64, 'hurricane force'], [90, 'hurricane force'],
  ] as const)('%s kn → %s', (kn, term) => {
    // Bureau of Meteorology: strong wind 26–33 kn, gale 34–47, storm 48–63, hurricane force ≥64
    expect(marineWindWarning(kn)).toBe(term);
  });

  it('describes a wind in one call', () => {
    // Met Office Fact sheet 6 (force 8, 34–40 kn) and Bureau of Meteorology (gale 34–47 kn)
    expect(describeWind(18, 'm/s')).toEqual({ knots: 18 / (1852 / 3600), force: 8, term: 'gale', warning: 'gale' });
  });
});

describe('bad input', () => {
  it.each([-1, Number.NaN, Infinity])('refuses %s with a clear message', (v) => {
    expect(() => beaufortForce(v)).toThrow(/Wind speed/);
  });
  it('refuses an unknown unit and force', () => {
    expect(() => beaufortForce(5, 'mph' as WindSpeedUnit)).toThrow(/kn, m\/s, km\/h/);
    expect(() => beaufortTerm(13)).toThrow(/0 to 12/);
  });
});
