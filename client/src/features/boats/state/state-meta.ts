import type { BoatState } from '@breakline/sync-protocol';

export interface StateMeta {
  word: string;
  /** A theme palette path or a colour; sand/amber is not in the theme, so it is given here. */
  colour: string;
}

export const STATE_META: Record<BoatState, StateMeta> = {
  unchecked: { word: 'Unchecked', colour: 'text.secondary' },
  fit: { word: 'Fit', colour: 'primary.main' },
  // A dark amber: the sand hue of the palette, deep enough to read on the shell background.
  limited: { word: 'Limited', colour: '#7A5200' },
  'stood-down': { word: 'Stood down', colour: 'error.main' },
  afloat: { word: 'Afloat', colour: 'info.main' },
  stowed: { word: 'Stowed', colour: 'secondary.main' },
};

/** "stood down: port pontoon …" → "Stood down: port pontoon …", for a list a person reads. */
export function reasonSentence(reason: string): string {
  return reason.charAt(0).toUpperCase() + reason.slice(1);
}
