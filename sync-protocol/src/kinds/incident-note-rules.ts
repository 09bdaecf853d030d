import type { IncidentNoteFields } from './incident-note.js';
import { defineRules } from './spec.js';

export const INCIDENT_KINDS = ['rescue', 'assist', 'first-aid', 'near-miss', 'equipment-failure'] as const;

/** Incident notes can hold health information: only their author and drivers up see them. */
export const incidentNoteRules = defineRules<IncidentNoteFields>({
  label: 'an incident note',
  immutable: ['authorId'],
  access: { create: 'crew', update: 'driver', delete: 'supervisor', ownerField: 'authorId', see: 'driver' },
  recordChecks: (n) =>
    (n.lat === null) !== (n.lon === null)
      ? [{ field: 'lat', message: 'Give both latitude and longitude, or neither.' }]
      : [],
});
