import { durationMinutes, utcToLocal, type KindFields } from '@breakline/sync-protocol';

/** Minutes on the water: launch to retrieval, or to now while afloat. UTC instants, so DST changes cannot skew it. */
export function onWaterMinutes(trip: KindFields['trip'], now: string): number {
  const end = trip.retrievedAt ?? now;
  return Date.parse(end) < Date.parse(trip.launchedAt) ? 0 : durationMinutes(trip.launchedAt, end);
}

/** "1 h 05 min", "42 min". */
export function durationText(minutes: number): string {
  const whole = Math.floor(minutes);
  const h = Math.floor(whole / 60);
  const m = whole % 60;
  return h === 0 ? `${m} min` : `${h} h ${String(m).padStart(2, '0')} min`;
}

/** A running timer: "0:12:07", "1:03:45". */
export function timerText(minutes: number): string {
  const seconds = Math.max(0, Math.floor(minutes * 60));
  const h = Math.floor(seconds / 3600);
  const m = Math.floor((seconds % 3600) / 60);
  const s = seconds % 60;
  return `${h}:${String(m).padStart(2, '0')}:${String(s).padStart(2, '0')}`;
}

/** "Sat 6 Dec 09:20": the club's local time of an instant, with its date when it is not `today`. */
export function clubTime(instant: string, zone: string, today?: string): string {
  const l = utcToLocal(instant, zone);
  if (l.date === today) return l.time;
  const [y, mo, d] = l.date.split('-').map(Number) as [number, number, number];
  const day = new Date(Date.UTC(y, mo - 1, d)).toLocaleDateString(undefined, { weekday: 'short', day: 'numeric', month: 'short', timeZone: 'UTC' });
  return `${day} ${l.time}`;
}
