import type { ServiceState } from '@breakline/sync-protocol';
import type { MotorService } from './motor-service';

const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];

/** A club-local date, YYYY-MM-DD, as "14 Feb 2027" (spelled out, so no reader mistakes day for month). */
export function dayWords(date: string): string {
  const [y, m, d] = date.split('-').map(Number);
  return `${d} ${MONTHS[m! - 1]} ${y}`;
}

export const STATE_WORDS: Record<ServiceState, string> = { ok: 'Service not yet due', 'due-soon': 'Service due soon', overdue: 'Service overdue' };

const hours = (n: number) => `${n.toFixed(1)} engine hours`;
const plural = (n: number, one: string) => `${n} ${one}${n === 1 ? '' : 's'}`;

/** When the next service falls due, in words: the hours and the date, whichever comes first. */
export function dueWords(s: MotorService): string {
  const d = s.detail;
  if (!d) return s.reason.charAt(0).toUpperCase() + s.reason.slice(1) + '.';
  const over: string[] = [];
  if (d.hoursRemaining !== null && d.hoursRemaining < 0) over.push(`${hours(-d.hoursRemaining)} past the ${d.dueByHoursAt!.toFixed(1)} h service`);
  if (d.daysRemaining !== null && d.daysRemaining < 0) over.push(`${plural(-d.daysRemaining, 'day')} past the service due on ${dayWords(d.dueByDate!)}`);
  if (over.length > 0) return `Overdue: ${over.join(', and ')}.`;
  const byHours = d.hoursRemaining === null ? null : d.hoursRemaining === 0 ? `now (the hour meter is at ${d.dueByHoursAt!.toFixed(1)} h)` : `in ${hours(d.hoursRemaining)}`;
  const byDate = d.dueByDate === null ? null : d.daysRemaining === 0 ? 'today' : `on ${dayWords(d.dueByDate)}`;
  if (byHours && byDate) return `Due ${byHours} or ${byDate}, whichever comes first.`;
  return `Due ${byHours ?? byDate}.`;
}

/** The forecast from the last 30 days of use, or why there is none. */
export function forecastWords(s: MotorService): string | null {
  const d = s.detail;
  if (!d || d.dueByHoursAt === null || d.hoursRemaining === null || d.hoursRemaining <= 0) return null;
  if (d.forecastDate === null) return 'No engine hours logged on trips in the last 30 days, so no forecast from use.';
  const first = d.dueByDate !== null && d.dueByDate < d.forecastDate ? ` The date (${dayWords(d.dueByDate)}) comes first.` : '';
  return `At the use of the last 30 days, the hours fall due about ${dayWords(d.forecastDate)}.${first}`;
}
