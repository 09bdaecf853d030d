// Builders for sync requests in the e2e tests; data is an invented scenario.
import { encodeHlc, PROTOCOL_VERSION } from '@breakline/sync-protocol';
export const uuid = () => crypto.randomUUID();
/** A device with its own seq counter and clock, as a phone would have. */
export class TestDevice {
    deviceId;
    seq = 0;
    c = 0;
    constructor(deviceId = `phone-${uuid().slice(0, 8)}`) {
        this.deviceId = deviceId;
    }
    hlc(at = Date.now()) {
        return encodeHlc({ l: at, c: this.c++, node: this.deviceId });
    }
    mutation(kind, recordId, patch, opts = {}) {
        return {
            mutationId: uuid(), seq: ++this.seq, recordId, kind, baseVersion: 0, base: {}, hlc: this.hlc(), patch, ...opts,
        };
    }
    body(mutations) {
        return { protocolVersion: PROTOCOL_VERSION, deviceId: this.deviceId, mutations };
    }
}
export function defectFields(boatId, reportedBy, over = {}) {
    return {
        boatId, motorId: null, checkId: null, itemId: null, severity: 'limit', description: 'Port handle strap frayed near the bow',
        photos: [], status: 'open', reportedBy, reportedAt: '2026-11-28T21:10:00Z', assignedTo: null, actionTaken: null,
        repairedAt: null, verifiedBy: null, verifiedAt: null, rejectedReason: null, notes: [], ...over,
    };
}
export function incidentFields(authorId, over = {}) {
    return {
        tripId: null, boatId: null, kind: 'assist', occurredAt: '2026-11-28T23:40:00Z', lat: null, lon: null, peopleHelped: 1,
        actionTaken: 'Brought a tired swimmer back to the flags', outcome: 'No injury', text: '', authorId, ...over,
    };
}
//# sourceMappingURL=sync-fixtures.js.map