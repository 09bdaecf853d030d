import type { BoatHours, SeasonReportView } from '../api/season';

/** A boat's name as the report prints it: fleet number and name from the server, else this computer's. */
export function boatLabel(b: BoatHours, nameOf: (id: string) => string): string {
  const sent = [b.fleetNumber, b.boatName].filter((p): p is string => Boolean(p)).join(' ');
  return sent || nameOf(b.boatId);
}

/** Boats with any hours in the range, most hours first (boats with none would be empty bars). */
export function boatsWithHours(f: SeasonReportView): BoatHours[] {
  return f.hoursOnWater.byBoat.filter((b) => b.totalHours > 0 || b.weekly.some((h) => h > 0)).sort((a, b) => b.totalHours - a.totalHours);
}

/** Hours rounded to a tenth, as the charts and tables print them. */
export const tenth = (h: number) => Math.round(h * 10) / 10;

/** "12.5 h"; a median of repair times reads better in days once it passes two days. */
export function hoursText(h: number | null): string {
  if (h === null) return 'no repairs yet';
  if (h >= 48) return `${tenth(h / 24)} days`;
  return `${tenth(h)} h`;
}

/** "6 Dec": the week's first day (a Monday), short. */
export function weekLabel(weekStart: string): string {
  const ms = Date.parse(`${weekStart}T12:00:00Z`);
  if (!Number.isFinite(ms)) return weekStart;
  return new Intl.DateTimeFormat('en-AU', { timeZone: 'UTC', day: 'numeric', month: 'short' }).format(ms);
}
