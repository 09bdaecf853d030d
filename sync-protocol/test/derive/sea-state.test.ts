import { describe, expect, it } from 'vitest';
import { describeSeaState, seaStateCode, seaStateDescriptor } from '../../src/derive/sea-state.js';
import { nextUp } from './support.js';

// WMO code table 3700 (WMO-No. 306, Vol I.1, Part A): code, upper bound (m), descriptor
const TABLE: Array<[number, number, string]> = [
  [0, 0, 'calm (glassy)'], [1, 0.1, 'calm (rippled)'], [2, 0.5, 'smooth'], [3, 1.25, 'slight'],
  [4, 2.5, 'moderate'], [5, 4, 'rough'], [6, 6, 'very rough'], [7, 9, 'high'], [8, 14, 'very high'],
];

describe('sea state code (WMO code table 3700)', () => {
  it.each(TABLE)('code %s ends at %s m; a bounding height belongs to the lower code', (code, upper, descriptor) => {
    expect(seaStateCode(upper)).toBe(code); // WMO code table 3700
    expect(seaStateCode(nextUp(upper))).toBe(code + 1);
    expect(seaStateDescriptor(code)).toBe(descriptor);
  });

  it('states the checks.md examples', () => {
    // WMO code table 3700: 4.0 m is code 5, 0.1 m is code 1, 0 m is code 0
    expect(seaStateCode(4.0)).toBe(5);
    expect(seaStateCode(0.1)).toBe(1);
    expect(seaStateCode(0)).toBe(0);
    expect(describeSeaState(20)).toEqual({ code: 9, descriptor: 'phenomenal' }); // WMO 3700: 9 is over 14 m
  });

  it.each([-0.1, Number.NaN, -Infinity])('refuses %s', (h) => {
    expect(() => seaStateCode(h)).toThrow(/Wave height/);
  });
  it('refuses a code outside 0–9', () => {
    expect(() => seaStateDescriptor(10)).toThrow(/0 to 9/);
  });
});
