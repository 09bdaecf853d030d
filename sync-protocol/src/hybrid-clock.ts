import type { Hlc } from './hlc.js';
import { MAX_HLC_COUNTER } from './hlc.js';
import { ClockDriftError, HlcCounterOverflowError } from './hlc-errors.js';

/** Remote clock values further ahead of the local physical time than this are refused. */
export const MAX_CLOCK_DRIFT_MS = 5 * 60 * 1000;

function checkPt(pt: number): void {
  if (!Number.isSafeInteger(pt) || pt < 0) {
    throw new RangeError(`Physical time must be whole ms since the epoch, got ${pt}.`);
  }
}

function withCounter(l: number, c: number, node: string): Hlc {
  if (c > MAX_HLC_COUNTER) throw new HlcCounterOverflowError(MAX_HLC_COUNTER);
  return { l, c, node };
}

/** Throws ClockDriftError when `remote` is more than maxDriftMs ahead of `pt`. */
export function assertNotAhead(remote: Hlc, pt: number, maxDriftMs = MAX_CLOCK_DRIFT_MS): void {
  const ahead = remote.l - pt;
  if (ahead > maxDriftMs) throw new ClockDriftError(ahead, maxDriftMs);
}

/** Send or local event: l' = l; l = max(l', pt); c = l == l' ? c + 1 : 0. */
export function tickLocal(prev: Hlc, pt: number): Hlc {
  checkPt(pt);
  const l = Math.max(prev.l, pt);
  return withCounter(l, l === prev.l ? prev.c + 1 : 0, prev.node);
}

/** Receive event for message clock m (the counter rule in four cases, as published). */
export function tickReceive(prev: Hlc, m: Hlc, pt: number, maxDriftMs = MAX_CLOCK_DRIFT_MS): Hlc {
  checkPt(pt);
  assertNotAhead(m, pt, maxDriftMs);
  const l = Math.max(prev.l, m.l, pt);
  let c: number;
  if (l === prev.l && l === m.l) c = Math.max(prev.c, m.c) + 1;
  else if (l === prev.l) c = prev.c + 1;
  else if (l === m.l) c = m.c + 1;
  else c = 0;
  return withCounter(l, c, prev.node);
}

/**
 * One node's clock. Physical time is passed in so that callers (and tests) decide
 * where it comes from; nothing here reads a wall clock.
 */
export class HybridClock {
  private state: Hlc;
  private readonly maxDriftMs: number;

  constructor(node: string, options: { initial?: Hlc; maxDriftMs?: number } = {}) {
    this.state = options.initial ? { ...options.initial, node } : { l: 0, c: 0, node };
    this.maxDriftMs = options.maxDriftMs ?? MAX_CLOCK_DRIFT_MS;
  }

  /** The last value handed out (or the initial one). */
  current(): Hlc {
    return { ...this.state };
  }

  /** Stamp a local or send event. State is unchanged if it throws. */
  now(pt: number): Hlc {
    this.state = tickLocal(this.state, pt);
    return this.current();
  }

  /** Merge a remote value into this clock. State is unchanged if it throws. */
  receive(remote: Hlc, pt: number): Hlc {
    this.state = tickReceive(this.state, remote, pt, this.maxDriftMs);
    return this.current();
  }
}
