import { describe, expect, it } from 'vitest';
import { PREMIX_CAUTION, litresPerHour, litresUsed, premix, premixOilMl, premixWording } from '../../src/derive/fuel.js';

describe('two-stroke premix', () => {
  it.each([
    // arithmetic; common practice, no source (values listed in checks.md)
    [20, 50, 400], [20, 100, 200], [5, 50, 100], [10, 25, 400],
  ])('%s L of petrol at %s:1 petrol to oil takes %s mL of oil', (litres, ratio, ml) => {
    expect(premixOilMl(litres, ratio, 'petrol-to-oil')).toBeCloseTo(ml, 9);
  });

  it('20 L of finished mix at 50:1 holds 392.16 mL of oil', () => {
    // arithmetic; common practice, no source: oil = total ÷ (R + 1)
    const mix = premix(20, 50, 'total-mix');
    expect(Math.round(mix.oilMl * 100) / 100).toBe(392.16);
    expect(mix.petrolLitres + mix.oilMl / 1000).toBeCloseTo(20, 12);
    expect(mix.totalLitres).toBeCloseTo(20, 12);
  });

  it('states the convention in words for the screen', () => {
    // arithmetic; common practice, no source
    expect(premix(20, 50, 'petrol-to-oil').wording).toBe('50:1 read as petrol to oil: 1 part oil added to every 50 parts petrol; the volume is petrol only.');
    expect(premixWording('total-mix', 50)).toMatch(/1 part in 51 of the finished mix/);
    expect(PREMIX_CAUTION).toMatch(/motor's manual/);
  });

  it.each([
    [() => premix(20, 0, 'petrol-to-oil'), /Premix ratio.*greater than zero/],
    [() => premix(20, -50, 'total-mix'), /Premix ratio.*greater than zero/],
    [() => premix(-1, 50, 'petrol-to-oil'), /Fuel volume \(L\) cannot be negative/],
    [() => premix(Number.NaN, 50, 'petrol-to-oil'), /Fuel volume \(L\) must be a number/],
    [() => premix(20, 50, 'oil-to-petrol' as never), /petrol-to-oil, total-mix/],
  ])('refuses bad input (%#)', (call, message) => {
    expect(call).toThrow(message);
  });
});

describe('fuel used and rate', () => {
  it('takes what was aboard plus what was added, less what is left', () => {
    // arithmetic; common practice, no source
    expect(litresUsed(25, 7)).toBe(18);
    expect(litresUsed(25, 10, 5)).toBe(20);
    expect(litresPerHour(18, 1.5)).toBe(12);
    expect(litresPerHour(0, 0)).toBeNull();
  });
  it('refuses readings that cannot be right', () => {
    expect(() => litresUsed(10, 12)).toThrow(/More fuel at the end \(12 L\) than at the start plus added \(10 L\)/);
    expect(() => litresUsed(-1, 0)).toThrow(/Fuel at start/);
    expect(() => litresPerHour(5, -1)).toThrow(/Engine hours cannot be negative/);
  });
});
