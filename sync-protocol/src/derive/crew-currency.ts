import { awardStatusOn, type AwardCurrency, type AwardInput, type AwardStatus } from './awards.js';

export type CrewRole = 'driver' | 'crew';

export interface RoleAwardInput extends AwardInput {
  /** The role the award qualifies for; a driver's award also qualifies for crew. */
  qualifies: CrewRole;
}

export interface RoleCurrency {
  role: CrewRole;
  date: string;
  /** 'none' when no award on the card qualifies for the role at all. */
  status: AwardCurrency | 'none';
  /** True when an award qualifying for the role may be relied on that day. */
  current: boolean;
  /** The award the answer rests on: the current one that lasts longest, else the one nearest to being held. */
  award: (AwardStatus & { name: string }) | null;
  reason: string;
}

const qualifiesFor = (a: RoleAwardInput, role: CrewRole) => a.qualifies === role || (role === 'crew' && a.qualifies === 'driver');

/** A current award lasts longer the more days it has left; one with no expiry lasts longest. */
const lasting = (s: AwardStatus) => (s.daysLeft === null ? Infinity : s.daysLeft);

/**
 * Whether a member holds a current award for signing on as `role` on a local date. A lapsing award
 * still counts (it is current) but is reported, so the member can renew it in time.
 */
export function currencyForRole(awards: readonly RoleAwardInput[], role: CrewRole, date: string): RoleCurrency {
  const statuses = awards.filter((a) => qualifiesFor(a, role)).map((a) => ({ ...awardStatusOn(a, date), name: a.name }));
  const roleWord = role === 'driver' ? 'driving an IRB' : 'crewing an IRB';
  if (statuses.length === 0) {
    // Validates the date even when there is nothing to compare it with.
    awardStatusOn({ name: '', expiresOn: null }, date);
    return { role, date, status: 'none', current: false, award: null, reason: `no award on the member card qualifies for ${roleWord}` };
  }
  const current = statuses.filter((s) => s.current).sort((a, b) => lasting(b) - lasting(a));
  if (current.length > 0) {
    const best = current[0]!;
    return { role, date, status: best.status, current: true, award: best, reason: best.reason };
  }
  // Not current: report the most recently expired award, or the one soonest to be held.
  const expired = statuses.filter((s) => s.status === 'expired').sort((a, b) => lasting(b) - lasting(a));
  const best = expired[0] ?? statuses[0]!;
  return { role, date, status: best.status, current: false, award: best, reason: best.reason };
}
