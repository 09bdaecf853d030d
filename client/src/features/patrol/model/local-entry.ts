import { localToUtc, utcToLocal } from '@breakline/sync-protocol';

export interface TimeChoice {
  instant: string;
  /** "02:30 at UTC+11:00 (before the clocks went back)". */
  label: string;
}

/**
 * A local date and time as typed. `ok` has the one instant it names. Where the clocks go back the
 * time happens twice and where they go forward it does not happen at all: then the person must
 * choose one of `choices`; nothing is picked for them.
 */
export type LocalEntry =
  | { status: 'empty' }
  | { status: 'invalid'; message: string }
  | { status: 'ok'; instant: string }
  | { status: 'ambiguous' | 'missing'; message: string; choices: TimeChoice[] };

const offsetText = (instant: string, zone: string) => {
  const m = /([+-]\d\d:\d\d)$/.exec(utcToLocal(instant, zone).rfc3339);
  return `UTC${m ? m[1] : ''}`;
};

export function resolveLocalEntry(date: string, time: string, zone: string): LocalEntry {
  if (!date && !time) return { status: 'empty' };
  if (!/^\d{4}-\d{2}-\d{2}$/.test(date) || !/^\d{2}:\d{2}$/.test(time)) {
    return { status: 'invalid', message: 'Enter a date and a time (hours and minutes).' };
  }
  let r;
  try {
    r = localToUtc(`${date}T${time}`, zone);
  } catch (error) {
    return { status: 'invalid', message: (error as Error).message };
  }
  if (r.status === 'ok') return { status: 'ok', instant: r.instant };
  if (r.status === 'ambiguous') {
    return {
      status: 'ambiguous',
      message: `${time} happened twice on ${date}: the clocks went back that night. Which one was it?`,
      choices: [
        { instant: r.earlier, label: `${time} at ${offsetText(r.earlier, zone)}, the first time (before the clocks went back)` },
        { instant: r.later, label: `${time} at ${offsetText(r.later, zone)}, the second time (after the clocks went back)` },
      ],
    };
  }
  const show = (instant: string) => `${utcToLocal(instant, zone).time} at ${offsetText(instant, zone)}`;
  return {
    status: 'missing',
    message: `${time} did not happen on ${date}: the clocks went forward that night. Which time was it? Or correct the time.`,
    choices: [
      { instant: r.before, label: `${show(r.before)}, if ${time} was read on a clock not yet put forward` },
      { instant: r.after, label: `${show(r.after)}, if ${time} was counted with the new offset` },
    ],
  };
}

/** The local date and time boxes' text for an instant. */
export function entryOf(instant: string | null, zone: string): { date: string; time: string } {
  if (!instant) return { date: '', time: '' };
  const l = utcToLocal(instant, zone);
  return { date: l.date, time: l.time };
}

/**
 * The instant a pair of boxes names. Boxes still showing `stored` keep it exactly, so a time in a
 * repeated hour is not asked about again; a choice made for an ambiguous or missing time is used
 * once it is one of that time's choices.
 */
export function entryInstant(date: string, time: string, choice: string | null, stored: string | null, zone: string): LocalEntry {
  const shown = entryOf(stored, zone);
  if (stored && shown.date === date && shown.time === time) return { status: 'ok', instant: stored };
  const entry = resolveLocalEntry(date, time, zone);
  if ((entry.status === 'ambiguous' || entry.status === 'missing') && choice && entry.choices.some((c) => c.instant === choice)) {
    return { status: 'ok', instant: choice };
  }
  return entry;
}
