import { requireFinite, requireOneOf } from './assert.js';

export type PressureUnit = 'kPa' | 'psi' | 'bar' | 'mbar';
export const PRESSURE_UNITS: readonly PressureUnit[] = ['kPa', 'psi', 'bar', 'mbar'];

/** Pascals in one unit. psi is the pound-force (avoirdupois pound × standard gravity) per square inch. */
export const PASCALS_PER: Readonly<Record<PressureUnit, number>> = {
  kPa: 1000,
  psi: (0.45359237 * 9.80665) / (0.0254 * 0.0254),
  bar: 100_000,
  mbar: 100,
};

// Decimals chosen so each unit shows about 0.1 kPa of resolution at IRB working pressures
// (roughly 15-25 kPa), fine enough to see a chamber going soft and no finer than a gauge reads.
export const PRESSURE_DECIMALS: Readonly<Record<PressureUnit, number>> = {
  kPa: 1,
  psi: 2,
  bar: 3,
  mbar: 0,
};

export function convertPressure(value: number, from: PressureUnit, to: PressureUnit): number {
  requireFinite('Pressure', value);
  requireOneOf('Pressure unit', from, PRESSURE_UNITS);
  requireOneOf('Pressure unit', to, PRESSURE_UNITS);
  if (from === to) return value;
  return (value * PASCALS_PER[from]) / PASCALS_PER[to];
}

/** A kPa value shown in the club's unit, e.g. formatPressure(13.79, 'psi') → "2.00 psi". */
export function formatPressure(kpa: number, unit: PressureUnit): string {
  const shown = convertPressure(kpa, 'kPa', unit).toFixed(PRESSURE_DECIMALS[unit]);
  // toFixed keeps the sign of tiny negatives ("-0.0"), which reads as a fault on a gauge.
  const clean = /^-0(\.0+)?$/.test(shown) ? shown.slice(1) : shown;
  return `${clean} ${unit}`;
}

export type PressureStatus = 'low' | 'in-range' | 'high';

/** Both limits are inside the range: a chamber exactly at its minimum is in range. */
export function pressureStatus(kpa: number, minKpa: number, maxKpa: number): PressureStatus {
  requireFinite('Pressure', kpa);
  requireFinite('Minimum pressure', minKpa);
  requireFinite('Maximum pressure', maxKpa);
  if (minKpa > maxKpa) {
    throw new RangeError(`Minimum pressure ${minKpa} kPa is above the maximum ${maxKpa} kPa: check the boat's specification`);
  }
  if (kpa < minKpa) return 'low';
  if (kpa > maxKpa) return 'high';
  return 'in-range';
}
