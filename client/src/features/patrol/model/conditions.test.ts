import { describe, expect, it } from 'vitest';
import { compassPoint, parseReading, parseWind, seaText, windEntryText, windText } from './conditions';

describe('wind as the driver reads it', () => {
  // Met Office Fact sheet 6 (knots): force 3 is 7–10 kn, force 4 is 11–16 kn, force 6 is 22–27 kn
  it.each([
    [10, 'Beaufort force 3, gentle breeze'],
    [11, 'Beaufort force 4, moderate breeze'],
    [16, 'Beaufort force 4, moderate breeze'],
    [17, 'Beaufort force 5, fresh breeze'],
    [27, 'Beaufort force 6, strong breeze'],
  ])('%d kn is %s', (kn, words) => {
    expect(windText(kn, null, 'kn')).toBe(`${kn} kn · ${words}${kn >= 26 ? ' · strong wind warning strength' : ''}`);
  });

  it('names the direction the wind is from on 16 points', () => {
    // Common practice, no source: 16-point compass, 22.5° apart, N at 0°
    expect([0, 22.5, 45, 135, 180, 200, 270, 337.5, 359].map(compassPoint)).toEqual(['N', 'NNE', 'NE', 'SE', 'S', 'SSW', 'W', 'NNW', 'N']);
    expect(windText(12, 135, 'kn')).toBe('12 kn from SE (135°) · Beaufort force 4, moderate breeze');
  });

  it('shows and takes speeds in the club unit, stored in knots with the exact knot', () => {
    // NIST SP 811 (2008) B.8: 1 knot = 1852/3600 m/s exactly; 20 km/h = 10.799 kn, read as 11 kn on the
    // Met Office knot table (force 4 is 11–16 kn), the table the product takes as the definition
    const r = parseWind('20', 'km/h');
    expect(r.ok && r.value).toBeCloseTo(10.79914, 5);
    expect(windText(10.79914, null, 'km/h')).toBe('20 km/h · Beaufort force 4, moderate breeze');
    expect(windText(18 / 1.852, null, 'km/h')).toBe('18 km/h · Beaufort force 3, gentle breeze');
    expect(windEntryText(10.79914, 'km/h')).toBe('20');
    // National met service m/s table: 5.5 m/s is force 4 (5.5–7.9 m/s)
    const ms = parseWind('5,5', 'm/s');
    expect(ms.ok && windText(ms.value, null, 'm/s')).toBe('5.5 m/s · Beaufort force 4, moderate breeze');
  });

  it('treats a blank box as not recorded, and says what is wrong with bad text', () => {
    expect(parseWind('', 'kn')).toEqual({ ok: true, value: null });
    expect(parseWind('fresh', 'kn')).toEqual({ ok: false, message: 'Enter the wind speed in kn as a number, or leave it blank.' });
    expect(parseReading('2.5', 'the number of people helped', { max: 10, integer: true })).toEqual({ ok: false, message: 'Enter the number of people helped as a whole number.' });
    expect(parseReading('31', 'the wave height in metres', { max: 30 })).toEqual({ ok: false, message: 'The wave height in metres must be at most 30.' });
  });
});

describe('waves as a sea state', () => {
  // WMO code table 3700: a bounding height belongs to the lower code (0.5 m is 2, 1.25 m is 3, 4 m is 5)
  it.each([
    [0.5, '0.5 m · sea state 2, smooth'],
    [0.51, '0.51 m · sea state 3, slight'],
    [1.25, '1.25 m · sea state 3, slight'],
    [2.5, '2.5 m · sea state 4, moderate'],
    [4, '4 m · sea state 5, rough'],
  ])('%d m', (m, text) => expect(seaText(m)).toBe(text));
  it('says nothing for a height not recorded', () => expect(seaText(null)).toBeNull());
});
