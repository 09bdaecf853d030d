import { deepEqual, type KindFields, type WindSpeedUnit } from '@breakline/sync-protocol';
import { parseReading, parseWind, windEntryText } from './conditions';
import { entryInstant, entryOf, type LocalEntry } from './local-entry';

type Trip = KindFields['trip'];

/** What the trip form holds: the person's text, parsed only on save. */
export interface TripDraft {
  purpose: Trip['purpose'];
  driverId: string;
  crewIds: string[];
  launchDate: string;
  launchTime: string;
  /** The instant picked when the launch time typed happened twice or not at all. */
  launchChoice: string | null;
  retrievalDate: string;
  retrievalTime: string;
  retrievalChoice: string | null;
  wind: string;
  /** Degrees as text, '' when not recorded; the form offers compass points. */
  windDirection: string;
  wave: string;
  hoursStart: string;
  hoursEnd: string;
  fuel: string;
}

const num = (n: number | null) => (n === null ? '' : String(n));

export function draftOf(t: Trip, zone: string, unit: WindSpeedUnit): TripDraft {
  const launch = entryOf(t.launchedAt, zone);
  const retrieval = entryOf(t.retrievedAt, zone);
  return {
    purpose: t.purpose, driverId: t.driverId, crewIds: [...t.crewIds],
    launchDate: launch.date, launchTime: launch.time, launchChoice: null,
    retrievalDate: retrieval.date, retrievalTime: retrieval.time, retrievalChoice: null,
    wind: windEntryText(t.windSpeedKn, unit), windDirection: num(t.windDirectionDeg), wave: num(t.waveHeightM),
    hoursStart: num(t.engineHoursStart), hoursEnd: num(t.engineHoursEnd), fuel: num(t.fuelAddedL),
  };
}

const LABELS: Partial<Record<keyof Trip, string>> = {
  purpose: 'purpose', driverId: 'driver', crewIds: 'crew', launchedAt: 'launch time', retrievedAt: 'retrieval time',
  windSpeedKn: 'wind speed', windDirectionDeg: 'wind direction', waveHeightM: 'wave height',
  engineHoursStart: 'engine hours at launch', engineHoursEnd: 'engine hours at retrieval', fuelAddedL: 'fuel added',
};

export type TimeField = 'launch' | 'retrieval';

export type DraftResult =
  | { ok: true; patch: Partial<Trip>; changed: string[]; needsReason: boolean }
  | { ok: false; errors: Partial<Record<keyof TripDraft, string>>; ask: Partial<Record<TimeField, Extract<LocalEntry, { choices: unknown }>>> };

/**
 * The changes a saved form makes to a trip. Once a trip is retrieved, correcting anything it logged
 * needs a reason, and so does moving a stamped launch or retrieval time at any point; filling in a
 * reading that was not recorded does not.
 */
export function tripChanges(draft: TripDraft, trip: Trip, zone: string, unit: WindSpeedUnit): DraftResult {
  const errors: Partial<Record<keyof TripDraft, string>> = {};
  const ask: Partial<Record<TimeField, Extract<LocalEntry, { choices: unknown }>>> = {};
  const next: Partial<Trip> = { purpose: draft.purpose, driverId: draft.driverId, crewIds: draft.crewIds.filter((id) => id !== draft.driverId) };

  const launch = entryInstant(draft.launchDate, draft.launchTime, draft.launchChoice, trip.launchedAt, zone);
  if (launch.status === 'ok') next.launchedAt = launch.instant;
  else if (launch.status === 'ambiguous' || launch.status === 'missing') { ask.launch = launch; errors.launchTime = 'Choose which time below.'; }
  else errors.launchTime = launch.status === 'empty' ? 'A trip needs its launch time.' : launch.message;

  const retrieval = entryInstant(draft.retrievalDate, draft.retrievalTime, draft.retrievalChoice, trip.retrievedAt, zone);
  if (retrieval.status === 'ok') next.retrievedAt = retrieval.instant;
  else if (retrieval.status === 'empty') next.retrievedAt = null;
  else if (retrieval.status === 'invalid') errors.retrievalTime = retrieval.message;
  else { ask.retrieval = retrieval; errors.retrievalTime = 'Choose which time below.'; }
  if (next.launchedAt && next.retrievedAt && Date.parse(next.retrievedAt) < Date.parse(next.launchedAt)) {
    errors.retrievalTime = 'Retrieval must not be before launch.';
  }

  const readings: [keyof TripDraft, keyof Trip, ReturnType<typeof parseReading>][] = [
    ['wind', 'windSpeedKn', parseWind(draft.wind, unit)],
    ['windDirection', 'windDirectionDeg', parseReading(draft.windDirection, 'the wind direction in degrees', { max: 359.9 })],
    ['wave', 'waveHeightM', parseReading(draft.wave, 'the wave height in metres', { max: 30 })],
    ['hoursStart', 'engineHoursStart', parseReading(draft.hoursStart, 'the engine hours at launch', { max: 100_000 })],
    ['hoursEnd', 'engineHoursEnd', parseReading(draft.hoursEnd, 'the engine hours at retrieval', { max: 100_000 })],
    ['fuel', 'fuelAddedL', parseReading(draft.fuel, 'the fuel added in litres', { max: 500 })],
  ];
  for (const [box, field, r] of readings) {
    if (r.ok) (next as Record<string, unknown>)[field] = r.value;
    else errors[box] = r.message;
  }
  if (next.engineHoursStart != null && next.engineHoursEnd != null && next.engineHoursEnd < next.engineHoursStart) {
    errors.hoursEnd = 'Engine hours at retrieval must not be below those at launch.';
  }
  if (Object.keys(errors).length > 0) return { ok: false, errors, ask };

  // A wind speed shown rounded in the club's unit is not a change unless its text changed.
  if (draft.wind === windEntryText(trip.windSpeedKn, unit)) next.windSpeedKn = trip.windSpeedKn;
  const patch = Object.fromEntries(Object.entries(next).filter(([f, v]) => !deepEqual(v, trip[f as keyof Trip]))) as Partial<Trip>;
  const changed = Object.keys(patch).map((f) => LABELS[f as keyof Trip] ?? f);
  // Filling in a reading not recorded yet is no correction; changing what was logged is.
  const corrected = Object.keys(patch).filter((f) => trip[f as keyof Trip] !== null);
  const timesMoved = 'launchedAt' in patch || (trip.retrievedAt !== null && 'retrievedAt' in patch);
  return { ok: true, patch, changed, needsReason: timesMoved || (trip.retrievedAt !== null && corrected.length > 0) };
}

/** The line kept in the trip's edit reasons: why, and what changed. */
export function reasonLine(reason: string, changed: readonly string[]): string {
  return `${reason.trim()} (changed: ${changed.join(', ')})`;
}
