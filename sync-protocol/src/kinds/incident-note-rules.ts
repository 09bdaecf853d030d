import type { IncidentNoteFields } from './incident-note.js';
import type { KindRules } from './spec.js';
import { SEE_RULES } from './see-rules.js';

/** Incident notes can hold health information: only their author and drivers up see them. */
export const incidentNoteRules: KindRules<IncidentNoteFields> = {
  label: 'an incident note',
  immutable: ['authorId'],
  access: { create: 'crew', update: 'driver', delete: 'supervisor', ownerField: 'authorId', see: SEE_RULES.incidentNote },
  recordChecks: (n) =>
    (n.lat === null) !== (n.lon === null)
      ? [{ field: 'lat', message: 'Give both latitude and longitude, or neither.' }]
      : [],
};
