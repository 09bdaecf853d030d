import { z } from 'zod';
import { memberId, recordId, text, utcTime } from './common.js';
import { incidentNoteRules } from './incident-note-rules.js';
import { defineKind } from './spec.js';
import { INCIDENT_KINDS } from './values.js';

const incidentNoteSchema = z.strictObject({
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
});

/**
 * Notes about a rescue, assist, first aid or near miss. They can hold health information,
 * so only their author and drivers, supervisors and admins see them; keep to what is needed.
 */
export const incidentNoteSpec = defineKind({ ...incidentNoteRules, schema: incidentNoteSchema });
export type IncidentNoteFields = z.infer<typeof incidentNoteSchema>;
