import { daysInMonth, utcMs } from './calendar.js';
import { instantMs } from './rfc3339.js';
import { offsetMsAt, requireZone, wallTimeAt } from './zone.js';

export { parseRfc3339, type ParsedTimestamp } from './rfc3339.js';
export { parseIsoDuration, type IsoDuration } from './iso-duration.js';

/** Minutes from one instant to another; both must be RFC 3339 timestamps with an offset or Z. */
export function durationMinutes(startIso: string, endIso: string): number {
  const start = instantMs(startIso, 'Start time');
  const end = instantMs(endIso, 'End time');
  if (end < start) throw new RangeError(`End time ${endIso} is before start time ${startIso}`);
  return (end - start) / 60_000;
}

/**
 * A wall-clock time in a zone as UTC. Where the clocks go back a wall time happens twice
 * ('ambiguous': earlier and later instants); where they go forward it never happens ('missing':
 * `before` reads it with the offset in force before the change, as a clock not yet put forward
 * would, `after` with the offset in force after it). The person chooses; nothing here guesses.
 */
export type LocalToUtc =
  | { status: 'ok'; instant: string }
  | { status: 'ambiguous'; earlier: string; later: string }
  | { status: 'missing'; before: string; after: string };

const LOCAL_RE = /^(\d{4})-(\d{2})-(\d{2})T(\d{2}):(\d{2})$/;
const HOUR = 3_600_000;

export function localToUtc(localDateTime: string, zone: string): LocalToUtc {
  requireZone(zone);
  const m = typeof localDateTime === 'string' ? LOCAL_RE.exec(localDateTime) : null;
  const [y, mo, d, h, mi] = m ? m.slice(1).map(Number) as [number, number, number, number, number] : [0, 0, 0, 0, 0];
  if (!m || mo < 1 || mo > 12 || d < 1 || d > daysInMonth(y, mo) || h > 23 || mi > 59) {
    throw new RangeError(`Local time must be a real date and time like 2026-04-05T02:30; got ${String(localDateTime)}`);
  }
  const wall = utcMs(y, mo, d, h, mi);
  // Every offset in use lies within -12 h..+14 h, so the instant is within 15 h of the wall time
  // read as UTC; sampling every 3 h finds every offset in force across that window.
  const offsets = new Set<number>();
  for (let k = -5; k <= 5; k++) offsets.add(offsetMsAt(wall + k * 3 * HOUR, zone));
  const valid = [...offsets].map((o) => wall - o).filter((t) => offsetMsAt(t, zone) === wall - t).sort((a, b) => a - b);
  const iso = (t: number) => new Date(t).toISOString();
  if (valid.length === 1) return { status: 'ok', instant: iso(valid[0]!) };
  if (valid.length > 1) return { status: 'ambiguous', earlier: iso(valid[0]!), later: iso(valid[valid.length - 1]!) };
  return { status: 'missing', before: iso(wall - offsetMsAt(wall - 15 * HOUR, zone)), after: iso(wall - offsetMsAt(wall + 15 * HOUR, zone)) };
}

export interface LocalTime {
  date: string;          // YYYY-MM-DD
  time: string;          // HH:mm
  localDateTime: string; // YYYY-MM-DDTHH:mm, the form localToUtc takes
  offsetMinutes: number;
  rfc3339: string;       // e.g. 2026-04-05T02:30:00+10:00
}

const pad = (n: number, width = 2) => String(n).padStart(width, '0');

export function utcToLocal(instant: string | Date, zone: string): LocalTime {
  const ms = instant instanceof Date ? instant.getTime() : instantMs(instant, 'Instant');
  if (!Number.isFinite(ms)) throw new RangeError('Instant is an invalid Date');
  const w = wallTimeAt(ms, zone);
  const offsetMinutes = Math.round(offsetMsAt(ms, zone) / 60_000);
  const date = `${pad(w.year, 4)}-${pad(w.month)}-${pad(w.day)}`;
  const time = `${pad(w.hour)}:${pad(w.minute)}`;
  const abs = Math.abs(offsetMinutes);
  const offset = `${offsetMinutes < 0 ? '-' : '+'}${pad(Math.floor(abs / 60))}:${pad(abs % 60)}`;
  return { date, time, localDateTime: `${date}T${time}`, offsetMinutes, rfc3339: `${date}T${time}:${pad(w.second)}${offset}` };
}
