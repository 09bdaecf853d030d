import { formatPressure, pressureStatus, type PressureUnit } from './pressure.js';
import { instantMs } from './rfc3339.js';
import { utcToLocal } from './time.js';
import type { CheckInput, CheckItemResult, ReadinessBoat, ReadinessInput, Readiness } from './readiness-types.js';

export type * from './readiness-types.js';

/** Defect statuses that still hold the boat: only a supervisor's verification or a rejection closes one. */
export const OPEN_DEFECT_STATUSES = ['open', 'assigned', 'repaired'] as const;

function completedMs(check: CheckInput | null): number | null {
  if (!check || check.status !== 'complete') return null;
  if (!check.completedAt) throw new RangeError(`A complete ${check.type} check needs the time it was completed`);
  return instantMs(check.completedAt, `${check.type} check completion time`);
}

function itemFault(r: CheckItemResult, boat: ReadinessBoat, unit: PressureUnit): string | null {
  const range = r.chamber !== undefined ? boat.chambers?.[r.chamber] : undefined;
  // A reading outside the specification is a fault even when the box was ticked.
  if (r.pressureKpa !== undefined && range) {
    const status = pressureStatus(r.pressureKpa, range.minKpa, range.maxKpa);
    if (status !== 'in-range') {
      const spec = `${formatPressure(range.minKpa, unit)} to ${formatPressure(range.maxKpa, unit)}`;
      return `${r.label} ${status === 'low' ? 'below' : 'above'} range at ${formatPressure(r.pressureKpa, unit)} (spec ${spec})`;
    }
  }
  if (r.outcome !== 'fail') return null;
  return `${r.label} failed${r.note ? ` (${r.note})` : ''}`;
}

/**
 * Precedence, safety first: afloat while on the water (still listing every fault); stood down over
 * everything else; then unchecked or stowed, which need no fresh launch check; then limited, fit.
 * "Today" is the club's local date. A launch check counts only if completed today and after the
 * latest stow check; a stow check shows the boat stowed on the day it was done, and from the next
 * day the boat is unchecked until a new launch check.
 */
export function boatReadiness(input: ReadinessInput): Readiness {
  const { boat, launchCheck, stowCheck, zone, pressureUnit = 'kPa' } = input;
  const localDate = (ms: number) => utcToLocal(new Date(ms), zone).date;
  const today = utcToLocal(input.now, zone).date;
  const launchAt = completedMs(launchCheck);
  const stowAt = completedMs(stowCheck);
  const standDown: string[] = [];
  const limits: string[] = [];

  const faults = (check: CheckInput, at: number | null) => {
    const when = at === null ? `${check.type} check in progress` : `${check.type} check ${localDate(at)}`;
    for (const r of check.results) {
      const fault = itemFault(r, boat, pressureUnit);
      if (fault) (r.critical ? standDown : limits).push(`${fault}; ${when}`);
    }
  };
  if (launchCheck) faults(launchCheck, launchAt);
  // A later launch check re-inspects the boat, so a stow check's faults count only until then.
  if (stowCheck && (stowAt === null || launchAt === null || stowAt > launchAt)) faults(stowCheck, stowAt);

  for (const d of input.defects) {
    if (!(OPEN_DEFECT_STATUSES as readonly string[]).includes(d.status)) continue;
    const raised = `"${d.summary}" raised ${localDate(instantMs(d.reportedAt, 'Defect report time'))}, ${d.status}`;
    if (d.severity === 'stand-down') standDown.push(`defect ${raised}`);
    else if (d.severity === 'limit') limits.push(`defect ${raised}${d.limitation ? `; limit: ${d.limitation}` : ''}`);
    else limits.push(`advisory defect ${raised}`);
  }
  if (input.motorService && input.motorService.status !== 'ok') limits.push(`motor ${input.motorService.reason}`);

  const afloat = input.trips.filter((t) => t.retrievedAt === null).map((t) => {
    const l = utcToLocal(t.launchedAt, zone);
    return `afloat: launched ${l.time} on ${l.date}, not yet retrieved`;
  });
  const launchCurrent = launchAt !== null && localDate(launchAt) === today && (stowAt === null || launchAt > stowAt);
  const stowCurrent = stowAt !== null && localDate(stowAt) === today && (launchAt === null || stowAt > launchAt);

  const unchecked: string[] = [];
  if (!launchCurrent && !stowCurrent) {
    if (launchCheck && launchAt === null) unchecked.push('unchecked: launch check in progress');
    if (launchAt === null && stowAt === null) unchecked.push('unchecked: no completed launch check on record');
    else if (stowAt !== null && (launchAt === null || stowAt > launchAt)) unchecked.push(`unchecked: no launch check since the stow check on ${localDate(stowAt)}`);
    else if (launchAt !== null) unchecked.push(`unchecked: last launch check was on ${localDate(launchAt)}, none today`);
  }

  const reasons = [
    ...afloat,
    ...standDown.map((r) => `stood down: ${r}`),
    ...limits.map((r) => `limited: ${r}`),
    ...unchecked,
  ];
  const state = afloat.length > 0 ? 'afloat'
    : standDown.length > 0 ? 'stood-down'
    : stowCurrent ? 'stowed'
    : !launchCurrent ? 'unchecked'
    : limits.length > 0 ? 'limited' : 'fit';
  if (state === 'stowed') reasons.push(`stowed: stow check completed ${utcToLocal(new Date(stowAt!), zone).time} today`);
  if (state === 'fit') reasons.push(`fit: launch check passed at ${utcToLocal(new Date(launchAt!), zone).time} today`);
  return { state, reasons };
}
