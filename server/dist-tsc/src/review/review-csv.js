import { utcToLocal } from '@breakline/sync-protocol';
/** An instant as the club's local time with its offset (RFC 3339), so a spreadsheet reader needs no zone. */
const local = (v, zone) => (typeof v === 'string' && v ? utcToLocal(v, zone).rfc3339 : null);
const val = (v) => (v === undefined || v === null ? null : typeof v === 'object' ? JSON.stringify(v) : v);
const boat = (r) => (r.boatFleetNumber || r.boatName ? [r.boatFleetNumber, r.boatName].filter(Boolean).join(' ') : val(r.boatId));
const f = (field) => (r) => val(r[field]);
const at = (field) => (r, z) => local(r[field], z);
const person = (field, nameField) => (r) => val(r[nameField] ?? r[field]);
function failedIds(r) {
    const results = (r.results ?? {});
    return Object.entries(results).filter(([, v]) => v?.outcome === 'fail').map(([k]) => k).sort().join('; ');
}
/** Each table's columns, in the order a person reads them; the record id last, to find it again. */
export const CSV_COLUMNS = {
    checks: [
        ['started', at('startedAt')], ['completed', at('completedAt')], ['boat', boat], ['motor', (r) => val(r.motorName ?? r.motorId)],
        ['check', f('checkType')], ['status', f('status')], ['failed items', f('failedItems')], ['failed item ids', failedIds],
        ['done by', person('performedBy', 'performedByName')], ['signed off by', person('signedOffBy', 'signedOffByName')],
        ['signed off', at('signedOffAt')], ['template version', f('templateVersion')], ['record id', f('id')],
    ],
    trips: [
        ['launched', at('launchedAt')], ['retrieved', at('retrievedAt')], ['minutes on the water', (r) => (typeof r.durationMinutes === 'number' ? Math.round(r.durationMinutes * 10) / 10 : null)],
        ['boat', boat], ['motor', (r) => val(r.motorName ?? r.motorId)], ['purpose', f('purpose')],
        ['driver', person('driverId', 'driverName')],
        ['crew', (r) => (Array.isArray(r.crewIds) ? r.crewIds.map((id, i) => r.crewNames?.[i] ?? id).join('; ') : null)],
        ['wind (knots)', f('windSpeedKn')], ['wind direction (degrees)', f('windDirectionDeg')], ['wave height (m)', f('waveHeightM')],
        ['engine hours at launch', f('engineHoursStart')], ['engine hours at retrieval', f('engineHoursEnd')], ['fuel added (litres)', f('fuelAddedL')],
        ['record id', f('id')],
    ],
    defects: [
        ['reported', at('reportedAt')], ['boat', boat], ['motor', (r) => val(r.motorName ?? r.motorId)], ['severity', f('severity')],
        ['what is wrong', f('description')], ['status', f('status')], ['reported by', person('reportedBy', 'reportedByName')],
        ['assigned to', person('assignedTo', 'assignedToName')], ['action taken', f('actionTaken')], ['repaired', at('repairedAt')],
        ['verified by', person('verifiedBy', 'verifiedByName')], ['verified', at('verifiedAt')], ['reason rejected', f('rejectedReason')],
        ['record id', f('id')],
    ],
    incidentNotes: [
        ['occurred', at('occurredAt')], ['what happened', f('kind')], ['boat', boat], ['trip id', f('tripId')], ['people helped', f('peopleHelped')],
        ['action taken', f('actionTaken')], ['outcome', f('outcome')], ['notes', f('text')], ['latitude', f('lat')], ['longitude', f('lon')],
        ['written by', person('authorId', 'authorName')], ['record id', f('id')],
    ],
};
export const csvHeader = (t) => CSV_COLUMNS[t].map(([h]) => h);
export const csvCells = (t, r, zone) => CSV_COLUMNS[t].map(([, v]) => v(r, zone));
//# sourceMappingURL=review-csv.js.map