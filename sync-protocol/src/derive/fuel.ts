import { requireNonNegative, requireOneOf, requirePositive } from './assert.js';

/**
 * How a premix ratio R:1 is read. 'petrol-to-oil': R parts petrol to 1 part oil, the volume is
 * petrol only (oil = petrol ÷ R). 'total-mix': the volume is the finished mix, of which oil is
 * 1 part in R + 1 (oil = total ÷ (R + 1)). The ratio itself comes from the motor's manual.
 */
export type PremixConvention = 'petrol-to-oil' | 'total-mix';
export const PREMIX_CONVENTIONS: readonly PremixConvention[] = ['petrol-to-oil', 'total-mix'];

export interface Premix {
  oilMl: number;
  petrolLitres: number;
  totalLitres: number;
  convention: PremixConvention;
  /** The convention in words, for the screen next to the figure. */
  wording: string;
}

export const PREMIX_CAUTION =
  "Use the ratio in the motor's manual. Mix and refuel in the open, away from sparks and flames.";

export function premixWording(convention: PremixConvention, ratio: number): string {
  requireOneOf('Premix convention', convention, PREMIX_CONVENTIONS);
  return convention === 'petrol-to-oil'
    ? `${ratio}:1 read as petrol to oil: 1 part oil added to every ${ratio} parts petrol; the volume is petrol only.`
    : `${ratio}:1 read as a share of the total: oil is 1 part in ${ratio + 1} of the finished mix; the volume is the whole mix.`;
}

export function premix(volumeLitres: number, ratio: number, convention: PremixConvention): Premix {
  requireNonNegative('Fuel volume (L)', volumeLitres);
  requirePositive("Premix ratio (the R in R:1, from the motor's manual)", ratio);
  requireOneOf('Premix convention', convention, PREMIX_CONVENTIONS);
  const oilLitres = convention === 'petrol-to-oil' ? volumeLitres / ratio : volumeLitres / (ratio + 1);
  const petrolLitres = convention === 'petrol-to-oil' ? volumeLitres : volumeLitres - oilLitres;
  return {
    oilMl: oilLitres * 1000,
    petrolLitres,
    totalLitres: petrolLitres + oilLitres,
    convention,
    wording: premixWording(convention, ratio),
  };
}

export function premixOilMl(volumeLitres: number, ratio: number, convention: PremixConvention): number {
  return premix(volumeLitres, ratio, convention).oilMl;
}

/** Fuel used over a session: what was aboard at the start, plus what was added, less what is left. */
export function litresUsed(startLitres: number, endLitres: number, addedLitres = 0): number {
  requireNonNegative('Fuel at start (L)', startLitres);
  requireNonNegative('Fuel at end (L)', endLitres);
  requireNonNegative('Fuel added (L)', addedLitres);
  const used = startLitres + addedLitres - endLitres;
  if (used < 0) {
    throw new RangeError(`More fuel at the end (${endLitres} L) than at the start plus added (${startLitres + addedLitres} L): check the readings`);
  }
  return used;
}

/** Litres per engine hour, or null when the motor did not run (no rate to state). */
export function litresPerHour(litres: number, engineHours: number): number | null {
  requireNonNegative('Fuel used (L)', litres);
  requireNonNegative('Engine hours', engineHours);
  return engineHours === 0 ? null : litres / engineHours;
}
