import type { KindFields } from '@breakline/sync-protocol';
import { parseReading } from './conditions';
import { entryInstant, entryOf, type LocalEntry } from './local-entry';
import type { IncidentDraft } from './writes';
import type { IncidentKind } from './words';

export interface Place { lat: number; lon: number; accuracyM: number | null }

export interface IncidentForm {
  kind: IncidentKind | null;
  date: string;
  time: string;
  choice: string | null;
  place: Place | null;
  peopleHelped: string;
  actionTaken: string;
  outcome: string;
  text: string;
}

export function blankIncident(now: string, zone: string): IncidentForm {
  return { kind: null, ...entryOf(now, zone), choice: null, place: null, peopleHelped: '', actionTaken: '', outcome: '', text: '' };
}

export function incidentFormOf(n: KindFields['incidentNote'], zone: string): IncidentForm {
  return {
    kind: n.kind, ...entryOf(n.occurredAt, zone), choice: null,
    place: n.lat !== null && n.lon !== null ? { lat: n.lat, lon: n.lon, accuracyM: null } : null,
    peopleHelped: String(n.peopleHelped), actionTaken: n.actionTaken, outcome: n.outcome, text: n.text,
  };
}

export type IncidentErrors = Partial<Record<'kind' | 'time' | 'peopleHelped' | 'actionTaken', string>>;

export type IncidentResult =
  | { ok: true; note: IncidentDraft }
  | { ok: false; errors: IncidentErrors; ask?: Extract<LocalEntry, { choices: unknown }> };

/** Coordinates kept to 5 decimal places (about a metre): enough to find the spot, no more. */
const round5 = (n: number) => Math.round(n * 1e5) / 1e5;

export function incidentOf(
  f: IncidentForm, link: { tripId: string | null; boatId: string | null }, storedAt: string, zone: string,
): IncidentResult {
  const errors: IncidentErrors = {};
  if (!f.kind) errors.kind = 'Choose what kind of incident it was.';
  const at = entryInstant(f.date, f.time, f.choice, storedAt, zone);
  const ask = at.status === 'ambiguous' || at.status === 'missing' ? at : undefined;
  if (ask) errors.time = 'Choose which time below.';
  else if (at.status === 'empty') errors.time = 'Give the time it happened.';
  else if (at.status === 'invalid') errors.time = at.message;
  const helped = parseReading(f.peopleHelped, 'the number of people helped', { max: 1000, integer: true });
  if (!helped.ok) errors.peopleHelped = helped.message;
  if (!f.actionTaken.trim()) errors.actionTaken = 'Say what was done.';
  if (Object.keys(errors).length > 0 || at.status !== 'ok' || !f.kind || !helped.ok) return { ok: false, errors, ask };
  return {
    ok: true,
    note: {
      ...link, kind: f.kind, occurredAt: at.instant,
      lat: f.place ? round5(f.place.lat) : null, lon: f.place ? round5(f.place.lon) : null,
      peopleHelped: helped.value ?? 0, actionTaken: f.actionTaken.trim(), outcome: f.outcome.trim(), text: f.text.trim(),
    },
  };
}
