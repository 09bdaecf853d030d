import { plural } from '../status-text';

// Apart from status-text.ts, which the first screen loads: only the sync details say this.

/** Changes queued for another of the person's clubs, which go only while that club is chosen. */
export function elsewhereText(count: number, clubName: string | undefined): string {
  return `${plural(count, 'change')} for ${clubName ?? 'another club'} ${count === 1 ? 'waits' : 'wait'} on this phone: switch to that club to send ${count === 1 ? 'it' : 'them'}.`;
}
