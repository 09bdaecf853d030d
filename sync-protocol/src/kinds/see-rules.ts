import type { RecordKind } from './names.js';
import type { Role } from '../roles.js';

/**
 * The kinds only some roles see whole (anyone sees their own), and the least role that does.
 * The kinds' rules take their `see` from here, so a phone can tell what a role sees without
 * loading every kind's rules.
 */
export const SEE_RULES: Readonly<Partial<Record<RecordKind, Role>>> = {
  // Incident notes can hold health information.
  incidentNote: 'driver',
};
