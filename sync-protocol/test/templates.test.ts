import { describe, expect, it } from 'vitest';
import { DEFAULT_LAUNCH_TEMPLATE, DEFAULT_STOW_TEMPLATE, validateRecord } from '../src/index.js';

const items = (t: typeof DEFAULT_LAUNCH_TEMPLATE) => t.sections.flatMap((s) => s.items);
const byId = (t: typeof DEFAULT_LAUNCH_TEMPLATE, id: string) => items(t).find((i) => i.id === id)!;

describe('default check templates', () => {
  it('are valid check templates of their type', () => {
    expect(validateRecord('checkTemplate', DEFAULT_LAUNCH_TEMPLATE)).toMatchObject({ ok: true });
    expect(validateRecord('checkTemplate', DEFAULT_STOW_TEMPLATE)).toMatchObject({ ok: true });
    expect(DEFAULT_LAUNCH_TEMPLATE.checkType).toBe('launch');
    expect(DEFAULT_STOW_TEMPLATE.checkType).toBe('stow');
  });

  it('cover the launch systems in order: hull, air chambers, fuel, motor, rescue gear, life jackets and radio', () => {
    expect(DEFAULT_LAUNCH_TEMPLATE.sections.map((s) => s.id)).toEqual(['hull', 'air', 'fuel', 'motor', 'gear', 'crew-kit']);
    expect(DEFAULT_STOW_TEMPLATE.sections.map((s) => s.id)).toEqual(['wash', 'flush', 'damage', 'fuel-safe']);
  });

  // Common practice, no source: an IRB has three inflation valves, the two side pontoons and the bow.
  it('read a pressure for each of the three air chambers, as critical items', () => {
    const readings = items(DEFAULT_LAUNCH_TEMPLATE).filter((i) => i.kind === 'reading');
    expect(readings.map((i) => i.chamberId)).toEqual(['port', 'starboard', 'bow']);
    expect(readings.every((i) => i.critical && i.unit === 'kPa')).toBe(true);
    expect(byId(DEFAULT_LAUNCH_TEMPLATE, 'valve-caps').label).toMatch(/All three valve caps/);
  });

  // Common practice, no source: the fuel bladder is held to the floor at four points by clips that face down.
  it('check the fuel bladder is held at four points with the clips facing down', () => {
    expect(byId(DEFAULT_LAUNCH_TEMPLATE, 'bladder-clips').label).toMatch(/four points, clips facing down/);
  });

  // Common practice, no source: a rescue tube, two paddles, a tow rope, a knife and a whistle; two life jackets and a waterproof radio.
  it('count the carried gear and the crew kit', () => {
    const counts = Object.fromEntries(items(DEFAULT_LAUNCH_TEMPLATE).filter((i) => i.kind === 'count').map((i) => [i.id, i.required]));
    expect(counts).toEqual({ 'rescue-tube': 1, paddles: 2, 'tow-rope': 1, knife: 1, whistle: 1, 'life-jackets': 2 });
    expect(byId(DEFAULT_LAUNCH_TEMPLATE, 'life-jackets').label).toMatch(/driver and crew/);
    expect(byId(DEFAULT_LAUNCH_TEMPLATE, 'radio').label).toMatch(/Waterproof radio/);
  });

  // Common practice, no source: after use the motor is flushed in neutral for three to five minutes.
  it('flush the motor in neutral for three to five minutes, with its caution', () => {
    const flush = byId(DEFAULT_STOW_TEMPLATE, 'flush-run');
    expect(flush.label).toMatch(/in neutral for three to five minutes/);
    expect(flush.caution).toMatch(/neutral/);
  });

  it('show the test-run caution: a tub of water, neutral, hands clear of the propeller, the manual first', () => {
    const caution = byId(DEFAULT_LAUNCH_TEMPLATE, 'test-run').caution!;
    for (const words of ['tub of water', 'neutral', 'propeller', "manufacturer's manual"]) expect(caution).toContain(words);
  });
});
