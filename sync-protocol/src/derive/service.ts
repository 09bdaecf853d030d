import { requireNonNegative, requirePositive } from './assert.js';
import { addDays, addMonthsClamped, dayNumber, daysBetween } from './calendar.js';

export interface MotorServiceInput {
  hourMeter: number;
  /** Null when the motor is serviced by months only. */
  serviceIntervalHours: number | null;
  /** Null when the motor is serviced by hours only. */
  serviceIntervalMonths: number | null;
  /** The club's local calendar date of the last service, YYYY-MM-DD. */
  lastServiceAt: string;
  lastServiceHours: number;
}

/** Engine hours run on a local date, from trips or from the difference of hour-meter readings. */
export interface UsageEntry { date: string; hours: number }

export interface ServiceOptions {
  /** Hours left at or below which service is due soon; default 10% of the hours interval. */
  soonHours?: number;
  /** Days left at or below which service is due soon; default 14. */
  soonDays?: number;
}

export type ServiceState = 'ok' | 'due-soon' | 'overdue';

export interface ServiceStatus {
  dueByHoursAt: number | null;
  dueByDate: string | null;
  hoursRemaining: number | null;
  daysRemaining: number | null;
  /** When the hour meter should reach dueByHoursAt at the mean daily use of the last 30 days. */
  forecastDate: string | null;
  status: ServiceState;
  reason: string;
}

export const USAGE_WINDOW_DAYS = 30;

/** Mean engine hours a day over the 30 days ending `today` (days without use count as zero). */
export function meanDailyHours(usage: readonly UsageEntry[], today: string): number {
  const end = dayNumber(today, 'Today');
  let total = 0;
  for (const u of usage) {
    requireNonNegative(`Engine hours on ${u.date}`, u.hours);
    if (u.hours > 24) throw new RangeError(`${u.hours} engine hours on ${u.date} is more than a day holds: give hours run, not a meter reading`);
    const d = dayNumber(u.date, 'Usage date');
    if (d > end - USAGE_WINDOW_DAYS && d <= end) total += u.hours;
  }
  return total / USAGE_WINDOW_DAYS;
}

const h1 = (n: number) => `${n.toFixed(1)} h`;
const days = (n: number) => (n === 1 ? '1 day' : `${n} days`);

export function serviceStatus(motor: MotorServiceInput, usage: readonly UsageEntry[], today: string, options: ServiceOptions = {}): ServiceStatus {
  const { hourMeter, serviceIntervalHours: everyHours, serviceIntervalMonths: everyMonths, lastServiceAt, lastServiceHours } = motor;
  requireNonNegative('Hour meter', hourMeter);
  requireNonNegative('Hours at last service', lastServiceHours);
  if (everyHours === null && everyMonths === null) throw new RangeError('Set a service interval in hours, in months, or both');
  if (everyHours !== null) requirePositive('Service interval (hours)', everyHours);
  if (everyMonths !== null && (!Number.isInteger(everyMonths) || everyMonths <= 0)) {
    throw new RangeError(`Service interval (months) must be a whole number above zero; got ${everyMonths}`);
  }
  if (hourMeter < lastServiceHours) {
    throw new RangeError(`Hour meter ${h1(hourMeter)} is below the ${h1(lastServiceHours)} recorded at the last service: check the readings`);
  }
  if (daysBetween(lastServiceAt, today) < 0) throw new RangeError(`Last service date ${lastServiceAt} is after today (${today})`);

  const dueByHoursAt = everyHours === null ? null : lastServiceHours + everyHours;
  const hoursRemaining = dueByHoursAt === null ? null : dueByHoursAt - hourMeter;
  const dueByDate = everyMonths === null ? null : addMonthsClamped(lastServiceAt, everyMonths);
  const daysRemaining = dueByDate === null ? null : daysBetween(today, dueByDate);
  const rate = meanDailyHours(usage, today);
  // The day the remaining hours are used up; the small allowance keeps 300.00000000000006 at 300.
  const forecastDate = hoursRemaining !== null && hoursRemaining > 0 && rate > 0
    ? addDays(today, Math.ceil(hoursRemaining / rate - 1e-9)) : null;

  const soonHours = options.soonHours ?? (everyHours ?? 0) * 0.1;
  const soonDays = options.soonDays ?? 14;
  const overHours = hoursRemaining !== null && hoursRemaining < 0;
  const overDays = daysRemaining !== null && daysRemaining < 0;
  const soon = (hoursRemaining !== null && hoursRemaining <= soonHours)
    || (daysRemaining !== null && daysRemaining <= soonDays)
    || (forecastDate !== null && daysBetween(today, forecastDate) <= soonDays);
  const status: ServiceState = overHours || overDays ? 'overdue' : soon ? 'due-soon' : 'ok';

  const parts: string[] = [];
  if (overHours) parts.push(`${h1(-hoursRemaining!)} past the ${h1(dueByHoursAt!)} service`);
  else if (hoursRemaining !== null) parts.push(`${h1(hoursRemaining)} left before the ${h1(dueByHoursAt!)} service`);
  if (overDays) parts.push(`due on ${dueByDate}, ${days(-daysRemaining!)} ago`);
  else if (daysRemaining !== null) parts.push(`due by ${dueByDate} (${days(daysRemaining)})`);
  if (forecastDate !== null) parts.push(`at recent use the hours fall due about ${forecastDate}`);
  const dueNow = hoursRemaining === 0 || daysRemaining === 0;
  const lead = status === 'overdue' ? 'service overdue' : dueNow ? 'service due now' : status === 'due-soon' ? 'service due soon' : 'service not yet due';
  const which = status !== 'overdue' && dueByHoursAt !== null && dueByDate !== null ? ', whichever comes first' : '';
  return { dueByHoursAt, dueByDate, hoursRemaining, daysRemaining, forecastDate, status, reason: `${lead}: ${parts.join('; ')}${which}` };
}
