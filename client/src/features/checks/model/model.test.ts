import { CAUTIONS, DEFAULT_LAUNCH_TEMPLATE, DEFAULT_STOW_TEMPLATE } from '@breakline/sync-protocol';
import { describe, expect, it } from 'vitest';
import { countEntry, pressureEntry, readingEntry } from './answers';
import { FLUSH_TIME, sectionCautions } from './cautions';
import { resumeSection, unansweredItems } from './progress';

const section = (type: 'launch' | 'stow', id: string) => (type === 'launch' ? DEFAULT_LAUNCH_TEMPLATE : DEFAULT_STOW_TEMPLATE).sections.find((s) => s.id === id)!;

describe('check answers', () => {
  it('passes a count at or above the required number', () => {
    expect(countEntry(2, 2)).toEqual({ outcome: 'pass', value: 2 });
    expect(countEntry(1, 2)).toEqual({ outcome: 'fail', value: 1 });
    expect(() => countEntry(-1, 2)).toThrow('whole number');
  });

  it('judges a pressure by the chamber range, limits inside', () => {
    const range = { minKpa: 17, maxKpa: 24 };
    expect(pressureEntry(17, range).outcome).toBe('pass');
    expect(pressureEntry(16.9, range).outcome).toBe('fail');
    expect(pressureEntry(24.1, range).outcome).toBe('fail');
    expect(() => pressureEntry(20, undefined)).toThrow('mark the reading Pass or Fail');
    expect(pressureEntry(20, undefined, 'fail')).toEqual({ outcome: 'fail', value: 20 });
  });

  it('judges a plain reading by its own limits', () => {
    expect(readingEntry(5, 1, 4).outcome).toBe('fail');
    expect(readingEntry(3, 1, undefined).outcome).toBe('pass');
  });
});

describe('check progress', () => {
  it('resumes at the first section with an unanswered item, then the review screen', () => {
    const results = Object.fromEntries(DEFAULT_LAUNCH_TEMPLATE.sections[0]!.items.map((i) => [i.id, { outcome: 'pass' as const }]));
    expect(resumeSection(DEFAULT_LAUNCH_TEMPLATE, {})).toBe(0);
    expect(resumeSection(DEFAULT_LAUNCH_TEMPLATE, results)).toBe(1);
    const all = Object.fromEntries(unansweredItems(DEFAULT_LAUNCH_TEMPLATE, {}).map((i) => [i.id, { outcome: 'na' as const }]));
    expect(resumeSection(DEFAULT_LAUNCH_TEMPLATE, all)).toBe(DEFAULT_LAUNCH_TEMPLATE.sections.length);
  });
});

describe('section cautions', () => {
  it('shows the test-run caution on the launch check motor screen', () => {
    expect(sectionCautions('launch', section('launch', 'motor'))).toContain(CAUTIONS.testRun);
  });

  it('shows the flush caution and time on the stow check motor screen (three to five minutes: common practice, no source)', () => {
    const cautions = sectionCautions('stow', section('stow', 'flush'));
    expect(cautions).toEqual(expect.arrayContaining([CAUTIONS.flush, FLUSH_TIME]));
  });

  it('shows fuel handling away from ignition on fuel screens, once', () => {
    expect(sectionCautions('stow', section('stow', 'fuel-safe'))).toEqual([CAUTIONS.fuel]);
  });

  it('keeps the usual caution when a club template dropped it', () => {
    const bare = { ...section('launch', 'motor'), items: [{ id: 'x', label: 'Motor ok', kind: 'pass-fail' as const, critical: true }] };
    expect(sectionCautions('launch', bare)).toEqual([CAUTIONS.testRun]);
  });
});
