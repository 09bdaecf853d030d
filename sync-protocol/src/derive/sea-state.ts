import { requireNonNegative } from './assert.js';

export type SeaStateCode = 0 | 1 | 2 | 3 | 4 | 5 | 6 | 7 | 8 | 9;

// Upper bound (m) of codes 0 to 8; a height equal to a bound belongs to the lower code.
const UPPER_BOUNDS = [0, 0.1, 0.5, 1.25, 2.5, 4, 6, 9, 14];

const DESCRIPTORS = [
  'calm (glassy)', 'calm (rippled)', 'smooth', 'slight', 'moderate', 'rough', 'very rough',
  'high', 'very high', 'phenomenal',
];

export function seaStateCode(waveHeightMetres: number): SeaStateCode {
  requireNonNegative('Wave height (m)', waveHeightMetres);
  const code = UPPER_BOUNDS.findIndex((upper) => waveHeightMetres <= upper);
  return (code === -1 ? 9 : code) as SeaStateCode;
}

export function seaStateDescriptor(code: number): string {
  if (!Number.isInteger(code) || code < 0 || code > 9) {
    throw new RangeError(`Sea state code must be a whole number from 0 to 9; got ${code}`);
  }
  return DESCRIPTORS[code]!;
}

export function describeSeaState(waveHeightMetres: number): { code: SeaStateCode; descriptor: string } {
  const code = seaStateCode(waveHeightMetres);
  return { code, descriptor: seaStateDescriptor(code) };
}
