import { dayNumber, daysBetween } from './calendar.js';
import { utcToLocal } from './time.js';

export interface AwardInput {
  name: string;
  /** Local calendar date the award was gained, if known. */
  awardedOn?: string | null;
  /** Last local calendar date the award is valid (inclusive); null when it does not expire. */
  expiresOn: string | null;
}

export type AwardCurrency = 'current' | 'lapsing' | 'expired' | 'not-yet-held';

export interface AwardStatus {
  status: AwardCurrency;
  /** True for 'current' and 'lapsing': the award may be relied on that day. */
  current: boolean;
  /** Days from the date to the expiry date; null when the award does not expire. */
  daysLeft: number | null;
  reason: string;
}

export const LAPSING_WITHIN_DAYS = 30;

/** Currency on a local calendar date: valid through the expiry date itself; lapsing with 30 days or fewer left. */
export function awardStatusOn(award: AwardInput, date: string): AwardStatus {
  dayNumber(date, 'Date');
  if (award.awardedOn && daysBetween(award.awardedOn, date) < 0) {
    return { status: 'not-yet-held', current: false, daysLeft: null, reason: `${award.name} not held until ${award.awardedOn}` };
  }
  if (award.expiresOn === null) {
    return { status: 'current', current: true, daysLeft: null, reason: `${award.name} current, no expiry` };
  }
  const daysLeft = daysBetween(date, award.expiresOn);
  if (daysLeft < 0) {
    return { status: 'expired', current: false, daysLeft, reason: `${award.name} expired on ${award.expiresOn}` };
  }
  const lapsing = daysLeft <= LAPSING_WITHIN_DAYS;
  const when = daysLeft === 0 ? 'today is its last valid day' : `valid until ${award.expiresOn} (${daysLeft} days)`;
  return { status: lapsing ? 'lapsing' : 'current', current: true, daysLeft, reason: `${award.name} ${lapsing ? 'lapsing' : 'current'}: ${when}` };
}

/** Currency for a trip: the trip's launch instant is turned into the club's local date first. */
export function awardStatusForTrip(award: AwardInput, launchedAt: string, zone: string): AwardStatus {
  return awardStatusOn(award, utcToLocal(launchedAt, zone).date);
}
