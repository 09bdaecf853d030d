/** Thrown when a string is not an encoded hybrid logical clock value. */
export class HlcFormatError extends Error {
  constructor(readonly input: unknown, reason: string) {
    super(`Not a clock value: ${JSON.stringify(input)} (${reason}).`);
    this.name = 'HlcFormatError';
  }
}

/**
 * Thrown when the logical counter would no longer fit its fixed encoded width.
 * It only happens when a huge number of events share one millisecond of logical
 * time, which means the physical clock is stuck far behind.
 */
export class HlcCounterOverflowError extends Error {
  constructor(readonly max: number) {
    super(
      `Clock counter overflow: more than ${max} changes were stamped within one millisecond. ` +
        `Check that this device's clock is running, then try again.`,
    );
    this.name = 'HlcCounterOverflowError';
  }
}

/** Thrown when a remote clock value is too far ahead of the local physical clock. */
export class ClockDriftError extends Error {
  readonly aheadMinutes: number;
  constructor(readonly aheadMs: number, readonly maxDriftMs: number) {
    const minutes = Math.max(1, Math.round(aheadMs / 60_000));
    super(
      `This phone's clock is ${minutes} minute${minutes === 1 ? '' : 's'} ahead of the server. ` +
        `Set the phone's date and time to automatic, then sync again.`,
    );
    this.aheadMinutes = minutes;
    this.name = 'ClockDriftError';
  }
}
