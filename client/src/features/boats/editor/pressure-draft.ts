import type { PressureUnit } from '@breakline/sync-protocol';
import { parsePressureEntry, pressureEntryText } from '@/lib/pressure-entry';

/**
 * A pressure box in the club's unit. The stored kPa is kept while the text is untouched, so
 * opening and saving a form never rounds a stored range through the display's decimals.
 */
export interface PressureDraft {
  text: string;
  stored?: { text: string; kpa: number };
}

export function pressureDraft(kpa: number | undefined, unit: PressureUnit): PressureDraft {
  if (kpa === undefined) return { text: '' };
  const text = pressureEntryText(kpa, unit);
  return { text, stored: { text, kpa } };
}

export function draftKpa(draft: PressureDraft, unit: PressureUnit): { ok: true; kpa: number } | { ok: false; message: string } {
  if (draft.stored && draft.stored.text === draft.text) return { ok: true, kpa: draft.stored.kpa };
  const entry = parsePressureEntry(draft.text, unit);
  if (entry.ok && entry.kpa <= 0) return { ok: false, message: 'A working pressure must be above zero.' };
  return entry;
}
