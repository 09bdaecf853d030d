import { type Mutation, type RecordKind } from '@breakline/sync-protocol';
export declare const uuid: () => `${string}-${string}-${string}-${string}-${string}`;
/** A device with its own seq counter and clock, as a phone would have. */
export declare class TestDevice {
    readonly deviceId: string;
    seq: number;
    private c;
    constructor(deviceId?: string);
    hlc(at?: number): string;
    mutation(kind: RecordKind, recordId: string, patch: Record<string, unknown>, opts?: Partial<Mutation>): Mutation;
    body(mutations: Mutation[]): {
        protocolVersion: number;
        deviceId: string;
        mutations: Mutation[];
    };
}
export declare function defectFields(boatId: string, reportedBy: string, over?: Record<string, unknown>): {
    boatId: string;
    motorId: null;
    checkId: null;
    itemId: null;
    severity: string;
    description: string;
    photos: never[];
    status: string;
    reportedBy: string;
    reportedAt: string;
    assignedTo: null;
    actionTaken: null;
    repairedAt: null;
    verifiedBy: null;
    verifiedAt: null;
    rejectedReason: null;
    notes: never[];
};
export declare function incidentFields(authorId: string, over?: Record<string, unknown>): {
    tripId: null;
    boatId: null;
    kind: string;
    occurredAt: string;
    lat: null;
    lon: null;
    peopleHelped: number;
    actionTaken: string;
    outcome: string;
    text: string;
    authorId: string;
};
