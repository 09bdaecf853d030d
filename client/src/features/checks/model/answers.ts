import { pressureStatus, type PressureStatus } from '@breakline/sync-protocol';
import type { CheckItemEntry } from './types';

/** A count item passes when at least the required number is there. */
export function countEntry(count: number, required: number): CheckItemEntry {
  if (!Number.isInteger(count) || count < 0) throw new RangeError('Enter how many are there, a whole number from 0.');
  return { outcome: count >= required ? 'pass' : 'fail', value: count };
}

/**
 * A pressure reading, kept in kPa. Against a known range the verdict is the range's; without
 * one the person judges it (Pass or Fail) against the maker's plate.
 */
export function pressureEntry(kpa: number, range: { minKpa: number; maxKpa: number } | undefined, judged?: 'pass' | 'fail'): CheckItemEntry {
  if (!range) {
    if (!judged) throw new RangeError('This chamber has no working range in the boat file: mark the reading Pass or Fail.');
    return { outcome: judged, value: kpa };
  }
  return { outcome: pressureStatus(kpa, range.minKpa, range.maxKpa) === 'in-range' ? 'pass' : 'fail', value: kpa };
}

/** A reading with a range in the item's own unit (not a pressure). */
export function readingEntry(value: number, min: number | undefined, max: number | undefined): CheckItemEntry {
  const low = min !== undefined && value < min, high = max !== undefined && value > max;
  return { outcome: low || high ? 'fail' : 'pass', value };
}

export const STATUS_WORDS: Record<PressureStatus, string> = { low: 'Below range', 'in-range': 'In range', high: 'Above range' };

/** The entry with the note set, or without a note key at all when it is blank. */
export function withNote(entry: CheckItemEntry, note: string): CheckItemEntry {
  const { note: _old, ...rest } = entry;
  return note.trim() ? { ...rest, note: note.trim() } : rest;
}
