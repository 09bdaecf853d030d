import { CHECK_TYPES, DEFECT_SEVERITIES, DEFECT_STATUSES, INCIDENT_KINDS, TRIP_PURPOSES } from '@breakline/sync-protocol';
import { snake, tableOf } from '../records/columns.js';
/** The Review desk's tables, as they appear in the address: /api/review/checks, /api/review/trips ... */
export const REVIEW_TABLES = ['checks', 'trips', 'defects', 'incidentNotes'];
export const isReviewTable = (s) => REVIEW_TABLES.includes(s);
/**
 * A member-id column as a uuid, or null when it does not hold one, so a join on it can use the
 * primary key and an odd value can never fail the query.
 */
export const uid = (expr) => `(CASE WHEN ${expr} ~* '^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$' THEN (${expr})::uuid END)`;
/** Name a person field's display name goes under: performedBy → performedByName, driverId → driverName. */
export const nameKey = (field) => `${field.replace(/Id$/, '')}Name`;
const col = (field) => `x.${snake(field)}`;
const rank = (field, values) => `array_position(ARRAY[${values.map((v) => `'${v}'`).join(',')}]::text[], ${col(field)})`;
const instant = (field) => `(${col(field)})::timestamptz`;
/** Sorts every table shares; person and boat fields sort by the name shown, not the id. */
function commonSorts(spec, peopleAlias) {
    const s = { [spec.date]: col(spec.date), updatedAt: 'x.updated_at' };
    if (spec.hasBoat)
        s.boatId = 'b.fleet_number';
    if (spec.hasMotor)
        s.motorId = 'mo.serial';
    spec.people.forEach((f, i) => { s[f] = `${peopleAlias(i)}.display_name`; });
    return s;
}
export const personAlias = (i) => `pu${i}`;
function spec(s) {
    return { ...s, sorts: { ...commonSorts(s, personAlias), ...(s.sorts ?? {}) } };
}
export const TABLES = {
    checks: spec({
        kind: 'check', words: 'checks', date: 'startedAt', hasBoat: true, hasMotor: true,
        people: ['performedBy', 'signedOffBy'],
        member: `(x.performed_by = $M OR x.signed_off_by = $M)`,
        states: {
            'in-progress': `x.status = 'in-progress'`,
            complete: `x.status = 'complete' AND x.signed_off_at IS NULL`,
            'signed-off': `x.signed_off_at IS NOT NULL`,
        },
        type: { field: 'checkType', values: CHECK_TYPES },
        severity: false,
        extras: { failedItems: `(SELECT count(*)::int FROM jsonb_each(coalesce(x.results, '{}'::jsonb)) r WHERE r.value->>'outcome' = 'fail')` },
        sorts: { completedAt: col('completedAt'), signedOffAt: col('signedOffAt'), checkType: col('checkType'), status: col('status'), failedItems: 'failed_items' },
    }),
    trips: spec({
        kind: 'trip', words: 'trips', date: 'launchedAt', hasBoat: true, hasMotor: true,
        people: ['driverId'],
        member: `(x.driver_id = $M OR coalesce(x.crew_ids, '[]'::jsonb) ? $M)`,
        states: { afloat: `x.retrieved_at IS NULL`, retrieved: `x.retrieved_at IS NOT NULL` },
        type: { field: 'purpose', values: TRIP_PURPOSES },
        severity: false,
        extras: {
            durationMinutes: `(CASE WHEN x.retrieved_at IS NULL THEN NULL ELSE extract(epoch FROM ${instant('retrievedAt')} - ${instant('launchedAt')}) / 60 END)::double precision`,
        },
        sorts: { retrievedAt: col('retrievedAt'), purpose: col('purpose'), durationMinutes: 'duration_minutes', fuelAddedL: col('fuelAddedL') },
    }),
    defects: spec({
        kind: 'defect', words: 'defects', date: 'reportedAt', hasBoat: true, hasMotor: true,
        people: ['reportedBy', 'assignedTo', 'verifiedBy'],
        member: `(x.reported_by = $M OR x.assigned_to = $M OR x.verified_by = $M)`,
        states: {
            ...Object.fromEntries(DEFECT_STATUSES.map((s) => [s, `x.status = '${s}'`])),
            // Still counting against the boat: only a supervisor's verification or a rejection closes one.
            unresolved: `x.status IN ('open', 'assigned', 'repaired')`,
        },
        severity: true,
        extras: {},
        sorts: { severity: rank('severity', DEFECT_SEVERITIES), status: rank('status', DEFECT_STATUSES), repairedAt: col('repairedAt'), verifiedAt: col('verifiedAt') },
    }),
    incidentNotes: spec({
        kind: 'incidentNote', words: 'incident notes', date: 'occurredAt', hasBoat: true, hasMotor: false,
        people: ['authorId'],
        member: `x.author_id = $M`,
        states: {},
        type: { field: 'kind', values: INCIDENT_KINDS },
        severity: false,
        extras: {},
        sorts: { kind: col('kind'), peopleHelped: col('peopleHelped') },
    }),
};
export const tableName = (t) => `"${tableOf(TABLES[t].kind)}"`;
//# sourceMappingURL=review-tables.js.map