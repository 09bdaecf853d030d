import { decodeHlc, durationMinutes } from '@breakline/sync-protocol';

const formatters = new Map<string, Intl.DateTimeFormat>();

function formatter(zone: string, withYear: boolean): Intl.DateTimeFormat {
  const key = `${zone}|${withYear}`;
  let f = formatters.get(key);
  if (!f) {
    f = new Intl.DateTimeFormat('en-AU', {
      timeZone: zone, weekday: 'short', day: 'numeric', month: 'short', year: withYear ? 'numeric' : undefined,
      hour: '2-digit', minute: '2-digit', hourCycle: 'h23',
    });
    formatters.set(key, f);
  }
  return f;
}

/** "Sat 6 Dec 2026, 09:14" in the club's time zone; a dash when there is no time. */
export function clubTime(iso: unknown, zone: string): string {
  if (typeof iso !== 'string' || iso === '') return '—';
  const ms = Date.parse(iso);
  if (!Number.isFinite(ms)) return iso;
  return formatter(zone, true).format(ms);
}

const exact = new Map<string, Intl.DateTimeFormat>();

/** "Sun, 6 Dec 2026, 10:47:12": with seconds, for telling apart two writes in the same minute. */
export function clubTimeExact(iso: unknown, zone: string): string {
  if (typeof iso !== 'string' || iso === '') return '—';
  const ms = Date.parse(iso);
  if (!Number.isFinite(ms)) return iso;
  let f = exact.get(zone);
  if (!f) {
    f = new Intl.DateTimeFormat('en-AU', {
      timeZone: zone, weekday: 'short', day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit', second: '2-digit', hourCycle: 'h23',
    });
    exact.set(zone, f);
  }
  return f.format(ms);
}

const short = new Map<string, Intl.DateTimeFormat>();

/**
 * "Sun 29 Nov, 15:30" for a table cell: the weekday (patrols are by day), the year only when it is
 * not this year's at the club, so a column stays narrow.
 */
export function tableTime(iso: unknown, zone: string, now = new Date()): string {
  if (typeof iso !== 'string' || iso === '') return '—';
  const ms = Date.parse(iso);
  if (!Number.isFinite(ms)) return iso;
  const year = (t: number) => new Intl.DateTimeFormat('en-AU', { timeZone: zone, year: 'numeric' }).format(t);
  const withYear = year(ms) !== year(now.getTime());
  const key = `${zone}|${withYear}`;
  let f = short.get(key);
  if (!f) {
    f = new Intl.DateTimeFormat('en-AU', {
      timeZone: zone, weekday: 'short', day: 'numeric', month: 'short', year: withYear ? 'numeric' : undefined, hour: '2-digit', minute: '2-digit', hourCycle: 'h23',
    });
    short.set(key, f);
  }
  return f.format(ms).replace(/^(\w{3}),/, '$1');
}

/** "15:30", for a time on the same club day as another. */
export function clockTime(iso: unknown, zone: string): string {
  if (typeof iso !== 'string' || iso === '') return '—';
  const ms = Date.parse(iso);
  return Number.isFinite(ms) ? new Intl.DateTimeFormat('en-AU', { timeZone: zone, hour: '2-digit', minute: '2-digit', hourCycle: 'h23' }).format(ms) : iso;
}

export function sameClubDay(a: unknown, b: unknown, zone: string): boolean {
  if (typeof a !== 'string' || typeof b !== 'string') return false;
  const day = (iso: string) => new Intl.DateTimeFormat('en-CA', { timeZone: zone, year: 'numeric', month: '2-digit', day: '2-digit' }).format(Date.parse(iso));
  return Number.isFinite(Date.parse(a)) && Number.isFinite(Date.parse(b)) && day(a) === day(b);
}

/** "Sat 6 Dec 2026" for a local calendar date (YYYY-MM-DD). */
export function calendarDate(date: string): string {
  const ms = Date.parse(`${date}T12:00:00Z`);
  if (!Number.isFinite(ms)) return date;
  return new Intl.DateTimeFormat('en-AU', { timeZone: 'UTC', weekday: 'short', day: 'numeric', month: 'short', year: 'numeric' }).format(ms);
}

/** When a side of a conflict wrote its value: the wall-clock part of its hybrid clock stamp. */
export function hlcTime(hlc: string, zone: string): string {
  try {
    return clubTimeExact(new Date(decodeHlc(hlc).l).toISOString(), zone);
  } catch {
    return 'time unknown';
  }
}

/** "1 h 35 min"; null while the boat is still out. */
export function duration(fromIso: unknown, toIso: unknown): string | null {
  if (typeof fromIso !== 'string' || typeof toIso !== 'string') return null;
  try {
    return minutesText(durationMinutes(fromIso, toIso));
  } catch {
    return null;
  }
}

export function minutesText(total: number): string {
  const m = Math.round(total);
  const h = Math.floor(m / 60);
  return h > 0 ? `${h} h ${m % 60} min` : `${m} min`;
}

/** Device ids are long; the end is enough to tell two apart, and the desk's own is named. */
export function deviceText(deviceId: string, thisDevice: string | undefined): string {
  if (deviceId === 'server') return 'the Review desk';
  if (thisDevice && deviceId === thisDevice) return 'this computer';
  // Phones and tablets name themselves by a long random id; the server's own writers by a word.
  if (!/^[0-9a-f]{8}-[0-9a-f]{4}-/i.test(deviceId)) return `the server (${deviceId})`;
  return `device ending ${deviceId.slice(-6)}`;
}

export const PURPOSE_WORDS: Record<string, string> = {
  patrol: 'Patrol', training: 'Training', rescue: 'Rescue', search: 'Search', 'preventive-action': 'Preventive action',
  'event-support': 'Event support', 'maintenance-run': 'Maintenance run',
};

export const INCIDENT_WORDS: Record<string, string> = {
  rescue: 'Rescue', assist: 'Assist', 'first-aid': 'First aid', 'near-miss': 'Near miss', 'equipment-failure': 'Equipment failure',
};

export const DEFECT_STATUS_WORDS: Record<string, string> = {
  open: 'Open', assigned: 'Assigned', repaired: 'Repaired, to verify', verified: 'Verified: back in service', rejected: 'Rejected: not a defect',
};

export const CHECK_TYPE_WORDS: Record<string, string> = { launch: 'Launch check', stow: 'Stow check' };
