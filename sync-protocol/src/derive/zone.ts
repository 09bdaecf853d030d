// Offsets of an IANA zone from Intl alone, so the phone and the server read the same tz data
// the platform ships and no library's guess at ambiguous times creeps in.

const formatters = new Map<string, Intl.DateTimeFormat>();

function formatterFor(zone: string): Intl.DateTimeFormat {
  let f = formatters.get(zone);
  if (f) return f;
  if (typeof zone !== 'string' || zone.trim() === '') {
    throw new RangeError('Time zone is missing: set the club time zone, e.g. Australia/Sydney');
  }
  try {
    f = new Intl.DateTimeFormat('en-US', {
      timeZone: zone, hourCycle: 'h23', era: 'short',
      year: 'numeric', month: 'numeric', day: 'numeric', hour: 'numeric', minute: 'numeric', second: 'numeric',
    });
  } catch {
    throw new RangeError(`Unknown time zone "${zone}": use an IANA name such as Australia/Sydney`);
  }
  formatters.set(zone, f);
  return f;
}

export interface WallTime { year: number; month: number; day: number; hour: number; minute: number; second: number }

/** The wall clock in `zone` at an instant (whole seconds). */
export function wallTimeAt(ms: number, zone: string): WallTime {
  const parts: Record<string, string> = {};
  for (const p of formatterFor(zone).formatToParts(new Date(ms))) parts[p.type] = p.value;
  const year = parts.era === 'BC' || parts.era === 'B' ? 1 - Number(parts.year) : Number(parts.year);
  return {
    year, month: Number(parts.month), day: Number(parts.day),
    hour: Number(parts.hour), minute: Number(parts.minute), second: Number(parts.second),
  };
}

export function wallAsUtcMs(w: WallTime): number {
  const d = new Date(0);
  d.setUTCFullYear(w.year, w.month - 1, w.day);
  d.setUTCHours(w.hour, w.minute, w.second, 0);
  return d.getTime();
}

/** The zone's offset from UTC at an instant, in milliseconds (east positive). */
export function offsetMsAt(ms: number, zone: string): number {
  const whole = Math.floor(ms / 1000) * 1000;
  return wallAsUtcMs(wallTimeAt(whole, zone)) - whole;
}

/** Throws the same clear error as any other derivation when the zone name is not known. */
export function requireZone(zone: string): string {
  formatterFor(zone);
  return zone;
}
