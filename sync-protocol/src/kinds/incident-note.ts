import { z } from 'zod';
import { memberId, recordId, text, utcTime } from './common.js';
import { defineKind } from './spec.js';

export const INCIDENT_KINDS = ['rescue', 'assist', 'first-aid', 'near-miss', 'equipment-failure'] as const;

/**
 * Notes about a rescue, assist, first aid or near miss. They can hold health information,
 * so only their author and drivers, supervisors and admins see them; keep to what is needed.
 */
export const incidentNoteSpec = defineKind({
  label: 'an incident note',
  schema: z.strictObject({
    tripId: recordId().nullable(),
    boatId: recordId().nullable(),
    kind: z.enum(INCIDENT_KINDS),
    occurredAt: utcTime(),
    lat: z.number().min(-90).max(90).nullable(),
    lon: z.number().min(-180).max(180).nullable(),
    peopleHelped: z.number().int().min(0).max(1000),
    actionTaken: text(4000),
    outcome: text(1000),
    text: text(8000),
    authorId: memberId(),
  }),
  immutable: ['authorId'],
  access: { create: 'crew', update: 'driver', delete: 'supervisor', ownerField: 'authorId', see: 'driver' },
  recordChecks: (n) =>
    (n.lat === null) !== (n.lon === null)
      ? [{ field: 'lat', message: 'Give both latitude and longitude, or neither.' }]
      : [],
});
export type IncidentNoteFields = z.infer<typeof incidentNoteSpec.schema>;
