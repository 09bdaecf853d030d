import { describe, expect, it } from 'vitest';
import { contrastRatio } from './contrast';
import { standardColours, sunlightColours, type Colours } from './palette';

// Text/background pairs the theme puts together.
const pairs = (c: Colours): [string, string, string][] => [
  ['app bar text', c.onDark, c.navy],
  ['button text on teal', c.onDark, c.teal],
  ['text on coral', c.onDark, c.coral],
  ['body text on sand', c.ink, c.sand],
  ['secondary text on cards', c.driftwood, c.shell],
  ['teal links on sand', c.teal, c.sand],
  ['coral text on sand', c.coral, c.sand],
];

describe('contrast', () => {
  it('matches the end points of the WCAG 2 contrast ratio', () => {
    // WCAG 2.2, definition of contrast ratio: black on white is 21:1, a colour on itself 1:1.
    expect(contrastRatio('#000000', '#FFFFFF')).toBeCloseTo(21, 5);
    expect(contrastRatio('#0E2A47', '#0E2A47')).toBe(1);
    // Symmetric by definition (lighter over darker).
    expect(contrastRatio('#FFFFFF', '#0B6E6A')).toBe(contrastRatio('#0B6E6A', '#FFFFFF'));
  });

  it('refuses a colour it cannot read', () => {
    expect(() => contrastRatio('teal', '#FFFFFF')).toThrow('Expected a colour like #0E2A47');
  });

  it.each(pairs(standardColours))('standard: %s reaches 4.5:1 (WCAG 2.2 SC 1.4.3)', (_, fg, bg) => {
    expect(contrastRatio(fg, bg)).toBeGreaterThanOrEqual(4.5);
  });

  it.each(pairs(sunlightColours))('sunlight: %s reaches 7:1 (WCAG 2.2 SC 1.4.6)', (_, fg, bg) => {
    expect(contrastRatio(fg, bg)).toBeGreaterThanOrEqual(7);
  });
});
