export const BACKOFF_FIRST_MS = 5_000;
export const BACKOFF_CAP_MS = 5 * 60_000;

/**
 * Wait before retry number `attempt` (1, 2, 3 ...): doubling from 5 s, capped at 5 minutes, then
 * jittered into the upper half of that range so phones that lost signal together do not all
 * come back at the same second. `random` is in [0, 1).
 */
export function backoffDelay(attempt: number, random: number): number {
  if (!Number.isInteger(attempt) || attempt < 1) throw new RangeError(`Retry attempts count from 1, got ${attempt}.`);
  const ceiling = Math.min(BACKOFF_CAP_MS, BACKOFF_FIRST_MS * 2 ** Math.min(attempt - 1, 30));
  return Math.round(ceiling / 2 + (ceiling / 2) * random);
}
