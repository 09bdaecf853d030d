import { describe, expect, it } from 'vitest';
import { parseIsoDuration } from '../../src/derive/time.js';

const zero = { years: 0, months: 0, weeks: 0, days: 0, hours: 0, minutes: 0, seconds: 0 };

describe('parseIsoDuration (ISO 8601-1:2019)', () => {
  it('PT1H30M is 5400 s', () => {
    // ISO 8601-1:2019 durations (checks.md): PT1H30M = 5400 s
    expect(parseIsoDuration('PT1H30M')).toEqual({ ...zero, hours: 1, minutes: 30, totalSeconds: 5400 });
  });

  it('P3Y6M4DT12H30M5S parses into its parts, with no exact length', () => {
    // ISO 8601-1:2019 (checks.md): P3Y6M4DT12H30M5S parses; years, months and days are nominal
    expect(parseIsoDuration('P3Y6M4DT12H30M5S')).toEqual({
      years: 3, months: 6, weeks: 0, days: 4, hours: 12, minutes: 30, seconds: 5, totalSeconds: null,
    });
  });

  it.each([
    ['PT36H', { hours: 36, totalSeconds: 129_600 }], // ISO 8601-1:2019: a part may exceed its carry-over point
    ['PT0.5H', { hours: 0.5, totalSeconds: 1800 }], // ISO 8601-1:2019: decimal fraction on the smallest part
    ['PT1,5M', { minutes: 1.5, totalSeconds: 90 }], // ISO 8601-1:2019: comma as the decimal sign
    ['PT1M', { minutes: 1, totalSeconds: 60 }], // "M" after "T" is minutes
    ['P1M', { months: 1, totalSeconds: null }], // "M" before "T" is months
    ['P2W', { weeks: 2, totalSeconds: null }],
    ['P0D', { totalSeconds: null }],
  ] as const)('%s', (text, parts) => {
    expect(parseIsoDuration(text)).toEqual({ ...zero, ...parts });
  });

  it.each(['', 'P', 'PT', 'P1YT', '1H', 'PT1H30', 'PT30M1H', 'PT1.5H30M', '-PT1H', 'P0001-02-03', 'pt1h'])(
    'refuses "%s"', (text) => {
      // ISO 8601-1:2019 designator grammar: at least one part, in order, fraction only on the last
      expect(() => parseIsoDuration(text)).toThrow(/ISO 8601 duration|only the last part/);
    });
});
