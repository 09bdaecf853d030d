import { convertPressure, formatPressure, PRESSURE_DECIMALS, PRESSURE_UNITS, type PressureUnit } from '@breakline/sync-protocol';

/** The club's pressure unit; one the app does not know is shown and entered in kPa, and says so. */
export function clubPressureUnit(value: string | undefined): PressureUnit {
  return (PRESSURE_UNITS as readonly string[]).includes(value ?? '') ? (value as PressureUnit) : 'kPa';
}

export type PressureEntry = { ok: true; kpa: number } | { ok: false; message: string };

/**
 * A pressure typed in the club's unit, to kPa as stored. A decimal comma is accepted because many
 * phones offer it on the number pad.
 */
export function parsePressureEntry(text: string, unit: PressureUnit): PressureEntry {
  const clean = text.trim().replace(',', '.');
  if (clean === '') return { ok: false, message: `Enter the pressure in ${unit}.` };
  if (!/^\d*\.?\d+$|^\d+\.$/.test(clean)) return { ok: false, message: `Enter the pressure as a number in ${unit}, such as ${example(unit)}.` };
  return { ok: true, kpa: convertPressure(Number(clean), unit, 'kPa') };
}

function example(unit: PressureUnit): string {
  return formatPressure(20, unit).split(' ')[0]!;
}

/** A stored kPa value as the number to put in an entry box in the club's unit. */
export function pressureEntryText(kpa: number, unit: PressureUnit): string {
  return convertPressure(kpa, 'kPa', unit).toFixed(PRESSURE_DECIMALS[unit]);
}
