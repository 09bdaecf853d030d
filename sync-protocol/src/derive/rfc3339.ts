import { daysInMonth, utcMs } from './calendar.js';

export interface ParsedTimestamp {
  /** The instant in UTC, as Date.prototype.toISOString writes it (fraction kept to milliseconds). */
  instant: string;
  /** Offset of the local time from UTC in minutes; null for "-00:00" (UTC known, local offset unknown). */
  offsetMinutes: number | null;
  offsetKnown: boolean;
  /** True for a :60 second; the instant is then the second that follows it. */
  leapSecond: boolean;
}

const RE = /^(\d{4})-(\d{2})-(\d{2})[Tt](\d{2}):(\d{2}):(\d{2})(\.\d+)?([Zz]|[+-]\d{2}:\d{2})$/;

function refuse(text: string, why: string): never {
  throw new RangeError(`Not an RFC 3339 timestamp (${why}): "${text}"; expected e.g. 2026-04-05T02:30:00+11:00`);
}

/** Parses an RFC 3339 date-time (section 5.6), refusing anything outside its grammar. */
export function parseRfc3339(text: string): ParsedTimestamp {
  const m = typeof text === 'string' ? RE.exec(text) : null;
  if (!m) refuse(String(text), 'layout');
  const [year, month, day, hour, minute, second] = m.slice(1, 7).map(Number) as [number, number, number, number, number, number];
  if (month < 1 || month > 12) refuse(text, `month ${month}`);
  if (day < 1 || day > daysInMonth(year, month)) refuse(text, `day ${day} of month ${month}`);
  if (hour > 23) refuse(text, `hour ${hour}`);
  if (minute > 59) refuse(text, `minute ${minute}`);
  if (second > 60) refuse(text, `second ${second}`);
  const zone = m[8]!;
  let offsetMinutes: number | null = 0;
  if (zone !== 'Z' && zone !== 'z') {
    const oh = Number(zone.slice(1, 3));
    const om = Number(zone.slice(4, 6));
    if (oh > 23 || om > 59) refuse(text, `offset ${zone}`);
    const sign = zone[0] === '-' ? -1 : 1;
    offsetMinutes = zone === '-00:00' ? null : sign * (oh * 60 + om);
  }
  // Digits past milliseconds are dropped (truncated), as a Date cannot hold them.
  const fractionMs = m[7] ? Number(`${m[7].slice(1)}00`.slice(0, 3)) : 0;
  const leapSecond = second === 60;
  const ms = utcMs(year, month, day, hour, minute, leapSecond ? 59 : second) - (offsetMinutes ?? 0) * 60_000;
  if (leapSecond) {
    // A leap second is inserted only as the last second of a UTC day (23:59:60 UTC).
    const utc = new Date(ms);
    if (utc.getUTCHours() !== 23 || utc.getUTCMinutes() !== 59) refuse(text, 'a leap second away from 23:59:60 UTC');
  }
  return {
    instant: new Date(ms + (leapSecond ? 1000 : fractionMs)).toISOString(),
    offsetMinutes,
    offsetKnown: offsetMinutes !== null,
    leapSecond,
  };
}

/** Milliseconds since the epoch of an RFC 3339 timestamp. */
export function instantMs(text: string, what = 'Timestamp'): number {
  try {
    return Date.parse(parseRfc3339(text).instant);
  } catch (e) {
    throw new RangeError(`${what}: ${(e as Error).message}`);
  }
}
