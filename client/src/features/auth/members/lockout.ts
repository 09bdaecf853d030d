/** Wrong PINs given for one member on this device, and until when they must wait. */
export interface PinTries {
  wrong: number;
  /** Epoch ms; null when not waiting. */
  lockedUntil: number | null;
}

export const NO_TRIES: PinTries = { wrong: 0, lockedUntil: null };
/** Wrong PINs allowed before the first wait: enough for wet fingers, too few to guess. */
export const FREE_TRIES = 5;
export const FIRST_WAIT_MS = 30_000;
export const LONGEST_WAIT_MS = 15 * 60_000;

/** The wait after the `wrong`-th wrong PIN: none for the free tries, then 30 s doubling to 15 min. */
export function waitAfter(wrong: number): number {
  if (wrong < FREE_TRIES) return 0;
  return Math.min(LONGEST_WAIT_MS, FIRST_WAIT_MS * 2 ** (wrong - FREE_TRIES));
}

/** Milliseconds left to wait before another PIN may be tried; 0 when it may be tried now. */
export function waitLeft(tries: PinTries, now: number): number {
  return tries.lockedUntil === null ? 0 : Math.max(0, tries.lockedUntil - now);
}

export function afterWrongPin(tries: PinTries, now: number): PinTries {
  const wrong = tries.wrong + 1;
  const wait = waitAfter(wrong);
  return { wrong, lockedUntil: wait > 0 ? now + wait : null };
}

/** Wrong PINs left before a wait starts. */
export function triesBeforeWait(tries: PinTries): number {
  return Math.max(0, FREE_TRIES - tries.wrong);
}

/** "30 seconds", "2 minutes", "1 minute 30 seconds", rounded up to the second. */
export function waitText(ms: number): string {
  const total = Math.ceil(ms / 1000);
  const minutes = Math.floor(total / 60);
  const seconds = total % 60;
  const part = (n: number, unit: string) => `${n} ${unit}${n === 1 ? '' : 's'}`;
  if (minutes === 0) return part(seconds, 'second');
  return seconds === 0 ? part(minutes, 'minute') : `${part(minutes, 'minute')} ${part(seconds, 'second')}`;
}
