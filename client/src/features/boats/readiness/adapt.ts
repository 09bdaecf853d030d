import { boatReadiness, type DefectInput, type PressureUnit, type Readiness, type ReadinessInput } from '@breakline/sync-protocol';
import type { LocalRecord } from '@/db/types';
import { latestCheck, templateFor, toCheckInput } from './check-input';
import { motorService, worstService } from '../service/motor-service';

/** Everything on the phone the state of a boat depends on. */
export interface FleetRecords {
  checks: readonly LocalRecord<'check'>[];
  templates: readonly LocalRecord<'checkTemplate'>[];
  defects: readonly LocalRecord<'defect'>[];
  motors: readonly LocalRecord<'motor'>[];
  trips: readonly LocalRecord<'trip'>[];
  serviceRecords: readonly LocalRecord<'serviceRecord'>[];
}

export interface ReadinessContext {
  now: string;
  zone: string;
  unit: PressureUnit;
}

/** A defect's first line, short enough to read in a list of reasons. */
export function defectSummary(description: string): string {
  const line = description.trim().split('\n')[0]!.trim();
  return line.length > 80 ? `${line.slice(0, 79)}…` : line;
}

export function readinessInput(boat: LocalRecord<'boat'>, records: FleetRecords, ctx: ReadinessContext): ReadinessInput {
  const checkInput = (type: 'launch' | 'stow') => {
    const check = latestCheck(records.checks, boat.id, type);
    return check ? toCheckInput(check.fields, templateFor(records.templates, check.fields)) : null;
  };
  const defects: DefectInput[] = records.defects
    .filter((d) => d.fields.boatId === boat.id)
    .map(({ fields: d }) => ({ summary: defectSummary(d.description), severity: d.severity, status: d.status, reportedAt: d.reportedAt }));
  const fitted = records.motors.filter((m) => m.fields.boatId === boat.id);
  const services = fitted.map((m) => motorService(m, records, ctx.now, ctx.zone));
  return {
    boat: {
      name: boat.fields.name,
      chambers: Object.fromEntries(boat.fields.airChambers.map((c) => [c.id, { minKpa: c.minKpa, maxKpa: c.maxKpa }])),
    },
    launchCheck: checkInput('launch'),
    stowCheck: checkInput('stow'),
    defects,
    motorService: worstService(services.map(({ status, reason }) => ({ status, reason }))),
    trips: records.trips.filter((t) => t.fields.boatId === boat.id).map(({ fields: t }) => ({ launchedAt: t.launchedAt, retrievedAt: t.retrievedAt })),
    now: ctx.now,
    zone: ctx.zone,
    pressureUnit: ctx.unit,
  };
}

export type BoatReadiness = { ok: true; readiness: Readiness } | { ok: false; message: string };

/** The boat's state, or the reason it could not be worked out (bad data must show, not crash Today). */
export function readinessOf(boat: LocalRecord<'boat'>, records: FleetRecords, ctx: ReadinessContext): BoatReadiness {
  try {
    return { ok: true, readiness: boatReadiness(readinessInput(boat, records, ctx)) };
  } catch (error) {
    return { ok: false, message: `The state of ${boat.fields.name} could not be worked out: ${(error as Error).message}.` };
  }
}
