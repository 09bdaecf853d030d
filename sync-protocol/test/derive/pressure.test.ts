import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import convert from 'convert-units';
import { PASCALS_PER, PRESSURE_UNITS, convertPressure, formatPressure, pressureStatus, type PressureUnit } from '../../src/derive/pressure.js';
import { expectRelative } from './support.js';

describe('pressure conversion', () => {
  it('uses the exact psi factor', () => {
    // NIST SP 811 (2008) App. B.8: 1 psi = 0.45359237 kg × 9.80665 m/s² ÷ (0.0254 m)² = 6894.757293168361 Pa
    expectRelative(PASCALS_PER.psi, 6894.757293168361, 1e-15);
    expect(PASCALS_PER.bar).toBe(100_000); // NIST SP 811 (2008) App. B.8: 1 bar = 100 000 Pa exactly
    expect(PASCALS_PER.mbar).toBe(100); // NIST SP 811 (2008) App. B.8: 1 mbar = 100 Pa exactly
  });

  // NIST SP 811 (2008) App. B.8 check values; exact value from the exact psi, printed value to its digits
  const checks: Array<[number, PressureUnit, PressureUnit, number, number, number]> = [
    [2, 'psi', 'kPa', (2 * 6894.757293168361) / 1000, 13.7895, 4],
    [2, 'psi', 'mbar', (2 * 6894.757293168361) / 100, 137.895, 3],
    [3, 'psi', 'kPa', (3 * 6894.757293168361) / 1000, 20.6843, 4],
    [3.5, 'psi', 'mbar', (3.5 * 6894.757293168361) / 100, 241.317, 3],
    [200, 'mbar', 'psi', 20_000 / 6894.757293168361, 2.9008, 4],
    [240, 'mbar', 'psi', 24_000 / 6894.757293168361, 3.4809, 4],
  ];
  it.each(checks)('%s %s in %s (NIST SP 811 (2008) App. B.8)', (value, from, to, exact, printed, digits) => {
    const got = convertPressure(value, from, to);
    expectRelative(got, exact, 1e-9);
    expect(Number(got.toFixed(digits))).toBe(printed);
  });

  it('converts bar and mbar exactly', () => {
    // NIST SP 811 (2008) App. B.8: 1 bar = 100 kPa, 1 mbar = 0.1 kPa
    expect(convertPressure(0.2, 'bar', 'kPa')).toBeCloseTo(20, 12);
    expect(convertPressure(180, 'mbar', 'kPa')).toBeCloseTo(18, 12);
    expect(convertPressure(1, 'bar', 'mbar')).toBe(1000);
  });

  // convert-units 2.3.4 (its psi factor is about 4e-7 off, so 1e-6)
  it.each([[1, 'psi', 'kPa'], [3.2, 'psi', 'bar'], [20, 'kPa', 'psi'], [0.25, 'bar', 'psi']] as const)(
    '%s %s → %s agrees with convert-units 2.3.4', (value, from, to) => {
      expectRelative(convertPressure(value, from, to), convert(value).from(from).to(to), 1e-6);
    });

  it('round-trips through every pair of units (property)', () => {
    // arithmetic: a conversion and its inverse give back the value
    const unit = fc.constantFrom(...PRESSURE_UNITS);
    fc.assert(fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), unit, unit, (v, a, b) => {
      const back = convertPressure(convertPressure(v, a, b), b, a);
      return Math.abs(back - v) <= 1e-12 * Math.max(1, Math.abs(v));
    }));
  });

  it('refuses unknown units and non-numbers', () => {
    expect(() => convertPressure(1, 'atm' as PressureUnit, 'kPa')).toThrow(/kPa, psi, bar, mbar/);
    expect(() => convertPressure(Number.NaN, 'psi', 'kPa')).toThrow(/must be a number/);
  });
});

describe('formatPressure', () => {
  it.each([
    [13.789514586336722, 'psi', '2.00 psi'], // NIST SP 811 (2008) App. B.8: 2 psi = 13.7895 kPa
    [20.684271879505083, 'kPa', '20.7 kPa'], // NIST SP 811 (2008) App. B.8: 3 psi = 20.6843 kPa
    [24.13165052608926, 'mbar', '241 mbar'], // NIST SP 811 (2008) App. B.8: 3.5 psi = 241.317 mbar
    [18, 'bar', '0.180 bar'], // NIST SP 811 (2008) App. B.8: 1 bar = 100 kPa
    [-0.00001, 'kPa', '0.0 kPa'], // our display rule: no "-0.0" on a gauge reading
  ] as const)('%s kPa as %s → %s', (kpa, unit, text) => {
    expect(formatPressure(kpa, unit)).toBe(text);
  });
});

describe('pressureStatus', () => {
  // arithmetic against a range; the range itself is the manufacturer's figure (configuration)
  it.each([[13.9, 'low'], [14, 'in-range'], [17, 'in-range'], [20, 'in-range'], [20.1, 'high']] as const)(
    '%s kPa against 14–20 kPa is %s', (kpa, status) => {
      expect(pressureStatus(kpa, 14, 20)).toBe(status);
    });
  it('refuses a range whose minimum is above its maximum', () => {
    expect(() => pressureStatus(15, 20, 14)).toThrow(/above the maximum/);
  });
});
