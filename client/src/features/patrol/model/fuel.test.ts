import { describe, expect, it } from 'vitest';
import { premixFor } from './fuel';
import { motorFields } from '../testing/records';

describe('premix oil for the fuel added', () => {
  it('gives both readings of the ratio, each with its wording', () => {
    // checks.md, two-stroke premix (arithmetic; common practice, no source): 20 L at 50:1 is 400 mL
    // petrol-to-oil, 20 ÷ 51 L = 392.16 mL as a share of the total mix
    const mix = premixFor(20, motorFields({ premixRatio: 50 }))!;
    expect(mix.lines.map((l) => l.oil)).toEqual([
      'Into 20 L of petrol: 400 mL of two-stroke oil',
      'For 20 L of mix in all: 392 mL of two-stroke oil with 19.61 L of petrol',
    ]);
    expect(mix.lines[0]!.wording).toMatch(/petrol to oil/);
    expect(mix.lines[1]!.wording).toMatch(/finished mix/);
    expect(mix.note).toMatch(/ratio in the motor's manual.*away from sparks and flames/);
  });

  it('uses the ratio from the motor record', () => {
    // checks.md: 10 L at 25:1 is 400 mL; 5 L at 50:1 is 100 mL (petrol-to-oil)
    expect(premixFor(10, motorFields({ premixRatio: 25 }))!.lines[0]!.oil).toBe('Into 10 L of petrol: 400 mL of two-stroke oil');
    expect(premixFor(5, motorFields({ premixRatio: 50 }))!.lines[0]!.oil).toBe('Into 5 L of petrol: 100 mL of two-stroke oil');
  });

  it('says why there is no figure for an oil-injected motor, a missing ratio or no motor', () => {
    expect(premixFor(10, motorFields({ fuelMode: 'oil-injection', premixRatio: null }))).toMatchObject({ lines: [], note: expect.stringMatching(/injects its own oil/) });
    expect(premixFor(10, { ...motorFields(), premixRatio: null })).toMatchObject({ lines: [], note: expect.stringMatching(/no premix ratio/) });
    expect(premixFor(10, null)).toMatchObject({ lines: [], note: expect.stringMatching(/No motor/) });
    expect(premixFor(null, motorFields())).toBeNull();
  });
});
